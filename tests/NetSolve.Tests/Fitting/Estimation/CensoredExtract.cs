using System.Collections.Immutable;
using NetSolve.Fitting.Estimation;

namespace NetSolve.Tests.Fitting.Estimation;

/// <summary>
/// A unit in steady state cut to an extract window, seeded: patients arrive as a Poisson stream from long before the
/// window, so the window sees stays already running (left-truncated), stays that end inside it, and stays still
/// running at its end (censored).
/// </summary>
internal static class CensoredExtract
{
    /// <summary>How long before the window arrivals begin, in mean stays: long enough for the unit to fill.</summary>
    private const double WarmUpMeans = 20.0;

    /// <summary>The unit's observations and, for contrast, the naive mean of the stays that both began and ended inside the window.</summary>
    public static (UnitObservations Unit, double NaiveMeanHours) Draw(int seed, double arrivalsPerHour, double windowHours, Func<Random, double> stayHours, double meanHours)
    {
        var random = new Random(seed);
        var hours = ImmutableArray.CreateBuilder<double>();
        var censored = ImmutableArray.CreateBuilder<bool>();
        var ages = ImmutableArray.CreateBuilder<double>();
        var complete = new List<double>();
        double time = -WarmUpMeans * meanHours;
        while (true)
        {
            time += -Math.Log(1.0 - random.NextDouble()) / arrivalsPerHour;
            if (time > windowHours)
            {
                break;
            }

            double stay = stayHours(random);
            double left = time + stay;
            if (left < 0.0)
            {
                continue;
            }

            bool isCensored = left > windowHours;
            hours.Add(Math.Min(left, windowHours) - time);
            censored.Add(isCensored);
            ages.Add(Math.Max(0.0, -time));
            if (time >= 0.0 && !isCensored)
            {
                complete.Add(stay);
            }
        }

        var unit = new UnitObservations("ward", hours.ToImmutable(), censored.ToImmutable(), ages.ToImmutable(), [], [], []);
        return (unit, complete.Count == 0 ? 0.0 : complete.Average());
    }

    /// <summary>An exponential stay with the given mean.</summary>
    public static Func<Random, double> Exponential(double meanHours) => random => -meanHours * Math.Log(1.0 - random.NextDouble());

    /// <summary>A lognormal stay with the given mean and cv (Box–Muller normal deviates).</summary>
    public static Func<Random, double> Lognormal(double meanHours, double cv)
    {
        double sigma = Math.Sqrt(Math.Log(1.0 + (cv * cv)));
        double mu = Math.Log(meanHours) - (sigma * sigma / 2.0);
        return random =>
        {
            double normal = Math.Sqrt(-2.0 * Math.Log(1.0 - random.NextDouble())) * Math.Cos(2.0 * Math.PI * random.NextDouble());
            return Math.Exp(mu + (sigma * normal));
        };
    }
}

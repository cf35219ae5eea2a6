using System.Globalization;
using NetSolve.Solving;

namespace NetSolve.Tests.Core.TimeVarying;

/// <summary>
/// The accuracy goal of the hour-by-hour formulas: each hour's mean queue within 10% or 0.5 patients of the exact
/// chain, on generated single units (1–50 servers, peak load 0.5–0.95 of the servers, emergency-shaped day). Long:
/// dozens of exact chains. Results go into docs/time-of-day.md with the command below.
/// </summary>
public sealed class TimeVaryingAccuracyTests
{
    private const string Command = "nice -n 10 dotnet test -- --filter-trait \"Category=Long\" --explicit only --filter-class '*TimeVaryingAccuracyTests*'";

    private const int GeneratedUnits = 40;

    private static readonly double[] MeanServiceHours = [0.25, 0.5, 1.0, 2.0, 4.0];

    // Exact by hand: the criterion of the goal, 10% of the exact chain's queue or 0.5 patients, whichever is larger.
    [Fact(Explicit = true)]
    [Trait("Category", "Long")]
    public void The_default_methods_keep_each_hour_within_ten_percent_or_half_a_patient_of_the_exact_chain()
    {
        var random = new Random(2026);
        var day = TimeVaryingTestNetworks.EmergencyDay();
        double peak = day.Max() / day.Average();
        var exactOptions = TimeVaryingOptions.Default with { ExactForSmallUnits = true };
        int hours = 0;
        int within = 0;
        foreach (int unit in Enumerable.Range(0, GeneratedUnits))
        {
            int servers = random.Next(1, 51);
            double peakLoad = 0.5 + (0.45 * random.NextDouble());
            double serviceHours = MeanServiceHours[random.Next(MeanServiceHours.Length)];
            double meanArrivals = peakLoad * servers / serviceHours / peak;
            var network = TimeVaryingTestNetworks.SingleUnit(servers, serviceHours, meanArrivals, day);

            var chosen = TimeVaryingSolver.Solve(network).Units[0];
            var exact = TimeVaryingSolver.Solve(network, options: exactOptions).Units[0];
            int unitWithin = 0;
            for (int h = 0; h < exact.MeanQueueByHour.Length; h++)
            {
                double allowed = Math.Max(0.5, 0.1 * exact.MeanQueueByHour[h]);
                unitWithin += Math.Abs(chosen.MeanQueueByHour[h] - exact.MeanQueueByHour[h]) <= allowed ? 1 : 0;
            }

            hours += exact.MeanQueueByHour.Length;
            within += unitWithin;
            TestContext.Current.TestOutputHelper?.WriteLine(string.Create(CultureInfo.InvariantCulture,
                $"unit {unit}: {servers} servers, mean service {serviceHours} h, peak load {peakLoad:F2}: {chosen.Method}, {unitWithin} of {exact.MeanQueueByHour.Length} hours within"));
        }

        TestContext.Current.TestOutputHelper?.WriteLine(string.Create(CultureInfo.InvariantCulture, $"{within} of {hours} hours within ({Command})"));
        Assert.True(within == hours, string.Create(CultureInfo.InvariantCulture, $"{within} of {hours} hours within 10% or 0.5 patients of the exact chain"));
    }
}

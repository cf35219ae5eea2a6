using NetSolve.Model;

namespace NetSolve.Solving;

/// <summary>
/// The service each patient class (the default group and every patient group) takes at each unit, mixed by the rates
/// the classes offer a unit: the mean and SCV of the length of stay of the patients who arrive there.
/// </summary>
/// <remarks>
/// The same mixture as <see cref="GroupTraffic"/> (law of total variance, docs/methods.md "Patient groups"), but
/// weighted by the offered rates of the bed-limit fixed point rather than the unlimited traffic equations, since a
/// diversion brings one group's patients to another group's unit. Immutable after construction; thread-safe.
/// </remarks>
internal sealed class ClassServices
{
    private readonly double[][] _meanHours;
    private readonly double[][] _scv;

    private ClassServices(double[][] meanHours, double[][] scv)
    {
        _meanHours = meanHours;
        _scv = scv;
    }

    /// <summary>The classes of <paramref name="network"/>, in the order of <see cref="GroupTraffic.Solve"/>.</summary>
    public static ClassServices Of(Network network)
    {
        if (network.Groups.IsEmpty)
        {
            double[] mean = [.. network.Units.Select(unit => unit.MeanServiceHours)];
            double[] scv = [.. network.Units.Select(unit => Squared(unit.Service?.Cv ?? unit.ServiceCv))];
            return new ClassServices([mean], [scv]);
        }

        var groups = GroupTraffic.Solve(network).Groups;
        return new ClassServices(
            [.. groups.Select(group => group.Units.Select(flow => flow.MeanServiceHours).ToArray())],
            [.. groups.Select(group => group.Units.Select(flow => flow.ServiceScv).ToArray())]);
    }

    /// <summary>Mean (hours) and SCV of the service at <paramref name="unit"/> mixed by <paramref name="offered"/>[class][unit].</summary>
    public (double MeanHours, double Scv) Mix(double[][] offered, int unit)
    {
        double total = 0.0;
        int first = -1;
        bool alike = true;
        for (int g = 0; g < _meanHours.Length; g++)
        {
            if (!(offered[g][unit] > 0.0))
            {
                continue;
            }

            total += offered[g][unit];
            first = first < 0 ? g : first;

            // Exact comparison on purpose: only classes with identical service may skip the mixture arithmetic.
            alike &= _meanHours[g][unit].Equals(_meanHours[first][unit]) && _scv[g][unit].Equals(_scv[first][unit]);
        }

        if (first < 0 || alike)
        {
            int shown = Math.Max(first, 0);
            return (_meanHours[shown][unit], _scv[shown][unit]);
        }

        double mean = 0.0;
        for (int g = 0; g < _meanHours.Length; g++)
        {
            mean += offered[g][unit] / total * _meanHours[g][unit];
        }

        double variance = 0.0;
        for (int g = 0; g < _meanHours.Length; g++)
        {
            double spread = _meanHours[g][unit] - mean;
            variance += offered[g][unit] / total * ((_meanHours[g][unit] * _meanHours[g][unit] * _scv[g][unit]) + (spread * spread));
        }

        return (mean, variance / (mean * mean));
    }

    private static double Squared(double value) => value * value;
}

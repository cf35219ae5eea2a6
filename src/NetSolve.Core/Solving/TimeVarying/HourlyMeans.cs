using System.Collections.Immutable;

namespace NetSolve.Solving;

/// <summary>Averages over each hour of values on the fine time grid.</summary>
internal static class HourlyMeans
{
    /// <summary>Hourly means of per-step values (each constant over its step).</summary>
    public static ImmutableArray<double> OfSteps(ReadOnlySpan<double> steps, int stepsPerHour)
    {
        var hours = new double[steps.Length / stepsPerHour];
        for (int k = 0; k < steps.Length; k++)
        {
            hours[k / stepsPerHour] += steps[k];
        }

        for (int h = 0; h < hours.Length; h++)
        {
            hours[h] /= stepsPerHour;
        }

        return [.. hours];
    }

    /// <summary>Hourly means of values at step boundaries, by the trapezoid rule.</summary>
    public static ImmutableArray<double> OfNodes(ReadOnlySpan<double> nodes, int stepsPerHour)
    {
        var midpoints = new double[nodes.Length - 1];
        for (int k = 0; k < midpoints.Length; k++)
        {
            midpoints[k] = 0.5 * (nodes[k] + nodes[k + 1]);
        }

        return OfSteps(midpoints, stepsPerHour);
    }
}

using MathNet.Numerics.Distributions;
using NetSolve.Simulation;

namespace NetSolve.Tests.Simulation;

/// <summary>
/// Checks that formulas lie inside simulation confidence intervals, several at once. Each 95% interval misses the
/// truth one time in twenty, so a test checking m values widens each interval to level 1 − 0.05/m (Bonferroni's
/// inequality: all m hold together with probability at least 95%). The seeds are fixed, so results never vary between runs.
/// </summary>
internal static class Bonferroni
{
    public static void AssertAllInside(IReadOnlyList<(string Name, Estimate Simulated, double Formula)> checks)
    {
        var failures = new List<string>();
        foreach (var (name, simulated, formula) in checks)
        {
            Assert.True(simulated.HalfWidth.HasValue, $"{name}: no confidence interval");
            double widen = Widening(checks.Count, simulated.Replications);
            double half = simulated.HalfWidth!.Value * widen;
            if (Math.Abs(simulated.Mean - formula) > half)
            {
                failures.Add(FormattableString.Invariant($"{name}: simulated {simulated.Mean:G6} ± {half:G3}, formula {formula:G6}"));
            }
        }

        Assert.True(failures.Count == 0, string.Join("\n", failures));
    }

    /// <summary>t(1 − 0.05/(2m), n − 1) / t(0.975, n − 1).</summary>
    public static double Widening(int checks, int replications)
    {
        double alpha = (1.0 - Estimate.ConfidenceLevel) / checks;
        return StudentT.InvCDF(0.0, 1.0, replications - 1, 1.0 - (alpha / 2.0))
            / StudentT.InvCDF(0.0, 1.0, replications - 1, 0.5 + (Estimate.ConfidenceLevel / 2.0));
    }
}

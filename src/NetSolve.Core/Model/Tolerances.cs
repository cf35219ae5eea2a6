namespace NetSolve.Model;

/// <summary>Every tolerance the solver and the parser use, in one place, each saying what it is relative to.</summary>
public static class Tolerances
{
    /// <summary>Absolute: routes out of a unit summing to within this of 1 count as exactly 1 (contract rule).</summary>
    public const double ProbabilitySum = 1e-9;

    /// <summary>Relative to the largest arrival rate: the largest traffic-equation residual accepted.</summary>
    public const double TrafficResidual = 1e-8;

    /// <summary>Relative: two headrooms this close are tied for bottleneck (contract rule).</summary>
    public const double HeadroomTie = 1e-9;
}

namespace NetSolve.Solving;

/// <summary>Default settings a planner can override on the command line.</summary>
public static class Defaults
{
    /// <summary>
    /// Utilisation at or above which a unit is reported <c>strained</c>. 0.85 follows the common planning rule
    /// of thumb that bed occupancy above about 85% brings regular bed crises (common practice).
    /// </summary>
    public const double StrainThreshold = 0.85;
}

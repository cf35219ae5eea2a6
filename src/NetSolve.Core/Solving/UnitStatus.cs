namespace NetSolve.Solving;

/// <summary>How a unit stands, in the contract's order of severity.</summary>
public enum UnitStatus
{
    /// <summary>Stable and below the strain threshold.</summary>
    Ok,

    /// <summary>Stable, utilisation at or above the strain threshold.</summary>
    Strained,

    /// <summary>The stable unit(s) with finite servers and the smallest headroom: saturates first as demand grows.</summary>
    Bottleneck,

    /// <summary>Utilisation at or above 1: the queue grows without bound.</summary>
    Unstable,
}

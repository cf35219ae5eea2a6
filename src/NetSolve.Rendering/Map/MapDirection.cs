namespace NetSolve.Rendering.Map;

/// <summary>The main direction patients flow on the map.</summary>
public enum MapDirection
{
    /// <summary>Arrivals at the top, exits below: suits A4 and Letter portrait.</summary>
    TopToBottom,

    /// <summary>Arrivals at the left, exits to the right: suits screens and landscape pages.</summary>
    LeftToRight,
}

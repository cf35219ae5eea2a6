namespace NetSolve.Rendering.Map;

/// <summary>What a flow line on the map stands for.</summary>
public enum MapEdgeKind
{
    /// <summary>A route that moves patients along the main direction.</summary>
    Forward,

    /// <summary>A route back against the main direction, or to the same unit: drawn dashed.</summary>
    Feedback,
}

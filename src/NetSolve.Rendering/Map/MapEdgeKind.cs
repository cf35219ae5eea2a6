namespace NetSolve.Rendering.Map;

/// <summary>What a flow line on the map stands for.</summary>
public enum MapEdgeKind
{
    /// <summary>A route that moves patients along the main direction.</summary>
    Forward,

    /// <summary>A route back against the main direction, or to the same unit: drawn dashed.</summary>
    Feedback,

    /// <summary>Patients diverted from a full unit to its diversion target (<c>when_full: divert to</c>): drawn dashed.</summary>
    Diversion,
}

namespace NetSolve.Rendering.Map;

/// <summary>What a box on the map stands for.</summary>
public enum MapNodeKind
{
    /// <summary>A hospital unit.</summary>
    Unit,

    /// <summary>Patients arriving from outside the network at one unit.</summary>
    Arrival,

    /// <summary>Patients leaving the network from one unit.</summary>
    Exit,
}

namespace NetSolve.Model;

/// <summary>What happens to a patient who arrives at a unit at its capacity: turned away, or diverted to another unit.</summary>
/// <remarks>Immutable. A turned-away patient leaves the network. A diverted patient arrives at the named unit instead,
/// where that unit's own capacity and policy apply.</remarks>
public sealed record WhenFull
{
    private WhenFull(string? divertToUnitId) => DivertToUnitId = divertToUnitId;

    /// <summary>The patient leaves the network (the default).</summary>
    public static WhenFull TurnAway { get; } = new((string?)null);

    /// <summary>The unit a full unit diverts to; null when patients are turned away.</summary>
    public string? DivertToUnitId { get; }

    /// <summary>True when patients are turned away rather than diverted.</summary>
    public bool IsTurnAway => DivertToUnitId is null;

    /// <summary>Diverts to the unit with id <paramref name="unitId"/>.</summary>
    public static WhenFull DivertTo(string unitId)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(unitId);
        return new WhenFull(unitId);
    }
}

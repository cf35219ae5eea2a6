namespace NetSolve.Rendering.Staffing;

/// <summary>What one line of the roster chart shows for its unit.</summary>
public enum RosterChartQuantity
{
    /// <summary>Offered load (erlangs) in each hour: the servers busy on average were there no queue.</summary>
    Demand,

    /// <summary>The roster's servers in each hour, drawn as steps that change on the hour.</summary>
    Roster,

    /// <summary>The fewest servers the same all day that meet the same targets: the reference the roster saves against.</summary>
    Flat,
}

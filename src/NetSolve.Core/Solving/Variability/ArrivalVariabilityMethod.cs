namespace NetSolve.Solving;

/// <summary>How the arrival SCV of each unit is worked out from the flows of the network (docs/methods.md).</summary>
public enum ArrivalVariabilityMethod
{
    /// <summary>One SCV per flow from the two-moment linear equations (W. Whitt, Bell System Technical Journal 62(9), 1983, pp. 2779–2815).</summary>
    Decomposition,

    /// <summary>
    /// Each unit's arrival SCV from the same equations evaluated at the time scale of that unit's queue: variability
    /// functions (W. Whitt, Management Science 41(10), 1995, pp. 1704–1715) with the heavy-traffic weight of a
    /// unit's service in its departures (<see cref="VariabilityFunctions"/>).
    /// </summary>
    VariabilityFunctions,

    /// <summary>
    /// The flows from queueing units as their departure processes, Markovian arrival processes (M. F. Neuts, 1989),
    /// read at the time scale of each destination's queue by their index of dispersion for counts
    /// (<see cref="MarkovianDepartures"/>); measured in docs/methods.md, not the default.
    /// </summary>
    MarkovianDepartures,

    /// <summary>
    /// Indices of dispersion through the network: every flow's index of dispersion for counts as a function of the
    /// window, one linear system per window (covariances between flows carried, so loops amplify), each unit's SCV
    /// from the robust-queueing supremum over windows (W. Whitt and W. You, Naval Research Logistics 69(1), 2022,
    /// pp. 36–56, from memory; <see cref="DispersionNetwork"/>); measured in docs/methods.md.
    /// </summary>
    IndicesOfDispersion,
}

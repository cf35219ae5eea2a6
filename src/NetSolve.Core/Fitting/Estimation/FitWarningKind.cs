namespace NetSolve.Fitting.Estimation;

/// <summary>Why an estimate deserves less trust than its interval alone suggests.</summary>
public enum FitWarningKind
{
    /// <summary>Fewer than 30 stays.</summary>
    FewStays,

    /// <summary>No stay ended inside the extract: no mean stay can be estimated.</summary>
    NoStayEnded,

    /// <summary>A route seen fewer than 10 times.</summary>
    ThinRoute,

    /// <summary>The unit's load interval reaches 1: it may be unstable with its servers.</summary>
    LoadMayReachServers,

    /// <summary>No patient waited, so the servers are only a lower bound.</summary>
    NeverQueued,
}

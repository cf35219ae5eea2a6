namespace NetSolve.Presentation;

/// <summary>The planning caution every report carries: staffing and capacity advice can hurt patients if misread.</summary>
public static class Caution
{
    /// <summary>The caution, one paragraph.</summary>
    public const string Text =
        "Caution: these are planning estimates under stated assumptions (steady state; each unit's method, exact for "
        + "Poisson arrivals and exponential service and approximate otherwise; independent routing; first come first served). Decisions on beds and staffing follow local clinical "
        + "governance and safe-staffing rules.";
}

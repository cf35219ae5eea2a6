namespace NetSolve.Presentation.Metrics;

/// <summary>Who a column is shown to.</summary>
public enum Audience
{
    /// <summary>Every format.</summary>
    All,

    /// <summary>JSON and CSV only, such as a unit's label beside its id.</summary>
    Machines,

    /// <summary>Tables, report and map only.</summary>
    People,
}

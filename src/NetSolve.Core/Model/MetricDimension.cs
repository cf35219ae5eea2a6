namespace NetSolve.Model;

/// <summary>What a metric measures: decides its conversion to a time unit and how people read it.</summary>
public enum MetricDimension
{
    /// <summary>A plain number, such as mean visits per patient or an offered load in erlangs.</summary>
    Plain,

    /// <summary>A time, stored in hours.</summary>
    Time,

    /// <summary>A rate, stored per hour.</summary>
    Rate,

    /// <summary>A mean number of patients (a queue, the patients in a unit).</summary>
    Count,

    /// <summary>A probability between 0 and 1, such as the chance of waiting.</summary>
    Probability,

    /// <summary>A share between 0 and 1 read as a percentage, such as utilisation.</summary>
    Fraction,

    /// <summary>A multiple, such as headroom or a growth factor.</summary>
    Factor,

    /// <summary>A whole number of servers; absent means unlimited.</summary>
    Servers,
}

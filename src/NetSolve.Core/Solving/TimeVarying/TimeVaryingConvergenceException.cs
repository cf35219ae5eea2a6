using System.Globalization;

namespace NetSolve.Solving;

/// <summary>The hour-by-hour flows round loops of routes, or an exact chain, did not settle within the allowed passes.</summary>
public sealed class TimeVaryingConvergenceException : Exception
{
    /// <summary>Creates the exception naming what did not settle and the relative change still left.</summary>
    public TimeVaryingConvergenceException(string what, double relativeChange)
        : base(string.Create(CultureInfo.InvariantCulture, $"{what} did not settle to a daily or weekly pattern (relative change {relativeChange:G3})"))
    {
        RelativeChange = relativeChange;
    }

    /// <summary>Creates the exception with a message.</summary>
    public TimeVaryingConvergenceException(string message)
        : base(message)
    {
    }

    /// <summary>Creates the exception with a message and cause.</summary>
    public TimeVaryingConvergenceException(string message, Exception innerException)
        : base(message, innerException)
    {
    }

    /// <summary>Creates the exception.</summary>
    public TimeVaryingConvergenceException()
    {
    }

    /// <summary>The last pass's largest change relative to the largest value.</summary>
    public double RelativeChange { get; }
}

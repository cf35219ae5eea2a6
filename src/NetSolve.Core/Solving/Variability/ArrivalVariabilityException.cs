using System.Globalization;

namespace NetSolve.Solving;

/// <summary>The arrival-variability equations could not be solved to <see cref="ArrivalVariability.ResidualTolerance"/>.</summary>
public sealed class ArrivalVariabilityException : Exception
{
    /// <summary>Creates the exception with the residual reached.</summary>
    public ArrivalVariabilityException(double residual)
        : base(string.Create(CultureInfo.InvariantCulture,
            $"the arrival-variability equations did not converge (residual {residual:G3})"))
    {
        Residual = residual;
    }

    /// <summary>Creates the exception with a message.</summary>
    public ArrivalVariabilityException(string message)
        : base(message)
    {
    }

    /// <summary>Creates the exception with a message and cause.</summary>
    public ArrivalVariabilityException(string message, Exception innerException)
        : base(message, innerException)
    {
    }

    /// <summary>Creates the exception.</summary>
    public ArrivalVariabilityException()
    {
    }

    /// <summary>The largest absolute residual of the equations, in SCV units (relative to the largest SCV when above 1).</summary>
    public double Residual { get; }
}

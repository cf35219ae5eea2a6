using System.Globalization;
using NetSolve.Model;

namespace NetSolve.Solving;

/// <summary>The traffic equations could not be solved to <see cref="Tolerances.TrafficResidual"/>.</summary>
public sealed class TrafficEquationsException : Exception
{
    /// <summary>Creates the exception with the relative residual reached.</summary>
    public TrafficEquationsException(double relativeResidual)
        : base(string.Create(CultureInfo.InvariantCulture,
            $"the traffic equations did not converge (relative residual {relativeResidual:G3})"))
    {
        RelativeResidual = relativeResidual;
    }

    /// <summary>Creates the exception with a message.</summary>
    public TrafficEquationsException(string message)
        : base(message)
    {
    }

    /// <summary>Creates the exception with a message and cause.</summary>
    public TrafficEquationsException(string message, Exception innerException)
        : base(message, innerException)
    {
    }

    /// <summary>Creates the exception.</summary>
    public TrafficEquationsException()
    {
    }

    /// <summary>The largest residual divided by the largest flow.</summary>
    public double RelativeResidual { get; }
}

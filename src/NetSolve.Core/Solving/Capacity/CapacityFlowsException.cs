using System.Globalization;

namespace NetSolve.Solving;

/// <summary>The capacity fixed point did not settle within <see cref="CapacityFlowOptions.MaxIterations"/> steps.</summary>
public sealed class CapacityFlowsException : Exception
{
    /// <summary>Creates the exception with the last relative change and the steps taken.</summary>
    public CapacityFlowsException(double relativeChange, int iterations)
        : base(string.Create(CultureInfo.InvariantCulture,
            $"the flows with bed limits did not converge in {iterations} steps (last relative change {relativeChange:G3})"))
    {
        RelativeChange = relativeChange;
        Iterations = iterations;
    }

    /// <summary>Creates the exception with a message.</summary>
    public CapacityFlowsException(string message)
        : base(message)
    {
    }

    /// <summary>Creates the exception with a message and cause.</summary>
    public CapacityFlowsException(string message, Exception innerException)
        : base(message, innerException)
    {
    }

    /// <summary>Creates the exception.</summary>
    public CapacityFlowsException()
    {
    }

    /// <summary>The largest change of a flow in the last step, divided by the largest flow.</summary>
    public double RelativeChange { get; }

    /// <summary>Steps taken.</summary>
    public int Iterations { get; }
}

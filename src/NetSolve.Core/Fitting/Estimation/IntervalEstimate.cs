using System.Runtime.InteropServices;

namespace NetSolve.Fitting.Estimation;

/// <summary>An estimate with its 95% interval.</summary>
/// <param name="Value">The point estimate.</param>
/// <param name="Interval">The 95% interval around it.</param>
[StructLayout(LayoutKind.Sequential)]
public readonly record struct IntervalEstimate(double Value, Interval Interval);

using System.Runtime.InteropServices;

namespace NetSolve.Fitting.Estimation;

/// <summary>A closed interval [Lower, Upper] around an estimate, both ends finite or Upper positive infinity.</summary>
/// <param name="Lower">The lower end.</param>
/// <param name="Upper">The upper end; <see cref="double.PositiveInfinity"/> when the data set no upper limit.</param>
[StructLayout(LayoutKind.Sequential)]
public readonly record struct Interval(double Lower, double Upper)
{
    /// <summary>Whether <paramref name="value"/> lies inside, ends included.</summary>
    public bool Contains(double value) => value >= Lower && value <= Upper;

    /// <summary>Whether the upper end is finite (a shown interval writes "no upper limit" otherwise).</summary>
    public bool IsBounded => double.IsFinite(Upper);
}

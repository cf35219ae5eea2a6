using MathNet.Numerics;

namespace NetSolve.Fitting.Estimation;

/// <summary>Logarithms of the standard normal density and upper tail, finite far into the tail.</summary>
internal static class NormalTail
{
    /// <summary>Above this z the upper tail is taken from its asymptotic series: erfc underflows near z = 38.</summary>
    private const double AsymptoticFrom = 8.0;

    private static readonly double LogRootTwoPi = 0.5 * Math.Log(2.0 * Math.PI);

    /// <summary>ln φ(z).</summary>
    public static double LogDensity(double z) => (-0.5 * z * z) - LogRootTwoPi;

    /// <summary>ln (1 − Φ(z)): for large z, ln φ(z) − ln z + ln(1 − 1/z² + 3/z⁴) (Abramowitz and Stegun 26.2.12).</summary>
    public static double LogUpper(double z)
    {
        if (z < AsymptoticFrom)
        {
            return Math.Log(0.5 * SpecialFunctions.Erfc(z / Constants.Sqrt2));
        }

        double inverseSquare = 1.0 / (z * z);
        return LogDensity(z) - Math.Log(z) + Math.Log(1.0 - inverseSquare + (3.0 * inverseSquare * inverseSquare));
    }
}

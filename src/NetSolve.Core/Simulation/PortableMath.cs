namespace NetSolve.Simulation;

/// <summary>
/// Exponential, logarithm and power written in plain IEEE double arithmetic (additions, multiplications, divisions
/// and bit operations, each correctly rounded on every platform), so that a seed gives the same sampled times to the
/// last bit on any machine. <c>Math.Exp</c> and <c>Math.Log</c> call the platform's C library, whose
/// last bit differs between operating systems and processors; the samplers use these instead.
/// </summary>
/// <remarks>
/// The methods are the argument reductions of Cody and Waite (Software Manual for the Elementary Functions,
/// Prentice-Hall, 1980, chapters 5 and 6) with the minimax coefficients of the freely distributable fdlibm
/// (Sun Microsystems, 1993, e_exp.c and e_log.c), a general-purpose math library: exp reduces x = k·ln 2 + r with
/// |r| ≤ ln 2 / 2 and evaluates a rational form of e^r; log reduces x = 2^k·(1 + f) with √2/2 ≤ 1 + f &lt; √2 and
/// evaluates log(1 + f) = 2·atanh(f / (2 + f)) by an odd series in s = f / (2 + f). Both stay within about one unit
/// in the last place of the correctly rounded result (tests check a few ulps against <see cref="Math"/>). No fused
/// multiply-add is used: the runtime never contracts a·b + c into one, so the rounding is the same everywhere.
/// </remarks>
internal static class PortableMath
{
    private const double Ln2High = 6.93147180369123816490e-01;
    private const double Ln2Low = 1.90821492927058770002e-10;
    private const double InverseLn2 = 1.44269504088896338700e+00;

    // Above this e^x overflows; below the lower bound it underflows to zero (709.78… and −745.13…).
    private const double ExpOverflow = 7.09782712893383973096e+02;
    private const double ExpUnderflow = -7.45133219101941108420e+02;

    // Coefficients of R(r²) with r·(e^r + 1)/(e^r − 1) ≈ 2 + r²·R(r²) on |r| ≤ ln 2 / 2 (minimax, error below 2^−59).
    private const double ExpP1 = 1.66666666666666019037e-01;
    private const double ExpP2 = -2.77777777770155933842e-03;
    private const double ExpP3 = 6.61375632143793436117e-05;
    private const double ExpP4 = -1.65339022054652515390e-06;
    private const double ExpP5 = 4.13813679705723846039e-08;

    // log(1 + f) = 2s + s·R(s²) with R(z) ≈ C1·z + C2·z² + … + C7·z⁷ (minimax on 0 ≤ s ≤ 0.1716, error below 2^−58.45).
    private const double LogC1 = 6.666666666666735130e-01;
    private const double LogC2 = 3.999999999940941908e-01;
    private const double LogC3 = 2.857142874366239149e-01;
    private const double LogC4 = 2.222219843214978396e-01;
    private const double LogC5 = 1.818357216161805012e-01;
    private const double LogC6 = 1.531383769920937332e-01;
    private const double LogC7 = 1.479819860511658591e-01;

    private const double Sqrt2 = 1.41421356237309504880;
    private const double SmallestNormal = 2.2250738585072014e-308;
    private const long MantissaMask = (1L << 52) - 1;
    private const long ExponentBias = 1023;

    /// <summary>e^<paramref name="x"/>; +∞ above 709.78, 0 below −745.13, NaN for NaN.</summary>
    public static double Exp(double x)
    {
        if (double.IsNaN(x))
        {
            return x;
        }

        if (x > ExpOverflow)
        {
            return double.PositiveInfinity;
        }

        if (x < ExpUnderflow)
        {
            return 0.0;
        }

        // x = k·ln 2 + r, k the nearest whole number; ln 2 in two parts so that k·Ln2High is exact.
        double k = Math.Round(x * InverseLn2, MidpointRounding.ToEven);
        double high = x - (k * Ln2High);
        double low = k * Ln2Low;
        double r = high - low;
        double t = r * r;
        double c = r - (t * (ExpP1 + (t * (ExpP2 + (t * (ExpP3 + (t * (ExpP4 + (t * ExpP5)))))))));
        double y = 1.0 - ((low - ((r * c) / (2.0 - c))) - high);
        return ScaleByPowerOfTwo(y, (int)k);
    }

    /// <summary>The natural logarithm of <paramref name="x"/>; −∞ at 0, NaN below 0 or for NaN, +∞ at +∞.</summary>
    public static double Log(double x)
    {
        if (double.IsNaN(x) || x < 0.0)
        {
            return double.NaN;
        }

        if (x == 0.0)
        {
            return double.NegativeInfinity;
        }

        if (double.IsPositiveInfinity(x))
        {
            return x;
        }

        int k = 0;
        if (x < SmallestNormal)
        {
            // Subnormal: scale into the normal range first (exact).
            x *= 18014398509481984.0; // 2^54
            k = -54;
        }

        long bits = BitConverter.DoubleToInt64Bits(x);
        k += (int)((bits >> 52) - ExponentBias);
        double m = BitConverter.Int64BitsToDouble((bits & MantissaMask) | (ExponentBias << 52));
        if (m >= Sqrt2)
        {
            m *= 0.5;
            k++;
        }

        double f = m - 1.0;
        double s = f / (2.0 + f);
        double z = s * s;
        double w = z * z;
        double odd = w * (LogC2 + (w * (LogC4 + (w * LogC6))));
        double even = z * (LogC1 + (w * (LogC3 + (w * (LogC5 + (w * LogC7))))));
        double r = even + odd;
        double halfSquare = 0.5 * f * f;
        return (k * Ln2High) - ((halfSquare - ((s * (halfSquare + r)) + (k * Ln2Low))) - f);
    }

    /// <summary>
    /// <paramref name="x"/>^<paramref name="y"/> for x &gt; 0 as e^(y·log x): the relative error grows with |y·log x|
    /// (about |y·log x|·2^−53 on top of an ulp or two), which is immaterial for sampling where the exponent is a
    /// shape parameter. Used only with x in (0, 1].
    /// </summary>
    public static double Pow(double x, double y)
    {
        ArgumentOutOfRangeException.ThrowIfNegativeOrZero(x);
        return Exp(y * Log(x));
    }

    /// <summary>y·2^k by building the power of two from bits, in two steps where it would leave the normal range.</summary>
    private static double ScaleByPowerOfTwo(double y, int k)
    {
        if (k > 1023)
        {
            return y * PowerOfTwo(1023) * PowerOfTwo(k - 1023);
        }

        if (k < -1022)
        {
            // Scale down in two exact-as-possible steps: the first keeps y normal, the second rounds once.
            return y * PowerOfTwo(k + 1000) * PowerOfTwo(-1000);
        }

        return y * PowerOfTwo(k);
    }

    private static double PowerOfTwo(int k) => BitConverter.Int64BitsToDouble((k + ExponentBias) << 52);
}

using NetSolve.Model;

namespace NetSolve.Solving;

/// <summary>
/// The variability factor f = Wq(G/G/c) / Wq(M/M/c) for c ≥ 2 servers: an M/G/c ratio R (from the service alone),
/// adjusted for non-Poisson arrivals: f = R·(ca² + cs²)/(1 + cs²) for ca² ≤ 1 and f = R + (ca² − 1)/2 for ca² &gt; 1,
/// continuous at ca² = 1 and never falling as ca² or cs² rises (the product form alone would fall with cs² when
/// ca² &gt; 1). With cs² = 1 both are Allen–Cunneen's (ca² + 1)/2. docs/methods.md gives the equations and accuracy.
/// </summary>
/// <remarks>
/// <list type="bullet">
/// <item>cs² = 1: R = 1, so f = (ca² + 1)/2 (Allen–Cunneen) and exactly 1.0 with Poisson arrivals.</item>
/// <item>cs² &lt; 1: Cosmetatos' interpolation between M/M/c and M/D/c, R = cs² + (1 − cs²)·R_D with
/// R_D = ½(1 + (1 − ρ)(c − 1)(√(4 + 5c) − 2)/(16ρc)) (G. P. Cosmetatos, "Some approximate equilibrium results for the
/// multi-server queue (M/G/r)", Operational Research Quarterly 27(3), 1976, pp. 615–620; from memory), with R_D capped
/// at the M/D/c light-traffic limit c/(c + 1), which the correction term overshoots at very light load.</item>
/// <item>cs² &gt; 1: harmonic interpolation in ρ between the light-traffic ratio R₀ of <see cref="LightTrafficRatio"/>
/// and the heavy-traffic ratio (1 + cs²)/2: 1/R = (1 − ρ)/R₀ + ρ/((1 + cs²)/2), the interpolation of the inverse
/// ("normed cooperation coefficient") of O. J. Boxma, J. W. Cohen and N. Huffels, Operations Research 27(6), 1979,
/// pp. 1115–1127. It follows the whole service distribution at light load, where two moments do not decide the wait.</item>
/// </list>
/// Pure and thread-safe; never NaN for 0 ≤ ρ &lt; 1.
/// </remarks>
public static class MultiServerFactor
{
    /// <summary>f for <paramref name="servers"/> ≥ 2 at utilisation <paramref name="utilisation"/>.</summary>
    /// <param name="servers">c, at least 2.</param>
    /// <param name="utilisation">ρ, from 0 to below 1.</param>
    /// <param name="arrivalScv">ca², 0 to <see cref="GgcFormulas.MaximumScv"/>.</param>
    /// <param name="serviceScv">cs², 0 to <see cref="GgcFormulas.MaximumScv"/>.</param>
    /// <param name="serviceShape">
    /// The service distribution whose light-traffic ratio to use when cs² &gt; 1; ignored when null or when its cv²
    /// is not <paramref name="serviceScv"/> (for example a mixture of patient groups), and a gamma with cs² is used.
    /// </param>
    public static double For(int servers, double utilisation, double arrivalScv, double serviceScv, ServiceDistribution? serviceShape = null)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(servers, 2);
        if (serviceScv == 1.0)
        {
            return (arrivalScv + 1.0) / 2.0;
        }

        double serviceRatio = serviceScv < 1.0
            ? RegularServiceRatio(servers, utilisation, serviceScv)
            : VariableServiceRatio(servers, utilisation, serviceScv, serviceShape);
        return arrivalScv <= 1.0
            ? serviceRatio * (arrivalScv + serviceScv) / (1.0 + serviceScv)
            : serviceRatio + ((arrivalScv - 1.0) / 2.0);
    }

    /// <summary>Cosmetatos' M/D/c ratio R_D, capped at the light-traffic limit c/(c + 1).</summary>
    /// <param name="servers">c, at least 1.</param>
    /// <param name="utilisation">ρ, from 0 to below 1.</param>
    public static double FixedServiceRatio(int servers, double utilisation)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(servers, 1);
        double correction = (1.0 - utilisation) * (servers - 1) * (Math.Sqrt(4.0 + (5.0 * servers)) - 2.0) / (16.0 * utilisation * servers);
        double lightTrafficLimit = servers / (servers + 1.0);
        // ρ = 0 with c > 1 gives +∞ here, and the cap takes over; c = 1 gives 0 / 0 only at ρ = 0, caught first.
        if (servers == 1)
        {
            return 0.5;
        }

        return Math.Min(0.5 * (1.0 + correction), lightTrafficLimit);
    }

    private static double RegularServiceRatio(int servers, double utilisation, double serviceScv) =>
        serviceScv + ((1.0 - serviceScv) * FixedServiceRatio(servers, utilisation));

    private static double VariableServiceRatio(int servers, double utilisation, double serviceScv, ServiceDistribution? serviceShape)
    {
        double heavyTraffic = (1.0 + serviceScv) / 2.0;
        double lightTraffic = LightTrafficRatio.For(servers, ShapeFor(serviceScv, serviceShape));
        if (!double.IsFinite(lightTraffic) || !(lightTraffic > 0.0))
        {
            return heavyTraffic;
        }

        return 1.0 / (((1.0 - utilisation) / lightTraffic) + (utilisation / heavyTraffic));
    }

    private static ServiceDistribution ShapeFor(double serviceScv, ServiceDistribution? serviceShape)
    {
        const double SameScvTolerance = 1e-9;
        if (serviceShape is not null && Math.Abs((serviceShape.Cv * serviceShape.Cv) - serviceScv) <= SameScvTolerance * Math.Max(1.0, serviceScv))
        {
            return serviceShape;
        }

        return ServiceDistribution.Gamma(1.0, Math.Sqrt(serviceScv));
    }
}

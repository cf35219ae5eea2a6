using NetSolve.Model;

namespace NetSolve.Simulation;

/// <summary>Draws service times in hours from a <see cref="ServiceDistribution"/>, with its parameters precomputed.</summary>
internal readonly struct ServiceSampler
{
    private readonly ServiceKind _kind;
    private readonly double _a;
    private readonly double _b;
    private readonly double[]? _samples;

    private ServiceSampler(ServiceKind kind, double a, double b, double[]? samples)
    {
        _kind = kind;
        _a = a;
        _b = b;
        _samples = samples;
    }

    /// <summary>True for exponential service, which the event loop draws inline as <see cref="ExponentialMeanHours"/> × Exp(1).</summary>
    public bool IsExponential => _kind == ServiceKind.Exponential;

    /// <summary>The mean in hours of exponential service; meaningless for other kinds.</summary>
    public double ExponentialMeanHours => _a;

    /// <summary>Precomputes the parameters of <paramref name="service"/>.</summary>
    public static ServiceSampler For(ServiceDistribution service)
    {
        double mean = service.MeanHours;
        double cv = service.Cv;
        switch (service.Kind)
        {
            case ServiceKind.Exponential:
                return new ServiceSampler(ServiceKind.Exponential, mean, 0.0, null);
            case ServiceKind.Empirical:
                return new ServiceSampler(ServiceKind.Empirical, mean, 0.0, [.. service.SamplesHours]);
            case ServiceKind.Lognormal when cv > 0.0:
                // ln X ~ N(m, s²) with s² = ln(1 + cv²) and m = ln(mean) − s²/2 keeps the mean and cv.
                double logVariance = PortableMath.Log(1.0 + (cv * cv));
                return new ServiceSampler(ServiceKind.Lognormal, PortableMath.Log(mean) - (logVariance / 2.0), Math.Sqrt(logVariance), null);
            case ServiceKind.Gamma when cv > 0.0:
                // Shape k = 1/cv² and scale θ = mean·cv² give mean kθ and cv 1/√k.
                return new ServiceSampler(ServiceKind.Gamma, 1.0 / (cv * cv), mean * cv * cv, null);
            default:
                return new ServiceSampler(ServiceKind.Deterministic, mean, 0.0, null);
        }
    }

    /// <summary>One service time in hours.</summary>
    public double Sample(ref Xoshiro256StarStar random) => _kind switch
    {
        ServiceKind.Exponential => _a * random.NextExponential(),
        ServiceKind.Deterministic => _a,
        ServiceKind.Lognormal => PortableMath.Exp(_a + (_b * random.NextNormal())),
        ServiceKind.Gamma => _b * StandardGamma(_a, ref random),
        _ => _samples![random.NextInt(_samples.Length)],
    };

    /// <summary>
    /// A gamma variate with the given shape and scale 1 by Marsaglia and Tsang, "A simple method for generating gamma
    /// variables", ACM TOMS 26(3), 2000; shapes below 1 use their boost Gamma(k) = Gamma(k + 1)·U^(1/k).
    /// </summary>
    private static double StandardGamma(double shape, ref Xoshiro256StarStar random)
    {
        double boost = 1.0;
        if (shape < 1.0)
        {
            boost = PortableMath.Pow(random.NextOpenDouble(), 1.0 / shape);
            shape += 1.0;
        }

        double d = shape - (1.0 / 3.0);
        double c = 1.0 / Math.Sqrt(9.0 * d);
        while (true)
        {
            double x = random.NextNormal();
            double v = 1.0 + (c * x);
            if (v <= 0.0)
            {
                continue;
            }

            v = v * v * v;
            double u = random.NextOpenDouble();
            double x2 = x * x;
            if (u < 1.0 - (0.0331 * x2 * x2) || PortableMath.Log(u) < (0.5 * x2) + (d * (1.0 - v + PortableMath.Log(v))))
            {
                return boost * d * v;
            }
        }
    }
}

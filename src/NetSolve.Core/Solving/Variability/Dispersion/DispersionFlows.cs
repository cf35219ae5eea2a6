using System.Collections.Immutable;
using MathNet.Numerics.LinearAlgebra;

namespace NetSolve.Solving;

/// <summary>
/// The flows of one network in the form <see cref="DispersionNetwork"/> solves them: the reached units, their routing
/// among themselves, the index functions of their external streams and service completions, and the time scales of
/// their departures. Built once, then asked for the arrival indices at any window. Immutable once built.
/// </summary>
internal sealed class DispersionFlows
{
    private readonly Matrix<double> _routing;
    private readonly Matrix<double> _routingNoise;
    private readonly double[] _arrivalsPerHour;
    private readonly double[] _externalPerHour;
    private readonly RenewalDispersion[] _external;
    private readonly RenewalDispersion[] _service;
    private readonly double[] _relaxationHours;
    private readonly bool[] _unlimited;
    private readonly bool[] _saturated;

    private DispersionFlows(ImmutableArray<int> members, int count)
    {
        Members = members;
        _routing = Matrix<double>.Build.Dense(count, count);
        _routingNoise = Matrix<double>.Build.Dense(count, count);
        _arrivalsPerHour = new double[count];
        _externalPerHour = new double[count];
        _external = new RenewalDispersion[count];
        _service = new RenewalDispersion[count];
        _relaxationHours = new double[count];
        _unlimited = new bool[count];
        _saturated = new bool[count];
        MeanServiceHours = new double[count];
        LongRun = new double[count];
    }

    /// <summary>Positions of the units with a positive flow, in order; every other array is indexed like this one.</summary>
    public ImmutableArray<int> Members { get; }

    /// <summary>True when every external stream is Poisson and every limited unit's service exponential.</summary>
    public bool IsJackson { get; private set; }

    /// <summary>Mean service time of each member (0 for unlimited servers: not used).</summary>
    public double[] MeanServiceHours { get; }

    /// <summary>I_a(∞) of each member: every departure flow equal to its arrivals over long windows.</summary>
    public double[] LongRun { get; }

    /// <summary>The shortest mean gap between arrivals at any member, hours.</summary>
    public double ShortestGapHours => 1.0 / _arrivalsPerHour.Max();

    /// <summary>The longest finite relaxation time of any member, hours (0 if none).</summary>
    public double LongestRelaxationHours => _relaxationHours.Where(double.IsFinite).DefaultIfEmpty(0.0).Max();

    public static DispersionFlows Build(IReadOnlyList<ArrivalVariabilityUnit> units, IReadOnlyList<ArrivalVariabilityRoute> routes)
    {
        var members = Enumerable.Range(0, units.Count).Where(i => units[i].ArrivalsPerHour > 0.0).ToImmutableArray();
        var position = Enumerable.Repeat(-1, units.Count).ToArray();
        for (int a = 0; a < members.Length; a++)
        {
            position[members[a]] = a;
        }

        bool jackson = true;
        var flows = new DispersionFlows(members, members.Length);
        for (int a = 0; a < members.Length; a++)
        {
            var unit = units[members[a]];
            double rho = ArrivalVariabilitySystem.Load(unit);
            flows._arrivalsPerHour[a] = unit.ArrivalsPerHour;
            flows._externalPerHour[a] = unit.ExternalPerHour;
            flows._external[a] = unit.ExternalPerHour > 0.0 ? RenewalDispersion.Of(1.0 / unit.ExternalPerHour, unit.ExternalScv) : RenewalDispersion.Poisson;
            flows._unlimited[a] = unit.Servers.IsUnlimited;
            flows._saturated[a] = !unit.Servers.IsUnlimited && rho >= 1.0;
            flows.MeanServiceHours[a] = unit.Servers.IsUnlimited ? 0.0 : rho * unit.Servers.Count / unit.ArrivalsPerHour;
            flows._service[a] = unit.Servers.IsUnlimited || !(flows.MeanServiceHours[a] > 0.0)
                ? RenewalDispersion.Poisson
                : RenewalDispersion.Of(flows.MeanServiceHours[a], unit.ServiceScv);
            jackson &= flows._external[a].IsPoisson && (unit.Servers.IsUnlimited || unit.ServiceScv == 1.0);
        }

        foreach (var (from, to, probability) in routes)
        {
            int a = position[from];
            int b = position[to];
            if (a >= 0 && b >= 0 && probability > 0.0)
            {
                flows._routing[a, b] += probability;
            }
        }

        // Multinomial routing noise per hour: λ_i p_ij on the diagonal, −λ_i p_ij p_ik off it.
        for (int a = 0; a < members.Length; a++)
        {
            for (int b = 0; b < members.Length; b++)
            {
                double pb = flows._routing[a, b];
                if (pb == 0.0)
                {
                    continue;
                }

                flows._routingNoise[b, b] += flows._arrivalsPerHour[a] * pb;
                for (int d = 0; d < members.Length; d++)
                {
                    flows._routingNoise[b, d] -= flows._arrivalsPerHour[a] * pb * flows._routing[a, d];
                }
            }
        }

        double[] longRun = flows.Solve(double.PositiveInfinity, Enumerable.Repeat(double.PositiveInfinity, members.Length).ToArray());
        Array.Copy(longRun, flows.LongRun, longRun.Length);
        for (int a = 0; a < members.Length; a++)
        {
            var unit = units[members[a]];
            flows._relaxationHours[a] = flows._unlimited[a]
                ? 0.0
                : DepartureDispersionWeight.RelaxationHours(flows.MeanServiceHours[a], unit.Servers.Count, ArrivalVariabilitySystem.Load(unit), longRun[a], unit.ServiceScv);
        }

        flows.IsJackson = jackson;
        return flows;
    }

    /// <summary>I_a of each member over a window of <paramref name="hours"/>.</summary>
    public double[] ArrivalDispersion(double hours) => Solve(hours, _relaxationHours);

    private double[] Solve(double hours, double[] relaxationHours)
    {
        int n = Members.Length;
        var arrivalWeight = Vector<double>.Build.Dense(n);
        var serviceVariance = Vector<double>.Build.Dense(n);
        var noise = _routingNoise.Clone();
        for (int a = 0; a < n; a++)
        {
            double w = Weight(a, hours, relaxationHours[a]);
            arrivalWeight[a] = Math.Sqrt(w);
            serviceVariance[a] = (1.0 - w) * _arrivalsPerHour[a] * _service[a].At(hours);
            noise[a, a] += _externalPerHour[a] > 0.0 ? _externalPerHour[a] * _external[a].At(hours) : 0.0;
        }

        // B = C₀ + C_R + Pᵀ diag((1 − w)λI_s) P; M = (I − PᵀΩ)⁻¹; C = M B Mᵀ.
        var transposed = _routing.Transpose();
        var source = noise + (transposed * Matrix<double>.Build.DenseOfDiagonalVector(serviceVariance) * _routing);
        var system = Matrix<double>.Build.DenseIdentity(n) - (transposed * Matrix<double>.Build.DenseOfDiagonalVector(arrivalWeight));
        var spread = system.Solve(system.Solve(source).Transpose());
        var index = new double[n];
        for (int a = 0; a < n; a++)
        {
            double value = spread[a, a] / _arrivalsPerHour[a];
            index[a] = double.IsFinite(value) ? Math.Max(0.0, value) : 1.0;
        }

        return index;
    }

    /// <summary>w(t): 1 for unlimited servers, 0 for a saturated unit, else w*(t/τ).</summary>
    private double Weight(int a, double hours, double relaxationHours) =>
        _unlimited[a] ? 1.0
        : _saturated[a] ? 0.0
        : double.IsPositiveInfinity(relaxationHours) || double.IsPositiveInfinity(hours) ? 1.0
        : relaxationHours <= 0.0 ? 1.0
        : DepartureDispersionWeight.Canonical(hours / relaxationHours);
}

using System.Collections.Immutable;
using NetSolve.Model;

namespace NetSolve.Solving;

/// <summary>
/// Multi-class traffic equations: every patient group's flow through its own routes, and per unit the total flow and
/// the mixture of the groups' service times that the per-unit formulas need.
/// </summary>
/// <remarks>
/// Each group g solves its own traffic equations λ_g = γ_g + P_gᵀ λ_g with <see cref="TrafficEquations"/>, where γ_g
/// holds the group's external arrivals and P_g its routes (the network's when it has none). Per unit the classes add:
/// λ_i = Σ_g λ_g,i, E[S] = Σ_g (λ_g,i/λ_i) m_g,i, E[S²] = Σ_g (λ_g,i/λ_i) m_g,i² (1 + cs²_g,i), cs² = E[S²]/E[S]² − 1
/// (Baskett, Chandy, Muntz and Palacios, J. ACM 22(2), 1975, pp. 248–260: open networks with several classes of
/// customers, each with its own routing). The SCV is computed as the law of total variance,
/// Var[S] = Σ_g w_g (m_g² cs²_g + (m_g − E[S])²), which is the same quantity without the cancellation of "− 1".
/// A network without groups takes the same path as <see cref="NetworkSolver"/>: one call to
/// <see cref="TrafficEquations.Solve(RoutingTable)"/> on <see cref="RoutingTable.Build(Network)"/>, so its flows are
/// bit-for-bit today's, and each unit keeps exactly <see cref="Unit.MeanServiceHours"/> and the square of
/// <see cref="Unit.EffectiveService"/>'s cv. Whenever every group reaching a unit has the same mean and SCV there,
/// those values are returned unchanged rather than re-derived through the mixture.
/// </remarks>
public static class GroupTraffic
{
    /// <summary>The id of the group formed by the network's top-level arrivals and routes.</summary>
    /// <remarks>A file may also name a group <c>default</c>; tell them apart by <see cref="GroupFlow.IsDefault"/>.</remarks>
    public const string DefaultGroupId = "default";

    /// <summary>The display name of the default group.</summary>
    public const string DefaultGroupLabel = "default group";

    /// <summary>Solves every group's traffic equations and mixes the groups at each unit.</summary>
    /// <param name="network">A validated network: every unit id in a group's arrivals, routes and services names a unit.</param>
    /// <returns>The default group first, then the network's groups in order; per unit the total flow and service mixture.</returns>
    /// <exception cref="ArgumentException">A group names a unit the network does not have.</exception>
    /// <exception cref="TrafficEquationsException">A group's traffic equations leave a residual above <see cref="Tolerances.TrafficResidual"/>.</exception>
    public static GroupTrafficSolution Solve(Network network)
    {
        ArgumentNullException.ThrowIfNull(network);
        var index = network.BuildIndex();
        var units = network.Units;
        var ownMean = units.Select(unit => unit.MeanServiceHours).ToArray();
        var ownScv = units.Select(unit => Squared(unit.EffectiveService.Cv)).ToArray();

        var groups = ImmutableArray.CreateBuilder<GroupFlow>(network.Groups.Length + 1);
        double[] defaultFlows = TrafficEquations.Solve(RoutingTable.Build(network));
        groups.Add(Flow(DefaultGroupId, DefaultGroupLabel, null, network.ExternalArrivalsPerHour, defaultFlows, ownMean, ownScv));
        foreach (var group in network.Groups)
        {
            CheckUnits(network, group, index);
            var routing = RoutingTable.Build(network with { Arrivals = group.Arrivals, Routes = group.Routes ?? network.Routes });
            var mean = (double[])ownMean.Clone();
            var scv = (double[])ownScv.Clone();
            foreach (var service in group.Services)
            {
                mean[index[service.UnitId]] = service.Service.MeanHours;
                scv[index[service.UnitId]] = Squared(service.Service.Cv);
            }

            groups.Add(Flow(group.Id, group.Label, group, group.ExternalArrivalsPerHour, TrafficEquations.Solve(routing), mean, scv));
        }

        var flows = groups.ToImmutable();
        var totals = ImmutableArray.CreateBuilder<UnitTraffic>(units.Length);
        for (int i = 0; i < units.Length; i++)
        {
            totals.Add(Mix(flows, i, ownMean[i], ownScv[i]));
        }

        return new GroupTrafficSolution(network, flows, totals.MoveToImmutable());
    }

    private static GroupFlow Flow(
        string id, string label, PatientGroup? group, double externalPerHour, double[] flows, double[] meanHours, double[] scv)
    {
        var units = ImmutableArray.CreateBuilder<GroupUnitFlow>(flows.Length);
        for (int i = 0; i < flows.Length; i++)
        {
            // The same expression as UnitMetrics, so the default group's visits are today's visits.
            double visits = externalPerHour > 0.0 ? flows[i] / externalPerHour : 0.0;
            units.Add(new GroupUnitFlow(flows[i], visits, meanHours[i], scv[i]));
        }

        return new GroupFlow(id, label, group, externalPerHour, units.MoveToImmutable());
    }

    private static UnitTraffic Mix(ImmutableArray<GroupFlow> groups, int unit, double ownMean, double ownScv)
    {
        double total = 0.0;
        GroupUnitFlow? first = null;
        bool alike = true;
        foreach (var group in groups)
        {
            var flow = group.Units[unit];
            if (flow.ArrivalsPerHour <= 0.0)
            {
                continue;
            }

            total += flow.ArrivalsPerHour;
            first ??= flow;

            // Exact comparison on purpose: only groups with identical service may skip the mixture arithmetic.
            alike &= flow.MeanServiceHours.Equals(first.MeanServiceHours) && flow.ServiceScv.Equals(first.ServiceScv);
        }

        if (first is null)
        {
            return new UnitTraffic(0.0, ownMean, ownScv);
        }

        if (alike)
        {
            return new UnitTraffic(total, first.MeanServiceHours, first.ServiceScv);
        }

        double mean = 0.0;
        foreach (var group in groups)
        {
            var flow = group.Units[unit];
            mean += flow.ArrivalsPerHour / total * flow.MeanServiceHours;
        }

        double variance = 0.0;
        foreach (var group in groups)
        {
            var flow = group.Units[unit];
            double spread = flow.MeanServiceHours - mean;
            variance += flow.ArrivalsPerHour / total
                * ((Squared(flow.MeanServiceHours) * flow.ServiceScv) + Squared(spread));
        }

        return new UnitTraffic(total, mean, variance / Squared(mean));
    }

    private static void CheckUnits(Network network, PatientGroup group, IReadOnlyDictionary<string, int> index)
    {
        var named = group.Arrivals.Select(arrival => arrival.UnitId)
            .Concat((group.Routes ?? []).SelectMany(route => new[] { route.From, route.To }))
            .Concat(group.Services.Select(service => service.UnitId));
        foreach (string unitId in named)
        {
            if (!index.ContainsKey(unitId))
            {
                throw new ArgumentException($"Group '{group.Id}' names unit '{unitId}', which the network does not have.", nameof(network));
            }
        }
    }

    private static double Squared(double value) => value * value;
}

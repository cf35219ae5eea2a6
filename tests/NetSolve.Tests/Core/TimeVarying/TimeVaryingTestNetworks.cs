using System.Globalization;
using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Tests.Core.TimeVarying;

/// <summary>Small networks and sinusoidal inputs for the hour-by-hour tests (invented units).</summary>
internal static class TimeVaryingTestNetworks
{
    /// <summary>One cycle of a day, in radians per hour.</summary>
    public const double DailyAngularRate = 2.0 * Math.PI / 24.0;

    /// <summary>A line of exponential units, each sending every patient to the next; arrivals enter the first.</summary>
    public static Network Tandem(double arrivalsPerHour, params double[] meanServiceHours)
    {
        var units = meanServiceHours.Select((mean, i) => new Unit(UnitName(i), UnitName(i), Servers.Unlimited, mean)).ToArray();
        var routes = Enumerable.Range(0, units.Length - 1).Select(i => new Route(units[i].Id, units[i + 1].Id, 1.0));
        return new Network("tandem", TimeUnit.Hour, [.. units], [new Arrival(units[0].Id, arrivalsPerHour)], [.. routes]);
    }

    private static string UnitName(int i) => string.Create(CultureInfo.InvariantCulture, $"unit{i}");

    /// <summary>
    /// The network's single group with external rate a + b·sin(γt) at the first unit, sampled at the middle of each
    /// step (so the integrator's error is second order in the step).
    /// </summary>
    public static FlowGroupPlan SinusoidalPlan(Network network, double mean, double amplitude, int steps, double stepHours)
    {
        var routing = RoutingTable.Build(network);
        var external = new double[]?[routing.UnitCount];
        external[0] = [.. Enumerable.Range(0, steps).Select(k => mean + (amplitude * Math.Sin(DailyAngularRate * (k + 0.5) * stepHours)))];
        var stages = network.Units.Select(unit => ServiceStages.Fit(unit.MeanServiceHours, unit.ServiceCv)).ToArray();
        return new FlowGroupPlan(external, routing, stages);
    }

    /// <summary>Hourly multipliers of an invented emergency day: quiet at night, rising through the morning, peaking 14–18.</summary>
    public static double[] EmergencyDay() =>
    [
        0.55, 0.45, 0.40, 0.35, 0.35, 0.40, 0.55, 0.75, 1.00, 1.20, 1.30, 1.35,
        1.40, 1.40, 1.45, 1.50, 1.50, 1.45, 1.35, 1.25, 1.10, 0.95, 0.80, 0.65,
    ];

    /// <summary>A single unit with servers, exponential service and a daily profile on its arrivals.</summary>
    public static Network SingleUnit(int servers, double meanServiceHours, double arrivalsPerHour, double[]? hourly)
    {
        var unit = new Unit("resus", "Resuscitation bays", Servers.Of(servers), meanServiceHours);
        var network = new Network("resus", TimeUnit.Hour, [unit], [new Arrival(unit.Id, arrivalsPerHour)], []);
        return hourly is null ? network : network with { ArrivalProfile = ArrivalProfile.Create(hourly) };
    }
}

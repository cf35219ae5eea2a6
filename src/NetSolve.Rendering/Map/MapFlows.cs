using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Solving;

namespace NetSolve.Rendering.Map;

/// <summary>
/// What a map draws of a solved network's flows, whichever layout places it: arrivals and exits per unit, and the
/// lines (routes with a positive probability in file order, then diversions from full units in file order).
/// </summary>
/// <param name="Index">Unit id to its position in the file.</param>
/// <param name="ArrivalPerHour">External arrivals per hour at each unit.</param>
/// <param name="ExitPerHour">Patients per hour leaving the network from each unit.</param>
/// <param name="Lines">Every line of the map.</param>
/// <param name="MaxPerHour">The largest flow on the map (line, arrival or exit): the widest line is drawn for it.</param>
internal sealed record MapFlows(
    IReadOnlyDictionary<string, int> Index,
    IReadOnlyList<double> ArrivalPerHour,
    IReadOnlyList<double> ExitPerHour,
    IReadOnlyList<MapFlowLine> Lines,
    double MaxPerHour)
{
    public static MapFlows Of(NetworkSolution solution)
    {
        var network = solution.Network;
        var routing = RoutingTable.Build(network);
        var index = network.BuildIndex();
        var timeUnit = network.TimeUnit;

        var arrivalPerHour = new double[network.Units.Length];
        foreach (var arrival in network.Arrivals)
        {
            arrivalPerHour[index[arrival.UnitId]] += arrival.PerHour;
        }

        var exitPerHour = new double[network.Units.Length];
        for (int i = 0; i < exitPerHour.Length; i++)
        {
            exitPerHour[i] = solution.Units[i].ArrivalsPerHour * routing.ExitProbability(i);
        }

        var routes = network.Routes
            .Where(route => route.Probability > 0.0)
            .Select(route => (Route: route, PerHour: solution.Units[index[route.From]].ArrivalsPerHour * route.Probability))
            .ToList();
        // Patients diverted from a full unit to its target: a dashed line of their own, laid out with the routes.
        var diversions = solution.Units
            .Where(result => result.DivertedPerHour > 0.0 && result.Unit.WhenFull.DivertToUnitId is not null)
            .Select(result => (From: result.Unit.Id, To: result.Unit.WhenFull.DivertToUnitId!, result.DivertedPerHour, Text: UnitBoxText.Diverted(result, timeUnit)))
            .ToList();
        double maxPerHour = routes.Select(r => r.PerHour).Concat(arrivalPerHour).Concat(exitPerHour)
            .Concat(diversions.Select(d => d.DivertedPerHour)).DefaultIfEmpty(0.0).Max();

        var lines = routes.Select(r => new MapFlowLine(r.Route.From, r.Route.To, index[r.Route.From], index[r.Route.To], IsDiversion: false, r.PerHour, PeopleFormat.Rate(r.PerHour, timeUnit)))
            .Concat(diversions.Select(d => new MapFlowLine(d.From, d.To, index[d.From], index[d.To], IsDiversion: true, d.DivertedPerHour, d.Text)))
            .ToList();
        return new MapFlows(index, arrivalPerHour, exitPerHour, lines, maxPerHour);
    }

    /// <summary>The lines as (source index, target index, patients per hour), as the return-route choices take them.</summary>
    public IReadOnlyList<(int From, int To, double PerHour)> Weighted() =>
        Lines.Select(line => (line.FromIndex, line.ToIndex, line.PerHour)).ToList();
}

using System.Collections.Immutable;
using System.Globalization;
using System.Text.RegularExpressions;
using NetSolve.Diagnostics;
using NetSolve.Model;
using NetSolve.Parsing;
using NetSolve.Parsing.Values;

namespace NetSolve.Scenarios;

/// <summary>
/// Applies what-if changes to a validated network, in order, and re-validates the result with the same rules
/// as a network file: known units, routes adding up to at most 1, a positive arrival rate, no set of reached
/// units patients can never leave.
/// </summary>
/// <remarks>Never throws for bad changes: each problem is a <see cref="Diagnostic"/> at the change's location. Thread-safe.</remarks>
public static partial class NetworkEditor
{
    /// <summary>Applies <paramref name="changes"/> to <paramref name="network"/>.</summary>
    /// <param name="network">A validated network.</param>
    /// <param name="changes">Changes in the order they apply.</param>
    /// <param name="origin">Where to point for a problem no single change explains (a scenario file's <c>base</c> key).</param>
    public static EditResult Apply(Network network, IReadOnlyList<NetworkChange> changes, SourceLocation origin)
    {
        ArgumentNullException.ThrowIfNull(network);
        ArgumentNullException.ThrowIfNull(changes);
        if (changes.Count == 0)
        {
            return new EditResult(network, []);
        }

        var edit = new Edit(network, origin);
        foreach (var change in changes)
        {
            edit.Apply(change);
        }

        return edit.Finish();
    }

    /// <summary>True for an id a network file accepts: letters, digits, '_' and '-', starting with a letter.</summary>
    public static bool IsValidUnitId(string id)
    {
        ArgumentNullException.ThrowIfNull(id);
        return UnitIdRegex().IsMatch(id);
    }

    [GeneratedRegex("^[A-Za-z][A-Za-z0-9_-]*$", RegexOptions.CultureInvariant, matchTimeoutMilliseconds: 1000)]
    private static partial Regex UnitIdRegex();

    private sealed class Edit(Network network, SourceLocation origin)
    {
        private readonly SourceLocation _origin = origin;
        private readonly List<Unit> _units = [.. network.Units];
        private readonly List<Arrival> _arrivals = [.. network.Arrivals];
        private readonly List<Route> _routes = [.. network.Routes];
        private readonly List<Diagnostic> _diagnostics = [];
        private readonly Dictionary<string, SourceLocation> _touched = new(StringComparer.Ordinal);
        private readonly HashSet<string> _unreachedBefore = UnreachedIds(network);
        private SourceLocation _lastArrivalChange;

        public void Apply(NetworkChange change)
        {
            switch (change)
            {
                case SetServers set when Find(set.UnitId, set.Location) is int i:
                    Touch(set.UnitId, set.Location);
                    _units[i] = _units[i] with { Servers = set.Servers };
                    break;
                case AddServers add when Find(add.UnitId, add.Location) is int i:
                    AddTo(i, add);
                    break;
                case SetService set when Find(set.UnitId, set.Location) is int i:
                    Touch(set.UnitId, set.Location);
                    _units[i] = _units[i] with { MeanServiceHours = set.MeanServiceHours };
                    break;
                case ScaleService scale when Find(scale.UnitId, scale.Location) is int i:
                    Touch(scale.UnitId, scale.Location);
                    ScaleServiceOf(i, scale);
                    break;
                case SetArrivals set when Find(set.UnitId, set.Location) is int:
                    Touch(set.UnitId, set.Location);
                    _lastArrivalChange = set.Location;
                    SetArrival(set.UnitId, set.PerHour);
                    break;
                case ScaleArrivals scale:
                    ScaleArrival(scale);
                    break;
                case SetRoute route when Find(route.From, route.Location) is int && Find(route.To, route.Location) is int:
                    Touch(route.From, route.Location);
                    Touch(route.To, route.Location);
                    SetRouteFraction(route.From, route.To, route.Probability);
                    CheckRouteSum(route.From, route.Location);
                    break;
                case AddUnit add:
                    AddNewUnit(add);
                    break;
                case CloseUnit close:
                    Close(close);
                    break;
                default:
                    break; // an unknown unit, already reported by Find
            }
        }

        public EditResult Finish()
        {
            if (_diagnostics.Any(d => d.IsError))
            {
                return new EditResult(null, [.. _diagnostics]);
            }

            var changed = new Network(network.Name, network.TimeUnit, [.. _units], [.. _arrivals], [.. _routes])
            {
                Journeys = JourneysOfOpenUnits(network.Journeys, _units),
            };
            if (!_arrivals.Any(arrival => arrival.PerHour > 0.0))
            {
                Error(_lastArrivalChange == default ? _origin : _lastArrivalChange, null, ChangeCodes.BrokenNetwork, "no positive arrival rate is left: at least one unit needs patients arriving from outside");
                return new EditResult(null, [.. _diagnostics]);
            }

            var unitLocations = _units.ToDictionary(unit => unit.Id, unit => _touched.GetValueOrDefault(unit.Id, _origin), StringComparer.Ordinal);
            var rules = new List<Diagnostic>();
            StructureRules.Check(changed, new NetworkLocations(unitLocations, unitLocations), rules);
            foreach (var diagnostic in rules)
            {
                bool newlyUnreached = diagnostic.Code != DiagnosticCodes.Unreached
                    || !_unreachedBefore.Contains(diagnostic.Subject ?? string.Empty);
                if (newlyUnreached)
                {
                    _diagnostics.Add(diagnostic.IsError ? diagnostic with { Code = ChangeCodes.BrokenNetwork } : diagnostic);
                }
            }

            return new EditResult(_diagnostics.Any(d => d.IsError) ? null : changed, [.. _diagnostics]);
        }

        /// <summary>The journeys without the units a change closed; a journey left with no unit is dropped.</summary>
        private static ImmutableArray<Journey> JourneysOfOpenUnits(ImmutableArray<Journey> journeys, List<Unit> units)
        {
            var open = units.Select(unit => unit.Id).ToHashSet(StringComparer.Ordinal);
            return [.. journeys
                .Select(journey => journey with { UnitIds = [.. journey.UnitIds.Where(open.Contains)] })
                .Where(journey => journey.UnitIds.Length > 0)];
        }

        private static HashSet<string> UnreachedIds(Network network)
        {
            bool[] reached = RoutingTable.Build(network).ReachedUnits();
            var ids = new HashSet<string>(StringComparer.Ordinal);
            for (int i = 0; i < reached.Length; i++)
            {
                if (!reached[i])
                {
                    ids.Add($"unit '{network.Units[i].Id}'");
                }
            }

            return ids;
        }

        private int? Find(string id, SourceLocation location)
        {
            int index = _units.FindIndex(unit => string.Equals(unit.Id, id, StringComparison.Ordinal));
            if (index >= 0)
            {
                return index;
            }

            Error(location, null, ChangeCodes.UnknownUnit, $"unknown unit '{id}'{NearestName.Hint(id, _units.Select(unit => unit.Id))}");
            return null;
        }

        private void Touch(string id, SourceLocation location) => _touched[id] = location;

        /// <summary>Multiplies a unit's mean service time, refusing a product that is no usable duration (as a file would).</summary>
        private void ScaleServiceOf(int index, ScaleService scale)
        {
            var unit = _units[index];
            double hours = unit.MeanServiceHours * scale.Factor;
            if (!DurationValue.IsUsableHours(hours))
            {
                Error(scale.Location, unit.Id, ChangeCodes.BadValue, string.Create(CultureInfo.InvariantCulture,
                    $"service: {unit.MeanServiceHours:0.######} h times {scale.Factor} is {(hours > ValueRanges.LongestHours ? "too long" : "too short")} for a duration ({ValueRanges.DurationRange})"));
                return;
            }

            _units[index] = unit with { MeanServiceHours = hours };
        }

        /// <summary>Multiplies one external stream, refusing a product outside a rate's range (as a file would).</summary>
        private void ScaleArrivalAt(int index, ScaleArrivals scale)
        {
            var arrival = _arrivals[index];
            double perHour = arrival.PerHour * scale.Factor;
            if (!ValueRanges.IsRate(perHour))
            {
                Error(scale.Location, arrival.UnitId, ChangeCodes.BadValue, string.Create(CultureInfo.InvariantCulture,
                    $"arrival rate: {arrival.PerHour:0.######}/h times {scale.Factor} is {(perHour > ValueRanges.LargestRatePerHour ? "too large" : "too small")} for a rate ({ValueRanges.RateRange})"));
                return;
            }

            _arrivals[index] = arrival with { PerHour = perHour };
        }

        private void AddTo(int index, AddServers add)
        {
            var unit = _units[index];
            Touch(unit.Id, add.Location);
            if (unit.Servers.IsUnlimited)
            {
                Error(add.Location, unit.Id, ChangeCodes.BadValue, "has unlimited servers; set a number instead of adding to it");
                return;
            }

            long total = (long)unit.Servers.Count + add.Count;
            if (total < 1 || total > Servers.MaxCount)
            {
                Error(add.Location, unit.Id, ChangeCodes.BadValue, string.Create(CultureInfo.InvariantCulture,
                    $"{unit.Servers.Count} servers {(add.Count < 0 ? "minus" : "plus")} {Math.Abs((long)add.Count)} gives {total}; a unit has 1 to {Servers.MaxCount} servers"));
                return;
            }

            _units[index] = unit with { Servers = Servers.Of((int)total) };
        }

        private void SetArrival(string id, double perHour)
        {
            int existing = _arrivals.FindIndex(arrival => string.Equals(arrival.UnitId, id, StringComparison.Ordinal));
            if (existing >= 0)
            {
                _arrivals[existing] = _arrivals[existing] with { PerHour = perHour };
            }
            else
            {
                _arrivals.Add(new Arrival(id, perHour));
            }
        }

        private void ScaleArrival(ScaleArrivals scale)
        {
            _lastArrivalChange = scale.Location;
            if (scale.UnitId is null)
            {
                for (int k = 0; k < _arrivals.Count; k++)
                {
                    ScaleArrivalAt(k, scale);
                }

                return;
            }

            if (Find(scale.UnitId, scale.Location) is null)
            {
                return;
            }

            Touch(scale.UnitId, scale.Location);
            int existing = _arrivals.FindIndex(arrival => string.Equals(arrival.UnitId, scale.UnitId, StringComparison.Ordinal));
            if (existing < 0 || !(_arrivals[existing].PerHour > 0.0))
            {
                Error(scale.Location, scale.UnitId, ChangeCodes.BadValue, "has no external arrivals to scale; set a rate instead");
                return;
            }

            ScaleArrivalAt(existing, scale);
        }

        private void SetRouteFraction(string from, string to, double probability)
        {
            int existing = _routes.FindIndex(route => string.Equals(route.From, from, StringComparison.Ordinal) && string.Equals(route.To, to, StringComparison.Ordinal));
            if (existing >= 0)
            {
                _routes[existing] = _routes[existing] with { Probability = probability };
            }
            else
            {
                _routes.Add(new Route(from, to, probability));
            }
        }

        private void CheckRouteSum(string from, SourceLocation location)
        {
            double total = _routes.Where(route => string.Equals(route.From, from, StringComparison.Ordinal)).Sum(route => route.Probability);
            if (total > 1.0 + Tolerances.ProbabilitySum)
            {
                Error(location, from, ChangeCodes.RoutesOverOne, string.Create(CultureInfo.InvariantCulture,
                    $"routes add up to {total:0.######}, more than 1 (a changed route takes its difference from the patients leaving the network; lower another route of this unit too)"));
            }
        }

        private void AddNewUnit(AddUnit add)
        {
            string id = add.Unit.Id;
            if (!IsValidUnitId(id))
            {
                Error(add.Location, null, ChangeCodes.BadNewUnit, $"'{id}' is not a valid unit id: use letters, digits, '_' and '-', starting with a letter");
                return;
            }

            if (_units.Exists(unit => string.Equals(unit.Id, id, StringComparison.Ordinal)))
            {
                Error(add.Location, id, ChangeCodes.BadNewUnit, "already exists; change it instead of adding it");
                return;
            }

            Touch(id, add.Location);
            _units.Add(add.Unit);
        }

        private void Close(CloseUnit close)
        {
            if (Find(close.UnitId, close.Location) is not int index)
            {
                return;
            }

            if (close.SendTo is string target)
            {
                if (string.Equals(target, close.UnitId, StringComparison.Ordinal))
                {
                    Error(close.Location, close.UnitId, ChangeCodes.BadValue, "cannot send its patients to itself; name another unit or 'leave network'");
                    return;
                }

                if (Find(target, close.Location) is null)
                {
                    return;
                }

                Touch(target, close.Location);
            }

            string closed = close.UnitId;
            _units.RemoveAt(index);
            double arriving = _arrivals.Where(arrival => string.Equals(arrival.UnitId, closed, StringComparison.Ordinal)).Sum(arrival => arrival.PerHour);
            _arrivals.RemoveAll(arrival => string.Equals(arrival.UnitId, closed, StringComparison.Ordinal));
            if (close.SendTo is string to && arriving > 0.0)
            {
                double current = _arrivals.Where(arrival => string.Equals(arrival.UnitId, to, StringComparison.Ordinal)).Sum(arrival => arrival.PerHour);
                SetArrival(to, current + arriving);
            }

            var into = _routes.Where(route => string.Equals(route.To, closed, StringComparison.Ordinal)).ToList();
            _routes.RemoveAll(route => string.Equals(route.From, closed, StringComparison.Ordinal) || string.Equals(route.To, closed, StringComparison.Ordinal));
            if (close.SendTo is string destination)
            {
                foreach (var route in into.Where(route => route.Probability > 0.0))
                {
                    double current = _routes.Where(r => string.Equals(r.From, route.From, StringComparison.Ordinal) && string.Equals(r.To, destination, StringComparison.Ordinal)).Sum(r => r.Probability);
                    SetRouteFraction(route.From, destination, Math.Min(1.0, current + route.Probability));
                    Touch(route.From, close.Location);
                }
            }

            _touched.Remove(closed);
        }

        private void Error(SourceLocation location, string? unitId, string code, string message) =>
            _diagnostics.Add(Diagnostic.Error(code, location, unitId, message));
    }
}

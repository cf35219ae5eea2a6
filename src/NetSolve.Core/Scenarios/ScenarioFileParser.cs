using NetSolve.Diagnostics;
using NetSolve.Model;
using NetSolve.Parsing;
using NetSolve.Parsing.Values;

namespace NetSolve.Scenarios;

/// <summary>Turns the located YAML of a scenario file into changes on its base network, collecting every problem.</summary>
internal sealed class ScenarioFileParser(string fileName, Func<string, ReadResult> readBase) : NodeParser([])
{
    private static readonly string[] TopKeys =
        ["scenario", "base", "add_units", "servers", "service", "scale_arrivals", "arrivals", "routes", "close_units"];

    private static readonly string[] UnitKeys = ["label", "servers", "service", "service_cv"];


    public ScenarioReadResult Parse(YamlNode root)
    {
        if (root.AsMapping is not YamlMapping top)
        {
            Error(root.Location, null, DiagnosticCodes.WrongShape, "the top level must be a mapping with 'base' and the changes");
            return Result(null);
        }

        var fields = Fields(top, TopKeys, null);
        string name = fields.TryGetValue("scenario", out var nameNode) && Scalar(nameNode, null, "scenario") is YamlScalar nameScalar
            ? nameScalar.Value
            : Path.GetFileNameWithoutExtension(fileName);
        var baseNode = fields["base"];
        if (Scalar(baseNode, null, "base") is not YamlScalar baseScalar)
        {
            return Result(null);
        }

        var read = readBase(baseScalar.Value);
        foreach (var diagnostic in read.Diagnostics)
        {
            Diagnostics.Add(diagnostic.Location.Line == 0
                ? Diagnostic.Error(ChangeCodes.BadBase, baseScalar.Location, null, $"base network '{baseScalar.Value}': {diagnostic.Message}")
                : diagnostic);
        }

        if (read.Network is not Network network)
        {
            return Result(null);
        }

        var changes = new List<NetworkChange>();
        var timeUnit = network.TimeUnit;
        Section(fields, "add_units", changes, (key, value) => AddUnit(key, value, timeUnit));
        Section(fields, "servers", changes, ServersChange);
        Section(fields, "service", changes, (key, value) => ServiceChange(key, value, timeUnit));
        if (fields.TryGetValue("scale_arrivals", out var scaleNode)
            && Value(scaleNode, null, "scale_arrivals", text => FactorValue.NotNegative(WithoutTimes(text))) is double all)
        {
            changes.Add(new ScaleArrivals(scaleNode.Location, null, all));
        }

        Section(fields, "arrivals", changes, (key, value) => ArrivalsChange(key, value, timeUnit));
        if (fields.TryGetValue("routes", out var routesNode) && Mapping(routesNode, null, "routes") is YamlMapping routes)
        {
            foreach (var (from, targets) in UniqueEntries(routes, null))
            {
                if (Mapping(targets, from.Value, $"routes.{from.Value}") is not YamlMapping targetMap)
                {
                    continue;
                }

                foreach (var (to, value) in UniqueEntries(targetMap, from.Value))
                {
                    if (Value(value, from.Value, FieldLabels.RouteTo, ProbabilityValue.Parse, to.Value) is double probability)
                    {
                        changes.Add(new SetRoute(to.Location, from.Value, to.Value, probability));
                    }
                }
            }
        }

        Section(fields, "close_units", changes, CloseChange);
        if (Diagnostics.Any(d => d.IsError))
        {
            return Result(null);
        }

        var edit = NetworkEditor.Apply(network, changes, baseScalar.Location);
        Diagnostics.AddRange(edit.Diagnostics);
        return Result(edit.Network is Network changed
            ? new Scenario(name, fileName, network, [.. changes], changed)
            : null);
    }

    private ScenarioReadResult Result(Scenario? scenario)
    {
        bool failed = Diagnostics.Any(d => d.IsError);
        var sorted = Diagnostics
            .OrderBy(d => string.Equals(d.Location.File, fileName, StringComparison.Ordinal))
            .ThenBy(d => d.Location.Line)
            .ThenBy(d => d.Location.Column);
        return new ScenarioReadResult(failed ? null : scenario, [.. sorted]);
    }

    private void Section(Dictionary<string, YamlNode> fields, string key, List<NetworkChange> changes, Func<YamlKey, YamlNode, NetworkChange?> parse)
    {
        if (!fields.TryGetValue(key, out var node) || node.IsNullScalar || Mapping(node, null, key) is not YamlMapping mapping)
        {
            return;
        }

        foreach (var (unitKey, value) in UniqueEntries(mapping, null))
        {
            if (parse(unitKey, value) is NetworkChange change)
            {
                changes.Add(change);
            }
        }
    }

    private AddUnit? AddUnit(YamlKey key, YamlNode node, TimeUnit timeUnit)
    {
        string id = key.Value;
        if (Mapping(node, id, "a new unit") is not YamlMapping mapping)
        {
            return null;
        }

        var fields = Fields(mapping, UnitKeys, id);
        string label = fields.TryGetValue("label", out var labelNode) && Scalar(labelNode, id, "label") is YamlScalar labelScalar ? labelScalar.Value : id;
        Servers? servers = null;
        if (!fields.TryGetValue("servers", out var serversNode))
        {
            Error(mapping.Location, id, DiagnosticCodes.MissingKey, "missing 'servers' (a whole number of at least 1, or unlimited)");
        }
        else
        {
            servers = ServersField(serversNode, id);
        }

        double? hours = null;
        if (!fields.TryGetValue("service", out var serviceNode))
        {
            Error(mapping.Location, id, DiagnosticCodes.MissingKey, "missing 'service' (the mean time a patient holds a server, e.g. 45min)");
        }
        else
        {
            hours = Value(serviceNode, id, FieldLabels.Service, text => DurationValue.Parse(text, timeUnit));
        }

        double? cv = fields.TryGetValue("service_cv", out var cvNode) ? Value(cvNode, id, "service_cv", CvValue.Parse) : 1.0;
        if (cv < 0.0)
        {
            Error(cvNode!.Location, id, DiagnosticCodes.BadValue, "service_cv must be 0 or more");
            return null;
        }

        return servers is Servers s && hours is double h && cv is double c
            ? new AddUnit(key.Location, new Unit(id, label, s, h, c))
            : null;
    }

    private NetworkChange? ServersChange(YamlKey key, YamlNode node)
    {
        if (node.AsScalar is YamlScalar { IsNull: false } scalar && scalar.Text[0] is '+' or '-')
        {
            return Value(node, key.Value, FieldLabels.Servers, AddedServersValue.Parse) is int added ? new AddServers(key.Location, key.Value, added) : null;
        }

        return ServersField(node, key.Value) is Servers servers ? new SetServers(key.Location, key.Value, servers) : null;
    }

    private NetworkChange? ServiceChange(YamlKey key, YamlNode node, TimeUnit timeUnit)
    {
        if (Scalar(node, key.Value, FieldLabels.Service) is not YamlScalar scalar)
        {
            return null;
        }

        if (scalar.Text is ['x', ..])
        {
            return Value(scalar.Node, key.Value, FieldLabels.Service, text => FactorValue.Positive(WithoutTimes(text))) is double factor
                ? new ScaleService(key.Location, key.Value, factor)
                : null;
        }

        return Value(scalar.Node, key.Value, FieldLabels.Service, text => DurationValue.Parse(text, timeUnit)) is double hours
            ? new SetService(key.Location, key.Value, hours)
            : null;
    }

    private NetworkChange? ArrivalsChange(YamlKey key, YamlNode node, TimeUnit timeUnit)
    {
        if (Scalar(node, key.Value, FieldLabels.ArrivalRate) is not YamlScalar scalar)
        {
            return null;
        }

        if (scalar.Text is ['x', ..])
        {
            return Value(scalar.Node, key.Value, FieldLabels.Arrivals, text => FactorValue.NotNegative(WithoutTimes(text))) is double factor
                ? new ScaleArrivals(key.Location, key.Value, factor)
                : null;
        }

        return Value(scalar.Node, key.Value, FieldLabels.ArrivalRate, text => RateValue.Parse(text, timeUnit)) is double perHour
            ? new SetArrivals(key.Location, key.Value, perHour)
            : null;
    }

    private CloseUnit? CloseChange(YamlKey key, YamlNode node)
    {
        if (node.IsNullScalar)
        {
            Error(node.Location, key.Value, DiagnosticCodes.MissingKey, $"say where its patients go instead: a unit id or '{ScenarioReader.LeaveNetwork}'");
            return null;
        }

        return Scalar(node, key.Value, "close_units") is YamlScalar scalar
            ? new CloseUnit(scalar.Location, key.Value, scalar.Value == ScenarioReader.LeaveNetwork ? null : scalar.Value)
            : null;
    }

    /// <summary>A factor as the scenario file writes it, <c>x1.2</c>, without its <c>x</c>; the factor alone is what <c>--set</c> takes after <c>*=</c>.</summary>
    private static ReadOnlySpan<char> WithoutTimes(ReadOnlySpan<char> text) => text is ['x', ..] ? text[1..] : text;
}

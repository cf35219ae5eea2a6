using System.CommandLine;
using System.CommandLine.Parsing;
using System.Globalization;
using NetSolve.Analysis;
using NetSolve.Diagnostics;
using NetSolve.Model;
using NetSolve.Presentation.Growth;
using NetSolve.Cli.Settings;
using NetSolve.Solving;

namespace NetSolve.Cli.Commands;

/// <summary><c>netsolve growth FILE</c>: where and when the network saturates as demand grows.</summary>
internal sealed class GrowthCommand() : NetworkCommand(
    "growth", "Demand growth: the order in which units saturate as arrivals grow, the factor at which the first unit is "
    + "strained and the first becomes unstable, and utilisation and mean wait per unit across growth factors.")
{
    private readonly Option<string> _stream = new("--stream") { Description = "Grow only the external arrivals at this unit; the other streams stay as they are.", HelpName = "UNIT" };

    private readonly Option<double> _from = SettingOptions.Number(
        "--from", value => value is >= 0.0 and <= SettingLimits.MaxGrowthFactor, text => FactorProblem("--from", text, "from 0 to"), 1.0,
        "First growth factor (default 1: today's demand).");

    private readonly Option<double?> _to = SettingOptions.OptionalNumber(
        "--to", value => value is > 0.0 and <= SettingLimits.MaxGrowthFactor, text => FactorProblem("--to", text, "above 0 and at most"),
        "Last growth factor (default: where the first unit to saturate reaches 98% utilisation; 2 when nothing saturates).");

    private readonly Option<int> _steps = SettingOptions.WholeNumber(
        "--steps", 1, SettingLimits.MaxSteps, GrowthAnalysis.DefaultSteps, "Rows in the table (default 20).");

    protected override string FormatDescription =>
        "Output: table (for people, with a text chart), json (one document) or csv (one row per factor and unit, ready to plot).";

    protected override IEnumerable<Symbol> Symbols => [_stream, _from, _to, _steps];

    protected override IEnumerable<string> CheckSettings(CommandResult settings)
    {
        if (settings.TryGetValue(_from, out double first) && settings.TryGetValue(_to, out double? last) && last < first)
        {
            yield return Messages.GrowthLastBelowFirst(last.Value, first);
        }
    }

    protected override int Execute(NetworkRequest request)
    {
        var network = request.Network;
        var solution = request.Solve();
        string? unit = request.GetValue(_stream);
        if (unit is not null)
        {
            CheckStream(network, unit);
        }

        var probe = Run(solution, unit, []);
        double first = request.GetValue(_from);
        double last = request.GetValue(_to) ?? GrowthAnalysis.DefaultLastFactor(probe.FirstUnstable);
        if (last < first)
        {
            // Only the default end can be below --from here; both given are checked with the other usage errors.
            throw new InputException(Messages.GrowthDefaultLastBelowFirst(last, first));
        }

        var growth = Run(solution, unit, GrowthAnalysis.Range(first, last, request.GetValue(_steps)));
        request.Output.Write(
            json => GrowthOutput.WriteJson(growth, json),
            csv => GrowthOutput.WriteCsv(growth, csv),
            table => GrowthOutput.WriteTable(growth, table));
        return ExitCodes.Success;
    }

    private static string FactorProblem(string option, string text, string range) => Messages.NotNumber(
        option, text, "a growth factor", string.Create(CultureInfo.InvariantCulture, $"{range} {SettingLimits.MaxGrowthFactor}"), "1 is today's demand");

    private static GrowthResult Run(NetworkSolution solution, string? stream, IReadOnlyList<double> factors) =>
        stream is null ? GrowthAnalysis.Run(solution, factors) : GrowthAnalysis.RunStream(solution, stream, factors);

    private static void CheckStream(Network network, string unit)
    {
        var ids = network.Units.Select(u => u.Id).ToList();
        if (!ids.Contains(unit, StringComparer.Ordinal))
        {
            throw new InputException(Messages.UnknownUnit("--stream", unit, unit, NearestName.Hint(unit, ids)));
        }

        if (!network.Arrivals.Any(arrival => arrival.UnitId == unit && arrival.PerHour > 0.0))
        {
            var streams = network.Arrivals.Where(arrival => arrival.PerHour > 0.0).Select(arrival => arrival.UnitId);
            throw new InputException(Messages.StreamWithoutArrivals(unit, streams));
        }
    }
}

using System.CommandLine;
using System.CommandLine.Parsing;
using NetSolve.Analysis;
using NetSolve.Diagnostics;
using NetSolve.Presentation.Pathways;
using NetSolve.Cli.Settings;

namespace NetSolve.Cli.Commands;

/// <summary><c>netsolve pathway FILE --from UNIT [--to UNIT] [--path A,B,C]</c>: where patients entering at a unit go.</summary>
internal sealed class PathwayCommand() : NetworkCommand(
    "pathway", "Pathways: the chance that a patient entering at one unit ever visits another, expected visits per unit, "
    + "and the mean time along a named sequence of units.")
{
    /// <summary>Above this many reached units, the chance of visiting is computed only for <c>--to</c> (one traffic solve per unit).</summary>
    public const int AllProbabilitiesLimit = 200;

    private readonly Option<string> _from = new("--from") { Description = "The unit patients enter at: expected visits, chance of visiting and time for every unit they can reach.", HelpName = "UNIT" };

    private readonly Option<string> _to = new("--to") { Description = "Only this unit's chance of being visited (the others are left out).", HelpName = "UNIT" };

    private readonly Option<string> _path = new("--path") { Description = "A sequence of units, comma-separated: mean time along it and the chance of following it step by step.", HelpName = "A,B,C" };

    protected override string FormatDescription => "Output: table (for people), json (one document) or csv (one row per unit reached, then the path).";

    /// <summary>Probabilities and visits along routes, not capacity advice: the table has no caution.</summary>
    protected override bool TableCarriesCaution => false;

    protected override IEnumerable<Symbol> Symbols => [_from, _to, _path];

    protected override IEnumerable<string> CheckSettings(CommandResult settings)
    {
        bool start = settings.IsGiven(_from);
        if (!start && !settings.IsGiven(_path))
        {
            yield return Messages.PathwayNeedsStart;
        }

        if (!start && settings.IsGiven(_to))
        {
            yield return Messages.PathwayToNeedsFrom;
        }
    }

    protected override int Execute(NetworkRequest request)
    {
        var network = request.Network;
        var ids = network.Units.Select(unit => unit.Id).ToList();
        string? start = request.GetValue(_from);
        string? target = request.GetValue(_to);
        string? pathText = request.GetValue(_path);
        string[]? sequence = pathText?.Split(',', StringSplitOptions.TrimEntries);
        var problems = new List<string>();
        void Check(string option, string? text, string? id)
        {
            if (id is not null && !ids.Contains(id, StringComparer.Ordinal))
            {
                problems.Add(Messages.UnknownUnit(option, text!, id, NearestName.Hint(id, ids)));
            }
        }

        Check("--from", start, start);
        Check("--to", target, target);
        foreach (string id in sequence ?? [])
        {
            Check("--path", pathText, id);
        }

        if (problems.Count > 0)
        {
            throw new InputException(string.Join("\n", problems));
        }

        var solution = request.Solve();
        PathwayResult? pathway = null;
        if (start is not null)
        {
            try
            {
                IReadOnlyCollection<string>? probabilities = target is not null ? [target]
                    : PathwayAnalysis.ExpectedVisits(network, start).Count(v => v > 0.0) <= AllProbabilitiesLimit ? null : [];
                pathway = PathwayAnalysis.From(solution, start, probabilities);
            }
            catch (ArgumentException exception)
            {
                throw new InputException(Messages.PathwayProblem(exception.Message.Split(" (Parameter", StringSplitOptions.None)[0]), exception);
            }
        }

        var path = sequence is null ? null : PathwayAnalysis.Path(solution, sequence);
        request.Output.Write(
            json => PathwayOutput.WriteJson(network, pathway, path, json),
            csv => PathwayOutput.WriteCsv(network, pathway, path, csv),
            table => PathwayOutput.WriteTable(network, pathway, path, table));
        return ExitCodes.Success;
    }
}

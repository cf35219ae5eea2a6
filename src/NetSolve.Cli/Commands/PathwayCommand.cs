using System.CommandLine;
using NetSolve.Analysis;
using NetSolve.Diagnostics;
using NetSolve.Model;
using NetSolve.Presentation.Pathways;
using NetSolve.Solving;

namespace NetSolve.Cli.Commands;

/// <summary><c>netsolve pathway FILE --from UNIT [--to UNIT] [--path A,B,C]</c>: where patients entering at a unit go.</summary>
internal static class PathwayCommand
{
    /// <summary>Above this many reached units, the chance of visiting is computed only for <c>--to</c> (one traffic solve per unit).</summary>
    public const int AllProbabilitiesLimit = 200;

    public static Command Create(CliContext context)
    {
        var input = new NetworkInput();
        var format = CommonOptions.Format();
        format.Description = "Output: table (for people), json (one document) or csv (one row per unit reached, then the path).";
        var strain = CommonOptions.Strain();
        var from = new Option<string>("--from") { Description = "The unit patients enter at: expected visits, chance of visiting and time for every unit they can reach.", HelpName = "UNIT" };
        var to = new Option<string>("--to") { Description = "Only this unit's chance of being visited (the others are left out).", HelpName = "UNIT" };
        var path = new Option<string>("--path") { Description = "A sequence of units, comma-separated: mean time along it and the chance of following it step by step.", HelpName = "A,B,C" };
        var command = new Command("pathway", "Pathways: the chance that a patient entering at one unit ever visits another, expected visits per unit, "
            + "and the mean time along a named sequence of units.")
        {
            input.File, format, strain, input.Set, from, to, path,
        };
        command.SetAction(parse =>
        {
            var network = input.Load(parse, context);
            var ids = network.Units.Select(unit => unit.Id).ToList();
            string? start = parse.GetValue(from);
            string? target = parse.GetValue(to);
            string[]? sequence = parse.GetValue(path)?.Split(',', StringSplitOptions.TrimEntries);
            if (start is null && sequence is null)
            {
                throw new InputException("netsolve: pathway: give --from UNIT, --path A,B,C, or both");
            }

            if (target is not null && start is null)
            {
                throw new InputException("netsolve: pathway: --to needs --from (the chance of visiting is from a start unit)");
            }

            Check("--from", start, ids);
            Check("--to", target, ids);
            foreach (string id in sequence ?? [])
            {
                Check("--path", id, ids);
            }

            var solution = NetworkSolver.Solve(network, parse.GetValue(strain));
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
                    throw new InputException($"netsolve: pathway: {exception.Message.Split(" (Parameter", StringSplitOptions.None)[0]}", exception);
                }
            }

            var result = sequence is null ? null : PathwayAnalysis.Path(solution, sequence);
            Write(network, pathway, result, parse.GetValue(format)!, context);
            return ExitCodes.Success;
        });
        return command;
    }

    private static void Check(string option, string? id, List<string> ids)
    {
        if (id is not null && !ids.Contains(id))
        {
            throw new InputException($"netsolve: {option}: unknown unit '{id}'{NearestName.Hint(id, ids)}");
        }
    }

    private static void Write(Network network, PathwayResult? pathway, PathResult? path, string format, CliContext context)
    {
        switch (format)
        {
            case "json":
                using (var buffer = new MemoryStream())
                {
                    PathwayOutput.WriteJson(network, pathway, path, buffer);
                    context.Out.Write(System.Text.Encoding.UTF8.GetString(buffer.ToArray()) + "\n");
                }

                break;
            case "csv":
                PathwayOutput.WriteCsv(network, pathway, path, context.Out);
                break;
            default:
                PathwayOutput.WriteTable(network, pathway, path, context.Out);
                break;
        }
    }
}

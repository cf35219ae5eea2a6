using System.CommandLine;
using System.Globalization;
using NetSolve.Analysis;
using NetSolve.Diagnostics;
using NetSolve.Model;
using NetSolve.Presentation;
using NetSolve.Presentation.Growth;
using NetSolve.Solving;

namespace NetSolve.Cli.Commands;

/// <summary><c>netsolve growth FILE</c>: where and when the network saturates as demand grows.</summary>
internal static class GrowthCommand
{
    /// <summary>Most rows a growth table may have.</summary>
    public const int MaxSteps = 10_000;

    public static Command Create(CliContext context)
    {
        var input = new NetworkInput();
        var format = CommonOptions.Format();
        format.Description = "Output: table (for people, with a text chart), json (one document) or csv (one row per factor and unit, ready to plot).";
        var strain = CommonOptions.Strain();
        var stream = new Option<string>("--stream") { Description = "Grow only the external arrivals at this unit; the other streams stay as they are.", HelpName = "UNIT" };
        var from = new Option<double>("--from") { Description = "First growth factor (default 1: today's demand).", DefaultValueFactory = _ => 1.0 };
        var to = new Option<double?>("--to") { Description = "Last growth factor (default: where the first unit to saturate reaches 98% utilisation; 2 when nothing saturates)." };
        var steps = new Option<int>("--steps") { Description = "Rows in the table (default 20).", DefaultValueFactory = _ => GrowthAnalysis.DefaultSteps };
        from.Validators.Add(result => Check(result, result.GetValueOrDefault<double>() is >= 0.0 and < double.PositiveInfinity, "--from must be a factor of 0 or more"));
        to.Validators.Add(result => Check(result, result.GetValueOrDefault<double?>() is > 0.0 and < double.PositiveInfinity, "--to must be a factor above 0"));
        steps.Validators.Add(result => Check(result, result.GetValueOrDefault<int>() is >= 1 and <= MaxSteps,
            string.Create(CultureInfo.InvariantCulture, $"--steps must be from 1 to {MaxSteps}")));
        var command = new Command("growth", "Demand growth: the order in which units saturate as arrivals grow, the factor at which the first unit is "
            + "strained and the first becomes unstable, and utilisation and mean wait per unit across growth factors.")
        {
            input.File, format, strain, input.Set, stream, from, to, steps,
        };
        command.SetAction(parse =>
        {
            var network = input.Load(parse, context);
            var solution = NetworkSolver.Solve(network, parse.GetValue(strain));
            string? unit = parse.GetValue(stream);
            if (unit is not null)
            {
                CheckStream(network, unit);
            }

            var probe = Run(solution, unit, []);
            double first = parse.GetValue(from);
            double last = parse.GetValue(to) ?? GrowthAnalysis.DefaultLastFactor(probe.FirstUnstable);
            if (last < first)
            {
                throw new InputException(string.Create(CultureInfo.InvariantCulture,
                    $"netsolve: growth: the last factor ({last:0.###}) is below the first ({first:0.###}); give --to above --from"));
            }

            var growth = Run(solution, unit, GrowthAnalysis.Range(first, last, parse.GetValue(steps)));
            Write(growth, parse.GetValue(format)!, context);
            return ExitCodes.Success;
        });
        return command;
    }

    private static GrowthResult Run(NetworkSolution solution, string? stream, IReadOnlyList<double> factors) =>
        stream is null ? GrowthAnalysis.Run(solution, factors) : GrowthAnalysis.RunStream(solution, stream, factors);

    private static void CheckStream(Network network, string unit)
    {
        if (!network.Units.Any(u => u.Id == unit))
        {
            throw new InputException($"netsolve: --stream {unit}: unknown unit '{unit}'{NearestName.Hint(unit, network.Units.Select(u => u.Id))}");
        }

        if (!network.Arrivals.Any(arrival => arrival.UnitId == unit && arrival.PerHour > 0.0))
        {
            var streams = network.Arrivals.Where(arrival => arrival.PerHour > 0.0).Select(arrival => arrival.UnitId);
            throw new InputException($"netsolve: --stream {unit}: unit '{unit}' has no arrivals from outside to grow (streams: {string.Join(", ", streams)})");
        }
    }

    private static void Write(GrowthResult growth, string format, CliContext context)
    {
        switch (format)
        {
            case "json":
                using (var buffer = new MemoryStream())
                {
                    GrowthOutput.WriteJson(growth, buffer);
                    context.Out.Write(System.Text.Encoding.UTF8.GetString(buffer.ToArray()) + "\n");
                }

                break;
            case "csv":
                GrowthOutput.WriteCsv(growth, context.Out);
                break;
            default:
                GrowthOutput.WriteTable(growth, context.Out);
                context.Out.Write("\n" + Caution.Text + "\n");
                break;
        }
    }

    private static void Check(System.CommandLine.Parsing.OptionResult result, bool ok, string message)
    {
        if (!ok)
        {
            result.AddError(message);
        }
    }
}

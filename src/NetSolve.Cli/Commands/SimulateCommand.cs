using NetSolve.Model;
using NetSolve.Presentation;
using NetSolve.Presentation.Simulation;
using System.CommandLine;
using NetSolve.Cli.Settings;
using NetSolve.Simulation;
using NetSolve.Solving;

namespace NetSolve.Cli.Commands;

/// <summary>
/// <c>netsolve simulate FILE</c>: discrete-event simulation of the network, with every extension key, confidence
/// intervals and percentiles; <c>--compare</c> sets the formulas beside it.
/// </summary>
internal sealed class SimulateCommand() : NetworkCommand(
    "simulate", "Simulate the network: means with 95% confidence intervals, percentiles, waits over given times and queues by hour of day.")
{
    private readonly Option<ulong> _seed = SimulationCliOptions.Seed();

    private readonly Option<int> _replications = SimulationCliOptions.Replications(SimulationOptions.DefaultReplications);

    private readonly Option<string> _warmup = SimulationCliOptions.RunLength(
        "--warmup", "Simulated time discarded at the start of each replication (e.g. 28d; a bare number is in the file's time unit); default: 5 relaxation times of the slowest unit, in whole weeks, at least 1 week.", null, SimulationCliOptions.Warmup);

    private readonly Option<string> _duration = SimulationCliOptions.RunLength(
        "--duration", "Simulated time measured in each replication after the warm-up (e.g. 364d); default: 20 relaxation times of the slowest unit, in whole weeks, from 364d to 3640d.", null, SimulationCliOptions.Duration);

    private readonly Option<double?> _precision = SimulationCliOptions.Precision();

    private readonly Option<int> _maxReplications = SimulationCliOptions.MaxReplications();

    private readonly Option<string[]> _waitOver = SimulationCliOptions.WaitOverOption();

    private readonly Option<bool> _compare = new("--compare") { Description = "Set the formula results beside the simulation, with each unit's method, the relative error and a verdict per metric." };

    private readonly Option<bool> _allowLong = SimulationCliOptions.AllowLong();

    private readonly Option<int> _threads = SettingOptions.WholeNumber(
        "--threads", 1, SettingLimits.MaxThreads, -1, "Most replications run at once (default: all cores); results do not depend on it.");

    protected override string FormatDescription =>
        "Output: table (for people), json (the contract's document) or csv (one row per unit; with --compare, one row per unit and metric).";

    protected override bool ForSimulation => true;

    /// <summary>The table ends with what was simulated and the simulation's own caution, not the formulas' assumptions.</summary>
    protected override bool TableCarriesCaution => false;

    protected override IEnumerable<Symbol> Symbols => [_seed, _replications, _warmup, _duration, _precision, _maxReplications, _waitOver, _compare, _threads, _allowLong];

    protected override int Execute(NetworkRequest request)
    {
        var network = request.Network;
        var options = PlannedOptions(request);
        var result = SimulationRun.Run(network, options, request.Context);
        if (result.ReplicationsFinished == 0)
        {
            request.Context.Report(Messages.StoppedBeforeAnyReplication);
            return ExitCodes.InvalidInput;
        }

        if (!result.IsComplete)
        {
            request.Context.Report(Messages.StoppedPartway(result.ReplicationsFinished, options.Replications, "the results below use those"));
        }

        if (result.IsWarmupShortByMser)
        {
            request.Warnings.Report(Messages.WarmupShortByMser(result.MserTruncationHours!.Value, options.WarmupHours));
        }

        var formula = request.GetValue(_compare) ? request.Solve() : null;
        double threshold = request.StrainThreshold;
        request.Output.Write(
            json => SimulationJsonWriter.Write(result, json, formula, threshold),
            csv => WriteCsv(result, formula, csv),
            table => WriteTable(result, formula, threshold, table, network));
        return ExitCodes.Success;
    }

    /// <summary>
    /// The run's options, planned and checked against the bound on work with one formula solve. In a method of its
    /// own so that the solution is let go before the run: at 100,000 units it is tens of MB the replication can use.
    /// </summary>
    private SimulationOptions PlannedOptions(NetworkRequest request)
    {
        var formula = request.Solve();
        var options = SimulationCliOptions.ReadPlanned(
            request, formula, _seed, _replications, (_warmup, SimulationCliOptions.Warmup), (_duration, SimulationCliOptions.Duration), _waitOver)
            with { MaxDegreeOfParallelism = request.GetValue(_threads), Precision = request.GetValue(_precision) };
        if (options.Precision is not null)
        {
            options = options with { MaxReplications = Math.Max(request.GetValue(_maxReplications), options.Replications) };
        }

        // With --precision the run may grow to --max-replications: the work estimate counts that bound.
        SimulationCliOptions.CheckWork(formula, options with { Replications = options.Precision is null ? options.Replications : options.MaxReplications }, request.GetValue(_allowLong));
        return options;
    }

    private static void WriteCsv(SimulationResult result, NetworkSolution? formula, TextWriter writer)
    {
        // A CSV file holds one table, so the comparison takes the place of the per-unit table rather than following
        // it; its rows repeat the simulated means and half-widths they are judged on.
        if (formula is null)
        {
            SimulationCsvWriter.Write(result, writer);
        }
        else
        {
            ComparisonCsvWriter.Write(result, formula, writer);
        }
    }

    private static void WriteTable(SimulationResult result, NetworkSolution? formula, double threshold, TextWriter writer, Network network)
    {
        SimulationTableWriter.Write(result, writer, threshold);
        if (formula is not null)
        {
            writer.Write("\n");
            ComparisonTableWriter.Write(result, formula, writer);
        }

        writer.Write("\nModelled:\n");
        foreach (string line in CautionForSimulation.Modelled(network))
        {
            writer.Write("  " + line + "\n");
        }

        writer.Write("\n" + CautionForSimulation.Text + "\n");
    }
}

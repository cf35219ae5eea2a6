using System.CommandLine;
using System.CommandLine.Parsing;
using System.Text;
using NetSolve.Cli.Settings;
using NetSolve.Presentation.Scenarios;
using NetSolve.Rendering.Report;
using NetSolve.Simulation;
using NetSolve.Solving;

namespace NetSolve.Cli.Commands;

/// <summary><c>netsolve report FILE [SCENARIO ...] -o report.html [--simulate]</c>: the self-contained leadership report.</summary>
/// <remarks>
/// Like <c>compare</c>: FILE and each SCENARIO may be a network file or a scenario file (docs/scenarios.md).
/// <c>--simulate</c> also simulates FILE and adds the time-of-day and formula-against-simulation sections.
/// </remarks>
internal sealed class ReportCommand() : NetworkCommand(
    "report", "Write the leadership report: finding, bottleneck map, unit table, waits as demand grows, scenarios, assumptions; with --simulate, queues by hour of day.")
{
    /// <summary>Replications for a report: fewer than <c>simulate</c>'s 10 so a report stays quick; still 4 degrees of freedom.</summary>
    public const int DefaultReplications = 5;

    /// <summary>A report's run length: at least a day, as the time-of-day section needs every hour measured.</summary>
    private static readonly DurationRule ReportDuration = SimulationCliOptions.Duration with
    {
        MinDays = 1.0,
        Shortest = "a day",
        TooShort = "the time-of-day section needs every hour measured",
    };

    /// <summary>The extensions a report file may have: the report is HTML whatever its name says.</summary>
    public static readonly IReadOnlyList<string> Extensions = [".html", ".htm"];

    private readonly Argument<string[]> _scenarios = new("SCENARIO")
    {
        Description = "Scenario files (see docs/scenarios.md) or network files, each solved and compared with FILE.",
        Arity = ArgumentArity.ZeroOrMore,
    };

    private readonly Option<string> _output = OutputFileOption.Create(
        "Write the report here (.html): one file with everything inline, to open in any browser, e-mail or print.", Extensions);

    private readonly Option<bool> _simulate = new("--simulate")
    {
        Description = "Also simulate FILE and add the mean queue by hour of day (chart and table) and the formula against the simulation per unit.",
    };

    private readonly Option<ulong> _seed = SimulationCliOptions.Seed();

    private readonly Option<int> _replications = SimulationCliOptions.Replications(DefaultReplications);

    private readonly Option<string> _warmup = SimulationCliOptions.RunLength(
        "--warmup", "With --simulate: simulated time discarded at the start of each replication; default: as simulate, from the slowest unit's relaxation time.", null, SimulationCliOptions.Warmup);

    private readonly Option<string> _duration = SimulationCliOptions.RunLength(
        "--duration", "With --simulate: simulated time measured in each replication, at least a day; default: as simulate, from the slowest unit's relaxation time.", null, ReportDuration);

    private readonly Option<bool> _allowLong = SimulationCliOptions.AllowLong();

    protected override string? FormatDescription => null;

    private readonly Option<string[]> _target = TargetOption.Create("The finding names the units that miss one.");

    protected override IEnumerable<Symbol> Symbols => [_scenarios, _output, _simulate, _seed, _replications, _warmup, _duration, _allowLong, _target];

    protected override IEnumerable<string> CheckSettings(CommandResult settings)
    {
        if (settings.TryGetValue(_simulate, out bool simulate) && simulate)
        {
            yield break;
        }

        foreach (Option option in new Option[] { _seed, _replications, _warmup, _duration, _allowLong }.Where(settings.IsGiven))
        {
            yield return Messages.OnlyWith(option.Name, "--simulate");
        }
    }

    protected override int Execute(NetworkRequest request)
    {
        var baseline = WithHours((request with { Network = TargetOption.Apply(request.Network, request.GetValue(_target)) }).Solve(), request);
        var provenance = ReportProvenanceReader.Read(request.File, request.GetValue(_scenarios) ?? []);
        var loader = new ScenarioLoader(request.Warnings);
        var alternatives = (request.GetValue(_scenarios) ?? [])
            .Select(loader.Load)
            .Select(scenario => new ReportScenario(
                scenario.Name,
                NetworkSolver.Solve(scenario.Network, request.StrainThreshold),
                ChangeWords.Describe(scenario.Changes, scenario.Network.TimeUnit)))
            .ToList();
        // FILE read again as a scenario only for its list of changes (a network file has none); --set changes are in the name.
        var own = loader.Load(request.File);
        var baselineChanges = ChangeWords.Describe(own.Changes, own.Network.TimeUnit);
        SimulationResult? simulation = null;
        if (request.GetValue(_simulate))
        {
            var options = SimulationCliOptions.ReadPlanned(request, baseline, _seed, _replications, (_warmup, SimulationCliOptions.Warmup), (_duration, ReportDuration));
            SimulationCliOptions.CheckWork(baseline, options, request.GetValue(_allowLong));
            simulation = SimulationRun.Run(baseline.Network, options, request.Context);
            if (simulation.ReplicationsFinished == 0)
            {
                request.Context.Report(Messages.StoppedBeforeAnyReplicationNoReport);
                return ExitCodes.InvalidInput;
            }

            if (!simulation.IsComplete)
            {
                request.Context.Report(Messages.StoppedPartway(simulation.ReplicationsFinished, options.Replications, "the report uses those"));
            }

            if (simulation.IsWarmupShortByMser)
            {
                request.Warnings.Report(Messages.WarmupShortByMser(simulation.MserTruncationHours!.Value, options.WarmupHours));
            }
        }

        string html = HtmlReport.Write(baseline, alternatives, simulation, provenance, baselineChanges);
        string target = request.GetValue(_output)!;
        AtomicFile.Write(target, stream => stream.Write(new UTF8Encoding(false).GetBytes(html)));
        request.Context.Out.Write(Messages.ReportWritten(target) + "\n");
        return ExitCodes.Success;
    }

    /// <summary>Adds the hour-by-hour solution when arrivals vary by hour; warns and goes on without it if it does not settle.</summary>
    private static NetworkSolution WithHours(NetworkSolution solution, NetworkRequest request)
    {
        try
        {
            return HourByHour.AddWhenArrivalsVary(solution);
        }
        catch (TimeVaryingConvergenceException problem)
        {
            request.Warnings.Report(Messages.ReportByHourNotSettled(request.File, problem.Message));
            return solution;
        }
    }
}

using NetSolve.Simulation;
using Spectre.Console;

namespace NetSolve.Cli.Terminal;

/// <summary>Runs a simulation under a Spectre.Console progress bar drawn on stderr.</summary>
internal static class SimulationProgressBar
{
    private static readonly TimeSpan Refresh = TimeSpan.FromMilliseconds(100);

    public static SimulationResult Run(Func<IProgress<double>, SimulationResult> simulate, TextWriter error)
    {
        var console = AnsiConsole.Create(new AnsiConsoleSettings { Out = new AnsiConsoleOutput(error) });
        var progress = new LatestProgress();
        SimulationResult? result = null;
        console.Progress()
            .AutoClear(true)
            .Columns(new TaskDescriptionColumn(), new ProgressBarColumn(), new PercentageColumn(), new RemainingTimeColumn())
            .Start(context =>
            {
                var task = context.AddTask("simulating (Ctrl-C stops and reports finished replications)", maxValue: 100.0);
                var work = Task.Run(() => simulate(progress));
                while (!work.Wait(Refresh))
                {
                    task.Value = progress.Value * 100.0;
                    context.Refresh();
                }

                task.Value = 100.0;
                result = work.GetAwaiter().GetResult();
            });
        return result!;
    }
}

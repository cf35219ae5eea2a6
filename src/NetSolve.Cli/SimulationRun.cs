using NetSolve.Cli.Terminal;
using NetSolve.Model;
using NetSolve.Simulation;

namespace NetSolve.Cli;

/// <summary>Runs a simulation for a command: a progress bar on stderr when it is a terminal, and Ctrl-C stops cleanly.</summary>
internal static class SimulationRun
{
    /// <summary>The result over the replications that finished (all of them unless Ctrl-C stopped the run).</summary>
    public static SimulationResult Run(Network network, SimulationOptions options, CliContext context)
    {
        using var stop = new CancellationTokenSource();
        ConsoleCancelEventHandler onCancel = (_, args) =>
        {
            // Keep the process alive: the run stops at its next check and reports the finished replications.
            args.Cancel = true;
            stop.Cancel();
        };
        Console.CancelKeyPress += onCancel;
        try
        {
            return context.IsTerminal
                ? SimulationProgressBar.Run(progress => Simulator.Run(network, options, progress, stop.Token), context.Error)
                : Simulator.Run(network, options, null, stop.Token);
        }
        finally
        {
            Console.CancelKeyPress -= onCancel;
        }
    }
}

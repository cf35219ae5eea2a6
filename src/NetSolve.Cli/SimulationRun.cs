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
        CollectBeforeLargeRun();
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

    /// <summary>Heap above which the garbage left before a run is worth collecting at once.</summary>
    private const long LargeHeapBytes = 64L * 1024 * 1024;

    /// <summary>
    /// Collects what reading the file and planning the run left behind, when that is much: on a 100,000-unit network
    /// a few hundred MB of garbage from the reader and the formulas, which the replication's own growth would otherwise
    /// be added to at the peak of the command (docs/performance.md, "Memory of simulate --format json").
    /// </summary>
    private static void CollectBeforeLargeRun()
    {
        if (GC.GetTotalMemory(forceFullCollection: false) > LargeHeapBytes)
        {
            GC.Collect(GC.MaxGeneration, GCCollectionMode.Aggressive, blocking: true, compacting: true);
        }
    }
}

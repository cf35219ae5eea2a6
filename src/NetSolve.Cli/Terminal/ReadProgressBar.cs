using Spectre.Console;

namespace NetSolve.Cli.Terminal;

/// <summary>Reads a large file under a Spectre.Console progress bar on stderr, measured in bytes read.</summary>
internal static class ReadProgressBar
{
    private static readonly TimeSpan Refresh = TimeSpan.FromMilliseconds(200);

    /// <summary>Runs <paramref name="read"/>, which reports bytes read, showing the share of <paramref name="totalBytes"/> done.</summary>
    public static T Run<T>(string description, long totalBytes, Func<IProgress<long>, T> read, TextWriter error)
    {
        var console = AnsiConsole.Create(new AnsiConsoleSettings { Out = new AnsiConsoleOutput(error) });
        var progress = new LatestProgress();
        T result = default!;
        console.Progress()
            .AutoClear(true)
            .Columns(new TaskDescriptionColumn(), new ProgressBarColumn(), new PercentageColumn(), new RemainingTimeColumn())
            .Start(context =>
            {
                var task = context.AddTask(description, maxValue: 100.0);
                var work = Task.Run(() => read(new Progress(progress, totalBytes)));
                while (!work.Wait(Refresh))
                {
                    task.Value = progress.Value * 100.0;
                    context.Refresh();
                }

                task.Value = 100.0;
                result = work.GetAwaiter().GetResult();
            });
        return result;
    }

    /// <summary>Bytes read turned into the fraction done, handed on at once (not through a synchronisation context).</summary>
    private sealed class Progress(LatestProgress fraction, long totalBytes) : IProgress<long>
    {
        public void Report(long value) => fraction.Report(totalBytes > 0 ? Math.Min(1.0, value / (double)totalBytes) : 0.0);
    }
}

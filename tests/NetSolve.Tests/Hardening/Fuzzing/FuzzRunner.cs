using System.Diagnostics;
using System.Globalization;
using System.Text;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Hardening.Fuzzing;

/// <summary>
/// Runs one input through the real command line in this process (as <see cref="CliRun"/> does), in a fresh temporary
/// folder, with a time limit and a memory watch, and checks the contract on what it gave.
/// </summary>
internal static class FuzzRunner
{
    /// <summary>A run that takes longer than this, in processor time (see <see cref="RunMeter"/>), is a hang.</summary>
    public static readonly TimeSpan HangLimit = TimeSpan.FromSeconds(20);

    /// <summary>
    /// A run still going after this long, in wall time, is a hang whatever its processor time; until then a run is
    /// waited for, since a run in this process cannot be stopped from outside and one that ends frees its worker.
    /// </summary>
    public static readonly TimeSpan GiveUpLimit = TimeSpan.FromSeconds(600);

    /// <summary>A process larger than this during a run is a memory failure: 2 GB.</summary>
    public const long MemoryLimit = 2L * 1024 * 1024 * 1024;

    /// <summary>Runs <paramref name="input"/> and checks it.</summary>
    public static FuzzOutcome Run(FuzzInput input)
    {
        var total = Stopwatch.StartNew();
        var folder = Directory.CreateTempSubdirectory("netsolve-fuzz-");
        bool finished = false;
        var runTime = TimeSpan.Zero;
        try
        {
            var written = WriteFiles(input, folder.FullName);
            string[] arguments = input.ArgumentsIn(folder.FullName);
            string given = string.Join('\n', input.Files.Select(file => Encoding.UTF8.GetString(file.Content)));
            using var watch = new MemoryWatch();
            var clock = Stopwatch.StartNew();
            var meter = new RunMeter(CommandShapes.RunsOnOneThread(arguments));
            var run = Task.Factory.StartNew(() =>
            {
                meter.Enter();
                try
                {
                    return CliRun.Run(arguments);
                }
                finally
                {
                    meter.Leave();
                }
            }, CancellationToken.None, TaskCreationOptions.LongRunning, TaskScheduler.Default);
            var findings = new List<FuzzFinding>();
            int exitCode = -1;
            try
            {
                finished = run.Wait(GiveUpLimit);
                runTime = clock.Elapsed;
                var (used, counted) = meter.Used();
                if (finished)
                {
                    var result = run.Result;
                    exitCode = result.ExitCode;
                    findings.AddRange(CliInvariant.Check(result, arguments, given));
                    // Help may win over everything else on the line and write no file; an old output put there
                    // first is still the output (untouched or complete), never a stray.
                    bool help = arguments.Any(argument => argument is "--help" or "-h" or "-?");
                    string? output = input.OutputFile is null ? null : Path.Combine(folder.FullName, input.OutputFile);
                    var others = CommandShapes.OtherOutputFiles(input.Arguments).Select(path => Path.Combine(folder.FullName, path)).ToList();
                    var strays = Directory.EnumerateFiles(folder.FullName, "*", SearchOption.AllDirectories)
                        .Where(path => !written.Contains(path) && !string.Equals(path, output, StringComparison.Ordinal) && !others.Contains(path, StringComparer.Ordinal));
                    string? expected = help && !File.Exists(output) ? null : output;
                    string said = string.Join('\n', arguments) + "\n" + given;
                    bool isText = string.Equals(arguments[0], "fit", StringComparison.Ordinal);
                    findings.AddRange(CliInvariant.CheckOutput(exitCode, expected, input.OldOutput, strays, said, isText));
                    foreach (string other in others.Where(path => !help || File.Exists(path)))
                    {
                        findings.AddRange(CliInvariant.CheckOutput(exitCode, other, oldOutput: null, [], said, isText));
                    }
                    if (used > HangLimit)
                    {
                        findings.Add(new FuzzFinding(FuzzFailureKind.Hang, string.Create(CultureInfo.InvariantCulture,
                            $"took {used.TotalSeconds:0} s of processor time ({counted}), over {HangLimit.TotalSeconds:0} s")));
                    }
                }
                else
                {
                    findings.Add(new FuzzFinding(FuzzFailureKind.Hang, string.Create(CultureInfo.InvariantCulture,
                        $"still running after {clock.Elapsed.TotalSeconds:0} s, {used.TotalSeconds:0} s of processor time ({counted})")));
                }
            }
            catch (AggregateException exception)
            {
                finished = true;
                runTime = clock.Elapsed;
                var inner = exception.InnerException ?? exception;
                findings.Add(new FuzzFinding(FuzzFailureKind.Crash, "escaped " + inner.GetType().Name + ": " + CliInvariant.Shorten(inner.Message)));
            }

            watch.Dispose();
            if (watch.PeakWorkingSet > MemoryLimit)
            {
                findings.Add(new FuzzFinding(FuzzFailureKind.Memory, string.Create(CultureInfo.InvariantCulture, $"working set {watch.PeakWorkingSet / (1024 * 1024)} MB")));
            }

            if (finished)
            {
                TryDelete(folder);
            }

            // A run that has not finished may still be using its folder; it is left for the system's temporary cleanup.
            return new FuzzOutcome(exitCode, findings, watch.PeakWorkingSet, runTime, total.Elapsed - runTime);
        }
        catch
        {
            if (finished)
            {
                TryDelete(folder);
            }

            throw;
        }
    }

    private static HashSet<string> WriteFiles(FuzzInput input, string folder)
    {
        var written = new HashSet<string>(StringComparer.Ordinal);
        foreach (var file in input.Files)
        {
            string path = Path.Combine(folder, file.RelativePath);
            Directory.CreateDirectory(Path.GetDirectoryName(path)!);
            File.WriteAllBytes(path, file.Content);
            written.Add(path);
        }

        if (input.OutputFile is not null && input.OldOutput is not null)
        {
            string path = Path.Combine(folder, input.OutputFile);
            // A name the file system refuses (a NUL in it) cannot hold an old file; the command must refuse it too.
            if (!input.OutputFile.Contains('\0', StringComparison.Ordinal) && Directory.Exists(Path.GetDirectoryName(path)) && !Directory.Exists(path))
            {
                File.WriteAllBytes(path, input.OldOutput);
            }
        }

        return written;
    }

    private static void TryDelete(DirectoryInfo folder)
    {
        try
        {
            folder.Delete(recursive: true);
        }
        catch (IOException)
        {
            // A file still open by a run that threw: left for the system's temporary cleanup.
        }
        catch (UnauthorizedAccessException)
        {
            // As above.
        }
    }
}

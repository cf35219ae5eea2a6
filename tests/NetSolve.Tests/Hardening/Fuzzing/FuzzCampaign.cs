using System.Diagnostics;
using System.Globalization;

namespace NetSolve.Tests.Hardening.Fuzzing;

/// <summary>Runs a seeded series of inputs, the surfaces in turn, then minimises the first input of each failure class.</summary>
internal static class FuzzCampaign
{
    /// <summary>After this many runs that never ended the campaign stops: each leaves a run going in the background that cannot be stopped from here.</summary>
    private const int MostHangs = 3;

    /// <summary>Most failure classes minimised (each costs up to a hundred runs).</summary>
    private const int MostMinimised = 40;

    /// <summary>Runs <paramref name="count"/> inputs from <paramref name="seed"/>.</summary>
    /// <param name="count">Inputs to run.</param>
    /// <param name="seed">Seed of the generator: the same seed gives the same inputs, whatever the workers.</param>
    /// <param name="progress">Told every <paramref name="progressEvery"/> inputs how far the campaign is.</param>
    /// <param name="progressEvery">How often to report progress.</param>
    /// <param name="minimise">Whether to shorten the first input of each failure class.</param>
    /// <param name="workers">Inputs run at once (each run is in-process and has its own folder, so they do not meet).</param>
    /// <param name="timeLimit">No input is started after this long (null: none); the report counts the inputs run.</param>
    public static FuzzReport Run(int count, int seed, Action<string> progress, int progressEvery, bool minimise, int workers = 1, TimeSpan? timeLimit = null)
    {
        var clock = Stopwatch.StartNew();
        var generator = new InputGenerator(SeedFiles.Load(), seed);
        var report = new FuzzReport { Workers = workers };
        var gate = new Lock();
        var done = new SortedDictionary<int, (FuzzInput Input, FuzzOutcome Outcome)>();
        int taken = 0;
        int counted = 0;
        int hangs = 0;

        // Inputs are drawn in order under the lock, so input i is the same whatever the workers; outcomes are counted
        // in the same order, so the report (first example of each class included) is too.
        void Work()
        {
            while (true)
            {
                int i;
                FuzzInput input;
                lock (gate)
                {
                    if (taken >= count || hangs >= MostHangs || clock.Elapsed > timeLimit)
                    {
                        return;
                    }

                    i = taken++;
                    long before = Stopwatch.GetTimestamp();
                    input = generator.Next(InputGenerator.Surfaces[i % InputGenerator.Surfaces.Length]);
                    report.Generating += Stopwatch.GetElapsedTime(before);
                }

                var outcome = FuzzRunner.Run(input);
                lock (gate)
                {
                    hangs += outcome.ExitCode == -1 ? outcome.Findings.Count(finding => finding.Kind == FuzzFailureKind.Hang) : 0;
                    done.Add(i, (input, outcome));
                    while (done.Remove(counted, out var next))
                    {
                        report.Add(next.Input, next.Outcome);
                        counted++;
                        if (counted % progressEvery == 0)
                        {
                            progress(string.Create(CultureInfo.InvariantCulture,
                                $"{counted}/{count} inputs, {report.Failing.Values.Sum()} failing, {report.Classes.Count} classes, {clock.Elapsed.TotalSeconds:0} s")
                                + string.Concat(report.Classes.Select(entry => "\n  " + entry.Key.Kind + " x" + entry.Value.Count.ToString(CultureInfo.InvariantCulture) + ": " + entry.Key.Signature
                                    + " <- " + CliInvariant.Shorten(string.Join(' ', entry.Value.Example.Arguments)))));
                        }
                    }
                }
            }
        }

        var threads = Enumerable.Range(0, Math.Max(1, workers)).Select(_ => new Thread(Work) { IsBackground = true }).ToList();
        threads.ForEach(thread => thread.Start());
        threads.ForEach(thread => thread.Join());

        // After a stop on hangs, inputs finished beyond a gap are counted too.
        foreach (var (input, outcome) in done.Values)
        {
            report.Add(input, outcome);
        }

        if (minimise)
        {
            foreach (var (failureClass, seen) in report.Classes.Take(MostMinimised).ToList())
            {
                report.Classes[failureClass] = (seen.Count, Minimiser.Minimise(seen.Example, failureClass.Kind), seen.Finding);
            }
        }

        report.Elapsed = clock.Elapsed;
        return report;
    }
}

using System.Diagnostics;
using System.Globalization;

namespace NetSolve.Tests.Hardening.Fuzzing;

/// <summary>Runs a seeded series of inputs, the surfaces in turn, then minimises the first input of each failure class.</summary>
internal static class FuzzCampaign
{
    /// <summary>After this many hangs the campaign stops: each leaves a run going in the background that cannot be stopped from here.</summary>
    private const int MostHangs = 3;

    /// <summary>Most failure classes minimised (each costs up to a hundred runs).</summary>
    private const int MostMinimised = 40;

    /// <summary>Runs <paramref name="count"/> inputs from <paramref name="seed"/>.</summary>
    /// <param name="count">Inputs to run.</param>
    /// <param name="seed">Seed of the generator: the same seed gives the same inputs.</param>
    /// <param name="progress">Told every <paramref name="progressEvery"/> inputs how far the campaign is.</param>
    /// <param name="progressEvery">How often to report progress.</param>
    /// <param name="minimise">Whether to shorten the first input of each failure class.</param>
    public static FuzzReport Run(int count, int seed, Action<string> progress, int progressEvery, bool minimise)
    {
        var clock = Stopwatch.StartNew();
        var generator = new InputGenerator(SeedFiles.Load(), seed);
        var report = new FuzzReport();
        int hangs = 0;
        for (int i = 0; i < count && hangs < MostHangs; i++)
        {
            var input = generator.Next(InputGenerator.Surfaces[i % InputGenerator.Surfaces.Length]);
            var outcome = FuzzRunner.Run(input);
            report.Add(input, outcome);
            hangs += outcome.Findings.Count(finding => finding.Kind == FuzzFailureKind.Hang);
            if ((i + 1) % progressEvery == 0)
            {
                progress(string.Create(CultureInfo.InvariantCulture,
                    $"{i + 1}/{count} inputs, {report.Failing.Values.Sum()} failing, {report.Classes.Count} classes, {clock.Elapsed.TotalSeconds:0} s"));
            }
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

namespace NetSolve.Tests.Hardening.Fuzzing;

/// <summary>What a campaign saw, counted as it goes: inputs and exit codes per surface, failure classes with a first example, peaks and times.</summary>
internal sealed class FuzzReport
{
    /// <summary>Inputs run, per surface.</summary>
    public Dictionary<FuzzSurface, int> Inputs { get; } = [];

    /// <summary>Runs by surface and exit code (-1: did not finish).</summary>
    public Dictionary<(FuzzSurface Surface, int ExitCode), int> ExitCodes { get; } = [];

    /// <summary>Inputs with at least one finding, per surface.</summary>
    public Dictionary<FuzzSurface, int> Failing { get; } = [];

    /// <summary>Inputs with a finding of each kind.</summary>
    public Dictionary<FuzzFailureKind, int> ByKind { get; } = [];

    /// <summary>Each failure class, how often it was seen and its first input (minimised once the campaign ends).</summary>
    public Dictionary<FailureClass, (int Count, FuzzInput Example, FuzzFinding Finding)> Classes { get; } = [];

    /// <summary>Largest working set seen during any run, in bytes.</summary>
    public long PeakWorkingSet { get; private set; }

    /// <summary>Longest single run.</summary>
    public TimeSpan Slowest { get; private set; }

    /// <summary>The surface and command of the longest single run.</summary>
    public string SlowestCommand { get; private set; } = string.Empty;

    /// <summary>Wall time of the whole campaign, minimising included.</summary>
    public TimeSpan Elapsed { get; set; }

    /// <summary>Per command, the inputs run and their summed run time: where a campaign's time goes.</summary>
    public Dictionary<string, (int Inputs, TimeSpan Time)> ByCommand { get; } = new(StringComparer.Ordinal);

    /// <summary>Wall time spent drawing inputs from the generator (one at a time, under the campaign's lock).</summary>
    public TimeSpan Generating { get; set; }

    /// <summary>Wall time around the runs, summed over the workers: writing files, checking outputs, removing folders.</summary>
    public TimeSpan Harness { get; private set; }

    /// <summary>Parallel workers the campaign ran inputs on.</summary>
    public int Workers { get; set; } = 1;

    /// <summary>Inputs run in all.</summary>
    public int Total => Inputs.Values.Sum();

    /// <summary>Counts one input and its outcome.</summary>
    public void Add(FuzzInput input, FuzzOutcome outcome)
    {
        Increment(Inputs, input.Surface);
        Increment(ExitCodes, (input.Surface, outcome.ExitCode));
        PeakWorkingSet = Math.Max(PeakWorkingSet, outcome.PeakWorkingSet);
        Harness += outcome.Harness;
        var (inputs, time) = ByCommand.GetValueOrDefault(input.Arguments[0]);
        ByCommand[input.Arguments[0]] = (inputs + 1, time + outcome.Elapsed);
        if (outcome.Elapsed > Slowest)
        {
            Slowest = outcome.Elapsed;
            SlowestCommand = input.Surface + ": " + input.Arguments[0];
        }

        if (outcome.Findings.Count == 0)
        {
            return;
        }

        Increment(Failing, input.Surface);
        foreach (var kind in outcome.Findings.Select(finding => finding.Kind).Distinct())
        {
            Increment(ByKind, kind);
        }

        foreach (var finding in outcome.Findings)
        {
            var failureClass = FailureClass.Of(finding);
            Classes[failureClass] = Classes.TryGetValue(failureClass, out var seen) ? (seen.Count + 1, seen.Example, seen.Finding) : (1, input, finding);
        }
    }

    private static void Increment<TKey>(Dictionary<TKey, int> counts, TKey key)
        where TKey : notnull => counts[key] = counts.GetValueOrDefault(key) + 1;
}

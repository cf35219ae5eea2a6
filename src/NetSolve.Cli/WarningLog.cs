using NetSolve.Diagnostics;

namespace NetSolve.Cli;

/// <summary>
/// Prints warnings on stderr, each line once however many files of one command repeat it, and at most
/// <see cref="ShownPerKind"/> of one kind from one file: a generated 100,000-unit file can carry tens of thousands of
/// the same warning (a bare service number on every unit), which would bury everything else and cost more time to
/// print than to solve. The rest of that kind is counted in one line.
/// </summary>
internal sealed class WarningLog(CliContext context)
{
    /// <summary>Warnings of one code shown from one list before the rest are summed up.</summary>
    internal const int ShownPerKind = 20;

    private readonly HashSet<string> _reported = new(StringComparer.Ordinal);

    /// <summary>Prints <paramref name="line"/> unless it was printed before.</summary>
    public void Report(string line)
    {
        if (_reported.Add(line))
        {
            context.Report(line);
        }
    }

    /// <summary>Prints the warnings of one file in order, the first <see cref="ShownPerKind"/> of each code, then one line per code for the rest.</summary>
    public void ReportAll(IEnumerable<Diagnostic> warnings, string file)
    {
        ArgumentNullException.ThrowIfNull(warnings);
        var shown = new Dictionary<string, int>(StringComparer.Ordinal);
        foreach (var warning in warnings)
        {
            int count = shown.GetValueOrDefault(warning.Code) + 1;
            shown[warning.Code] = count;
            if (count <= ShownPerKind)
            {
                Report(warning.ToString());
            }
        }

        foreach (var (code, count) in shown)
        {
            if (count > ShownPerKind)
            {
                Report(Messages.MoreWarnings(file, count - ShownPerKind, code));
            }
        }
    }
}

namespace NetSolve.Cli;

/// <summary>Prints warnings on stderr, each line once however many files of one command repeat it.</summary>
internal sealed class WarningLog(CliContext context)
{
    private readonly HashSet<string> _reported = new(StringComparer.Ordinal);

    /// <summary>Prints <paramref name="line"/> unless it was printed before.</summary>
    public void Report(string line)
    {
        if (_reported.Add(line))
        {
            context.Report(line);
        }
    }
}

namespace NetSolve.Cli;

/// <summary>Exit codes of the network file contract; anything else is a defect.</summary>
internal static class ExitCodes
{
    /// <summary>Solved (even with unstable units).</summary>
    public const int Success = 0;

    /// <summary>Invalid input: a bad file, value or override.</summary>
    public const int InvalidInput = 1;

    /// <summary>Wrong usage: unknown command or option, or a bad option value.</summary>
    public const int Usage = 2;

    /// <summary>A defect in NetSolve itself.</summary>
    public const int InternalError = 70;
}

namespace NetSolve.Cli.Settings;

/// <summary>
/// Wrong usage found after parsing, when a check needs the network (a bare number is in the file's time unit):
/// exit 2, one line per problem, each naming its option.
/// </summary>
internal sealed class UsageException : Exception
{
    public UsageException(IReadOnlyList<string> problems)
        : base(string.Join("\n", problems)) => Problems = problems;

    public UsageException(string message)
        : this([message])
    {
    }

    public UsageException()
        : this([])
    {
    }

    public UsageException(string message, Exception innerException)
        : base(message, innerException) => Problems = [message];

    /// <summary>Every problem, one line each, without the program's prefix.</summary>
    public IReadOnlyList<string> Problems { get; }
}

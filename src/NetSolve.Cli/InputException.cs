namespace NetSolve.Cli;

/// <summary>Bad input found by a command after parsing (for example an output path that cannot be written). Exit 1.</summary>
internal sealed class InputException : Exception
{
    public InputException(string message)
        : base(message)
    {
    }

    public InputException()
    {
    }

    public InputException(string message, Exception innerException)
        : base(message, innerException)
    {
    }
}

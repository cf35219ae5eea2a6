using NetSolve.Diagnostics;

namespace NetSolve.Parsing;

/// <summary>The text could not be read as YAML. Caught by <see cref="NetworkReader"/> and turned into a diagnostic.</summary>
public sealed class YamlReadException : Exception
{
    /// <summary>Creates the exception at a location.</summary>
    public YamlReadException(SourceLocation location, string message)
        : base(message)
    {
        Location = location;
    }

    /// <summary>Creates the exception.</summary>
    public YamlReadException()
    {
    }

    /// <summary>Creates the exception with a message.</summary>
    public YamlReadException(string message)
        : base(message)
    {
    }

    /// <summary>Creates the exception with a message and cause.</summary>
    public YamlReadException(string message, Exception innerException)
        : base(message, innerException)
    {
    }

    /// <summary>Where reading stopped.</summary>
    public SourceLocation Location { get; }
}

namespace NetSolve.Tests.Hardening.Fuzzing;

/// <summary>The classes of broken contract the harness tells apart.</summary>
internal enum FuzzFailureKind
{
    /// <summary>An exit code other than 0, 1 or 2 (70 is a caught defect; anything else an escaped exception).</summary>
    Crash,

    /// <summary>The run took longer than the hang limit.</summary>
    Hang,

    /// <summary>The process grew above the memory limit during the run.</summary>
    Memory,

    /// <summary>NaN or Infinity in stdout or a written file.</summary>
    NotFinite,

    /// <summary>An error that is not one plain line per problem: a stack trace, an exception's name, an empty line.</summary>
    ErrorShape,

    /// <summary>Raw control or direction override characters in stdout or stderr, or a spreadsheet formula in a CSV cell.</summary>
    UnsafeText,

    /// <summary>An output file neither absent, the old content, nor complete; or a temporary file left behind.</summary>
    PartialWrite,
}

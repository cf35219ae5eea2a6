namespace NetSolve.Tests.Hardening.Fuzzing;

/// <summary>Where a mutated input enters the program: each is fuzzed on its own so the summary can say which held.</summary>
internal enum FuzzSurface
{
    /// <summary>A mutated network file, given to a command that reads one.</summary>
    NetworkFile,

    /// <summary>A mutated scenario file over a bundled base network.</summary>
    ScenarioFile,

    /// <summary>Generated <c>--set</c> what-if expressions on a bundled network.</summary>
    WhatIf,

    /// <summary>A mutated movement log given to <c>fit</c>.</summary>
    MovementLog,

    /// <summary>Boundary and junk values for the options of every command.</summary>
    OptionValue,
}

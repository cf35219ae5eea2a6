namespace NetSolve.Tests.Hardening.Fuzzing;

/// <summary>What an option's value means, which decides the boundary values the fuzzer tries on it.</summary>
internal enum OptionKind
{
    /// <summary>One of a fixed set of words (<c>--format</c>, <c>--direction</c>).</summary>
    Choice,

    /// <summary>A fraction from 0 to 1, or a percentage (<c>--strain</c>, <c>--max-util</c>).</summary>
    Fraction,

    /// <summary>A positive number such as a growth factor or a cost.</summary>
    Number,

    /// <summary>A whole number with limits (<c>--steps</c>, <c>--budget</c>, <c>--threads</c>).</summary>
    WholeNumber,

    /// <summary>An unsigned 64-bit seed.</summary>
    Seed,

    /// <summary>A duration with its unit (<c>30min</c>) or a bare number in the file's time unit.</summary>
    Duration,

    /// <summary>A unit id of the network, or several joined by commas.</summary>
    Unit,

    /// <summary><c>UNIT=NUMBER</c> (<c>staff --cost</c>).</summary>
    UnitNumber,

    /// <summary>A what-if expression (<c>--set</c>).</summary>
    WhatIf,

    /// <summary>A file the command writes.</summary>
    OutputPath,

    /// <summary>Free text (a network name).</summary>
    Text,

    /// <summary>A switch without a value.</summary>
    Flag,
}

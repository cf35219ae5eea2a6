using System.CommandLine;

namespace NetSolve.Cli;

/// <summary>The <c>--set</c> option every command that reads a network takes: what-if changes without editing the file.</summary>
internal static class WhatIfOption
{
    /// <summary>The help text, shown by every command that takes the option.</summary>
    public const string Description =
        "What-if change, repeatable, applied in order: servers.UNIT=N|unlimited, servers.UNIT+=N, service.UNIT=25min, "
        + "service.UNIT*=0.9, arrivals.UNIT=12/h, arrivals.UNIT*=1.2, arrivals*=1.1 (every stream), route.FROM.TO=0.2 "
        + "(only that fraction changes; the patients leaving the network absorb the difference; over 1 in all is an error). "
        + "See docs/what-if.md.";

    /// <summary>Creates the option (a new instance per command, as System.CommandLine requires).</summary>
    public static Option<string[]> Create() => new("--set")
    {
        Description = Description,
        HelpName = "FIELD.UNIT=VALUE",
        Arity = ArgumentArity.ZeroOrMore,
        AllowMultipleArgumentsPerToken = false,
    };
}

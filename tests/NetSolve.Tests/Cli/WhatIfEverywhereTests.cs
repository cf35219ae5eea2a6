using NetSolve.Tests.Support;
using static NetSolve.Tests.Support.CliRun;

namespace NetSolve.Tests.Cli;

/// <summary>Every command that reads a network takes <c>--set</c> and reports a bad change the same way (issue: what-if on every command).</summary>
public sealed class WhatIfEverywhereTests
{
    private static readonly string Harbourside = TestFiles.Network("harbourside");

    public static TheoryData<string[]> Commands()
    {
        string output = Path.Combine(Path.GetTempPath(), "netsolve-whatif-" + Guid.NewGuid().ToString("N"));
        return new TheoryData<string[]>
        {
            new[] { "check", Harbourside },
            new[] { "solve", Harbourside },
            new[] { "growth", Harbourside },
            new[] { "staff", Harbourside, "--max-util", "0.9" },
            new[] { "pathway", Harbourside, "--from", "emergency" },
            new[] { "simulate", Harbourside, "-r", "2", "--duration", "2d", "--warmup", "0" },
            new[] { "map", Harbourside, "-o", output + ".svg" },
            new[] { "report", Harbourside, "-o", output + ".html" },
        };
    }

    [Theory]
    [MemberData(nameof(Commands))]
    public void A_change_to_an_unknown_unit_is_one_line_naming_the_nearest_unit_and_nothing_is_written(string[] args)
    {
        // Source: the what-if syntax and its error wording in docs/what-if.md.
        var (exitCode, output, error) = Run([.. args, "--set", "servers.wrd=320"]);

        Assert.Equal(1, exitCode);
        Assert.Equal(string.Empty, output);
        Assert.Equal("--set servers.wrd=320: unknown unit 'wrd'; did you mean 'ward'?", error.Split('\n', StringSplitOptions.RemoveEmptyEntries).Last());
        string? target = args.SkipWhile(arg => arg != "-o").Skip(1).FirstOrDefault();
        Assert.True(target is null || !File.Exists(target));
    }

    [Theory]
    [MemberData(nameof(Commands))]
    public void A_valid_change_shows_in_the_output(string[] args)
    {
        var (exitCode, output, _) = Run([.. args, "--set", "servers.ward=320"]);
        string? target = args.SkipWhile(arg => arg != "-o").Skip(1).FirstOrDefault();
        string shown = target is null ? output : File.ReadAllText(target);

        Assert.Equal(0, exitCode);
        if (args[0] != "check")
        {
            // Common practice: a what-if result says it is one; the changes travel in the network's name.
            Assert.Contains("what-if: servers.ward=320", shown, StringComparison.Ordinal);
        }

        if (target is not null)
        {
            File.Delete(target);
        }
    }
}

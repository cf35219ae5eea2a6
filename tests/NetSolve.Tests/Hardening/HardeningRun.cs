using NetSolve.Tests.Support;

namespace NetSolve.Tests.Hardening;

/// <summary>Runs the command line on hostile values and checks what every such run owes a planner.</summary>
internal static class HardeningRun
{
    /// <summary>The hint that closes every list of usage errors.</summary>
    public const string UsageHint = "Run 'netsolve --help' for usage.";

    /// <summary>
    /// Runs <paramref name="args"/> and asserts the exit code, no stack trace, no NaN or Infinity in the output, and
    /// the problem lines (without the usage hint); returns those lines.
    /// </summary>
    public static string[] Refused(int exitCode, params string[] args)
    {
        var (code, output, error) = CliRun.Run(args);
        Assert.Equal(exitCode, code);
        Assert.DoesNotContain("Exception", error, StringComparison.Ordinal);
        Assert.DoesNotContain("   at ", error, StringComparison.Ordinal);
        AssertFinite(output);
        Assert.Empty(output);
        string[] lines = error.Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries);
        if (exitCode == 2)
        {
            Assert.Equal(UsageHint, lines[^1]);
            return lines[..^1];
        }

        return lines;
    }

    /// <summary>Asserts that <paramref name="text"/> holds no non-finite number as .NET or JSON writers spell them.</summary>
    public static void AssertFinite(string text)
    {
        Assert.DoesNotContain("Infinity", text, StringComparison.Ordinal);
        Assert.DoesNotContain("NaN", text, StringComparison.Ordinal);
        Assert.DoesNotContain("\u221E", text, StringComparison.Ordinal);
    }

    /// <summary>Writes the Millbrook clinic with each change's text replaced into a fresh temporary file.</summary>
    public static string MillbrookWith(params (string From, string To)[] changes)
    {
        string text = File.ReadAllText(TestFiles.Network("millbrook-clinic"));
        foreach (var (from, to) in changes)
        {
            Assert.Contains(from, text, StringComparison.Ordinal);
            text = text.Replace(from, to, StringComparison.Ordinal);
        }

        string folder = Directory.CreateTempSubdirectory("netsolve-hardening-").FullName;
        string path = Path.Combine(folder, "millbrook.yaml");
        File.WriteAllText(path, text);
        return path;
    }
}

using NetSolve.Tests.Hardening.Fuzzing;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Hardening.Corpus;

/// <summary>
/// Runs one input of the crash corpus and checks the contract every input keeps (the fuzzing harness's
/// <see cref="CliInvariant"/>): exit 0, 1 or 2; one plain, located line per problem; no NaN or Infinity; no raw control characters.
/// </summary>
internal static class CorpusCase
{
    /// <summary>The folder of the corpus files in the source tree.</summary>
    public static string Folder { get; } = Path.Combine(Repository.Root, "tests", "NetSolve.Tests", "Hardening", "Corpus");

    /// <summary>A corpus file by name.</summary>
    public static string File(string name) => Path.Combine(Folder, name);

    /// <summary>Runs <paramref name="arguments"/>, asserts the contract and returns the result.</summary>
    /// <param name="arguments">The command line.</param>
    public static CliResult Run(string[] arguments)
    {
        var result = CliRun.Run(arguments);
        AssertKeepsContract(result, arguments);
        return result;
    }

    /// <summary>
    /// Asserts the contract on <paramref name="result"/>: no finding of the fuzzing harness, and on refusal at least
    /// one problem, each stderr line one located problem (a file with line and column, a whole file, or an option).
    /// </summary>
    public static void AssertKeepsContract(CliResult result, string[] arguments)
    {
        // Only small regular files are read back: a device such as /dev/zero reports no length and never ends.
        string given = string.Join('\n', arguments.Where(path => System.IO.File.Exists(path) && new FileInfo(path).Length is > 0 and < 1_000_000).Select(System.IO.File.ReadAllText));
        var findings = CliInvariant.Check(result, arguments, given);
        Assert.True(findings.Count == 0, string.Join('\n', findings.Select(finding => finding.Kind + ": " + finding.Detail)) + "\nstderr: " + CliInvariant.Shorten(result.Error));
        if (result.ExitCode != 0)
        {
            var lines = result.Error.TrimEnd('\n').Split('\n').Where(line => line != CliInvariant.UsageHint).ToArray();
            Assert.True(lines.Length > 0 && lines.All(line => CliInvariant.IsLocated(line, arguments) && !line.Contains("Exception", StringComparison.Ordinal)),
                "expected one located problem per stderr line, got:\n" + result.Error);
        }
    }

    /// <summary>Runs a command that writes <paramref name="outputName"/> in a fresh temporary folder and checks the file too.</summary>
    public static CliResult RunWriting(Func<string, string[]> arguments, string outputName, Action<string>? inspect = null)
    {
        var folder = Directory.CreateTempSubdirectory("netsolve-corpus-");
        try
        {
            string output = Path.Combine(folder.FullName, outputName);
            string[] line = arguments(output);
            var result = Run(line);
            var strays = Directory.EnumerateFiles(folder.FullName).Where(path => !string.Equals(path, output, StringComparison.Ordinal));
            var findings = CliInvariant.CheckOutput(result.ExitCode, output, null, strays, string.Join('\n', line));
            Assert.True(findings.Count == 0, string.Join('\n', findings.Select(finding => finding.Kind + ": " + finding.Detail)));
            if (result.ExitCode == 0)
            {
                inspect?.Invoke(output);
            }

            return result;
        }
        finally
        {
            folder.Delete(recursive: true);
        }
    }
}

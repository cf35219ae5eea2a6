using System.Globalization;

namespace NetSolve.Tests.Hardening;

/// <summary>
/// The full reader refuses every text holding a character YAML 1.2 does not allow (YamlDotNet reads many of them).
/// The fast block reader rejects (by declining to YamlDotNet) whatever YamlDotNet rejects, on mutated copies of real
/// files, and gives the same tree when both accept.
/// Reference: YamlDotNet's parser, an outside implementation of YAML 1.2 (YAML 1.2.2 specification, chapters 5 to 8).
/// </summary>
public sealed class YamlMutationTests(ITestOutputHelper output)
{
    [Fact]
    public void Four_hundred_mutated_files_read_as_YamlDotNet_reads_them()
    {
        var result = YamlDifferential.Run(400, 20261202);

        Assert.Empty(result.Disagreements);
        // The run is not vacuous: some mutations break the YAML and some keep it in the fast subset.
        Assert.True(result.ReferenceRejected > 20, string.Create(CultureInfo.InvariantCulture, $"only {result.ReferenceRejected} rejected"));
        Assert.True(result.FastAccepted > 100, string.Create(CultureInfo.InvariantCulture, $"only {result.FastAccepted} took the fast path"));
    }

    [Fact(Explicit = true)]
    [Trait("Category", "Long")]
    public void A_hundred_thousand_mutated_files_read_as_YamlDotNet_reads_them()
    {
        var result = YamlDifferential.Run(100_000, 20261202);

        string summary = string.Create(CultureInfo.InvariantCulture,
            $"mutations 100000, YamlDotNet rejected {result.ReferenceRejected}, fast path taken {result.FastAccepted}, full reader rejected {result.FullReaderRejected}, YamlDotNet read a character YAML 1.2 refuses {result.NonPrintableYamlDotNetAccepted}, disagreements {result.Disagreements.Count}");
        output.WriteLine(summary);
        foreach (string disagreement in result.Disagreements.Take(30))
        {
            output.WriteLine(disagreement);
        }

        // The test runner shows output only for failures: the summary also goes to a file, for docs/network-file.md.
        File.WriteAllLines(Path.Combine(Path.GetTempPath(), "netsolve-yaml-mutations.txt"), [summary, .. result.Disagreements.Take(30)]);

        Assert.Empty(result.Disagreements);
    }
}

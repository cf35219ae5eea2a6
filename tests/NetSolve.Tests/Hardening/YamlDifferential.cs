using System.Globalization;
using NetSolve.Parsing;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Hardening;

/// <summary>
/// Runs mutated copies of the bundled networks, scenarios and test files through the fast reader and through
/// YamlDotNet, and counts where they part.
/// </summary>
internal static class YamlDifferential
{
    /// <summary>The YAML files mutated: every bundled network and scenario and every YAML test file.</summary>
    public static IReadOnlyList<byte[]> Seeds() =>
        [.. Directory.GetFiles(TestFiles.NetworksFolder, "*.yaml", SearchOption.AllDirectories)
            .Concat(Directory.GetFiles(Path.Combine(AppContext.BaseDirectory, "TestData"), "*.yaml", SearchOption.AllDirectories))
            .Order(StringComparer.Ordinal)
            .Select(File.ReadAllBytes)];

    /// <summary>
    /// Runs <paramref name="count"/> mutations with <paramref name="seed"/>; the returned disagreements are texts where
    /// YamlDotNet rejects but the fast reader accepts, where both accept with different trees, or where the full
    /// reader rejects without a located error.
    /// </summary>
    public static DifferentialResult Run(int count, int seed)
    {
        var seeds = Seeds();
        var random = new Random(seed);
        var result = new DifferentialResult();
        for (int i = 0; i < count; i++)
        {
            string text = YamlMutator.Mutate(seeds[random.Next(seeds.Count)], random);
            Check(text, result);
        }

        return result;
    }

    private static void Check(string text, DifferentialResult result)
    {
        string? reference = Outcome(() => LocatedYamlReader.ReadWithYamlDotNet(text, "f"), out bool referenceRejects);
        bool fastAccepts = BlockYamlReader.TryRead(text, "f", out var fast);
        if (referenceRejects)
        {
            result.ReferenceRejected++;
        }

        if (fastAccepts)
        {
            result.FastAccepted++;
            if (referenceRejects)
            {
                result.Disagreements.Add("fast reader accepts what YamlDotNet rejects: " + Show(text));
            }
            else if (!string.Equals(reference, YamlTreeText.Of(fast), StringComparison.Ordinal))
            {
                result.Disagreements.Add("different trees: " + Show(text));
            }
        }

        try
        {
            LocatedYamlReader.Read(text, "f");
        }
        catch (YamlReadException exception) when (exception.Location.Line >= 1 && exception.Location.Column >= 1 && exception.Message.Length > 0)
        {
            result.FullReaderRejected++;
        }
        catch (Exception exception) when (exception is not YamlReadException)
        {
            result.Disagreements.Add("unexpected " + exception.GetType().Name + ": " + Show(text));
        }
    }

    private static string? Outcome(Func<YamlNode?> read, out bool rejects)
    {
        try
        {
            rejects = false;
            return YamlTreeText.Of(read());
        }
        catch (YamlReadException)
        {
            rejects = true;
            return null;
        }
    }

    private static string Show(string text) =>
        string.Concat(text.Select(c => c is < ' ' or > '~' ? string.Create(CultureInfo.InvariantCulture, $"\\u{(int)c:X4}") : c.ToString()));
}

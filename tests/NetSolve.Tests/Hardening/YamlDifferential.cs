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

        bool printable = IsPrintable(text);
        if (!printable && !referenceRejects)
        {
            result.NonPrintableYamlDotNetAccepted++;
        }

        try
        {
            LocatedYamlReader.Read(text, "f");
            if (!printable)
            {
                result.Disagreements.Add("a character YAML 1.2 does not allow is read: " + Show(text));
            }
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

    /// <summary>
    /// YAML 1.2's c-printable, written out here from the specification (YAML 1.2.2, section 5.1), independently
    /// of the product's own check; a byte order mark is allowed only at the start.
    /// </summary>
    private static bool IsPrintable(string text)
    {
        for (int i = 0; i < text.Length; i++)
        {
            int c = text[i];
            if (char.IsHighSurrogate(text[i]) && i + 1 < text.Length && char.IsLowSurrogate(text[i + 1]))
            {
                i++;
                continue;
            }

            bool allowed = c is 0x09 or 0x0A or 0x0D or (>= 0x20 and <= 0x7E) or 0x85 or (>= 0xA0 and <= 0xD7FF) or (>= 0xE000 and <= 0xFFFD);
            if (!allowed || (c == 0xFEFF && i > 0))
            {
                return false;
            }
        }

        return true;
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

using System.Text;
using NetSolve.Parsing;
using NetSolve.Tests.Hardening;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Core.Parsing;

/// <summary>
/// The fast block reader must give exactly the nodes and positions YamlDotNet gives, or decline.
/// Reference: YamlDotNet's parser (an outside implementation of YAML 1.1/1.2), run on the same text.
/// </summary>
public sealed class BlockYamlReaderTests
{
    private static readonly string[] Keys = ["units", "ward", "ed", "servers", "service", "a-b", "x_1", "routes", "label"];
    private static readonly string[] Values =
    [
        "3", "45min", "11.5 /h", "35 %", "unlimited", "\"quoted text\"", "'single'", "~", "null", "-2", "a#b",
        "text with  spaces", "1e400", ".nan", "x: y", "[1, 2]", "{a: 1}", "&anchor v", "*alias", "- item", "\"esc\\\"ape\"",
        "'it''s'", "!tag v", "| block", "value:", "Kestrel – Vale é", "\"unterminated", "a # comment",
    ];

    [Fact]
    public void Every_example_network_takes_the_fast_path_and_matches_YamlDotNet()
    {
        foreach (var path in Directory.GetFiles(TestFiles.NetworksFolder, "*.yaml", SearchOption.AllDirectories))
        {
            string text = File.ReadAllText(path);
            if (!text.Contains("\n  - ", StringComparison.Ordinal) && !text.Contains('[', StringComparison.Ordinal))
            {
                Assert.True(BlockYamlReader.TryRead(text, "f", out _), $"{path} should take the fast path");
            }

            AssertAgreesWithYamlDotNet(text);
        }
    }

    [Fact]
    public void Thousands_of_generated_documents_read_the_same_or_are_declined()
    {
        var random = new Random(20261201);
        int accepted = 0;
        for (int i = 0; i < 3000; i++)
        {
            string text = Generate(random);
            if (AssertAgreesWithYamlDotNet(text))
            {
                accepted++;
            }
        }

        // Most generated documents are in the subset, so the comparison is not vacuous.
        Assert.True(accepted > 500, FormattableString.Invariant($"only {accepted} documents took the fast path"));
    }

    [Theory]
    [InlineData("units:\n\tward: 1\n")]
    [InlineData("units:\n  - ward\n")]
    [InlineData("units: [a, b]\n")]
    [InlineData("name: a\n  b: 1\n")]
    [InlineData("---\nname: a\n")]
    [InlineData("name: |\n  text\n")]
    [InlineData("name: first\n  continued\n")]
    public void Declines_what_is_outside_the_block_subset(string text)
    {
        Assert.False(BlockYamlReader.TryRead(text, "f", out _));
    }

    private static bool AssertAgreesWithYamlDotNet(string text)
    {
        if (!BlockYamlReader.TryRead(text, "f", out var fast))
        {
            return false;
        }

        YamlNode? reference = LocatedYamlReader.ReadWithYamlDotNet(text, "f");
        Assert.Equal(YamlTreeText.Of(reference), YamlTreeText.Of(fast));
        return true;
    }

    private static string Generate(Random random)
    {
        var text = new StringBuilder();
        if (random.Next(4) == 0)
        {
            text.Append("# heading comment\n");
        }

        GenerateMapping(random, text, 0, 0);
        if (random.Next(3) == 0)
        {
            text.Append(random.Next(2) == 0 ? "\n" : "   \n# trailing\n");
        }

        return random.Next(5) == 0 ? text.ToString().Replace("\n", "\r\n", StringComparison.Ordinal) : text.ToString();
    }

    private static void GenerateMapping(Random random, StringBuilder text, int indent, int depth)
    {
        int count = random.Next(1, 4);
        for (int k = 0; k < count; k++)
        {
            text.Append(' ', indent).Append(Keys[random.Next(Keys.Length)]).Append(':');
            int choice = random.Next(10);
            if (depth < 3 && choice < 4)
            {
                text.Append(random.Next(4) == 0 ? "   # note\n" : "\n");
                if (random.Next(6) == 0)
                {
                    text.Append('\n');
                }

                GenerateMapping(random, text, indent + random.Next(1, 4), depth + 1);
            }
            else if (choice == 4)
            {
                text.Append(random.Next(2) == 0 ? "\n" : "  # empty\n");
            }
            else
            {
                text.Append(' ', random.Next(1, 3)).Append(Values[random.Next(Values.Length)]);
                text.Append(random.Next(5) == 0 ? "  # why\n" : random.Next(5) == 0 ? "  \n" : "\n");
            }
        }
    }

}

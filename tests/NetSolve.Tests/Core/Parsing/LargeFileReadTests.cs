using System.Globalization;
using System.Text;
using NetSolve.Diagnostics;
using NetSolve.Parsing;
using NetSolve.Tests.Hardening;

namespace NetSolve.Tests.Core.Parsing;

/// <summary>
/// A large file is read partly on a second core (the bare-number warnings beside the structure rules); its problems
/// must be the ones a small file with the same mistakes gets, at the places the mistakes were written (line numbers
/// counted by the test as it writes the file), in the same order.
/// </summary>
public sealed class LargeFileReadTests
{
    // Enough units for every part read aside (10,000 units), and over 1 M characters of text.
    private const int FillerUnits = 25_000;

    // Lines each filler unit takes under 'units', and before the routes (one more under 'arrivals'): what the
    // arrivals' and the routes' lines are moved down by, per filler.
    private const int LinesBeforeArrivals = 3;
    private const int LinesBeforeRoutes = 4;

    private const string Mistakes = """
        time_unit: hour
        units:
          a1:
            servers: 2
            service: 30min
          9bad:
            servers: 1
            service: 1h
          a1:
            servers: 3
            service: 1h
          b2:
            servers: 1
            service: 20min
        {0}arrivals:
          a1: 1/h
        {1}routes:
          a1:
            b3: 0.5
            b2: 1.5
          b2:
            a1: 0.7
            b2: 0.6
        {2}
        """;

    private const string BareNumbers = """
        time_unit: hour
        units:
          a1:
            servers: 2
            service: 30
          b2:
            servers: 1
            service: 0.5
        {0}arrivals:
          a1: 1/h
        {1}routes:
          a1:
            b2: 0.5
        {2}
        """;

    [Fact]
    public void A_large_file_has_the_same_errors_at_the_same_places_as_a_small_one()
    {
        AssertSameProblems(Mistakes, expectedErrors: 5);
    }

    [Fact]
    public void A_large_file_has_the_same_bare_number_warnings_as_a_small_one()
    {
        AssertSameProblems(BareNumbers, expectedErrors: 0);
    }

    /// <summary>Reference: YamlDotNet's parser (an outside implementation of YAML), run on the same large text.</summary>
    [Fact]
    public void A_large_file_gives_the_nodes_and_places_YamlDotNet_gives()
    {
        string text = "# a comment line first\n" + Fill(Mistakes, FillerUnits) + "# and one last\n";
        Assert.True(BlockYamlReader.TryRead(text, "n.yaml", out var fast));
        Assert.Equal(YamlTreeText.Of(LocatedYamlReader.ReadWithYamlDotNet(text, "n.yaml")), YamlTreeText.Of(fast));
    }

    [Fact]
    public void A_large_file_with_a_line_outside_the_block_subset_near_its_end_is_declined_as_a_whole()
    {
        string text = Fill(Mistakes, FillerUnits) + "journeys:\n  - a1\n";
        Assert.False(BlockYamlReader.TryRead(text, "n.yaml", out _));
    }

    private static void AssertSameProblems(string template, int expectedErrors)
    {
        var small = NetworkReader.ReadText(Fill(template, 0), "n.yaml").Diagnostics;
        string largeText = Fill(template, FillerUnits);
        var large = NetworkReader.ReadText(largeText, "n.yaml").Diagnostics;

        Assert.Equal(expectedErrors, small.Count(d => d.IsError));
        Assert.NotEmpty(small);
        var smallLines = Fill(template, 0).Split('\n').ToList();
        int arrivalsStart = smallLines.FindIndex(line => line.StartsWith("arrivals:", StringComparison.Ordinal)) + 1;
        int routesStart = smallLines.FindIndex(line => line.StartsWith("routes:", StringComparison.Ordinal)) + 1;
        var expected = small.Select(d => Shifted(d, d.Location.Line >= routesStart ? FillerUnits * LinesBeforeRoutes
            : d.Location.Line >= arrivalsStart ? FillerUnits * LinesBeforeArrivals : 0)).ToList();
        Assert.Equal(expected, large);
    }

    private static Diagnostic Shifted(Diagnostic diagnostic, int lines) =>
        diagnostic with { Location = diagnostic.Location with { Line = diagnostic.Location.Line + lines } };

    /// <summary>The template with the filler units put in: correct, each with its arrivals and one route.</summary>
    private static string Fill(string template, int fillers)
    {
        var units = new StringBuilder();
        var arrivals = new StringBuilder();
        var routes = new StringBuilder();
        for (int i = 0; i < fillers; i++)
        {
            string id = string.Create(CultureInfo.InvariantCulture, $"f{i:D5}");
            units.Append("  ").Append(id).Append(":\n    servers: 1\n    service: 1h\n");
            arrivals.Append("  ").Append(id).Append(": 0.1/h\n");
            routes.Append("  ").Append(id).Append(":\n    a1: 0.1\n");
        }

        return string.Format(CultureInfo.InvariantCulture, template.ReplaceLineEndings("\n") + "\n", units, arrivals, routes);
    }
}

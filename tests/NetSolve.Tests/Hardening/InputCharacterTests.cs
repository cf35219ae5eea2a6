using NetSolve.Diagnostics;
using NetSolve.Fitting;
using NetSolve.Parsing;

namespace NetSolve.Tests.Hardening;

/// <summary>
/// Control characters, noncharacters, lone surrogates and bidirectional formatting characters are refused wherever
/// they stand in a network file, scenario file or movement-log name, at their line and column.
/// </summary>
public sealed class InputCharacterTests
{
    private static string Network(string inLabel) =>
        "name: Test\nunits:\n  ward:\n    label: Ward " + inLabel + " one\n    servers: 2\n    service: 1h\narrivals:\n  ward: 1/h\n";

    // Source: YAML 1.2.2 specification (2021), section 5.1 "Character Set": c-printable excludes C0 controls other than
    // tab, line feed and carriage return, DEL, C1 controls other than U+0085, and U+FFFE/U+FFFF.
    [Theory]
    [InlineData('\u0000', "a NUL character (U+0000)")]
    [InlineData('\u0001', "the control character U+0001")]
    [InlineData('\u001B', "the control character U+001B")]
    [InlineData('\u007F', "the control character U+007F")]
    [InlineData('\u0080', "the control character U+0080")]
    [InlineData('\u009B', "the control character U+009B")]
    [InlineData('\uFFFE', "U+FFFE is not a character")]
    [InlineData('\uFFFF', "U+FFFF is not a character")]
    [InlineData('\uD800', "U+D800 is half of a surrogate pair")]
    [InlineData('\uDC00', "U+DC00 is half of a surrogate pair")]
    [InlineData('\uFEFF', "a byte order mark (U+FEFF) is allowed only at the start")]
    public void A_character_YAML_does_not_count_as_printable_is_refused_in_a_label(char character, string expected)
    {
        AssertRefusedAt(Network(character.ToString()), 4, 17, expected);
    }

    // Source: Unicode Standard Annex #9, Unicode Bidirectional Algorithm, section 2 (explicit formatting characters
    // U+202A-U+202E and U+2066-U+2069; implicit marks U+200E, U+200F, U+061C). Why: Boucher and Anderson,
    // "Trojan Source: Invisible Vulnerabilities", 2021, sections 3-4 (stored order differs from displayed order).
    [Theory]
    [InlineData('\u202A')]
    [InlineData('\u202B')]
    [InlineData('\u202C')]
    [InlineData('\u202D')]
    [InlineData('\u202E')]
    [InlineData('\u2066')]
    [InlineData('\u2067')]
    [InlineData('\u2068')]
    [InlineData('\u2069')]
    [InlineData('\u200E')]
    [InlineData('\u200F')]
    [InlineData('\u061C')]
    public void A_bidirectional_formatting_character_is_refused_in_a_label(char character)
    {
        AssertRefusedAt(Network(character.ToString()), 4, 17, "bidirectional formatting character");
    }

    [Fact]
    public void A_bidirectional_override_in_a_unit_id_is_refused_at_its_column()
    {
        AssertRefusedAt("units:\n  wa\u202Erd:\n    servers: 1\n", 2, 5, "U+202E");
    }

    [Fact]
    public void A_raw_tab_inside_a_value_is_refused_at_its_column()
    {
        // Exact by hand: "    label: Ward" is 15 characters, so the tab is column 16.
        AssertRefusedAt(Network("\t").Replace("Ward \t", "Ward\t", StringComparison.Ordinal), 4, 16, "a tab inside a key or value");
    }

    [Fact]
    public void A_raw_tab_inside_a_quoted_value_is_refused_at_its_column()
    {
        AssertRefusedAt("name: \"a\tb\"\n", 1, 9, "a tab inside a key or value");
    }

    [Fact]
    public void A_tab_in_a_comment_or_between_key_and_value_is_fine()
    {
        var root = LocatedYamlReader.Read("name:\tx   #\tnote\n", "f");

        Assert.Equal("x", root!.Value.AsMapping!.Value.Find("name")!.Value.AsScalar!.Value.Value);
    }

    [Fact]
    public void Letters_from_right_to_left_scripts_and_characters_beyond_the_basic_plane_are_fine()
    {
        var root = LocatedYamlReader.Read("name: \u05D0\u05D1 \u0627\u0644 \U0001F3E5 caf\u00E9\n", "f");

        Assert.Equal("\u05D0\u05D1 \u0627\u0644 \U0001F3E5 caf\u00E9", root!.Value.AsMapping!.Value.Find("name")!.Value.AsScalar!.Value.Value);
    }

    [Fact]
    public void A_refused_character_in_a_comment_is_refused_too()
    {
        // YAML 1.2 refuses it anywhere; a hidden override in a comment misleads a reviewer as much as one in a label.
        AssertRefusedAt("# note \u202E\nname: x\n", 1, 8, "U+202E");
    }

    [Fact]
    public void An_implicit_key_longer_than_1024_characters_is_refused_with_its_place()
    {
        // Source: YAML 1.2.2 specification, section 7.4.2 (implicit keys are restricted to 1024 Unicode characters).
        string text = new string('k', 1025) + ": 1\n";

        Assert.False(BlockYamlReader.TryRead(text, "f", out _));
        var exception = Assert.Throws<YamlReadException>(() => LocatedYamlReader.Read(text, "f"));
        Assert.Equal(1, exception.Location.Line);
    }

    [Theory]
    [InlineData("ward\u202E", 8, "unit: the bidirectional formatting character U+202E")]
    [InlineData("wa\u0000rd", 6, "unit: a NUL character (U+0000)")]
    [InlineData("wa\trd", 6, "unit: a tab is not allowed in a name")]
    public void A_movement_log_unit_name_gets_the_same_character_rules(string unit, int column, string expected)
    {
        string log = $"patient,unit,arrived,left\nP1,{unit},2026-03-02T08:00,2026-03-02T09:00\n";

        var (read, diagnostics) = MovementLogReader.Read(log, "log.csv");

        Assert.Null(read);
        var problem = Assert.Single(diagnostics);
        Assert.Equal(DiagnosticCodes.BadText, problem.Code);
        // Exact by hand: "P1," is three characters, so the unit cell starts at column 4 and its third character is column 6.
        Assert.Equal((2, column), (problem.Location.Line, problem.Location.Column));
        Assert.StartsWith(expected, problem.Message, StringComparison.Ordinal);
    }

    private static void AssertRefusedAt(string text, int line, int column, string expected)
    {
        var result = NetworkReader.ReadText(text, "net.yaml");

        Assert.Null(result.Network);
        var problem = Assert.Single(result.Diagnostics);
        Assert.Equal((line, column), (problem.Location.Line, problem.Location.Column));
        Assert.Contains(expected, problem.Message, StringComparison.Ordinal);
    }
}

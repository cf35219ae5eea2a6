using NetSolve.Presentation.Formats;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Hardening;

/// <summary>What <see cref="SafeText"/> shows in place of characters that must not reach a terminal, XML or DOT.</summary>
public class OutputSafeTextTests
{
    // Source: The Unicode Standard, chart "Control Pictures" (U+2400 to U+243F): U+2400 + n pictures C0 control n, U+2421 DEL.
    [Theory]
    [InlineData("a\0b", "a\u2400b")]
    [InlineData("a\u001Bb", "a\u241Bb")]
    [InlineData("a\u007Fb", "a\u2421b")]
    [InlineData("a\tb\r\nc", "a b  c")]
    [InlineData("a\u0085b", "a\uFFFDb")]
    [InlineData("a\uFFFEb", "a\uFFFDb")]
    [InlineData("a\u202Eb\u2066c", "a\uFFFDb\uFFFDc")]
    public void Unsafe_characters_are_shown_as_visible_symbols(string text, string expected) =>
        Assert.Equal(expected, SafeText.ForDisplay(text));

    [Fact]
    public void An_unpaired_surrogate_is_replaced_and_a_pair_is_kept() =>
        Assert.Equal("a\uFFFDb\U0001F3E5", SafeText.ForDisplay("a" + (char)0xD800 + "b\U0001F3E5"));

    [Theory]
    [InlineData("Reception and triage")]
    [InlineData("Unité de soins intensifs")]
    [InlineData("病棟 \U0001F3E5")]
    public void Ordinary_text_is_returned_as_it_is(string text) => Assert.Same(text, SafeText.ForDisplay(text));

    [Fact]
    public void The_terminal_keeps_line_feeds_and_loses_escapes()
    {
        Assert.Equal("row one\nrow \u241B[2Jtwo\n", SafeText.ForTerminal("row one\nrow \u001B[2Jtwo\n"));
    }

    [Fact]
    public void Solve_prints_no_escape_character_to_the_terminal()
    {
        string path = Path.Combine(Path.GetTempPath(), FormattableString.Invariant($"netsolve-esc-{Environment.ProcessId}.yaml"));
        File.WriteAllText(path, "name: \"Invented clinic \\e[2J\"\nunits:\n  reception:\n    servers: 2\n    service: 5min\narrivals:\n  reception: 10/h\n");
        try
        {
            var result = CliRun.Run("solve", path);

            Assert.DoesNotContain('\u001B', result.Out);
        }
        finally
        {
            File.Delete(path);
        }
    }
}

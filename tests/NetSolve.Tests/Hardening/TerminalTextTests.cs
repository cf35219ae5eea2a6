using NetSolve.Diagnostics;

namespace NetSolve.Tests.Hardening;

/// <summary>The one escaping rule of messages: what a terminal could act on is named, everything else kept.</summary>
public sealed class TerminalTextTests
{
    [Theory]
    [InlineData("a\u001B[2Jb", "a\\u001B[2Jb")]
    [InlineData("out.svg\0", "out.svg\\u0000")]
    [InlineData("\u202Egnp.exe", "\\u202Egnp.exe")]
    [InlineData("x\u2066y\u2069", "x\\u2066y\\u2069")]
    [InlineData("bell\u0007", "bell\\u0007")]
    [InlineData("tab\there", "tab\\u0009here")]
    [InlineData("cr\rlf\n", "cr\\u000Dlf\\u000A")]
    [InlineData("del\u007F c1\u009B", "del\\u007F c1\\u009B")]
    public void A_character_the_terminal_could_act_on_is_written_as_its_code(string text, string expected) =>
        Assert.Equal(expected, TerminalText.Quote(text));

    [Fact]
    public void A_non_character_and_half_a_surrogate_pair_are_written_as_their_codes() =>
        Assert.Equal("\\uFFFE\\uD800x", TerminalText.Quote(new string(['\uFFFE', '\uD800', 'x'])));

    [Theory]
    [InlineData("unit 'lab': service: 'abc' is not a duration")]
    [InlineData("Station thérapeutique, 病棟 \U0001F3E5")]
    [InlineData("")]
    public void Plain_text_other_scripts_and_emoji_are_kept_as_they_are(string text) =>
        Assert.Same(text, TerminalText.Quote(text));

    [Fact]
    public void A_message_of_several_lines_keeps_its_line_feeds_and_escapes_the_rest() =>
        Assert.Equal("a: \\u001B\nb: ok", TerminalText.Lines("a: \u001B\nb: ok"));

    [Fact]
    public void Escaping_twice_changes_nothing_more()
    {
        string once = TerminalText.Quote("\u001B\u202E\0");

        Assert.Equal(once, TerminalText.Quote(once));
    }
}

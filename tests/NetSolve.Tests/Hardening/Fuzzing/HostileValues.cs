namespace NetSolve.Tests.Hardening.Fuzzing;

/// <summary>The values a mutation puts in: extremes of a double, huge integers, control and bidirectional characters, hostile labels.</summary>
internal static class HostileValues
{
    /// <summary>Numbers at and past the edges of what a double or an int holds, and the spellings of not-a-number.</summary>
    public static readonly string[] Numbers =
    [
        "0", "-0", "0.0", "-1", "1", "1e-320", "5e-324", "4.9e-324", "2.2250738585072014e-308", "1e-300", "1e-9",
        "1e300", "1e308", "1.7976931348623157e308", "1.8e308", "1e309", "1e400", "-1e308",
        "2147483647", "2147483648", "-2147483648", "9223372036854775807", "18446744073709551616",
        "99999999999999999999999999999999", ".nan", ".NaN", "nan", "NaN", ".inf", "-.inf", "+.inf", "inf", "Infinity",
        "0x1F", "1_000", "1,5", "1e", "e5", ".", "-", "+", "1..2", "١٢", "\uFF11",
    ];

    /// <summary>Suffixes a number may carry in the file: time units, rates, percentages, factors, and wrong ones.</summary>
    public static readonly string[] Suffixes = ["", "min", "h", "d", "/h", "/d", "/min", "%", "x", "s", "w", " h", "hours", "/", "%%"];

    /// <summary>Characters that have no business in a label: controls, the byte-order mark, non-characters and bidirectional overrides.</summary>
    public static readonly string[] Characters =
    [
        "\0", "\u0001", "\u0007", "\b", "\t", "\r", "\u000B", "\u000C", "\u001B", "\u001B[31m", "\u007F", "\u0085", "\u00A0",
        "\u200B", "\u200E", "\u202A", "\u202E", "\u2066", "\u2069", "\uFEFF", "\uFFFE", "\uFFFF", "\uD800", "\uDC00",
        "\"", "'", "<", ">", "&", "]]>", "#", ":", "- ", "{", "[", "*", "|", "\\",
    ];

    /// <summary>Labels and names a spreadsheet, a browser or a terminal might act on.</summary>
    public static readonly string[] Labels =
    [
        "=HYPERLINK(\"http://example.invalid\",\"x\")", "+cmd|' /C calc'!A0", "-2+3", "@SUM(A1:A9)", "\t=1+1", "\r=1+1",
        "<script>alert(1)</script>", "</svg><svg onload=alert(1)>", "a\"b'c", "&amp;&lt;", "${x}", "%s%n", "../../etc",
        "NUL\0byte", "esc\u001B]0;title\u0007", "rtl\u202Egnp.exe", "\uFFFEmark", "", " ",
    ];

    /// <summary>Junk any option value might be given.</summary>
    public static readonly string[] Junk =
    [
        "", " ", "abc", "-", "--", "--help", "-h", "NaN", "Infinity", "-Infinity", "∞", "1e308", "-1e308", "1e-320", "-0",
        "2147483648", "99999999999999999999", "85%", "1,5", "0x10", "\0", "\u202E1", "\u001B[2J", "true", "null", "~",
    ];

    /// <summary>A label of <paramref name="length"/> characters.</summary>
    public static string LongLabel(int length) => new('W', length);
}

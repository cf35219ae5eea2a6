using System.Globalization;

namespace NetSolve.Parsing;

/// <summary>
/// The characters no input text may hold: control characters that YAML 1.2 does not count as printable, the
/// noncharacters U+FFFE and U+FFFF, unpaired surrogates, a byte order mark after the start, and the bidirectional
/// formatting characters that can make a label or id read in a misleading order.
/// </summary>
/// <remarks>
/// Printable characters: YAML 1.2.2 specification, section 5.1 (c-printable: tab, line feed, carriage return,
/// U+0020–U+007E, U+0085, U+00A0–U+D7FF, U+E000–U+FFFD and beyond the BMP). Bidirectional formatting characters:
/// Unicode Standard Annex #9, section 2 (explicit embeddings, overrides and isolates U+202A–U+202E, U+2066–U+2069;
/// implicit marks U+200E, U+200F, U+061C). Why they are refused, not only shown: Boucher and Anderson, "Trojan
/// Source: Invisible Vulnerabilities", 2021, show text whose displayed order differs from its stored order.
/// </remarks>
public static class InputCharacters
{
    /// <summary>The index of the first refused character in <paramref name="text"/>, or -1; tab, line feed and carriage return are allowed.</summary>
    public static int FindRefused(ReadOnlySpan<char> text)
    {
        int i = 0;
        while (i < text.Length)
        {
            // Most text is printable ASCII: skip it in one vectorised search.
            int next = text[i..].IndexOfAnyExceptInRange(' ', '~');
            if (next < 0)
            {
                return -1;
            }

            i += next;
            if (IsRefused(text, i))
            {
                return i;
            }

            i += char.IsHighSurrogate(text[i]) ? 2 : 1;
        }

        return -1;
    }

    /// <summary>Why the character at <paramref name="index"/> is refused, worded for a diagnostic.</summary>
    public static string Describe(ReadOnlySpan<char> text, int index)
    {
        char c = text[index];
        string code = string.Create(CultureInfo.InvariantCulture, $"U+{(int)c:X4}");
        return c switch
        {
            '\0' => "a NUL character (U+0000) is not allowed",
            _ when IsBidiControl(c) => $"the bidirectional formatting character {code} is not allowed: it can make text read in a misleading order",
            '\uFEFF' => "a byte order mark (U+FEFF) is allowed only at the start of the file",
            _ when char.IsSurrogate(c) => $"{code} is half of a surrogate pair without its other half",
            '\uFFFE' or '\uFFFF' => $"{code} is not a character",
            _ => $"the control character {code} is not allowed",
        };
    }

    private static bool IsRefused(ReadOnlySpan<char> text, int i)
    {
        char c = text[i];
        if (c is '\t' or '\n' or '\r' or '\u0085')
        {
            return false;
        }

        if (c < ' ' || c is (>= '\u007f' and <= '\u009f') or '\uFFFE' or '\uFFFF' or '\uFEFF' || IsBidiControl(c))
        {
            return true;
        }

        if (char.IsHighSurrogate(c))
        {
            return i + 1 >= text.Length || !char.IsLowSurrogate(text[i + 1]);
        }

        return char.IsLowSurrogate(c);
    }

    private static bool IsBidiControl(char c) => c is (>= '\u202A' and <= '\u202E') or (>= '\u2066' and <= '\u2069') or '\u200E' or '\u200F' or '\u061C';
}

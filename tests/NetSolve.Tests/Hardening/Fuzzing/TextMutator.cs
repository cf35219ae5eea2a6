using System.Text;
using System.Text.RegularExpressions;

namespace NetSolve.Tests.Hardening.Fuzzing;

/// <summary>
/// Seeded mutations of a text input (a network file, a scenario file, a movement log): each call applies one to
/// three of them, chosen by the generator, so the same seed always gives the same inputs.
/// </summary>
internal sealed partial class TextMutator(Random random, IReadOnlyList<string> keys)
{
    private delegate string Mutation(string text);

    /// <summary>One to three mutations of <paramref name="text"/>, as bytes (the last may break the UTF-8 on purpose).</summary>
    public byte[] Mutate(string text)
    {
        Mutation[] mutations =
        [
            ReplaceNumber, ReplaceNumber, ReplaceNumber, SwapTokens, DeleteLine, DuplicateLine, SwapLines, Reindent,
            InsertCharacter, ReplaceLabel, MisplaceKey, Truncate,
        ];
        // Mostly one mutation, so that many inputs get past the reader to the solver and the writers.
        int count = random.Next(3) == 0 ? 2 + random.Next(2) : 1;
        for (int i = 0; i < count; i++)
        {
            text = mutations[random.Next(mutations.Length)](text);
        }

        byte[] bytes = Encoding.UTF8.GetBytes(text);
        return random.Next(10) == 0 ? FlipBytes(bytes) : bytes;
    }

    private string Pick(IReadOnlyList<string> values) => values[random.Next(values.Count)];

    private string ReplaceNumber(string text)
    {
        var numbers = NumberPattern().Matches(text);
        if (numbers.Count == 0)
        {
            return text;
        }

        var number = numbers[random.Next(numbers.Count)];
        string replacement = Pick(HostileValues.Numbers) + (random.Next(3) == 0 ? Pick(HostileValues.Suffixes) : number.Groups["suffix"].Value);
        return string.Concat(text.AsSpan(0, number.Index), replacement, text.AsSpan(number.Index + number.Length));
    }

    private string SwapTokens(string text)
    {
        var tokens = TokenPattern().Matches(text);
        if (tokens.Count < 2)
        {
            return text;
        }

        var first = tokens[random.Next(tokens.Count)];
        var second = tokens[random.Next(tokens.Count)];
        if (first.Index > second.Index)
        {
            (first, second) = (second, first);
        }

        if (first.Index + first.Length > second.Index)
        {
            return text;
        }

        return string.Concat(text[..first.Index], second.Value, text[(first.Index + first.Length)..second.Index], first.Value, text[(second.Index + second.Length)..]);
    }

    private string DeleteLine(string text) => EditLines(text, (lines, at) => lines.RemoveAt(at));

    private string DuplicateLine(string text) => EditLines(text, (lines, at) => lines.Insert(at, lines[at]));

    private string SwapLines(string text) => EditLines(text, (lines, at) =>
    {
        int other = random.Next(lines.Count);
        (lines[at], lines[other]) = (lines[other], lines[at]);
    });

    private string Reindent(string text) => EditLines(text, (lines, at) =>
    {
        string line = lines[at];
        string trimmed = line.TrimStart(' ');
        lines[at] = random.Next(4) switch
        {
            0 => trimmed,
            1 => "\t" + line,
            2 => " " + line,
            _ => new string(' ', random.Next(1, 12)) + trimmed,
        };
    });

    private string InsertCharacter(string text)
    {
        int at = random.Next(text.Length + 1);
        return text.Insert(at, Pick(HostileValues.Characters));
    }

    private string ReplaceLabel(string text)
    {
        var values = ValuePattern().Matches(text);
        if (values.Count == 0)
        {
            return text;
        }

        var value = values[random.Next(values.Count)].Groups["value"];
        string label = random.Next(4) == 0 ? HostileValues.LongLabel(random.Next(3) == 0 ? 10_000 : 300) : Pick(HostileValues.Labels);
        return string.Concat(text.AsSpan(0, value.Index), label, text.AsSpan(value.Index + value.Length));
    }

    private string MisplaceKey(string text) => EditLines(text, (lines, at) =>
    {
        string indent = new(' ', 2 * random.Next(4));
        string value = random.Next(2) == 0 ? Pick(HostileValues.Numbers) : string.Empty;
        lines.Insert(at, indent + Pick(keys) + ": " + value);
    });

    private string Truncate(string text) => text.Length == 0 ? text : text[..random.Next(text.Length)];

    private byte[] FlipBytes(byte[] bytes)
    {
        if (bytes.Length == 0)
        {
            return bytes;
        }

        byte[] flipped = (byte[])bytes.Clone();
        int flips = 1 + random.Next(4);
        for (int i = 0; i < flips; i++)
        {
            int at = random.Next(flipped.Length);
            flipped[at] = random.Next(3) == 0 ? (byte)(0x80 + random.Next(0x80)) : (byte)(flipped[at] ^ (1 << random.Next(8)));
        }

        return flipped;
    }

    private string EditLines(string text, Action<List<string>, int> edit)
    {
        var lines = text.Split('\n').ToList();
        if (lines.Count == 0)
        {
            return text;
        }

        edit(lines, random.Next(lines.Count));
        return string.Join('\n', lines);
    }

    [GeneratedRegex(@"(?<![\w.])-?\d+(\.\d+)?([eE][-+]?\d+)?(?<suffix>min|h|d|/h|/d|/min|%)?", RegexOptions.CultureInvariant | RegexOptions.ExplicitCapture)]
    private static partial Regex NumberPattern();

    [GeneratedRegex(@"[^\s:,\[\]]+", RegexOptions.CultureInvariant)]
    private static partial Regex TokenPattern();

    [GeneratedRegex(@"(?:label|name|scenario):[ ]*(?<value>[^\n#]*)", RegexOptions.CultureInvariant)]
    private static partial Regex ValuePattern();
}

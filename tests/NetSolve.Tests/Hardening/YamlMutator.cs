using System.Text;

namespace NetSolve.Tests.Hardening;

/// <summary>
/// Seeded mutations of YAML files, the kinds a careless edit or a damaged copy makes: flipped bytes, deleted or
/// doubled lines, inserted tabs, colons, quotes, brackets and indents, and truncation.
/// </summary>
internal static class YamlMutator
{
    private static readonly string[] Insertions = ["\t", ":", ": ", "\"", "'", "[", "]", "{", "}", "  ", " ", "#", "- ", "-", "&", "*", "!", "|", ">", "?", "%", "@", "`", ",", "\\", "\n", "\r\n", " #"];

    /// <summary>One to three mutations of <paramref name="bytes"/>, decoded as UTF-8 with replacement (as a lenient reader would).</summary>
    public static string Mutate(byte[] bytes, Random random)
    {
        var data = new List<byte>(bytes);
        int count = random.Next(1, 4);
        for (int i = 0; i < count && data.Count > 0; i++)
        {
            MutateOnce(data, random);
        }

        return Encoding.UTF8.GetString([.. data]);
    }

    private static void MutateOnce(List<byte> data, Random random)
    {
        int at = random.Next(data.Count);
        switch (random.Next(6))
        {
            case 0:
                data[at] = (byte)(data[at] ^ (1 << random.Next(8)));
                break;
            case 1:
                var (start, end) = LineAround(data, at);
                data.RemoveRange(start, end - start);
                break;
            case 2:
                var (from, to) = LineAround(data, at);
                data.InsertRange(from, data.GetRange(from, to - from));
                break;
            case 3:
            case 4:
                data.InsertRange(at, Encoding.UTF8.GetBytes(Insertions[random.Next(Insertions.Length)]));
                break;
            default:
                data.RemoveRange(at, data.Count - at);
                break;
        }
    }

    /// <summary>The line holding byte <paramref name="at"/>, with its line break.</summary>
    private static (int Start, int End) LineAround(List<byte> data, int at)
    {
        int start = at;
        while (start > 0 && data[start - 1] != (byte)'\n')
        {
            start--;
        }

        int end = at;
        while (end < data.Count && data[end] != (byte)'\n')
        {
            end++;
        }

        return (start, Math.Min(end + 1, data.Count));
    }
}

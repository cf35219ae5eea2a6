namespace NetSolve.Diagnostics;

/// <summary>"Did you mean" suggestions by edit distance.</summary>
public static class NearestName
{
    /// <summary>The candidate closest to <paramref name="name"/>, if within about a third of its length (at least 1, at most 3 edits).</summary>
    public static string? Suggest(string name, IEnumerable<string> candidates)
    {
        ArgumentNullException.ThrowIfNull(name);
        ArgumentNullException.ThrowIfNull(candidates);
        int allowed = Math.Clamp(name.Length / 3, 1, 3);
        string? best = null;
        int bestDistance = int.MaxValue;
        foreach (var candidate in candidates)
        {
            int distance = Distance(name, candidate);
            if (distance <= allowed && distance < bestDistance)
            {
                best = candidate;
                bestDistance = distance;
            }
        }

        return best;
    }

    /// <summary>" did you mean 'x'?" or empty.</summary>
    public static string Hint(string name, IEnumerable<string> candidates) =>
        Suggest(name, candidates) is string best ? $"; did you mean '{best}'?" : string.Empty;

    /// <summary>Levenshtein distance with adjacent transpositions counted as one edit.</summary>
    public static int Distance(string a, string b)
    {
        ArgumentNullException.ThrowIfNull(a);
        ArgumentNullException.ThrowIfNull(b);
        var d = new int[a.Length + 1, b.Length + 1];
        for (int i = 0; i <= a.Length; i++)
        {
            d[i, 0] = i;
        }

        for (int j = 0; j <= b.Length; j++)
        {
            d[0, j] = j;
        }

        for (int i = 1; i <= a.Length; i++)
        {
            for (int j = 1; j <= b.Length; j++)
            {
                int cost = a[i - 1] == b[j - 1] ? 0 : 1;
                d[i, j] = Math.Min(Math.Min(d[i - 1, j] + 1, d[i, j - 1] + 1), d[i - 1, j - 1] + cost);
                if (i > 1 && j > 1 && a[i - 1] == b[j - 2] && a[i - 2] == b[j - 1])
                {
                    d[i, j] = Math.Min(d[i, j], d[i - 2, j - 2] + 1);
                }
            }
        }

        return d[a.Length, b.Length];
    }
}

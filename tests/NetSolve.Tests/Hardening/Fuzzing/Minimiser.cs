using System.Text;

namespace NetSolve.Tests.Hardening.Fuzzing;

/// <summary>
/// Shortens a failing input while it still fails the same way: drops options, then chunks of lines of each file,
/// halving the chunk down to one line (delta debugging), within a budget of runs.
/// </summary>
internal static class Minimiser
{
    /// <summary>Most runs spent on one input.</summary>
    private const int Budget = 120;

    /// <summary>The shortest input found that still breaks the contract with <paramref name="kind"/>.</summary>
    public static FuzzInput Minimise(FuzzInput input, FuzzFailureKind kind)
    {
        if (kind is FuzzFailureKind.Hang or FuzzFailureKind.Memory)
        {
            return input;
        }

        int runs = 0;
        bool StillFails(FuzzInput candidate)
        {
            runs++;
            return FuzzRunner.Run(candidate).Findings.Any(finding => finding.Kind == kind);
        }

        input = DropOptions(input, StillFails, () => runs < Budget);
        for (int file = 0; file < input.Files.Count; file++)
        {
            input = ShortenFile(input, file, StillFails, () => runs < Budget);
        }

        return input;
    }

    private static FuzzInput DropOptions(FuzzInput input, Func<FuzzInput, bool> stillFails, Func<bool> budgetLeft)
    {
        int at = 1;
        while (at < input.Arguments.Count && budgetLeft())
        {
            if (!input.Arguments[at].StartsWith('-'))
            {
                at++;
                continue;
            }

            int width = at + 1 < input.Arguments.Count && !input.Arguments[at + 1].StartsWith("--", StringComparison.Ordinal) ? 2 : 1;
            string[] arguments = [.. input.Arguments.Take(at), .. input.Arguments.Skip(at + width)];
            var candidate = input with { Arguments = arguments, OutputFile = CommandShapes.OutputFile(arguments) };
            if (stillFails(candidate))
            {
                input = candidate;
            }
            else
            {
                at += width;
            }
        }

        return input;
    }

    private static FuzzInput ShortenFile(FuzzInput input, int index, Func<FuzzInput, bool> stillFails, Func<bool> budgetLeft)
    {
        var lines = Encoding.UTF8.GetString(input.Files[index].Content).Split('\n').ToList();
        int chunk = Math.Max(1, lines.Count / 2);
        while (chunk >= 1 && budgetLeft())
        {
            bool removed = false;
            for (int start = 0; start < lines.Count && budgetLeft(); start += chunk)
            {
                var kept = lines.Take(start).Concat(lines.Skip(start + chunk)).ToList();
                var candidate = WithFile(input, index, kept);
                if (stillFails(candidate))
                {
                    (lines, input, removed) = (kept, candidate, true);
                    start -= chunk;
                }
            }

            if (!removed)
            {
                chunk /= 2;
            }
        }

        return input;
    }

    private static FuzzInput WithFile(FuzzInput input, int index, List<string> lines)
    {
        var files = input.Files.ToArray();
        files[index] = files[index] with { Content = Encoding.UTF8.GetBytes(string.Join('\n', lines)) };
        return input with { Files = files };
    }
}

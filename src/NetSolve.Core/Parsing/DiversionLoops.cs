using NetSolve.Diagnostics;

namespace NetSolve.Parsing;

/// <summary>
/// NS0204 for diversions: units that divert to each other in a loop are a diversion chain with no way out. When every
/// unit of the loop is full, a diverted patient has nowhere to go, and the formulas' fixed point has no meaning there.
/// </summary>
/// <remarks>Each loop is reported once, at the <c>when_full</c> value of its first unit in file order. Yields every loop.</remarks>
internal static class DiversionLoops
{
    public static void Check(IReadOnlyList<(string UnitId, string Target, SourceLocation Location)> diversions, List<Diagnostic> diagnostics)
    {
        var next = new Dictionary<string, string>(StringComparer.Ordinal);
        var order = new Dictionary<string, int>(StringComparer.Ordinal);
        foreach (var (unitId, target, _) in diversions)
        {
            next[unitId] = target;
            order.TryAdd(unitId, order.Count);
        }

        var reported = new HashSet<string>(StringComparer.Ordinal);
        foreach (var (unitId, _, location) in diversions)
        {
            var loop = LoopFrom(unitId, next);
            if (loop is null || loop.Min(id => order[id]) != order[unitId] || !reported.Add(unitId))
            {
                continue;
            }

            string chain = string.Join(" → ", loop.Append(unitId).Select(id => $"'{id}'"));
            diagnostics.Add(Diagnostic.Error(DiagnosticCodes.NoExit, location, unitId,
                $"when_full: a diversion chain with no way out ({chain}); when all of them are full a patient has nowhere to go, so let one of them turn patients away"));
        }
    }

    /// <summary>The units of the loop through <paramref name="start"/>, starting there; null when its chain ends.</summary>
    private static List<string>? LoopFrom(string start, Dictionary<string, string> next)
    {
        var path = new List<string> { start };
        string current = start;
        while (next.TryGetValue(current, out var target))
        {
            if (string.Equals(target, start, StringComparison.Ordinal))
            {
                return path;
            }

            if (path.Contains(target, StringComparer.Ordinal))
            {
                return null;
            }

            path.Add(target);
            current = target;
        }

        return null;
    }
}

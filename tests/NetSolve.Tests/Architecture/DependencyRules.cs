namespace NetSolve.Tests.Architecture;

/// <summary>Judges namespace references against a table of allowed dependencies.</summary>
/// <param name="allowed">For each namespace (with the namespaces inside it), the other namespaces it may use.</param>
internal sealed class DependencyRules(IReadOnlyDictionary<string, IReadOnlyList<string>> allowed)
{
    /// <summary>The row of the table that <paramref name="name"/> belongs to: the longest namespace it is or lies inside; null when none.</summary>
    public string? RowOf(string name) => allowed.Keys
        .Where(ns => string.Equals(name, ns, StringComparison.Ordinal) || name.StartsWith(ns + ".", StringComparison.Ordinal))
        .MaxBy(ns => ns.Length);

    /// <summary>One line per reference the table does not allow, each once, in order; empty when all are allowed.</summary>
    public IReadOnlyList<string> Violations(IEnumerable<NamespaceReference> references)
    {
        var lines = new List<string>();
        foreach (var reference in references)
        {
            string? from = RowOf(reference.FromNamespace);
            string? to = RowOf(reference.ToName);
            if (from is null)
            {
                lines.Add($"{reference.Where}: namespace {reference.FromNamespace} has no row in the table");
            }
            else if (to is null)
            {
                lines.Add($"{reference.Where}: {from} uses {reference.ToName}, which has no row in the table");
            }
            else if (!string.Equals(from, to, StringComparison.Ordinal) && !allowed[from].Contains(to, StringComparer.Ordinal))
            {
                lines.Add($"{reference.Where}: {from} uses {to} ({reference.ToName}); it may use only {Listed(allowed[from])}");
            }
        }

        return [.. lines.Distinct(StringComparer.Ordinal)];
    }

    private static string Listed(IReadOnlyList<string> namespaces) => namespaces.Count == 0 ? "itself" : "itself, " + string.Join(", ", namespaces);
}

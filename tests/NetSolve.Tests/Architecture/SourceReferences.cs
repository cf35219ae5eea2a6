using System.Text.RegularExpressions;

namespace NetSolve.Tests.Architecture;

/// <summary>
/// The NetSolve names a C# file uses, read from its text: <c>using</c> directives (plain, static, alias, global),
/// names written in full from <c>NetSolve.</c>, and names written from a part of NetSolve (<c>Solving.Tolerances</c>
/// inside <c>namespace NetSolve.Parsing</c>, which C# resolves against the enclosing <c>NetSolve</c>) when
/// <c>NetSolve.</c> and that name is a namespace or type of <c>knownNames</c>.
/// </summary>
/// <remarks>
/// Comments and the text of literals are left out first (<see cref="CodeText"/>). The using namespace is the one
/// the file declares; a file without one (top-level statements) belongs to <c>defaultNamespace</c>. Constants and
/// names in <c>nameof</c> are found here although compiled code does not show them.
/// </remarks>
internal static partial class SourceReferences
{
    /// <summary>Every NetSolve name used by <paramref name="text"/>, in order, with <c>where:line</c>.</summary>
    public static IEnumerable<NamespaceReference> Find(string where, string text, string defaultNamespace, IReadOnlySet<string> knownNames)
    {
        string code = CodeText.Blank(text);
        var declaration = NamespaceRegex().Match(code);
        string from = declaration.Success ? declaration.Groups["name"].Value : defaultNamespace;
        var found = new List<(int Index, string Name)>();
        foreach (Match match in UsingRegex().Matches(code))
        {
            found.Add((match.Index, match.Groups["name"].Value));
        }

        foreach (Match match in QualifiedRegex().Matches(code))
        {
            if (!(declaration.Success && match.Index == declaration.Groups["name"].Index))
            {
                found.Add((match.Index, match.Value.Replace("global::", string.Empty, StringComparison.Ordinal)));
            }
        }

        foreach (Match match in PartRegex().Matches(code))
        {
            string name = "NetSolve." + match.Groups["name"].Value;
            if (knownNames.Contains(name[..PrefixEnd(name)]) && !IsInside(declaration, match.Index))
            {
                found.Add((match.Index, name));
            }
        }

        return found
            .OrderBy(item => item.Index)
            .Select(item => new NamespaceReference(from, item.Name, FormattableString.Invariant($"{where}:{LineOf(code, item.Index)}")));
    }

    /// <summary>The namespace <paramref name="text"/> declares, or <paramref name="defaultNamespace"/> when it declares none.</summary>
    public static string DeclaredNamespace(string text, string defaultNamespace) =>
        NamespaceRegex().Match(CodeText.Blank(text)) is { Success: true } declaration ? declaration.Groups["name"].Value : defaultNamespace;

    private static bool IsInside(Match declaration, int index) =>
        declaration.Success && index >= declaration.Index && index < declaration.Index + declaration.Length;

    /// <summary>The end of <c>NetSolve.Part.Name</c>, the first two names after NetSolve.</summary>
    private static int PrefixEnd(string name)
    {
        int second = name.IndexOf('.', "NetSolve.".Length);
        int third = second < 0 ? -1 : name.IndexOf('.', second + 1);
        return third < 0 ? name.Length : third;
    }

    private static int LineOf(string code, int index) => 1 + code.AsSpan(0, index).Count('\n');

    [GeneratedRegex(@"^[ \t]*namespace[ \t]+(?<name>[\w.]+)", RegexOptions.Multiline | RegexOptions.CultureInvariant)]
    private static partial Regex NamespaceRegex();

    [GeneratedRegex(@"^[ \t]*(?:global[ \t]+)?using[ \t]+(?:static[ \t]+)?(?:\w+[ \t]*=[ \t]*)?(?:global::)?(?<name>NetSolve(?:\.\w+)*)[ \t]*;", RegexOptions.Multiline | RegexOptions.CultureInvariant)]
    private static partial Regex UsingRegex();

    [GeneratedRegex(@"(?<![\w.])(?:global::)?NetSolve(?:\.[A-Za-z_]\w*)+", RegexOptions.CultureInvariant)]
    private static partial Regex QualifiedRegex();

    [GeneratedRegex(@"(?<![\w.:])(?<name>[A-Z]\w*\.[A-Za-z_][\w.]*)", RegexOptions.CultureInvariant)]
    private static partial Regex PartRegex();
}

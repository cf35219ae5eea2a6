using System.Text.RegularExpressions;

namespace NetSolve.Tests.Architecture;

/// <summary>The NetSolve projects a project file references, as references a <see cref="DependencyRules"/> can judge.</summary>
internal static partial class ProjectReferences
{
    /// <summary>One reference per <c>ProjectReference</c> of <paramref name="projectText"/>, from <paramref name="project"/>.</summary>
    public static IEnumerable<NamespaceReference> Find(string project, string where, string projectText) =>
        ReferenceRegex().Matches(projectText)
            .Select(match => Path.GetFileNameWithoutExtension(match.Groups["path"].Value.Replace('\\', '/')))
            .Select(referenced => new NamespaceReference(project, referenced, where));

    [GeneratedRegex("<ProjectReference\\s+Include=\"(?<path>[^\"]+)\"", RegexOptions.CultureInvariant)]
    private static partial Regex ReferenceRegex();
}

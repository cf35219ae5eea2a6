using System.Reflection;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Architecture;

/// <summary>
/// The dependency direction of docs/architecture.md holds: every namespace uses only the namespaces its row allows,
/// in the source and in the compiled assemblies, and every project references only the projects its row allows.
/// </summary>
public class DependencyTests
{
    private static readonly DependencyRules NamespaceRules = new(AllowedDependencies.Namespaces);

    private static readonly DependencyRules ProjectRules = new(AllowedDependencies.Projects);

    private static readonly string Source = Path.Combine(Repository.Root, "src");

    [Fact]
    public void Every_source_file_under_src_uses_only_the_namespaces_its_row_allows()
    {
        var references = SourceFiles()
            .SelectMany(file => SourceReferences.Find(Repository.Relative(file.Path), File.ReadAllText(file.Path), file.Project, KnownNames.All))
            .ToList();

        Assert.True(references.Count > 300, $"only {references.Count} references were found: the tree was not read");
        AssertNone(NamespaceRules.Violations(references));
    }

    [Fact]
    public void Every_compiled_type_of_the_four_projects_uses_only_the_namespaces_its_row_allows()
    {
        // A type outside any namespace (top-level statements) belongs to its assembly, named as its project.
        var references = KnownNames.Assemblies
            .SelectMany(name => CompiledReferences.Find(Assembly.Load(name), name == "netsolve" ? "NetSolve.Cli" : name))
            .ToList();

        Assert.True(references.Count > 1000, $"only {references.Count} references were found in the assemblies");
        AssertNone(NamespaceRules.Violations(references));
    }

    [Fact]
    public void Every_project_under_src_references_only_the_projects_its_row_allows()
    {
        var projects = Directory.GetFiles(Source, "*.csproj", SearchOption.AllDirectories);
        var references = projects
            .SelectMany(path => ProjectReferences.Find(Path.GetFileNameWithoutExtension(path), Repository.Relative(path), File.ReadAllText(path)))
            .ToList();

        Assert.Equal(AllowedDependencies.Projects.Keys.Order(StringComparer.Ordinal), projects.Select(Path.GetFileNameWithoutExtension).Order(StringComparer.Ordinal));
        Assert.NotEmpty(references);
        AssertNone(ProjectRules.Violations(references));
    }

    [Fact]
    public void Every_namespace_declared_under_src_belongs_to_the_project_that_declares_it()
    {
        var misplaced = SourceFiles()
            .Select(file => (file, Row: NamespaceRules.RowOf(SourceReferences.DeclaredNamespace(File.ReadAllText(file.Path), file.Project))))
            .Where(item => item.Row is null || AllowedDependencies.ProjectOf(item.Row) != item.file.Project)
            .Select(item => $"{Repository.Relative(item.file.Path)}: namespace row {item.Row ?? "(none)"} is not of project {item.file.Project}")
            .ToList();

        AssertNone(misplaced);
    }

    [Fact]
    public void No_namespace_row_allows_a_use_that_its_project_may_not_reference()
    {
        var needed = AllowedDependencies.Namespaces.SelectMany(row => row.Value.Select(used =>
            new NamespaceReference(AllowedDependencies.ProjectOf(row.Key), AllowedDependencies.ProjectOf(used), $"{row.Key} -> {used}")));

        AssertNone(ProjectRules.Violations(needed));
    }

    [Fact]
    public void The_tables_in_docs_architecture_md_are_the_tables_this_test_checks()
    {
        string markdown = File.ReadAllText(Path.Combine(Repository.Root, "docs", "architecture.md"));

        Assert.Equal(Sorted(AllowedDependencies.Namespaces), Sorted(MarkdownTable.Read(markdown, "namespace")));
        Assert.Equal(Sorted(AllowedDependencies.Projects), Sorted(MarkdownTable.Read(markdown, "project")));
    }

    private static void AssertNone(IReadOnlyList<string> violations)
    {
        if (violations.Count > 0)
        {
            Assert.Fail($"{violations.Count} dependencies break docs/architecture.md:\n{string.Join('\n', violations)}");
        }
    }

    private static List<string> Sorted<TList>(IEnumerable<KeyValuePair<string, TList>> table)
        where TList : IEnumerable<string> =>
        [.. table.Select(row => $"{row.Key}: {string.Join(", ", row.Value.Order(StringComparer.Ordinal))}").Order(StringComparer.Ordinal)];

    /// <summary>Every C# file of the projects under src (build output left out), with the name of its project.</summary>
    private static IEnumerable<(string Path, string Project)> SourceFiles() =>
        from project in Directory.GetFiles(Source, "*.csproj", SearchOption.AllDirectories)
        let folder = Path.GetDirectoryName(project)!
        from file in Directory.GetFiles(folder, "*.cs", SearchOption.AllDirectories)
        let relative = Path.GetRelativePath(folder, file).Replace('\\', '/')
        where !relative.StartsWith("bin/", StringComparison.Ordinal) && !relative.StartsWith("obj/", StringComparison.Ordinal)
        select (file, Path.GetFileNameWithoutExtension(project));
}

using System.Reflection;

namespace NetSolve.Tests.Architecture;

/// <summary>The dependency checks catch a forbidden use planted in source, in compiled code and in a project file.</summary>
public class DependencyCheckTests
{
    private const string Where = "src/NetSolve.Core/Solving/Planted.cs";

    private static readonly DependencyRules Rules = new(AllowedDependencies.Namespaces);

    [Theory]
    [InlineData("using NetSolve.Analysis;\n\nnamespace NetSolve.Solving;\n", 1)]
    [InlineData("namespace NetSolve.Solving;\n\nusing static NetSolve.Analysis.StaffingSearch;\n", 3)]
    [InlineData("namespace NetSolve.Solving;\n\nusing Search = NetSolve.Analysis.StaffingSearch;\n", 3)]
    [InlineData("global using NetSolve.Analysis;\nnamespace NetSolve.Solving;\n", 1)]
    [InlineData("namespace NetSolve.Solving;\n\ninternal static class Planted\n{\n    public static object Use() => NetSolve.Analysis.StaffingSearch.MeetTargets(null!, null!);\n}\n", 5)]
    [InlineData("namespace NetSolve.Solving;\n\ninternal static class Planted\n{\n    public static object Use() => global::NetSolve.Analysis.StaffingSearch.MeetTargets(null!, null!);\n}\n", 5)]
    [InlineData("namespace NetSolve.Solving;\n\ninternal static class Planted\n{\n    public static object Use() => Analysis.StaffingSearch.MeetTargets(null!, null!);\n}\n", 5)]
    [InlineData("namespace NetSolve.Solving;\n\ninternal static class Planted\n{\n    public static string Use() => $\"at most {Analysis.StaffingSearch.Limit} servers\";\n}\n", 5)]
    [InlineData("namespace NetSolve.Solving;\n\ninternal static class Planted\n{\n    public const string Name = nameof(Analysis.StaffingSearch);\n}\n", 5)]
    public void A_forbidden_use_planted_in_a_source_file_is_reported_with_its_line(string text, int line)
    {
        var violations = Rules.Violations(SourceReferences.Find(Where, text, "NetSolve.Core", KnownNames.All));

        var violation = Assert.Single(violations);
        Assert.StartsWith(FormattableString.Invariant($"{Where}:{line}: NetSolve.Solving uses NetSolve.Analysis (NetSolve.Analysis"), violation, StringComparison.Ordinal);
        Assert.EndsWith("; it may use only itself, NetSolve.Model", violation, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("namespace NetSolve.Solving;\n\n// Analysis.StaffingSearch and NetSolve.Analysis are named in a comment only.\n")]
    [InlineData("namespace NetSolve.Solving;\n\n/// <summary>Unlike <c>NetSolve.Analysis</c>, /* Analysis.X */ this is a doc comment.</summary>\ninternal static class Planted;\n")]
    [InlineData("namespace NetSolve.Solving;\n\ninternal static class Planted\n{\n    public const string Text = \"NetSolve.Analysis and Analysis.StaffingSearch\";\n    public const string Verbatim = @\"Analysis.X \"\" NetSolve.Analysis\";\n    public const char Quote = '\"';\n}\n")]
    [InlineData("namespace NetSolve.Solving;\n\ninternal static class Planted\n{\n    public const string Raw = \"\"\"\n        NetSolve.Analysis \"\" Analysis.StaffingSearch\n        \"\"\";\n}\n")]
    [InlineData("using NetSolve.Model;\n\nnamespace NetSolve.Solving;\n\ninternal static class Planted\n{\n    public static int Use() => Model.Servers.MaxCount + NetSolve.Solving.Defaults.StrainThreshold.GetHashCode();\n}\n")]
    public void Names_in_comments_and_text_and_allowed_uses_are_not_reported(string text)
    {
        Assert.Empty(Rules.Violations(SourceReferences.Find(Where, text, "NetSolve.Core", KnownNames.All)));
    }

    [Fact]
    public void A_file_in_a_namespace_without_a_row_is_reported()
    {
        var violations = Rules.Violations(SourceReferences.Find(Where, "using NetSolve.Model;\n\nnamespace NetSolve.Planning;\n", "NetSolve.Core", KnownNames.All));

        Assert.Equal([$"{Where}:1: namespace NetSolve.Planning has no row in the table"], violations);
    }

    [Fact]
    public void Compiled_code_shows_uses_inside_method_bodies_and_lambdas_but_not_constants()
    {
        var types = new[] { typeof(PlantedDependencies) }.Concat(typeof(PlantedDependencies).GetNestedTypes(BindingFlags.Public | BindingFlags.NonPublic));
        var rules = new DependencyRules(new Dictionary<string, IReadOnlyList<string>>(StringComparer.Ordinal)
        {
            ["NetSolve.Tests.Architecture"] = [],
            ["NetSolve.Model"] = [],
            ["NetSolve.Solving"] = [],
        });

        var violations = rules.Violations(types.SelectMany(type => CompiledReferences.Of(type, "NetSolve.Tests")));

        Assert.Contains(violations, line => line.Contains("uses NetSolve.Model (NetSolve.Model.Servers)", StringComparison.Ordinal));
        Assert.Contains(violations, line => line.Contains("uses NetSolve.Solving (NetSolve.Solving.ErlangFormulas)", StringComparison.Ordinal));
        Assert.DoesNotContain(violations, line => line.Contains("Defaults", StringComparison.Ordinal));
    }

    [Fact]
    public void The_source_check_sees_the_constant_that_compiled_code_hides()
    {
        string path = Path.Combine(Support.Repository.Root, "tests", "NetSolve.Tests", "Architecture", "PlantedDependencies.cs");

        var names = SourceReferences.Find("PlantedDependencies.cs", File.ReadAllText(path), "NetSolve.Tests", KnownNames.All).Select(reference => reference.ToName);

        Assert.Contains("NetSolve.Solving.Defaults.StrainThreshold", names, StringComparer.Ordinal);
    }

    [Fact]
    public void A_project_reference_planted_in_the_core_project_file_is_reported()
    {
        const string Planted = "<Project Sdk=\"Microsoft.NET.Sdk\">\n  <ItemGroup>\n    <ProjectReference Include=\"../NetSolve.Presentation/NetSolve.Presentation.csproj\" />\n  </ItemGroup>\n</Project>\n";
        var rules = new DependencyRules(AllowedDependencies.Projects);

        var violations = rules.Violations(ProjectReferences.Find("NetSolve.Core", "src/NetSolve.Core/NetSolve.Core.csproj", Planted));

        Assert.Equal(["src/NetSolve.Core/NetSolve.Core.csproj: NetSolve.Core uses NetSolve.Presentation (NetSolve.Presentation); it may use only itself"], violations);
    }
}

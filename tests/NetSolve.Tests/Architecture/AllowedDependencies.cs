namespace NetSolve.Tests.Architecture;

/// <summary>
/// The dependency direction of docs/architecture.md, as data: which NetSolve namespaces each namespace may use and
/// which projects each project may reference. Anything not listed is forbidden; a namespace may always use itself
/// and the namespaces inside it.
/// </summary>
internal static class AllowedDependencies
{
    private const string Model = "NetSolve.Model";
    private const string Diagnostics = "NetSolve.Diagnostics";
    private const string Parsing = "NetSolve.Parsing";
    private const string Scenarios = "NetSolve.Scenarios";
    private const string Fitting = "NetSolve.Fitting";
    private const string Solving = "NetSolve.Solving";
    private const string Simulation = "NetSolve.Simulation";
    private const string Analysis = "NetSolve.Analysis";
    private const string Presentation = "NetSolve.Presentation";
    private const string Rendering = "NetSolve.Rendering";
    private const string Cli = "NetSolve.Cli";

    /// <summary>The namespaces of NetSolve.Core, bottom first.</summary>
    public static readonly IReadOnlyList<string> CoreNamespaces = [Model, Diagnostics, Parsing, Scenarios, Fitting, Solving, Simulation, Analysis];

    /// <summary>For each namespace (with the namespaces inside it), the other namespaces it may use.</summary>
    public static readonly IReadOnlyDictionary<string, IReadOnlyList<string>> Namespaces = new Dictionary<string, IReadOnlyList<string>>(StringComparer.Ordinal)
    {
        [Model] = [],
        [Diagnostics] = [],
        [Parsing] = [Model, Diagnostics],
        [Scenarios] = [Model, Diagnostics, Parsing],
        [Fitting] = [Model, Diagnostics, Parsing],
        [Solving] = [Model],
        [Simulation] = [Model],
        [Analysis] = [Model, Diagnostics, Solving, Simulation],
        [Presentation] = [.. CoreNamespaces],
        [Rendering] = [.. CoreNamespaces, Presentation],
        [Cli] = [.. CoreNamespaces, Presentation, Rendering],
    };

    /// <summary>For each project under src, the NetSolve projects it may reference.</summary>
    public static readonly IReadOnlyDictionary<string, IReadOnlyList<string>> Projects = new Dictionary<string, IReadOnlyList<string>>(StringComparer.Ordinal)
    {
        ["NetSolve.Core"] = [],
        ["NetSolve.Presentation"] = ["NetSolve.Core"],
        ["NetSolve.Rendering"] = ["NetSolve.Core", "NetSolve.Presentation"],
        ["NetSolve.Cli"] = ["NetSolve.Core", "NetSolve.Presentation", "NetSolve.Rendering"],
    };

    /// <summary>The project that holds each namespace of <see cref="Namespaces"/>.</summary>
    public static string ProjectOf(string ns) => CoreNamespaces.Contains(ns, StringComparer.Ordinal) ? "NetSolve.Core" : ns;
}

using System.Reflection;

namespace NetSolve.Tests.Architecture;

/// <summary>The full names of the NetSolve namespaces and their outermost types, read from the four assemblies under src.</summary>
/// <remarks>
/// The source check takes <c>Solving.Tolerances</c> for a use of <c>NetSolve.Solving</c> only when such a namespace or
/// type exists, so a member that happens to share a namespace's last name (a <c>Diagnostics</c> list) is no use.
/// </remarks>
internal static class KnownNames
{
    /// <summary>The assemblies of the projects under src, by assembly name (the command-line project builds netsolve).</summary>
    public static readonly IReadOnlyList<string> Assemblies = ["NetSolve.Core", "NetSolve.Presentation", "NetSolve.Rendering", "netsolve"];

    /// <summary>Every NetSolve namespace (with each namespace around it) and every outermost NetSolve type.</summary>
    public static IReadOnlySet<string> All { get; } = Read();

    private static HashSet<string> Read()
    {
        var names = new HashSet<string>(StringComparer.Ordinal);
        foreach (var type in Assemblies.SelectMany(name => Assembly.Load(name).GetTypes()))
        {
            if (type.IsNested || type.Namespace?.StartsWith("NetSolve", StringComparison.Ordinal) != true)
            {
                continue;
            }

            names.Add(type.FullName!.Split('`')[0]);
            string ns = type.Namespace;
            for (int dot = ns.Length; dot > 0; dot = ns.LastIndexOf('.', dot - 1))
            {
                names.Add(ns[..dot]);
            }
        }

        return names;
    }
}

using NetSolve.Model;
using NetSolve.Parsing;
using NetSolve.Solving;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Rendering;

/// <summary>Networks the rendering tests draw: the example files in networks/ and generated hospitals.</summary>
internal static class RenderingFixtures
{
    public static Network Example(string name)
    {
        var result = NetworkReader.ReadFile(TestFiles.Network(name));
        Assert.True(result.Network is not null, string.Join("\n", result.Diagnostics));
        return result.Network!;
    }

    public static NetworkSolution Solved(string name) => NetworkSolver.Solve(Example(name));

    public static NetworkSolution Generated(int units, int seed) => NetworkSolver.Solve(GeneratedHospital.Create(units, seed));

    /// <summary>A folder under the test output directory for files a person may want to look at.</summary>
    public static string OutputFolder()
    {
        string folder = Path.Combine(AppContext.BaseDirectory, "rendering-output");
        Directory.CreateDirectory(folder);
        return folder;
    }
}

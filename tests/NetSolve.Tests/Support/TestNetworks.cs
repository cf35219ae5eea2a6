using NetSolve.Model;
using NetSolve.Parsing;

namespace NetSolve.Tests.Support;

/// <summary>Reads network text or files for tests and fails the test with the diagnostics when invalid.</summary>
internal static class TestNetworks
{
    /// <summary>Every example network file name, for data-driven tests.</summary>
    public static TheoryData<string> ExampleFiles()
    {
        var data = new TheoryData<string>();
        foreach (var path in Directory.EnumerateFiles(TestFiles.NetworksFolder, "*.yaml").Order(StringComparer.Ordinal))
        {
            data.Add(Path.GetFileName(path));
        }

        return data;
    }

    public static Network Parse(string yaml, string fileName = "test.yaml")
    {
        var result = NetworkReader.ReadText(yaml, fileName);
        Assert.False(result.HasErrors, string.Join("\n", result.Diagnostics));
        return result.Network!;
    }

    public static Network Example(string fileName)
    {
        var result = NetworkReader.ReadFile(Path.Combine(TestFiles.NetworksFolder, fileName));
        Assert.False(result.HasErrors, string.Join("\n", result.Diagnostics));
        return result.Network!;
    }
}

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

    /// <summary>
    /// A bundled example with every service made exponential and every arrival stream Poisson: the Jackson network
    /// whose numbers the shared contract's example output shows (it predates the two-moment method).
    /// </summary>
    public static Network JacksonExample(string fileName)
    {
        var network = Example(fileName);
        return network with
        {
            Units = [.. network.Units.Select(unit => unit with { ServiceCv = 1.0, Service = null })],
            Arrivals = [.. network.Arrivals.Select(arrival => arrival with { Cv = 1.0 })],
        };
    }

    public static Network Example(string fileName)
    {
        var result = NetworkReader.ReadFile(Path.Combine(TestFiles.NetworksFolder, fileName));
        Assert.False(result.HasErrors, string.Join("\n", result.Diagnostics));
        return result.Network!;
    }
}

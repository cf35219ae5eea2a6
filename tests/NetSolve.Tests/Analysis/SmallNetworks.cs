using System.Collections.Immutable;
using NetSolve.Model;
using NetSolve.Parsing;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Analysis;

/// <summary>Networks for the analysis tests: small ones built in code, and the example files.</summary>
internal static class SmallNetworks
{
    /// <summary>An example network from networks/, read and validated.</summary>
    public static Network Example(string fileName)
    {
        var result = NetworkReader.ReadFile(Path.Combine(TestFiles.NetworksFolder, fileName));
        Assert.False(result.HasErrors, string.Join("\n", result.Diagnostics));
        return result.Network!;
    }

    /// <summary>A network of units in hours; each unit is (id, servers or 0 for unlimited, mean service hours).</summary>
    public static Network Build(
        (string Id, int Servers, double ServiceHours)[] units,
        (string Unit, double PerHour)[] arrivals,
        (string From, string To, double Probability)[]? routes = null) => new(
            "test",
            TimeUnit.Hour,
            [.. units.Select(u => new Unit(u.Id, u.Id, u.Servers == 0 ? Servers.Unlimited : Servers.Of(u.Servers), u.ServiceHours))],
            [.. arrivals.Select(a => new Arrival(a.Unit, a.PerHour))],
            (routes ?? []).Select(r => new Route(r.From, r.To, r.Probability)).ToImmutableArray());

    /// <summary>A folder of its own under the system temporary folder, for files a test writes.</summary>
    public static string TemporaryFolder() => Directory.CreateTempSubdirectory("netsolve-analysis-").FullName;
}

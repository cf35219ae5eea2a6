namespace NetSolve.Tests.Support;

/// <summary>Paths of the files the test project copies beside the test assembly: the bundled <c>networks/</c> and <c>TestData/</c>.</summary>
internal static class TestFiles
{
    /// <summary>The copy of the repository's <c>networks/</c> folder.</summary>
    public static string NetworksFolder => Path.Combine(AppContext.BaseDirectory, "networks");

    /// <summary>A bundled example network, by name without extension: <c>Network("harbourside")</c>.</summary>
    public static string Network(string name) => Path.Combine(NetworksFolder, name + ".yaml");

    /// <summary>A bundled scenario file under <c>networks/scenarios/</c>, by name without extension.</summary>
    public static string Scenario(string name) => Path.Combine(NetworksFolder, "scenarios", name + ".yaml");

    /// <summary>A bundled movement log under <c>networks/logs/</c>, by name without extension.</summary>
    public static string Log(string name) => Path.Combine(NetworksFolder, "logs", name + ".csv");

    /// <summary>A folder under <c>TestData/</c>, such as <c>Invalid</c> or <c>Warnings</c>.</summary>
    public static string TestDataFolder(string folder) => Path.Combine(AppContext.BaseDirectory, "TestData", folder);

    /// <summary>A file under <c>TestData/</c>.</summary>
    public static string TestData(string folder, string file) => Path.Combine(TestDataFolder(folder), file);
}

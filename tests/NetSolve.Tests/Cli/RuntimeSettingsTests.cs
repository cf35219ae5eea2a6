using System.Text.Json;

namespace NetSolve.Tests.Cli;

/// <summary>
/// The collector settings the command ships with, which its memory figures depend on (docs/performance.md, "Peak
/// memory of solve at 100,000 units, by output format"): the native build compiles these runtime settings in (they are
/// read as System.GC.* settings at start), the just-in-time build reads them from the same runtimeconfig.json.
/// </summary>
public sealed class RuntimeSettingsTests
{
    private static JsonElement Settings()
    {
        string path = Path.Combine(AppContext.BaseDirectory, "netsolve.runtimeconfig.json");
        using var document = JsonDocument.Parse(File.ReadAllText(path));
        return document.RootElement.GetProperty("runtimeOptions").GetProperty("configProperties").Clone();
    }

    // Measured (docs/performance.md): at level 7 the 100,000-unit JSON solve peaks at 184-191 MB whatever the first
    // generation's budget (4 to 96 MB, standing in for processor caches of any size); at level 3 at 226 MB, at 0 at
    // 298-348 MB, over the 300 MB goal; fit on 10 million rows at 893 MB against 1,315 MB at level 0 (goal 1 GB).
    [Fact]
    public void The_collector_conserves_memory_at_level_seven()
    {
        Assert.Equal(7, Settings().GetProperty("System.GC.ConserveMemory").GetInt32());
    }

    // Without background collections no second thread competes for a core with the work of a two-core machine.
    [Fact]
    public void The_collector_runs_no_background_collections()
    {
        Assert.False(Settings().GetProperty("System.GC.Concurrent").GetBoolean());
    }
}

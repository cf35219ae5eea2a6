using System.Globalization;
using NetSolve.Simulation;
using NetSolve.Solving;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Accuracy;

/// <summary>
/// The formula side of the accuracy study recomputed against the simulated waits stored in docs/methods.md's table
/// (four decimals): the simulation does not depend on the formulas, so a change to them is measured in seconds
/// instead of minutes. Explicit and Long like the study itself, because its expected counts follow the stored table:
/// <c>dotnet test --project tests/NetSolve.Tests -- --filter-trait "Category=Long" --explicit only --filter-class '*StoredSimulationAccuracyTests'</c>.
/// </summary>
[Trait("Category", "Long")]
public sealed class StoredSimulationAccuracyTests
{
    /// <summary>The units with a cv different from 1 that neither method brings closer than the exponential formula.</summary>
    private const string LoopedUnits = "generated-6/u3, generated-12/u1";

    // Source: the simulated waits of docs/methods.md ("Measured accuracy against the simulator": seed 2026, 10
    // replications of 50,000 h after 2,000 h). The decomposition must give the counts measured with the simulator
    // (119 of 124 within 15%, the two looped units not closer): a check that the stored waits stand for the run.
    // Variability functions, measured here: 121 of 124 within 15%, the same two units not closer (docs/methods.md,
    // "Published refinements tried on the two units not closer"). Markovian departures, measured here: 116 of 124, the
    // same two units not closer (same section). Indices of dispersion, measured here: 119 of 124, the same two units
    // and Harbourside's lab not closer (its arrival cv rises to 1.13 in a loop of exponential units; same section).
    [Theory(Explicit = true)]
    [InlineData(ArrivalVariabilityMethod.Decomposition, 119, LoopedUnits)]
    [InlineData(ArrivalVariabilityMethod.VariabilityFunctions, 121, LoopedUnits)]
    [InlineData(ArrivalVariabilityMethod.MarkovianDepartures, 116, LoopedUnits)]
    [InlineData(ArrivalVariabilityMethod.IndicesOfDispersion, 119, "harbourside/lab, " + LoopedUnits)]
    public void Formula_waits_against_the_stored_simulated_waits_give_the_measured_counts(ArrivalVariabilityMethod method, int measuredWithin, string notCloser)
    {
        var stored = StoredWaits();
        var rows = AccuracyStudy.Networks()
            .SelectMany(pair => AccuracyStudy.Rows(pair.Name, pair.Network, method,
                i => stored.TryGetValue((pair.Name, pair.Network.Units[i].Id), out var estimate) ? estimate : null))
            .ToList();
        var (table, counted, within, notBetter) = AccuracyStudy.Summarise(rows);
        File.WriteAllText(Path.Combine(AppContext.BaseDirectory, "stored-accuracy-" + method + ".md"), table);

        Assert.Equal(124, counted);
        Assert.Equal(measuredWithin, within);
        Assert.Equal(notCloser, string.Join(", ", notBetter.Select(row => row.Network + "/" + row.UnitId)));
    }

    /// <summary>The simulated mean wait and half-width of every row of the table in docs/methods.md, by network and unit.</summary>
    private static Dictionary<(string Network, string Unit), Estimate> StoredWaits()
    {
        var waits = new Dictionary<(string, string), Estimate>();
        foreach (string line in File.ReadLines(Path.Combine(Repository.Root, "docs", "methods.md")))
        {
            // | network | unit | servers | service | arrival cv | service cv | utilisation | simulated wait (h) | ...
            string[] cells = line.Split('|', StringSplitOptions.TrimEntries);
            string[] estimate = cells.Length >= 15 ? cells[8].Split('±', StringSplitOptions.TrimEntries) : [];
            if (estimate.Length == 2
                && double.TryParse(estimate[0], CultureInfo.InvariantCulture, out double mean)
                && double.TryParse(estimate[1], CultureInfo.InvariantCulture, out double halfWidth))
            {
                string unit = cells[2].Replace(" (tiny)", "", StringComparison.Ordinal);
                Assert.True(waits.TryAdd((cells[1], unit), new Estimate(mean, halfWidth, 10)), "twice in the table: " + cells[1] + "/" + unit);
            }
        }

        return waits;
    }
}

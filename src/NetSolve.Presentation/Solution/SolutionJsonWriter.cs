using System.Text.Json;
using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Solving;

namespace NetSolve.Presentation.Solution;

/// <summary>Writes a solution as the contract's JSON document (one document, units in file order).</summary>
public static class SolutionJsonWriter
{
    /// <summary>Writes <paramref name="solution"/> to <paramref name="output"/>, indented, UTF-8.</summary>
    public static void Write(NetworkSolution solution, Stream output)
    {
        ArgumentNullException.ThrowIfNull(solution);
        using var json = new Utf8JsonWriter(output, new JsonWriterOptions { Indented = true });
        Write(solution, json);
    }

    /// <summary>Writes <paramref name="solution"/> as one JSON object to <paramref name="json"/>.</summary>
    public static void Write(NetworkSolution solution, Utf8JsonWriter json)
    {
        ArgumentNullException.ThrowIfNull(solution);
        ArgumentNullException.ThrowIfNull(json);
        json.WriteStartObject();
        json.WriteString("network", solution.Network.Name);
        json.WriteString("time_unit", TimeConstants.Name(solution.Network.TimeUnit));
        json.WriteBoolean("stable", solution.IsStable);
        JsonTableWriter.WriteArray(UnitColumns.Table(solution), "units", json);
        var totals = TotalsColumns.Table(solution);
        json.WritePropertyName("totals");
        JsonTableWriter.WriteObject(totals, totals.Rows[0], json);
        if (!solution.Groups.IsEmpty)
        {
            GroupColumns.WriteArray(solution, json);
        }

        json.WriteEndObject();
        json.Flush();
    }
}

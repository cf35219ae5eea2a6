using System.Text;
using System.Text.Json;
using NetSolve.Fitting;
using NetSolve.Model;
using NetSolve.Presentation.Fitting.Evidence;

namespace NetSolve.Cli.Commands;

/// <summary>
/// <c>fit --format json</c>: one document with the notes on the log read, the fit evidence (<c>fit_evidence</c>,
/// docs/movement-log.md) and, when no <c>-o</c> file was given, the network file's text.
/// </summary>
internal static class FitJsonSummary
{
    public static void Write(FittedNetwork fitted, IReadOnlyDictionary<string, double?> predictedWaitHours, string? networkYaml, TextWriter output)
    {
        using var buffer = new MemoryStream();
        using (var json = new Utf8JsonWriter(buffer, new JsonWriterOptions { Indented = true }))
        {
            json.WriteStartObject();
            json.WriteString("name", fitted.Network.Name);
            json.WriteString("time_unit", TimeConstants.Name(fitted.Network.TimeUnit));
            json.WriteStartArray("notes");
            foreach (string line in FitNotes.Lines(fitted, withRowOrder: true))
            {
                json.WriteStringValue(line);
            }

            json.WriteEndArray();
            FitEvidenceJson.Write(fitted.Evidence, predictedWaitHours, fitted.Network.TimeUnit, json);
            if (networkYaml is not null)
            {
                json.WriteString("network", networkYaml);
            }

            json.WriteEndObject();
        }

        output.Write(Encoding.UTF8.GetString(buffer.ToArray()) + "\n");
    }
}

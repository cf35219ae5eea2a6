using System.Text;
using NetSolve.Presentation;
using NetSolve.Presentation.Simulation;
using NetSolve.Simulation;
using NetSolve.Solving;

namespace NetSolve.Cli;

/// <summary>Writes a simulation to stdout in the chosen format, whole or not at all.</summary>
internal static class SimulationOutput
{
    public static void Write(SimulationResult result, NetworkSolution? formula, string format, double strainThreshold, CliContext context)
    {
        // Everything is rendered first, so a failure never leaves half a document on stdout.
        string text;
        switch (format)
        {
            case "json":
                using (var buffer = new MemoryStream())
                {
                    SimulationJsonWriter.Write(result, buffer, formula, strainThreshold);
                    text = Encoding.UTF8.GetString(buffer.ToArray()) + "\n";
                }

                break;
            case "csv":
                using (var writer = new StringWriter())
                {
                    // A CSV file holds one table, so the comparison takes the place of the per-unit table rather
                    // than following it; its rows repeat the simulated means and half-widths they are judged on.
                    if (formula is null)
                    {
                        SimulationCsvWriter.Write(result, writer);
                    }
                    else
                    {
                        ComparisonCsvWriter.Write(result, formula, writer);
                    }

                    text = writer.ToString();
                }

                break;
            default:
                using (var writer = new StringWriter())
                {
                    SimulationTableWriter.Write(result, writer, strainThreshold);
                    if (formula is not null)
                    {
                        writer.Write("\n");
                        ComparisonTableWriter.Write(result, formula, writer);
                    }

                    writer.Write("\n" + Caution.Text + "\n");
                    text = writer.ToString();
                }

                break;
        }

        context.Out.Write(text);
    }
}

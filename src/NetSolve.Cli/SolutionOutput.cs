using NetSolve.Presentation.Solution;
using NetSolve.Presentation;
using NetSolve.Solving;

namespace NetSolve.Cli;

/// <summary>Writes a solution to stdout in the chosen format; the table also carries the planning caution.</summary>
internal static class SolutionOutput
{
    public static void Write(NetworkSolution solution, string format, CliContext context)
    {
        switch (format)
        {
            case "json":
                using (var buffer = new MemoryStream())
                {
                    SolutionJsonWriter.Write(solution, buffer);
                    context.Out.Write(System.Text.Encoding.UTF8.GetString(buffer.ToArray()) + "\n");
                }

                break;
            case "csv":
                SolutionCsvWriter.Write(solution, context.Out);
                break;
            default:
                SolutionTableWriter.Write(solution, context.Out);
                context.Out.Write("\n" + Caution.Text + "\n");
                break;
        }
    }
}

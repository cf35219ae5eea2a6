using System.CommandLine;
using System.Text;
using NetSolve.Rendering.Map;
using NetSolve.Solving;

namespace NetSolve.Cli.Commands;

/// <summary><c>netsolve map FILE -o map.svg|map.png|map.dot</c>: draws the bottleneck map of a solved network.</summary>
internal static class MapCommand
{
    /// <summary>Output extensions and what they write.</summary>
    private static readonly string[] Extensions = [".svg", ".png", ".dot"];

    public static Command Create(CliContext context)
    {
        var input = new NetworkInput();
        var output = OutputOption("Write the map here; the extension picks the format: .svg, .png (rendered from the SVG) or .dot (Graphviz).", Extensions);
        var direction = new Option<string>("--direction")
        {
            Description = "Main direction of patient flow on the map: down (top to bottom, for portrait pages) or right (left to right).",
            DefaultValueFactory = _ => "down",
        }.AcceptOnlyFromAmong("down", "right");
        var strain = CommonOptions.Strain();
        var command = new Command("map", "Draw the bottleneck map: units filled by status, routes as lines as wide as their flow, arrivals and exits.")
        {
            input.File, input.Set, output, direction, strain,
        };
        command.SetAction(parse =>
        {
            var network = input.Load(parse, context);
            var solution = NetworkSolver.Solve(network, parse.GetValue(strain));
            var layout = MapLayoutBuilder.Build(solution, parse.GetValue(direction) == "right" ? MapDirection.LeftToRight : MapDirection.TopToBottom);
            string target = parse.GetValue(output)!;
            byte[] content = Path.GetExtension(target).ToLowerInvariant() switch
            {
                ".png" => PngMapRenderer.Render(SvgMapWriter.WriteString(layout)),
                ".dot" => Utf8(DotMapWriter.Write(layout)),
                _ => Utf8("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n" + SvgMapWriter.WriteString(layout) + "\n"),
            };
            AtomicFile.Write(target, stream => stream.Write(content));
            context.Out.Write($"map of {network.Units.Length} units written to {target}\n");
            return ExitCodes.Success;
        });
        return command;
    }

    /// <summary>A required <c>--output/-o</c> whose extension must be one of <paramref name="extensions"/> (a usage error otherwise).</summary>
    internal static Option<string> OutputOption(string description, string[] extensions)
    {
        var option = new Option<string>("--output", "-o")
        {
            Description = description,
            Required = true,
        };
        option.Validators.Add(result =>
        {
            string? value = result.GetValueOrDefault<string>();
            string extension = Path.GetExtension(value ?? string.Empty).ToLowerInvariant();
            if (!extensions.Contains(extension, StringComparer.Ordinal))
            {
                result.AddError($"--output '{value}': the file name must end in {string.Join(", ", extensions)}");
            }
        });
        return option;
    }

    private static byte[] Utf8(string text) => new UTF8Encoding(false).GetBytes(text);
}

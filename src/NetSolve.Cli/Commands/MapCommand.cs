using System.CommandLine;
using System.Text;
using NetSolve.Cli.Settings;
using NetSolve.Rendering.Map;

namespace NetSolve.Cli.Commands;

/// <summary><c>netsolve map FILE -o map.svg|map.png|map.dot</c>: draws the bottleneck map of a solved network.</summary>
internal sealed class MapCommand() : NetworkCommand(
    "map", "Draw the bottleneck map: units filled by status, routes as lines as wide as their flow, arrivals and exits.")
{
    /// <summary>Output extensions and what they write.</summary>
    private static readonly string[] Extensions = [".svg", ".png", ".dot"];

    private readonly Option<string> _output = OutputFileOption.Create(
        "Write the map here; the extension picks the format: .svg, .png (drawn as the SVG looks) or .dot (Graphviz).", Extensions);

    private readonly Option<string> _direction = SettingOptions.Choice(
        "--direction", "Main direction of patient flow on the map: down (top to bottom, for portrait pages) or right (left to right).", "down", ["down", "right"]);

    protected override string? FormatDescription => null;

    private readonly Option<string[]> _target = TargetOption.Create("A unit that misses one is marked on its box.");

    protected override IEnumerable<Symbol> Symbols => [_output, _direction, _target];

    protected override int Execute(NetworkRequest request)
    {
        if (request.Network.Units.Length > MapLayoutBuilder.MaxUnits)
        {
            request.Context.Report(Messages.MapTooLarge(request.Network.Units.Length, MapLayoutBuilder.MaxUnits));
            return ExitCodes.InvalidInput;
        }

        var solution = (request with { Network = TargetOption.Apply(request.Network, request.GetValue(_target)) }).Solve();
        var layout = MapLayoutBuilder.Build(solution, request.GetValue(_direction) == "right" ? MapDirection.LeftToRight : MapDirection.TopToBottom) with { Changes = request.Changes };
        string target = request.GetValue(_output)!;
        byte[] content = Path.GetExtension(target).ToLowerInvariant() switch
        {
            ".png" => PngMapRenderer.Render(layout),
            ".dot" => Utf8(DotMapWriter.Write(layout)),
            _ => Utf8("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n" + SvgMapWriter.WriteString(layout) + "\n"),
        };
        AtomicFile.Write(target, stream => stream.Write(content));
        request.Context.Out.Write(Messages.MapWritten(request.Network.Units.Length, target) + "\n");
        return ExitCodes.Success;
    }

    private static byte[] Utf8(string text) => new UTF8Encoding(false).GetBytes(text);
}

using System.Globalization;
using NetSolve.Rendering.Map;
using NetSolve.Solving;
using static NetSolve.Benchmarks.InProcessTiming;

namespace NetSolve.Benchmarks;

/// <summary>
/// <c>dotnet run -c Release --project tests/NetSolve.Benchmarks -- map-layout NET.yaml ...</c>: the map's layout alone
/// (<see cref="MapLayoutBuilder.Build"/>, after solving) and then the SVG writing, in process, by CPU time and wall
/// clock, the median of five runs after one warm-up run, with the large map's layering (<see cref="LargeMapLayering"/>)
/// on its own, and how much of the map's area its boxes cover; so the growth of the layout with the network's size can be
/// read apart from start-up, reading, solving and rasterising.
/// </summary>
internal static class MapLayoutMeasurement
{
    private const int Runs = 5;

    public static void Run(TextWriter output, IEnumerable<string> paths)
    {
        output.WriteLine("units  lines  layers  layout cpu ms  layout wall ms  of it layering cpu ms  svg cpu ms  svg wall ms  map area / boxes' area");
        foreach (string path in paths)
        {
            var network = NetworkFile.Read(path);
            var solution = NetworkSolver.Solve(network);
            var layout = MapLayoutBuilder.Build(solution);
            _ = SvgMapWriter.WriteString(layout);
            var layoutTimes = Enumerable.Range(0, Runs).Select(_ => Time(() => MapLayoutBuilder.Build(solution))).ToList();
            var svgTimes = Enumerable.Range(0, Runs).Select(_ => Time(() => SvgMapWriter.WriteString(layout))).ToList();
            var flows = MapFlows.Of(solution);
            var weighted = flows.Weighted();
            var layering = LargeMapLayering.Compute(network.Units.Length, weighted, flows.ArrivalPerHour);
            var layeringTimes = Enumerable.Range(0, Runs).Select(_ => Time(() => LargeMapLayering.Compute(network.Units.Length, weighted, flows.ArrivalPerHour))).ToList();
            output.WriteLine(string.Create(CultureInfo.InvariantCulture,
                $"{network.Units.Length,5}  {layout.Edges.Length,5}  {layering.Layers.Sum(layers => layers.Count),6}  {Median(layoutTimes.Select(t => t.Cpu)),13:F1}  {Median(layoutTimes.Select(t => t.Wall)),14:F1}  {Median(layeringTimes.Select(t => t.Cpu)),21:F1}  {Median(svgTimes.Select(t => t.Cpu)),10:F1}  {Median(svgTimes.Select(t => t.Wall)),11:F1}  {layout.Width * layout.Height / layout.Nodes.Sum(node => node.Width * node.Height),22:F2}"));
        }
    }
}

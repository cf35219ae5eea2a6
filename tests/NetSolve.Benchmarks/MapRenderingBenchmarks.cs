using BenchmarkDotNet.Attributes;
using NetSolve.Rendering.Map;
using NetSolve.Rendering.Report;
using NetSolve.Solving;
using NetSolve.Tests.Rendering;

namespace NetSolve.Benchmarks;

/// <summary>Drawing a generated hospital of 40 and 200 units: the map as SVG, as PNG, and the whole report. Target: 200 units under 5 s.</summary>
[MemoryDiagnoser]
public class MapRenderingBenchmarks
{
    private NetworkSolution _solution = null!;
    private string _svg = string.Empty;

    [Params(40, 200)]
    public int Units { get; set; }

    [GlobalSetup]
    public void Setup()
    {
        _solution = NetworkSolver.Solve(GeneratedHospital.Create(Units, seed: 1));
        _svg = SvgMapWriter.WriteString(MapLayoutBuilder.Build(_solution));
    }

    /// <summary>MSAGL layout plus SVG writing: what <c>netsolve map -o map.svg</c> does after solving.</summary>
    [Benchmark(Baseline = true)]
    public string MapSvg() => SvgMapWriter.WriteString(MapLayoutBuilder.Build(_solution));

    /// <summary>Rasterising the finished SVG at 2 pixels per unit with Svg.Skia.</summary>
    [Benchmark]
    public byte[] PngFromSvg() => PngMapRenderer.Render(_svg);

    /// <summary>The whole report: map, table, 41-point wait-growth chart with ScottPlot.</summary>
    [Benchmark]
    public string Report() => HtmlReport.Write(_solution);
}

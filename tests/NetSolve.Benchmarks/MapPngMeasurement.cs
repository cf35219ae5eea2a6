using System.Globalization;
using NetSolve.Rendering.Map;
using NetSolve.Solving;
using SkiaSharp;
using Svg.Skia;
using static NetSolve.Benchmarks.InProcessTiming;

namespace NetSolve.Benchmarks;

/// <summary>
/// <c>NetSolve.Benchmarks.dll map-png NET.yaml ...</c>: where the time of a PNG map goes, stage by stage, in process,
/// by CPU time and wall clock (the median of five runs after one warm-up run): the layout, the SVG text, Svg.Skia's
/// parse of it into a picture, drawing that picture into the pixel budget, and the PNG encoding at the renderer's
/// setting and others; the whole of <see cref="PngMapRenderer.Render(string, float)"/> (through Svg.Skia); then the
/// map's elements, painting them straight onto the canvas, encoding that opaque bitmap, and the whole of
/// <see cref="PngMapRenderer.Render(MapLayout, float)"/> as <c>map -o map.png</c> calls it. Encoding stages print the PNG's size.
/// </summary>
internal static class MapPngMeasurement
{
    private const int Runs = 5;

    public static void Run(TextWriter output, IEnumerable<string> paths)
    {
        output.WriteLine("units  pixels       stage                      cpu ms   wall ms       bytes");
        foreach (string path in paths)
        {
            var network = NetworkFile.Read(path);
            var solution = NetworkSolver.Solve(network);
            var layout = MapLayoutBuilder.Build(solution);
            string svg = SvgMapWriter.WriteString(layout);
            using var svgDocument = new SKSvg();
            using var picture = svgDocument.FromSvg(svg)!;
            float scale = Math.Min(PngMapRenderer.DefaultScale, (float)Math.Sqrt(PngMapRenderer.MaxPixels / ((double)picture.CullRect.Width * picture.CullRect.Height)));
            int width = (int)Math.Ceiling(picture.CullRect.Width * scale);
            int height = (int)Math.Ceiling(picture.CullRect.Height * scale);
            using var bitmap = new SKBitmap(width, height);
            Draw(bitmap, picture, scale);
            var elements = SvgMapWriter.Write(layout).Root!;
            float opaqueScale = PngMapRenderer.DefaultScale;
            using var opaque = PngMapRenderer.Canvas(picture.CullRect.Width, picture.CullRect.Height, ref opaqueScale, SKAlphaType.Opaque);
            PaintDirectly(opaque, elements, scale);

            var stages = new (string Name, Func<object> Work)[]
            {
                ("layout", () => MapLayoutBuilder.Build(solution)),
                ("svg text", () => SvgMapWriter.WriteString(layout)),
                ("svg parse (Svg.Skia)", () => Parse(svg)),
                ("draw picture", () => Draw(bitmap, picture, scale)),
                ("png encode (up, zlib 6)", () => Encode(bitmap, SKPngEncoderFilterFlags.Up, 6)),
                ("png encode (up, zlib 1)", () => Encode(bitmap, SKPngEncoderFilterFlags.Up, 1)),
                ("png encode (none, zlib 1)", () => Encode(bitmap, SKPngEncoderFilterFlags.None, 1)),
                ("render from svg (all)", () => PngMapRenderer.Render(svg)),
                ("svg elements", () => SvgMapWriter.Write(layout)),
                ("paint directly", () => PaintDirectly(opaque, elements, scale)),
                ("png encode opaque (up, 6)", () => Encode(opaque, SKPngEncoderFilterFlags.Up, 6)),
                ("png encode opaque (up, 1)", () => Encode(opaque, SKPngEncoderFilterFlags.Up, 1)),
                ("png encode opaque (none, 6)", () => Encode(opaque, SKPngEncoderFilterFlags.None, 6)),
                ("png encode opaque (none, 1)", () => Encode(opaque, SKPngEncoderFilterFlags.None, 1)),
                ("render from layout (all)", () => PngMapRenderer.Render(layout)),
            };
            foreach (var (name, work) in stages)
            {
                long bytes = work() switch
                {
                    byte[] png => png.Length,
                    long size => size,
                    _ => 0,
                };
                var times = Enumerable.Range(0, Runs).Select(_ => Time(work)).ToList();
                output.WriteLine(string.Create(CultureInfo.InvariantCulture,
                    $"{network.Units.Length,5}  {(long)width * height,11:N0}  {name,-25}  {Median(times.Select(t => t.Cpu)),7:F1}  {Median(times.Select(t => t.Wall)),8:F1}  {(bytes > 0 ? bytes.ToString("N0", CultureInfo.InvariantCulture) : "-"),10}"));
            }
        }
    }

    private static SKRect Parse(string svg)
    {
        using var document = new SKSvg();
        using var picture = document.FromSvg(svg)!;
        return picture.CullRect;
    }

    private static SKBitmap Draw(SKBitmap bitmap, SKPicture picture, float scale)
    {
        using var canvas = new SKCanvas(bitmap);
        canvas.Clear(SKColors.White);
        canvas.Scale(scale);
        canvas.DrawPicture(picture);
        return bitmap;
    }

    private static SKBitmap PaintDirectly(SKBitmap bitmap, System.Xml.Linq.XElement svg, float scale)
    {
        using var canvas = new SKCanvas(bitmap);
        canvas.Clear(SKColors.White);
        canvas.Scale(scale);
        using var painter = new MapCanvasPainter(canvas);
        painter.Paint(svg);
        return bitmap;
    }

    private static byte[] Encode(SKBitmap bitmap, SKPngEncoderFilterFlags filter, int level)
    {
        using var pixels = bitmap.PeekPixels();
        using var data = pixels.Encode(new SKPngEncoderOptions(filter, level))!;
        return data.ToArray();
    }
}

using System.Globalization;
using System.Xml.Linq;
using SkiaSharp;
using SkiaSharp.HarfBuzz;

namespace NetSolve.Rendering.Map;

/// <summary>
/// Paints the map's SVG elements, as <see cref="SvgMapWriter.Write"/> builds them, straight onto a Skia canvas: the
/// same shapes, colours, dashes and text as the SVG, without writing the SVG out as text and parsing it back.
/// </summary>
/// <remarks>
/// Knows only what the map writer emits: <c>g</c> (with a translation), <c>rect</c>, <c>line</c>, <c>path</c>,
/// <c>polygon</c> and <c>text</c>, with fill, stroke, width, dashes, opacities, bold and a middle anchor; anything
/// else is a bug and throws. Text follows the SVG's font list and falls back, character by character, to a face
/// that has the glyph, as a browser does. Not thread-safe: one painter per drawing.
/// </remarks>
internal sealed class MapCanvasPainter : IDisposable
{
    private readonly SKCanvas _canvas;
    private readonly SKPaint _paint = new() { IsAntialias = true };
    private readonly Dictionary<(string Family, bool Bold), SKTypeface> _faces = [];
    private readonly Dictionary<(int Character, bool Bold), SKTypeface> _fallbacks = [];
    private readonly Dictionary<string, SKPathEffect> _dashes = new(StringComparer.Ordinal);
    private readonly Dictionary<SKTypeface, SKShaper> _shapers = [];

    public MapCanvasPainter(SKCanvas canvas) => _canvas = canvas;

    /// <summary>Paints <paramref name="svg"/>, the root element of a map, at one canvas unit per map unit.</summary>
    public void Paint(XElement svg)
    {
        ArgumentNullException.ThrowIfNull(svg);
        Group(svg, (string?)svg.Attribute("font-family") ?? MapTypography.FontFamily);
    }

    public void Dispose()
    {
        _paint.Dispose();
        foreach (var face in _faces.Values.Concat(_fallbacks.Values).Distinct())
        {
            face.Dispose();
        }

        foreach (var shaper in _shapers.Values)
        {
            shaper.Dispose();
        }

        foreach (var dash in _dashes.Values)
        {
            dash.Dispose();
        }
    }

    private void Group(XElement group, string fontFamily)
    {
        int saved = _canvas.Save();
        if ((string?)group.Attribute("transform") is string transform)
        {
            var (dx, dy) = Translation(transform);
            _canvas.Translate(dx, dy);
        }

        foreach (var element in group.Elements())
        {
            switch (element.Name.LocalName)
            {
                case "g":
                    Group(element, fontFamily);
                    break;
                case "rect":
                    Rect(element);
                    break;
                case "line":
                    Line(element);
                    break;
                case "path":
                    Path(element);
                    break;
                case "polygon":
                    Polygon(element);
                    break;
                case "text":
                    Text(element, fontFamily);
                    break;
                case "title" or "desc":
                    break;
                default:
                    throw new InvalidOperationException("The map painter has no drawing for <" + element.Name.LocalName + ">.");
            }
        }

        _canvas.RestoreToCount(saved);
    }

    /// <summary>A rectangle, drawn as a path as SVG renderers do, so a thin border covers the same pixels.</summary>
    private void Rect(XElement rect)
    {
        var bounds = SKRect.Create(Number(rect, "x"), Number(rect, "y"), Number(rect, "width"), Number(rect, "height"));
        float radius = (string?)rect.Attribute("rx") is null ? 0f : Number(rect, "rx");
        using var builder = new SKPathBuilder();
        if (radius > 0f)
        {
            builder.AddRoundRect(bounds, radius, radius);
        }
        else
        {
            builder.AddRect(bounds);
        }

        using var shape = builder.Detach();
        if (SetFill(rect))
        {
            _canvas.DrawPath(shape, _paint);
        }

        if (SetStroke(rect))
        {
            _canvas.DrawPath(shape, _paint);
        }
    }

    private void Line(XElement line)
    {
        if (SetStroke(line))
        {
            _canvas.DrawLine(Number(line, "x1"), Number(line, "y1"), Number(line, "x2"), Number(line, "y2"), _paint);
        }
    }

    private void Path(XElement path)
    {
        using var shape = SKPath.ParseSvgPathData((string)path.Attribute("d")!)
            ?? throw new InvalidOperationException("The map writer wrote path data the painter cannot read.");
        if (SetFill(path))
        {
            _canvas.DrawPath(shape, _paint);
        }

        if (SetStroke(path))
        {
            _canvas.DrawPath(shape, _paint);
        }
    }

    private void Polygon(XElement polygon)
    {
        using var builder = new SKPathBuilder();
        var numbers = ((string)polygon.Attribute("points")!).Split([' ', ','], StringSplitOptions.RemoveEmptyEntries);
        for (int i = 0; i + 1 < numbers.Length; i += 2)
        {
            var point = new SKPoint(Parse(numbers[i]), Parse(numbers[i + 1]));
            if (i == 0)
            {
                builder.MoveTo(point);
            }
            else
            {
                builder.LineTo(point);
            }
        }

        builder.Close();
        using var shape = builder.Detach();
        if (SetFill(polygon))
        {
            _canvas.DrawPath(shape, _paint);
        }
    }

    private void Text(XElement text, string fontFamily)
    {
        if (!SetFill(text))
        {
            return;
        }

        bool bold = (string?)text.Attribute("font-weight") == "bold";
        string content = text.Value;
        using var font = new SKFont(Face(fontFamily, bold), Number(text, "font-size"))
        {
            Edging = SKFontEdging.SubpixelAntialias,
            Subpixel = true,
        };
        var runs = Runs(content, font, bold);
        float width = runs.Sum(run => Measure(run, font));
        float x = Number(text, "x") - ((string?)text.Attribute("text-anchor") == "middle" ? width / 2f : 0f);
        float y = Number(text, "y");
        var face = font.Typeface;
        foreach (var run in runs)
        {
            font.Typeface = run.Face;
            _canvas.DrawShapedText(Shaper(run.Face), run.Text, x, y, SKTextAlign.Left, font, _paint);
            x += Measure(run, font);
        }

        font.Typeface = face;
    }

    /// <summary>The run's advance as shaped (kerning applied), as the SVG renderer lays text out.</summary>
    private float Measure((string Text, SKTypeface Face) run, SKFont font)
    {
        var face = font.Typeface;
        font.Typeface = run.Face;
        float width = Shaper(run.Face).Shape(run.Text, font).Width;
        font.Typeface = face;
        return width;
    }

    private SKShaper Shaper(SKTypeface face)
    {
        if (!_shapers.TryGetValue(face, out var shaper))
        {
            shaper = new SKShaper(face);
            _shapers[face] = shaper;
        }

        return shaper;
    }

    /// <summary>The text cut where the face changes: the map's face wherever it has the glyph, else a face that does.</summary>
    private List<(string Text, SKTypeface Face)> Runs(string text, SKFont font, bool bold)
    {
        var face = font.Typeface;
        var runs = new List<(string Text, SKTypeface Face)>();
        if (font.ContainsGlyphs(text))
        {
            runs.Add((text, face));
            return runs;
        }

        int start = 0;
        SKTypeface? current = null;
        for (int i = 0; i < text.Length; i += char.IsSurrogatePair(text, i) ? 2 : 1)
        {
            int character = char.ConvertToUtf32(text, i);
            var chosen = font.ContainsGlyph(character) ? face : Fallback(character, face, bold);
            if (current is not null && !ReferenceEquals(chosen, current))
            {
                runs.Add((text[start..i], current));
                start = i;
            }

            current = chosen;
        }

        if (current is not null)
        {
            runs.Add((text[start..], current));
        }

        return runs;
    }

    private SKTypeface Fallback(int character, SKTypeface face, bool bold)
    {
        if (!_fallbacks.TryGetValue((character, bold), out var fallback))
        {
            fallback = SKFontManager.Default.MatchCharacter(null, bold ? SKFontStyle.Bold : SKFontStyle.Normal, null, character) ?? face;
            _fallbacks[(character, bold)] = fallback;
        }

        return fallback;
    }

    /// <summary>The first family of the list that is installed, as a browser picks it; the system's default face when none is.</summary>
    private SKTypeface Face(string fontFamily, bool bold)
    {
        if (_faces.TryGetValue((fontFamily, bold), out var face))
        {
            return face;
        }

        var style = bold ? SKFontStyle.Bold : SKFontStyle.Normal;
        foreach (string family in fontFamily.Split(',', StringSplitOptions.TrimEntries | StringSplitOptions.RemoveEmptyEntries))
        {
            var candidate = SKFontManager.Default.MatchFamily(family, style);
            if (candidate is not null && string.Equals(candidate.FamilyName, family, StringComparison.OrdinalIgnoreCase))
            {
                face = candidate;
                break;
            }

            candidate?.Dispose();
        }

        face ??= SKFontManager.Default.MatchFamily(null, style) ?? SKTypeface.Default;
        _faces[(fontFamily, bold)] = face;
        return face;
    }

    /// <summary>Sets the paint to the element's fill; false when it has none.</summary>
    private bool SetFill(XElement element)
    {
        string fill = (string?)element.Attribute("fill") ?? "#000000";
        if (fill == "none")
        {
            return false;
        }

        _paint.Style = SKPaintStyle.Fill;
        _paint.PathEffect = null;
        _paint.Color = Colour(fill, element.Attribute("fill-opacity"));
        return true;
    }

    /// <summary>Sets the paint to the element's stroke, width, caps and dashes; false when it has none.</summary>
    private bool SetStroke(XElement element)
    {
        string? stroke = (string?)element.Attribute("stroke");
        if (stroke is null or "none")
        {
            return false;
        }

        _paint.Style = SKPaintStyle.Stroke;
        _paint.Color = Colour(stroke, element.Attribute("stroke-opacity"));
        _paint.StrokeWidth = (string?)element.Attribute("stroke-width") is null ? 1f : Number(element, "stroke-width");
        _paint.StrokeCap = (string?)element.Attribute("stroke-linecap") switch
        {
            "round" => SKStrokeCap.Round,
            "square" => SKStrokeCap.Square,
            _ => SKStrokeCap.Butt,
        };
        _paint.StrokeJoin = SKStrokeJoin.Miter;
        _paint.StrokeMiter = 4f;
        _paint.PathEffect = (string?)element.Attribute("stroke-dasharray") is string pattern ? Dash(pattern) : null;
        return true;
    }

    /// <summary>A dash pattern as Skia takes it; an odd list is repeated, as SVG says.</summary>
    private SKPathEffect Dash(string pattern)
    {
        if (!_dashes.TryGetValue(pattern, out var effect))
        {
            var lengths = pattern.Split([' ', ','], StringSplitOptions.RemoveEmptyEntries).Select(Parse).ToArray();
            effect = SKPathEffect.CreateDash(lengths.Length % 2 == 0 ? lengths : [.. lengths, .. lengths], 0f);
            _dashes[pattern] = effect;
        }

        return effect;
    }

    private static SKColor Colour(string hex, XAttribute? opacity)
    {
        var colour = SKColor.Parse(hex);
        return opacity is null ? colour : colour.WithAlpha((byte)Math.Round(255.0 * Math.Clamp(double.Parse(opacity.Value, CultureInfo.InvariantCulture), 0.0, 1.0)));
    }

    private static (float X, float Y) Translation(string transform)
    {
        const string Prefix = "translate(";
        if (!transform.StartsWith(Prefix, StringComparison.Ordinal) || !transform.EndsWith(')'))
        {
            throw new InvalidOperationException("The map painter knows only translations, not '" + transform + "'.");
        }

        var parts = transform[Prefix.Length..^1].Split([' ', ','], StringSplitOptions.RemoveEmptyEntries);
        return (Parse(parts[0]), parts.Length > 1 ? Parse(parts[1]) : 0f);
    }

    private static float Number(XElement element, string name) => Parse((string)element.Attribute(name)!);

    private static float Parse(string number) => float.Parse(number, NumberStyles.Float, CultureInfo.InvariantCulture);
}

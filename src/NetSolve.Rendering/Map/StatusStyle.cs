namespace NetSolve.Rendering.Map;

/// <summary>How one unit status is drawn: colours, border and glyph. Status never rests on colour alone.</summary>
/// <remarks>The word written after the glyph is the contract's, from <see cref="Presentation.StatusWords"/>.</remarks>
/// <param name="Glyph">A shape drawn before the status word; each status has its own.</param>
/// <param name="Fill">Box fill, <c>#RRGGBB</c>.</param>
/// <param name="Text">Text colour on that fill, <c>#RRGGBB</c>.</param>
/// <param name="Border">Border colour, <c>#RRGGBB</c>.</param>
/// <param name="BorderWidth">Border width in map units.</param>
/// <param name="BorderDash">SVG <c>stroke-dasharray</c>, empty for a solid line.</param>
/// <param name="DoubleBorder">True to draw a second border inside the first.</param>
public sealed record StatusStyle(
    string Glyph,
    string Fill,
    string Text,
    string Border,
    double BorderWidth,
    string BorderDash,
    bool DoubleBorder);

namespace NetSolve.Rendering.Map;

/// <summary>One line of text inside a map box.</summary>
/// <param name="Text">What is written.</param>
/// <param name="FontSize">Font size in map units.</param>
/// <param name="IsBold">True for the bold face.</param>
public sealed record MapTextLine(string Text, double FontSize, bool IsBold);

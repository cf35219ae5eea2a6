namespace NetSolve.Diagnostics;

/// <summary>A place in a source file: 1-based line and column.</summary>
/// <param name="File">The file name as the user gave it.</param>
/// <param name="Line">1-based line.</param>
/// <param name="Column">1-based column.</param>
public readonly record struct SourceLocation(string File, int Line, int Column)
{
    /// <summary><c>FILE:LINE:COL</c>.</summary>
    /// <remarks>
    /// A location with line 0 stands for the whole file and prints as <c>FILE</c> alone; an empty name (a path given
    /// as <c>''</c>) prints as <c>''</c>, so the line still starts with what was typed.
    /// </remarks>
    public override string ToString()
    {
        string file = File.Length == 0 ? "''" : File;
        return Line == 0 ? file : string.Create(System.Globalization.CultureInfo.InvariantCulture, $"{file}:{Line}:{Column}");
    }
}

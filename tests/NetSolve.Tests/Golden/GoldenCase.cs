namespace NetSolve.Tests.Golden;

/// <summary>One command run whose output is pinned by an approved file.</summary>
/// <param name="Name">Command, example and variant, dot-separated: <c>staff.harbourside.budget-3</c>.</param>
/// <param name="Format">The output's format: table, text, json, csv, svg, dot, html or yaml.</param>
/// <param name="Arguments">The command line after <c>netsolve</c>, without the output file.</param>
/// <param name="WrittenFile">
/// For commands that write a file (<c>-o</c>): its name; the run writes it to a temporary folder and the file, not
/// stdout, is the pinned output. Null when stdout is the output.
/// </param>
internal sealed record GoldenCase(string Name, string Format, IReadOnlyList<string> Arguments, string? WrittenFile = null)
{
    /// <summary>The case's id in test names and theory data: <c>solve.harbourside.json</c>.</summary>
    public string Id => Name + "." + Format;

    /// <summary>The approved output file: <c>solve.harbourside.json</c>, <c>solve.harbourside.table.txt</c>.</summary>
    public string ApprovedFileName => Format is "table" or "text" ? Id + ".txt" : Id;

    /// <summary>The approved exit code, stderr and (for a written file) stdout: <c>solve.harbourside.json.console.txt</c>.</summary>
    public string ConsoleFileName => Id + ".console.txt";

    public override string ToString() => Id;
}

namespace NetSolve.Cli.Output;

/// <summary>What <c>--format</c> asks for.</summary>
internal enum OutputFormat
{
    /// <summary>For people: aligned columns, the planning caution at the end.</summary>
    Table,

    /// <summary>One JSON document (the contract's shape for <c>solve</c>).</summary>
    Json,

    /// <summary>Comma-separated rows with a header, ready for a spreadsheet.</summary>
    Csv,
}

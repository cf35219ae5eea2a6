namespace NetSolve.Rendering.Report;

/// <summary>One file the report was made from, named and fingerprinted so a reader can tell which inputs it shows.</summary>
/// <param name="Name">The file's name as the report shows it (no folders, which differ from machine to machine).</param>
/// <param name="Sha256">The SHA-256 of the file's bytes, 64 lowercase hexadecimal digits.</param>
public sealed record ReportInput(string Name, string Sha256);

namespace NetSolve.Tests.Hardening.Fuzzing;

/// <summary>
/// One generated run of <c>netsolve</c>: the arguments, the files they name and the output file the command may
/// write. Arguments say <c>{dir}</c> where the temporary folder goes, so an input can be saved and replayed anywhere.
/// </summary>
/// <param name="Surface">Which input surface was mutated.</param>
/// <param name="Arguments">The command line, with <c>{dir}</c> for the temporary folder.</param>
/// <param name="Files">The files written under the temporary folder before the run.</param>
/// <param name="OutputFile">The file the command is asked to write (relative to the folder), if any.</param>
/// <param name="OldOutput">Content placed at <paramref name="OutputFile"/> before the run, to see that a failed run leaves it alone.</param>
internal sealed record FuzzInput(FuzzSurface Surface, IReadOnlyList<string> Arguments, IReadOnlyList<FuzzFile> Files, string? OutputFile = null, byte[]? OldOutput = null)
{
    /// <summary>Placeholder for the temporary folder in <see cref="Arguments"/>.</summary>
    public const string Folder = "{dir}";

    /// <summary>The arguments with the placeholder replaced by <paramref name="folder"/>.</summary>
    public string[] ArgumentsIn(string folder) => [.. Arguments.Select(argument => argument.Replace(Folder, folder, StringComparison.Ordinal))];
}

using System.Text;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Golden;

/// <summary>What a golden case gave, with the machine's paths replaced by tokens, ready to compare with approved files.</summary>
/// <param name="Output">The pinned output: stdout, or the file the command wrote.</param>
/// <param name="Console">The command line, exit code, stderr and, for a written file, stdout.</param>
internal sealed record GoldenOutput(string Output, string Console)
{
    /// <summary>Stands for the test output folder, which holds the copies of <c>networks/</c>.</summary>
    public const string OutputFolderToken = "{test-output}";

    /// <summary>Stands for the temporary folder a case writes its file to.</summary>
    public const string TemporaryFolderToken = "{temp}";

    /// <summary>Runs the case in a temporary folder of its own and reads what it gave.</summary>
    public static GoldenOutput Run(GoldenCase golden)
    {
        var folder = Directory.CreateTempSubdirectory("netsolve-golden-");
        try
        {
            string? written = golden.WrittenFile is null ? null : Path.Combine(folder.FullName, golden.WrittenFile);
            string[] arguments = written is null ? [.. golden.Arguments] : [.. golden.Arguments, "-o", written];
            var result = CliRun.Run(arguments);
            string output = written is null ? result.Out : File.Exists(written) ? File.ReadAllText(written) : string.Empty;

            var console = new StringBuilder();
            console.Append("netsolve ").AppendJoin(' ', arguments.Select(Quote)).Append('\n');
            console.Append("exit code: ").Append(result.ExitCode).Append('\n');
            if (written is not null)
            {
                AppendStream(console, "stdout", result.Out);
            }

            AppendStream(console, "stderr", result.Error);
            return new GoldenOutput(Normalise(output, folder.FullName), Normalise(console.ToString(), folder.FullName));
        }
        finally
        {
            folder.Delete(recursive: true);
        }
    }

    // Paths are the only part of the output that depends on the machine: the network files are read from the test
    // output folder and written files go to a fresh temporary folder. Nothing else is normalised: the outputs carry no
    // date, version, timing or random id (simulations are seeded and do not depend on the thread count).
    private static string Normalise(string text, string temporaryFolder)
    {
        string outputFolder = Path.TrimEndingDirectorySeparator(AppContext.BaseDirectory);
        var replacements = new[] { (Path: outputFolder, Token: OutputFolderToken), (Path: temporaryFolder, Token: TemporaryFolderToken) }
            .OrderByDescending(replacement => replacement.Path.Length);
        foreach (var (path, token) in replacements)
        {
            text = text.Replace(path, token, StringComparison.Ordinal);
        }

        return text;
    }

    private static void AppendStream(StringBuilder console, string name, string text)
    {
        console.Append("--- ").Append(name).Append(text.Length == 0 ? " (empty)\n" : "\n").Append(text);
        if (text.Length > 0 && !text.EndsWith('\n'))
        {
            console.Append("\n(no newline at the end)\n");
        }
    }

    private static string Quote(string argument) => argument.Contains(' ', StringComparison.Ordinal) ? "'" + argument + "'" : argument;
}

using System.Text;
using NetSolve.Cli;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Cli;

/// <summary>
/// The program streams results into stdout's bytes; tests capture text. Both paths must give the same output, byte
/// for byte, so the golden files (taken through text) also pin what a planner's terminal or pipe receives.
/// </summary>
public sealed class StreamedOutputTests
{
    public static TheoryData<string[]> Commands => new()
    {
        { ["solve", Example("kestrel-general.yaml"), "--format", "json"] },
        { ["solve", Example("scenarios/harbourside-fourth-scanner.yaml"), "--set", "servers.lab=7", "--format", "json"] },
        { ["solve", Example("scenarios/harbourside-fourth-scanner.yaml"), "--set", "servers.lab=7"] },
        { ["solve", Example("kestrel-general.yaml"), "--format", "csv"] },
        { ["growth", Example("kestrel-general.yaml"), "--format", "json"] },
    };

    [Theory]
    [MemberData(nameof(Commands))]
    public void Output_streamed_into_stdout_bytes_is_the_text_a_test_captures(string[] args)
    {
        var captured = CliRun.Run(args);
        using var bytes = new MemoryStream();
        using var error = new StringWriter();
        int exitCode;
        using (var stdout = new StreamWriter(bytes, new UTF8Encoding(false), 16, leaveOpen: true))
        {
            exitCode = NetSolveApp.Run(args, new CliContext(stdout, error));
        }

        Assert.Equal(0, captured.ExitCode);
        Assert.Equal(captured.ExitCode, exitCode);
        Assert.Equal(captured.Out, Encoding.UTF8.GetString(bytes.ToArray()));
    }

    private static string Example(string file) => Path.Combine(TestFiles.NetworksFolder, file);
}

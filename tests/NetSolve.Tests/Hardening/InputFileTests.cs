using System.Text;
using NetSolve.Diagnostics;
using NetSolve.Parsing;
using NetSolve.Scenarios;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Hardening;

/// <summary>Only regular files are read, no larger than the limit, and only as strict UTF-8.</summary>
public sealed class InputFileTests : IDisposable
{
    private readonly TempFolder folder = new();

    [Fact]
    public void A_directory_is_refused_by_name()
    {
        Assert.Null(InputFile.TryRead(folder.Path, "a network file", out var problem));

        Assert.Equal(DiagnosticCodes.Unreadable, problem!.Code);
        Assert.Contains("is a directory, not a network file", problem.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_named_pipe_is_refused_without_waiting_for_a_writer()
    {
        Assert.SkipWhen(OperatingSystem.IsWindows(), "named pipes in the file system are a Unix feature");
        string path = Path.Combine(folder.Path, "pipe.yaml");
        NamedPipe.Create(path);

        Assert.Null(InputFile.TryRead(path, "a network file", out var problem));

        Assert.Equal($"{path}: is a named pipe (FIFO), not a network file; only regular files are read", problem!.ToString());
    }

    [Fact]
    public void A_device_that_never_ends_is_refused_before_reading()
    {
        Assert.SkipUnless(File.Exists("/dev/zero"), "needs /dev/zero");

        Assert.Null(InputFile.TryRead("/dev/zero", "a network file", out var problem));

        Assert.Equal("/dev/zero: is a character device, not a network file; only regular files are read", problem!.ToString());
    }

    [Fact]
    public void A_link_to_a_regular_file_is_followed()
    {
        string target = folder.Write("target.yaml", "name: x\n"u8.ToArray());
        string link = Path.Combine(folder.Path, "link.yaml");
        File.CreateSymbolicLink(link, target);

        Assert.Equal("name: x\n", InputFile.TryRead(link, "a network file", out _));
    }

    [Fact]
    public void A_file_over_the_limit_is_refused_with_the_limit_named()
    {
        string path = folder.Write("big.yaml", new byte[1001]);

        Assert.Null(InputFile.TryRead(path, "a network file", 1000, out var problem));

        Assert.Equal($"{path}: is larger than 1000 bytes, the most read for a network file", problem!.ToString());
    }

    [Fact]
    public void A_file_at_the_limit_is_read()
    {
        string path = folder.Write("exact.yaml", Encoding.UTF8.GetBytes(new string('#', 1000)));

        Assert.Equal(1000, InputFile.TryRead(path, "a network file", 1000, out _)!.Length);
    }

    [Fact]
    public void A_sparse_file_over_256_MiB_is_refused_before_any_of_it_is_read()
    {
        string path = Path.Combine(folder.Path, "sparse.yaml");
        using (var stream = File.Create(path))
        {
            stream.SetLength(InputFile.MaxNetworkBytes + 1);
        }

        var result = NetworkReader.ReadFile(path);

        Assert.Equal($"{path}: is larger than 256 MiB, the most read for a network file", Assert.Single(result.Diagnostics).ToString());
    }

    [Theory]
    // Exact by hand: the bytes before the bad one, counted line by line; 'é' is one column (one UTF-16 unit).
    [InlineData(new byte[] { (byte)'a', (byte)':', (byte)' ', 0xFF }, 1, 4, "0xFF")]
    [InlineData(new byte[] { (byte)'a', (byte)':', (byte)'\n', (byte)'b', (byte)':', (byte)' ', 0xC3, 0xA9, 0xC3 }, 2, 5, "0xC3")]
    [InlineData(new byte[] { (byte)'#', (byte)'\n', (byte)'\n', 0xED, 0xA0, 0x80 }, 3, 1, "0xED")]
    public void Invalid_UTF8_is_an_error_at_its_line_and_column(byte[] bytes, int line, int column, string shown)
    {
        string path = folder.Write("bad.yaml", bytes);

        Assert.Null(InputFile.TryRead(path, "a network file", out var problem));

        Assert.Equal(DiagnosticCodes.BadText, problem!.Code);
        Assert.Equal((line, column), (problem.Location.Line, problem.Location.Column));
        Assert.Contains($"byte {shown} is not valid UTF-8", problem.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_leading_byte_order_mark_is_skipped()
    {
        string path = folder.Write("bom.yaml", [0xEF, 0xBB, 0xBF, (byte)'a', (byte)':', (byte)' ', (byte)'1']);

        Assert.Equal("a: 1", InputFile.TryRead(path, "a network file", out _));
    }

    [Fact]
    public void A_scenario_whose_base_is_a_device_is_refused_at_once()
    {
        Assert.SkipUnless(File.Exists("/dev/zero"), "needs /dev/zero");
        string path = folder.Write("scenario.yaml", "scenario: x\nbase: /dev/zero\nservers:\n  a: 2\n"u8.ToArray());

        var result = ScenarioReader.ReadFile(path);

        Assert.Contains(result.Diagnostics, d => d.IsError && d.Message.Contains("is a character device", StringComparison.Ordinal));
    }

    [Fact]
    public void Solving_a_device_is_one_located_line_and_exit_code_1()
    {
        Assert.SkipUnless(File.Exists("/dev/zero"), "needs /dev/zero");

        var result = CliRun.Run("solve", "/dev/zero");

        Assert.Equal(1, result.ExitCode);
        Assert.Equal("/dev/zero: is a character device, not a network or scenario file; only regular files are read", result.Error.TrimEnd('\n'));
    }

    [Fact]
    public void Fitting_a_log_that_is_a_named_pipe_is_refused()
    {
        Assert.SkipWhen(OperatingSystem.IsWindows(), "named pipes in the file system are a Unix feature");
        string path = Path.Combine(folder.Path, "log.csv");
        NamedPipe.Create(path);

        var result = CliRun.Run("fit", path);

        Assert.Equal(1, result.ExitCode);
        Assert.Contains("is a named pipe (FIFO), not a movement log", result.Error, StringComparison.Ordinal);
    }

    [Fact]
    public void The_file_type_is_asked_of_the_operating_system_so_a_directory_pipe_and_device_are_told_apart()
    {
        Assert.SkipUnless(OperatingSystem.IsLinux() || OperatingSystem.IsMacOS(), "the file type is asked on Linux and macOS");
        string file = folder.Write("plain.yaml", "a: 1\n"u8.ToArray());
        string pipe = Path.Combine(folder.Path, "pipe.yaml");
        NamedPipe.Create(pipe);

        Assert.Null(InputFileType.NotRegular(file));
        Assert.Equal("a directory", InputFileType.NotRegular(folder.Path));
        Assert.Equal("a named pipe (FIFO)", InputFileType.NotRegular(pipe));
        Assert.Equal("a character device", InputFileType.NotRegular("/dev/null"));
    }

    [Theory]
    // Exact by hand: the S_IFMT values of POSIX sys/stat.h (IEEE Std 1003.1), with permission bits set beside them.
    [InlineData(0x81A4, null)]
    [InlineData(0x41ED, "a directory")]
    [InlineData(0x1180, "a named pipe (FIFO)")]
    [InlineData(0x21B6, "a character device")]
    [InlineData(0x61B0, "a block device")]
    [InlineData(0xC1FF, "a socket")]
    [InlineData(0xA1FF, "not a regular file")]
    public void Each_file_type_is_named_for_the_message(int mode, string? named)
    {
        Assert.Equal(named, InputFileType.Describe(mode));
    }

    [Fact]
    public void The_file_type_check_does_not_call_the_runtime_s_private_helper_library()
    {
        // A Native AOT build links that library into the program and does not ship it, so a call to it would fail there.
        string source = File.ReadAllText(Path.Combine(Repository.Root, "src", "NetSolve.Core", "Parsing", "InputFileType.cs"));

        Assert.DoesNotContain("[DllImport(\"libSystem.Native", source, StringComparison.Ordinal);
    }

    public void Dispose() => folder.Dispose();
}

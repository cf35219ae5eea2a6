using System.Text;
using NetSolve.Cli;

// Stdout through one large buffer, not the console's writer that flushes at every write: a 100,000-unit document
// is written in a few dozen system calls instead of millions. Flushed once at the end, whatever happened.
var stdout = new StreamWriter(Console.OpenStandardOutput(), new UTF8Encoding(false), bufferSize: 1 << 16) { AutoFlush = false };
try
{
    return NetSolveApp.Run(args, new CliContext(stdout, Console.Error, IsTerminal: !Console.IsErrorRedirected));
}
#pragma warning disable CA1031 // The last resort: a defect outside the command tree (the console itself) is still one line.
catch (Exception exception)
#pragma warning restore CA1031
{
    await Console.Error.WriteLineAsync(Messages.InternalError(exception, args.Contains("--verbose"))).ConfigureAwait(false);
    return ExitCodes.InternalError;
}
finally
{
    FlushQuietly(stdout);
}

// A reader that went away (`netsolve solve … | head`) is no error of ours: what it did not read is simply not written.
static void FlushQuietly(StreamWriter stdout)
{
    try
    {
        stdout.Dispose();
    }
    catch (IOException)
    {
        // Nothing is left to tell: the reader has gone.
    }
}

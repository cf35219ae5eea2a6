using NetSolve.Cli;

try
{
    return NetSolveApp.Run(args, new CliContext(Console.Out, Console.Error, IsTerminal: !Console.IsErrorRedirected));
}
#pragma warning disable CA1031 // The last resort: a defect outside the command tree (the console itself) is still one line.
catch (Exception exception)
#pragma warning restore CA1031
{
    await Console.Error.WriteLineAsync(Messages.InternalError(exception, args.Contains("--verbose"))).ConfigureAwait(false);
    return ExitCodes.InternalError;
}

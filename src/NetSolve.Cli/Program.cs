using NetSolve.Cli;

return NetSolveApp.Run(args, new CliContext(Console.Out, Console.Error, IsTerminal: !Console.IsErrorRedirected));

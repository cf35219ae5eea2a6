using NetSolve.Analysis;

namespace NetSolve.Cli.Commands;

/// <summary><c>netsolve check FILE</c>: validates a network (or scenario) file and shows its warnings, solving nothing.</summary>
internal sealed class CheckCommand() : NetworkCommand(
    "check", "Validate a network file: report every error and warning with file, line, column and unit.")
{
    protected override string? FormatDescription => null;

    protected override bool TakesStrain => false;

    protected override int Execute(NetworkRequest request)
    {
        var network = request.Network;
        foreach (var warning in ReturnLoops.Warnings(request.Network, request.File))
        {
            request.Warnings.Report(warning.ToString());
        }

        request.Context.Out.Write(Messages.Valid(request.File, network.Units.Length, network.Arrivals.Length, network.Routes.Length) + "\n");
        return ExitCodes.Success;
    }
}

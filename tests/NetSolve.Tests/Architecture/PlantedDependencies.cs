namespace NetSolve.Tests.Architecture;

/// <summary>
/// A specimen for the compiled-code check: its signatures name no NetSolve type; its bodies use one of Model
/// directly and one of Solving inside a lambda, and a Solving constant that compiled code cannot show.
/// </summary>
internal static class PlantedDependencies
{
    public static int ServersInABody() => NetSolve.Model.Servers.Of(3).Count;

    public static Func<double> WaitInALambda() => () => NetSolve.Solving.ErlangFormulas.WaitProbability(2, 1.0);

    public static double ThresholdConstant() => NetSolve.Solving.Defaults.StrainThreshold;
}

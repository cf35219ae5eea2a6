using System.Globalization;
using NetSolve.Model;
using NetSolve.Parsing;
using NetSolve.Simulation;
using NetSolve.Solving;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Accuracy;

/// <summary>
/// The networks and the rows of the accuracy study of issue 11 (docs/methods.md, "Measured accuracy against the
/// simulator"), shared by the run against the simulator and the formula-only run against its stored waits.
/// </summary>
internal static class AccuracyStudy
{
    /// <summary>The goal: a unit's two-moment mean wait within this relative error of the simulated mean.</summary>
    public const double GoalError = 0.15;

    /// <summary>Generated networks in the study, seeds 1 to this.</summary>
    private const int GeneratedNetworks = 20;

    private static readonly string[] Bundled = ["harbourside", "kestrel-general", "millbrook-clinic", "fenwick-winter-surge", "larkspur-simulation"];

    /// <summary>The five bundled networks at their mean rates, then generated networks 1 to 20, with their names in the table.</summary>
    public static List<(string Name, Network Network)> Networks() => Bundled
        .Select(name => (name, AccuracyNetworks.Steady(NetworkReader.ReadFile(TestFiles.Network(name)).Network!)))
        .Concat(Enumerable.Range(1, GeneratedNetworks).Select(seed => ("generated-" + seed.ToString(CultureInfo.InvariantCulture), AccuracyNetworks.Generate(seed))))
        .ToList();

    /// <summary>One row per unit with servers to wait for: the formulas (with the given arrival variability) against the simulated wait.</summary>
    /// <param name="name">The network's name in the table.</param>
    /// <param name="network">The network.</param>
    /// <param name="variability">The method for the arrival SCVs of the two-moment side.</param>
    /// <param name="simulated">The simulated mean wait of the unit at a position; null leaves the unit out.</param>
    public static IEnumerable<AccuracyRow> Rows(string name, Network network, ArrivalVariabilityMethod variability, Func<int, Estimate?> simulated)
    {
        var twoMoment = NetworkSolver.Solve(network, Defaults.StrainThreshold, variability);
        var exponential = NetworkSolver.Solve(AccuracyNetworks.Exponential(network));
        for (int i = 0; i < network.Units.Length; i++)
        {
            var unit = network.Units[i];
            var formula = twoMoment.Units[i];
            if (unit.Servers.IsUnlimited || formula.MeanWaitHours is not double wait || exponential.Units[i].MeanWaitHours is not double exponentialWait
                || simulated(i) is not Estimate estimate)
            {
                continue;
            }

            double meanService = formula.ArrivalsPerHour > 0.0 ? formula.OfferedLoad / formula.ArrivalsPerHour : unit.MeanServiceHours;
            yield return new AccuracyRow(name, unit.Id, formula.ArrivalScv, formula.ServiceScv, unit.Servers.Count, formula.Utilisation,
                meanService, estimate, wait, exponentialWait, formula.Method)
            {
                Family = network.Groups.Any(group => group.Services.Any(service => service.UnitId == unit.Id))
                    ? "group mixture"
                    : unit.EffectiveService.Kind.ToString().ToLowerInvariant(),
            };
        }
    }

    /// <summary>The table and its counts: units within 15%, and units with a cv different from 1 not closer than the exponential formula.</summary>
    public static (string Table, int Counted, int Within, List<AccuracyRow> NotBetter) Summarise(List<AccuracyRow> rows)
    {
        var counted = rows.Where(row => row.Counts).ToList();
        int within = counted.Count(row => Math.Abs(row.TwoMomentError) <= GoalError);
        var differing = counted.Where(row => row.CvDiffers).ToList();
        var notBetter = differing.Where(row => Math.Abs(row.TwoMomentError) >= Math.Abs(row.ExponentialError)).ToList();
        return (AccuracyTable.Write(rows, counted.Count, within, differing.Count, notBetter.Count), counted.Count, within, notBetter);
    }
}

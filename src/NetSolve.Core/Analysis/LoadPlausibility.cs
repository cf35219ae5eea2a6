using System.Collections.Immutable;
using System.Globalization;
using NetSolve.Diagnostics;
using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Analysis;

/// <summary>
/// Flags units whose utilisation is far beyond anything a hospital runs at. A unit just over 100% is a real
/// finding (demand outgrew the unit); one at several times 100% is almost always a time written in the wrong unit
/// (<c>service: 25</c> in an hourly file is 25 hours of imaging, not 25 minutes), so the warning says so.
/// </summary>
public static class LoadPlausibility
{
    /// <summary>Utilisation above which a unit is flagged: twice what its servers can do.</summary>
    public const double Threshold = 2.0;

    /// <summary>One warning per unit above <see cref="Threshold"/>, located at <paramref name="fileName"/>.</summary>
    public static ImmutableArray<Diagnostic> Warnings(NetworkSolution solution, string fileName)
    {
        ArgumentNullException.ThrowIfNull(solution);
        ArgumentNullException.ThrowIfNull(fileName);
        var timeUnit = solution.Network.TimeUnit;
        return
        [
            .. solution.Units
                .Where(unit => unit.Utilisation > Threshold && double.IsFinite(unit.Utilisation))
                .Select(unit => Diagnostic.Warning(DiagnosticCodes.ImplausibleLoad, new SourceLocation(fileName, 0, 0), unit.Unit.Id, string.Create(
                    CultureInfo.InvariantCulture,
                    $"utilisation {unit.Utilisation:0%} is more than twice what its servers can do; is a unit of time missing or wrong? its service is {TimeConstants.FromHours(unit.Unit.MeanServiceHours, timeUnit):0.###} {TimeConstants.Name(timeUnit)}s per patient (write e.g. 25min or 2.5h)"))),
        ];
    }
}

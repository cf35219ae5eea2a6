using System.Globalization;
using NetSolve.Model;
using NetSolve.Presentation.Metrics;
using NetSolve.Solving;

namespace NetSolve.Presentation;

/// <summary>How a unit's targets read beside its status: the breached ones named, in one place for every writer.</summary>
public static class TargetWords
{
    /// <summary>The word for a unit whose targets are all met.</summary>
    public const string Met = "met";

    /// <summary>The sign printed before breached targets in plain text, so a miss reads at a glance without colour.</summary>
    public const string BreachMarker = "x";

    /// <summary>True when some unit of <paramref name="solution"/> has a target: only then do outputs show targets.</summary>
    public static bool AnyTargets(NetworkSolution solution)
    {
        ArgumentNullException.ThrowIfNull(solution);
        return solution.Network.Units.Any(unit => unit.Targets is { IsEmpty: false });
    }

    /// <summary>The breached targets' keys joined by ", " (<c>mean_wait, wait_over</c>); empty when none is breached.</summary>
    public static string Breached(UnitResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        return string.Join(", ", result.TargetsBreached.Select(TargetKeys.Of));
    }

    /// <summary>
    /// The targets cell: empty for a unit without targets, <see cref="Met"/> when all are met, else the breached keys
    /// marked with <see cref="BreachMarker"/> for people.
    /// </summary>
    public static Cell Cell(UnitResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        if (result.Unit.Targets is not { IsEmpty: false })
        {
            return Metrics.Cell.Word(string.Empty);
        }

        return result.TargetsBreached.IsEmpty ? Metrics.Cell.Word(Met, " ") : Metrics.Cell.Word(Breached(result), BreachMarker);
    }

    /// <summary>
    /// One sentence on the targets: which units miss which (<c>targets missed: critical_care (mean_wait)</c>) or that
    /// all are met; null when no unit has a target.
    /// </summary>
    public static string? Finding(NetworkSolution solution)
    {
        ArgumentNullException.ThrowIfNull(solution);
        if (!AnyTargets(solution))
        {
            return null;
        }

        var missed = solution.Units.Where(unit => !unit.TargetsBreached.IsEmpty).Select(unit => $"{unit.Unit.Id} ({Breached(unit)})").ToList();
        int withTargets = solution.Network.Units.Count(unit => unit.Targets is { IsEmpty: false });
        return missed.Count == 0
            ? string.Create(CultureInfo.InvariantCulture, $"targets: all met at the {withTargets} unit(s) with targets")
            : $"targets missed: {string.Join(", ", missed)}";
    }
}

using System.Text.RegularExpressions;
using NetSolve.Diagnostics;
using NetSolve.Model;
using NetSolve.Parsing.Values;

namespace NetSolve.Cli.Settings;

/// <summary>
/// One <c>--target</c> as written: <c>[UNIT:] KEY &lt;= VALUE</c>, or <c>[UNIT:] wait_over TIME &lt;= SHARE</c>; no unit (or
/// <c>all_units</c>) sets it for every unit. The keys are the network file's (docs/network-file.md, "Targets").
/// </summary>
/// <param name="UnitId">The unit, or null for every unit.</param>
/// <param name="Kind">Which target.</param>
/// <param name="Time">The wait of <c>wait_over</c> as written; null for the other kinds.</param>
/// <param name="Value">The limit as written: a duration for the means, a share for <c>wait_over</c> and <c>turned_away</c>.</param>
internal sealed record TargetText(string? UnitId, TargetKind Kind, string? Time, string Value)
{
    private static readonly Regex Form = new(
        @"^\s*(?:(?<unit>[A-Za-z][A-Za-z0-9_-]*)\s*:\s*)?(?<key>[A-Za-z_]+)(?:\s+(?<time>[^\s<=]+))?\s*<=\s*(?<value>\S+)\s*$",
        RegexOptions.ExplicitCapture | RegexOptions.CultureInvariant, TimeSpan.FromSeconds(1));

    /// <summary>Reads <paramref name="text"/>; null with the reason (without the option's name) when it is not a target.</summary>
    public static TargetText? Parse(string text, out string? problem)
    {
        ArgumentNullException.ThrowIfNull(text);
        var match = Form.Match(text);
        if (!match.Success)
        {
            problem = "is not UNIT: KEY <= VALUE";
            return null;
        }

        string key = match.Groups["key"].Value;
        int index = TargetKeys.All.ToList().IndexOf(key);
        if (index < 0)
        {
            problem = $"has no target '{key}'{NearestName.Hint(key, TargetKeys.All)} (targets: {string.Join(", ", TargetKeys.All)})";
            return null;
        }

        var kind = (TargetKind)index;
        string? time = match.Groups["time"].Success ? match.Groups["time"].Value : null;
        string value = match.Groups["value"].Value;
        problem = (kind == TargetKind.WaitOver, time) switch
        {
            (true, null) => "needs the wait after wait_over (e.g. wait_over 4h <= 5%)",
            (true, string t) => DurationValue.Parse(t, TimeUnit.Hour).IsValid ? ProbabilityProblem(value) : $"has '{t}', which is not a duration",
            (false, string t) => $"has '{t}' after {key}: only wait_over takes a time",
            (false, null) => kind == TargetKind.TurnedAway ? ProbabilityProblem(value) : DurationProblem(value),
        };
        string? unit = match.Groups["unit"].Success && match.Groups["unit"].Value != TargetKeys.AllUnits ? match.Groups["unit"].Value : null;
        return problem is null ? new TargetText(unit, kind, time, value) : null;
    }

    /// <summary>The target in hours (durations read in <paramref name="timeUnit"/> when bare), set on otherwise empty targets.</summary>
    public UnitTargets ToTargets(TimeUnit timeUnit) => Kind switch
    {
        TargetKind.MeanWait => new UnitTargets(MaxMeanWaitHours: DurationValue.Parse(Value, timeUnit).Value),
        TargetKind.MeanTimeInUnit => new UnitTargets(MaxMeanTimeInUnitHours: DurationValue.Parse(Value, timeUnit).Value),
        TargetKind.WaitOver => new UnitTargets(WaitOver: new WaitOverTarget(DurationValue.Parse(Time!, timeUnit).Value, ProbabilityValue.Parse(Value).Value)),
        _ => new UnitTargets(MaxTurnedAway: ProbabilityValue.Parse(Value).Value),
    };

    private static string? ProbabilityProblem(string value) => ProbabilityValue.Parse(value).IsValid ? null : $"has '{value}', which is not a share (write e.g. 5%)";

    private static string? DurationProblem(string value) => DurationValue.Parse(value, TimeUnit.Hour).IsValid ? null : $"has '{value}', which is not a duration (write e.g. 15min, 4h)";
}

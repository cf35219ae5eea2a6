using System.Globalization;
using NetSolve.Diagnostics;
using NetSolve.Model;
using NetSolve.Parsing.Values;

namespace NetSolve.Parsing;

/// <summary>
/// Warns about service times written as a bare number. A bare number is valid (it is in the file's time unit), but
/// it is the commonest slip in a network file: <c>service: 25</c> meant as minutes in an hourly file is 25 hours, and
/// the unit then shows thousands of percent. The warning names the unit, the place and the unit of time it was read in.
/// </summary>
/// <remarks>Runs on the YAML tree after a successful parse, so only values the reader accepted are looked at.</remarks>
public static class BareNumbers
{
    /// <summary>True when <paramref name="text"/> is a positive number with no unit of time; <paramref name="amount"/> is that number.</summary>
    public static bool IsBare(string text, out double amount)
    {
        ArgumentNullException.ThrowIfNull(text);
        return IsBare(text.AsSpan(), out amount);
    }

    /// <summary>True when <paramref name="text"/> is a positive number with no unit of time; <paramref name="amount"/> is that number.</summary>
    public static bool IsBare(ReadOnlySpan<char> text, out double amount)
    {
        amount = 0.0;
        return NumberText.Split(text, string.Empty, out var number, out var suffix) && suffix.Length == 0
            && NumberText.IsNumber(number, out amount) && amount > 0.0;
    }

    /// <summary>
    /// Adds one warning per bare service number under <c>units</c> and under each group's <c>services</c>, and per bare
    /// time in a journey's <c>over</c> list (<c>over: [4]</c> in a file in minutes asks about 4 minutes, not 4 hours).
    /// </summary>
    internal static void Check(YamlNode root, TimeUnit timeUnit, List<Diagnostic> diagnostics)
    {
        if (root.AsMapping is not YamlMapping top)
        {
            return;
        }

        foreach (var (unitKey, unit) in Entries(top.Find("units")))
        {
            Warn(Child(unit, "service"), unitKey, null, timeUnit, diagnostics);
        }

        foreach (var (groupKey, group) in Entries(top.Find("groups")))
        {
            foreach (var (unitKey, service) in Entries(Child(group, "services")))
            {
                Warn(Child(service, "service"), unitKey, groupKey.Value, timeUnit, diagnostics);
            }
        }

        foreach (var (journeyId, journey) in Entries(top.Find("journeys")))
        {
            if (Child(journey, "over")?.AsSequence is not YamlSequence over)
            {
                continue;
            }

            foreach (var item in over.Items)
            {
                if (item.AsScalar is YamlScalar time && IsBare(time.Text, out _))
                {
                    diagnostics.Add(new Diagnostic(DiagnosticSeverity.Warning, DiagnosticCodes.BareNumber, time.Location,
                        string.Concat("journey '", journeyId.Value, "'"), NoUnitOfTime("over", time.Value, timeUnit)));
                }
            }
        }
    }

    /// <summary>A warning when <paramref name="node"/> is a bare number; the unit's id and the text are made into strings only then.</summary>
    private static void Warn(YamlNode? node, YamlKey unitKey, string? groupId, TimeUnit timeUnit, List<Diagnostic> diagnostics)
    {
        if (node?.AsScalar is not YamlScalar scalar || !IsBare(scalar.Text, out _))
        {
            return;
        }

        diagnostics.Add(ServiceWarning(scalar.Location, scalar.Value, unitKey.Value, groupId, timeUnit));
    }

    /// <summary>
    /// The warning for a bare service number, its words built only when read: the command line prints the first few
    /// of a kind, and a generated file can have tens of thousands. (A method of its own, so that the captured values
    /// are allocated only for a bare number, not for every unit looked at.)
    /// </summary>
    private static Diagnostic ServiceWarning(SourceLocation location, string text, string unitId, string? groupId, TimeUnit timeUnit) =>
        Diagnostic.Warning(DiagnosticCodes.BareNumber, location, unitId, () =>
            NoUnitOfTime(groupId is null ? "service" : string.Concat("service of group '", groupId, "'"), text, timeUnit));

    /// <summary>The warning's words: what was bare, how it was read and how to say which unit was meant.</summary>
    private static string NoUnitOfTime(string where, string text, TimeUnit timeUnit)
    {
        IsBare(text, out double amount);
        string number = text.Trim();
        string unitName = TimeConstants.Name(timeUnit);
        return string.Create(
            CultureInfo.InvariantCulture,
            $"{where} '{text}' has no unit of time, so it was read as {amount:0.###} {unitName}s (the file's time_unit is {unitName}); write e.g. {number}min or {number}h to say which");
    }

    /// <summary>The first value under <paramref name="key"/>; a plain loop, as it runs once per unit.</summary>
    private static YamlNode? Child(YamlNode node, string key) => node.AsMapping is YamlMapping mapping ? mapping.Find(key) : null;

    /// <summary>The entries of <paramref name="node"/> when it is a mapping; none otherwise.</summary>
    private static YamlEntries Entries(YamlNode? node) => node?.AsMapping is YamlMapping mapping ? mapping.Entries : default;
}

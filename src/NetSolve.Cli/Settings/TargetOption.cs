using System.CommandLine;
using NetSolve.Diagnostics;
using NetSolve.Model;
using NetSolve.Presentation.Formats;

namespace NetSolve.Cli.Settings;

/// <summary>
/// <c>--target</c>, repeatable, for the commands that show status (<c>solve</c>, <c>map</c>, <c>report</c>) and for
/// <c>staff</c>: the file's targets with these set over them, target by target (a unit's own over all units').
/// </summary>
internal static class TargetOption
{
    /// <summary>A new <c>--target</c> option; its form is checked with the other usage errors.</summary>
    public static Option<string[]> Create(string purpose) => new("--target")
    {
        Description = "Target, repeatable: 'UNIT: KEY <= VALUE' with KEY mean_wait, mean_time_in_unit or turned_away, "
            + "or 'UNIT: wait_over TIME <= SHARE'; without UNIT (or all_units) for every unit. " + purpose,
        HelpName = "TARGET",
        Arity = ArgumentArity.ZeroOrMore,
        CustomParser = result =>
        {
            foreach (var token in result.Tokens)
            {
                if (TargetText.Parse(token.Value, out string? problem) is null)
                {
                    result.AddError(Messages.NotTarget(token.Value, problem!));
                }
            }

            return [.. result.Tokens.Select(token => token.Value)];
        },
    };

    /// <summary>
    /// <paramref name="network"/> with <paramref name="texts"/> set over its units' targets, in order (a later one wins);
    /// an unknown unit, or turned_away at a unit without a capacity, is an <see cref="InputException"/> naming every one.
    /// </summary>
    public static Network Apply(Network network, string[]? texts)
    {
        ArgumentNullException.ThrowIfNull(network);
        if (texts is null || texts.Length == 0)
        {
            return network;
        }

        var ids = network.Units.Select(unit => unit.Id).ToList();
        var problems = new List<string>();
        var units = network.Units.ToBuilder();
        foreach (string text in texts)
        {
            var target = TargetText.Parse(text, out _)!;
            var given = target.ToTargets(network.TimeUnit);
            if (target.UnitId is string id && !ids.Contains(id, StringComparer.Ordinal))
            {
                problems.Add(Messages.UnknownUnit("--target", SafeText.ForDisplay(text), id, NearestName.Hint(id, ids)));
                continue;
            }

            for (int i = 0; i < units.Count; i++)
            {
                var unit = units[i];
                if (target.UnitId is string only && unit.Id != only)
                {
                    continue;
                }

                if (target.Kind == TargetKind.TurnedAway && unit.Capacity is null)
                {
                    if (target.UnitId is not null)
                    {
                        problems.Add(Messages.TargetNeedsCapacity(text, unit.Id));
                    }

                    continue;
                }

                units[i] = unit with { Targets = given.Over(unit.Targets) };
            }
        }

        return problems.Count == 0 ? network with { Units = units.ToImmutable() } : throw new InputException(string.Join("\n", problems));
    }
}

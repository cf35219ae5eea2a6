using System.Collections.Immutable;

namespace NetSolve.Fitting.Estimation;

/// <summary>The evidence behind a whole fitted network.</summary>
/// <param name="Window">The extract's span.</param>
/// <param name="Units">Per unit, in the order given.</param>
/// <param name="Entries">All entries into the hospital, as a rate with its exact Poisson interval.</param>
/// <param name="Profile">The network's arrival profile from all entries (the one a network file's top-level <c>arrival_profile</c> takes).</param>
public sealed record NetworkEvidence(ExtractWindow Window, ImmutableArray<UnitEvidence> Units, RateEvidence Entries, ArrivalProfileEstimate Profile)
{
    /// <summary>Stays in every unit.</summary>
    public int Stays => Units.Sum(unit => unit.Stay.Stays);

    /// <summary>Stays still running at the extract's end, in every unit.</summary>
    public int Censored => Units.Sum(unit => unit.Stay.Censored);

    /// <summary>Every unit's warnings, unit by unit.</summary>
    public IEnumerable<FitWarning> Warnings => Units.SelectMany(unit => unit.Warnings);
}

using System.Collections.Immutable;
using NetSolve.Model;

namespace NetSolve.Analysis;

/// <summary>How a network behaves as demand grows: saturation order, thresholds and one solution per factor.</summary>
/// <remarks>Immutable. Factors multiply every external arrival stream, or only <see cref="Stream"/> when it is set.</remarks>
/// <param name="Network">The network at today's demand (factor 1).</param>
/// <param name="Stream">The unit whose external arrivals grow, or null when every stream grows.</param>
/// <param name="StrainThreshold">Utilisation at which a unit counts as strained.</param>
/// <param name="Saturation">
/// Units that saturate at some finite factor, in the order they do (smallest factor first, ties in file order).
/// Units with unlimited servers, with a capacity (they refuse patients instead, see <see cref="BedLimits"/>), with no
/// flow, or (for a stream) not fed by it never saturate and are not listed.
/// </param>
/// <param name="Steps">One solution per requested factor, in the order requested.</param>
public sealed record GrowthResult(
    Network Network,
    string? Stream,
    double StrainThreshold,
    ImmutableArray<SaturationPoint> Saturation,
    ImmutableArray<GrowthStep> Steps)
{
    /// <summary>Every unit with a capacity, in file order, with the factors at which 1% and 5% of its arrivals find it full.</summary>
    public ImmutableArray<BedLimitPoint> BedLimits { get; init; } = [];

    /// <summary>The unit that becomes unstable first and the factor at which it does; null when none ever does.</summary>
    public SaturationPoint? FirstUnstable => Saturation.IsEmpty ? null : Saturation[0];

    /// <summary>The unit that crosses the strain threshold first and the factor at which it does; null when none ever does.</summary>
    public SaturationPoint? FirstStrained => Saturation.IsEmpty
        ? null
        : Saturation.OrderBy(point => point.StrainFactor).First();
}

using System.Collections.Immutable;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.Metrics;

namespace NetSolve.Presentation.Growth;

/// <summary>The registry of a unit's saturation point: ids as in the contract's <c>saturation_order</c> objects.</summary>
public static class SaturationColumns
{
    /// <summary>The unit.</summary>
    public static readonly Column<SaturationPoint> Unit = Columns.Words<SaturationPoint>("unit", "unit", point => point.UnitId);

    /// <summary>The growth factor at which the unit reaches the strain threshold.</summary>
    public static readonly Column<SaturationPoint> StrainFactor = Columns.Number<SaturationPoint>("strain_factor", "strained at", MetricDimension.Factor, point => point.StrainFactor);

    /// <summary>The growth factor at which the unit becomes unstable.</summary>
    public static readonly Column<SaturationPoint> SaturationFactor = Columns.Number<SaturationPoint>("saturation_factor", "unstable at", MetricDimension.Factor, point => point.SaturationFactor);

    /// <summary>How much more demand makes the unit unstable, as a share of today's; for people, the JSON has the factor.</summary>
    public static readonly Column<SaturationPoint> GrowthToUnstable = Columns.Number<SaturationPoint>(
        "growth_to_unstable", "growth to unstable", MetricDimension.Fraction, point => point.SaturationFactor - 1.0, Audience.People);

    /// <summary>Every column, in the contract's order.</summary>
    public static readonly ImmutableArray<Column<SaturationPoint>> All = [Unit, StrainFactor, SaturationFactor, GrowthToUnstable];

    /// <summary>The saturation order of <paramref name="growth"/>: units that saturate, first to saturate first.</summary>
    public static ResultTable Table(GrowthResult growth)
    {
        ArgumentNullException.ThrowIfNull(growth);
        return ResultTable.Build(All, growth.Saturation, growth.Network.TimeUnit);
    }
}

using NetSolve.Solving;

namespace NetSolve.Tests.Core.Solving.Capacity;

/// <summary>A loss unit offered far more than it can take still carries its servers' worth of patients.</summary>
public sealed class OverloadedLossUnitTests
{
    // Exact by hand (Erlang B with one server): B(1, a) = a / (1 + a), so the admitted rate λ(1 − B) = λ / (1 + a);
    // with a mean stay of 1 h, a = λ and the unit admits λ / (1 + λ), just under 1 patient an hour, at any λ.
    [Theory]
    [InlineData(1e6)]
    [InlineData(1e300)]
    public void One_bed_offered_an_absurd_rate_admits_about_one_patient_an_hour(double arrivalsPerHour)
    {
        var result = FiniteCapacityFormulas.Solve(1, 1, arrivalsPerHour, 1.0);

        Assert.Equal(arrivalsPerHour / (1.0 + arrivalsPerHour), result.AdmittedPerHour, 1e-12);
        Assert.Equal(1.0, result.Utilisation, 1e-6);
        Assert.Equal(1.0, result.MeanInUnit, 1e-6);
    }
}

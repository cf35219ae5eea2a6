using NetSolve.Analysis;
using NetSolve.Solving;

namespace NetSolve.Tests.Analysis;

public sealed class PathwayAnalysisTests
{
    private const double Tolerance = 1e-12;

    [Fact]
    public void Clinic_patients_see_the_clinician_one_and_a_quarter_times_and_one_in_five_has_an_x_ray()
    {
        // Exact by hand (networks/millbrook-clinic.yaml): reception → clinician (1), clinician → xray (0.2), xray →
        // clinician (1). From reception: v_clinician = 1 + v_xray, v_xray = 0.2·v_clinician, so v_clinician = 1.25 and
        // v_xray = 0.25; the x-ray is visited at most once on any path that leaves, so P(x-ray) = 0.2.
        var solution = NetworkSolver.Solve(SmallNetworks.Example("millbrook-clinic.yaml"));
        var pathway = PathwayAnalysis.From(solution, "reception");
        Assert.Equal([1.0, 1.25, 0.25], pathway.Units.Select(u => u.ExpectedVisits), new ToleranceComparer(Tolerance));
        Assert.Equal([1.0, 1.0, 0.2], pathway.Units.Select(u => u.VisitProbability!.Value), new ToleranceComparer(Tolerance));
    }

    [Fact]
    public void An_emergency_patient_reaches_the_harbourside_ward_with_probability_155_over_615()
    {
        // Exact by hand (networks/harbourside.yaml), h_X = P(ever reach ward from X), h_ward = 1:
        // h_E = 0.35·h_I + 0.30·h_L + 0.12, h_I = 0.5·h_E + 0.10, h_L = 0.7·h_E
        // ⇒ h_E (1 − 0.175 − 0.21) = 0.035 + 0.12 ⇒ h_E = 0.155 / 0.615.
        var network = SmallNetworks.Example("harbourside.yaml");
        Assert.Equal(0.155 / 0.615, PathwayAnalysis.VisitProbability(network, "emergency", "ward"), Tolerance);
        // and imaging: h'_E = 0.35 + 0.30·0.7·h'_E... with h'_I = 1: h'_E = 0.35 + 0.21·h'_E ⇒ 0.35 / 0.79.
        Assert.Equal(0.35 / 0.79, PathwayAnalysis.VisitProbability(network, "emergency", "imaging"), Tolerance);
        Assert.Equal(1.0, PathwayAnalysis.VisitProbability(network, "ward", "ward"));
    }

    [Fact]
    public void Expected_visits_from_emergency_follow_from_the_routing_fractions()
    {
        // Exact by hand: v_E = 1 + 0.5·v_I + 0.7·v_L with v_I = 0.35·v_E and v_L = 0.30·v_E ⇒ v_E = 1/0.615.
        var visits = PathwayAnalysis.ExpectedVisits(SmallNetworks.Example("harbourside.yaml"), "emergency");
        Assert.Equal(1.0 / 0.615, visits[0], Tolerance);
        Assert.Equal(0.35 / 0.615, visits[1], Tolerance);
    }

    [Fact]
    public void Visits_weighted_by_the_arrival_streams_equal_the_solved_visits_per_patient()
    {
        // Source: linearity of the traffic equations, λ = Σ_s γ_s · N_s (N_s the visits from entry unit s).
        var network = SmallNetworks.Example("kestrel-general.yaml");
        var solution = NetworkSolver.Solve(network);
        var total = new double[network.Units.Length];
        foreach (var arrival in network.Arrivals)
        {
            var visits = PathwayAnalysis.ExpectedVisits(network, arrival.UnitId);
            for (int j = 0; j < total.Length; j++)
            {
                total[j] += arrival.PerHour * visits[j];
            }
        }

        for (int j = 0; j < total.Length; j++)
        {
            Assert.Equal(solution.Units[j].ArrivalsPerHour, total[j], 1e-9 * Math.Max(1.0, total[j]));
        }
    }

    [Fact]
    public void A_path_sums_the_mean_times_and_multiplies_the_routing_fractions()
    {
        // Exact by hand: emergency → imaging is 0.35 and imaging → ward 0.10, so 0.035 step by step.
        var solution = NetworkSolver.Solve(SmallNetworks.Example("harbourside.yaml"));
        var path = PathwayAnalysis.Path(solution, ["emergency", "imaging", "ward"]);
        Assert.Equal(0.035, path.StepProbability, Tolerance);
        double expected = solution.Units[0].MeanTimeInUnitHours!.Value + solution.Units[1].MeanTimeInUnitHours!.Value + solution.Units[3].MeanTimeInUnitHours!.Value;
        Assert.Equal(expected, path.MeanTimeHours!.Value, Tolerance);
    }

    [Fact]
    public void Mean_time_from_the_only_entry_equals_the_networks_mean_time_in_system()
    {
        // Source: Little's law — with one entry unit, Σ_j N_j W_j = Σ_j L_j / γ.
        var solution = NetworkSolver.Solve(SmallNetworks.Example("millbrook-clinic.yaml"));
        var pathway = PathwayAnalysis.From(solution, "reception");
        Assert.Equal(solution.Totals.MeanTimeInSystemHours!.Value, pathway.MeanTimeInNetworkHours!.Value, 1e-9);
    }

    [Fact]
    public void A_unit_that_cannot_be_reached_from_the_start_has_chance_zero_when_asked()
    {
        // Exact by hand: nothing routes back from the ward to emergency in networks/harbourside.yaml.
        var solution = NetworkSolver.Solve(SmallNetworks.Example("harbourside.yaml"));
        var pathway = PathwayAnalysis.From(solution, "ward", ["emergency"]);
        var emergency = pathway.Units.Single(u => u.UnitId == "emergency");
        Assert.Equal(0.0, emergency.VisitProbability);
        Assert.Equal(0.0, emergency.ExpectedVisits);
    }

    private sealed class ToleranceComparer(double tolerance) : IEqualityComparer<double>
    {
        public bool Equals(double x, double y) => Math.Abs(x - y) <= tolerance;

        public int GetHashCode(double obj) => 0;
    }
}

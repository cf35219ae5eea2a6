using System.Globalization;
using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Tests.Core.TimeVarying;

public class TimeVaryingTrafficTests
{
    private const int StepsPerHour = 60;
    private const double StepHours = 1.0 / StepsPerHour;
    private const int Steps = 24 * StepsPerHour;

    // The one-minute grid holds the sinusoid's input constant (or linear) within each step: a second-order error of
    // about b·γ·h²/12 ≈ 4e-5 patients for b = 6, γ = 2π/24, h = 1/60 h; the method itself is exact for such inputs.
    private const double GridError = 1e-4;

    // Exact by hand (the linear ODE m' = a + b·sin(γt) − μ·m solved by undetermined coefficients; the closed form of
    // Eick, Massey and Whitt, "M_t/G/∞ queues with sinusoidal arrival rates", Management Science 39(2), 1993,
    // 241–252, for exponential service): m(t) = a/μ + b/(μ² + γ²)·(μ·sin γt − γ·cos γt).
    [Theory]
    [InlineData(1.0)]
    [InlineData(0.25)]
    [InlineData(6.0)]
    public void A_sinusoidal_infinite_server_unit_follows_the_closed_form_with_its_lag(double meanServiceHours)
    {
        const double mean = 10.0;
        const double amplitude = 6.0;
        var network = TimeVaryingTestNetworks.Tandem(mean, meanServiceHours);
        var plan = TimeVaryingTestNetworks.SinusoidalPlan(network, mean, amplitude, Steps, StepHours);

        var (_, loads) = LoadPropagation.Run(1, Steps, StepHours, [plan], TimeVaryingOptions.Default);

        double mu = 1.0 / meanServiceHours;
        double gamma = TimeVaryingTestNetworks.DailyAngularRate;
        for (int k = 0; k <= Steps; k += 7)
        {
            double t = k * StepHours;
            double exact = (mean / mu) + (amplitude / ((mu * mu) + (gamma * gamma)) * ((mu * Math.Sin(gamma * t)) - (gamma * Math.Cos(gamma * t))));
            Assert.Equal(exact, loads[0][k], GridError);
        }
    }

    // Exact by hand: the first unit's departure rate μ1·m1(t) = a + b·μ1/√(μ1² + γ²)·sin(γt − φ1), φ1 = atan(γ/μ1),
    // is the second unit's input, so m2(t) = a/μ2 + b·μ1/(√(μ1² + γ²)·√(μ2² + γ²))·sin(γt − φ1 − φ2): each exponential
    // unit scales the wave by μ/√(μ² + γ²) and delays it by atan(γ/μ)/γ hours.
    [Fact]
    public void A_two_unit_tandem_passes_the_wave_on_smaller_and_later()
    {
        const double mean = 8.0;
        const double amplitude = 5.0;
        const double firstMean = 2.0;
        const double secondMean = 4.0;
        var network = TimeVaryingTestNetworks.Tandem(mean, firstMean, secondMean);
        var plan = TimeVaryingTestNetworks.SinusoidalPlan(network, mean, amplitude, Steps, StepHours);

        var (arrivals, loads) = LoadPropagation.Run(2, Steps, StepHours, [plan], TimeVaryingOptions.Default);

        double gamma = TimeVaryingTestNetworks.DailyAngularRate;
        double mu1 = 1.0 / firstMean;
        double mu2 = 1.0 / secondMean;
        double scale1 = mu1 / Math.Sqrt((mu1 * mu1) + (gamma * gamma));
        double phase1 = Math.Atan(gamma / mu1);
        double phase2 = Math.Atan(gamma / mu2);
        for (int k = 0; k < Steps; k += 11)
        {
            double t = k * StepHours;
            double secondLoad = (mean / mu2) + (amplitude * scale1 / Math.Sqrt((mu2 * mu2) + (gamma * gamma)) * Math.Sin((gamma * t) - phase1 - phase2));
            Assert.Equal(secondLoad, loads[1][k], GridError);
            double midStep = t + (0.5 * StepHours);
            double secondArrivals = mean + (amplitude * scale1 * Math.Sin((gamma * midStep) - phase1));
            Assert.Equal(secondArrivals, arrivals[1][k], GridError);
        }
    }

    // Exact by hand: with no profile every unit's load is constant and equals its flow times its mean service
    // (Little's law on the infinite-server unit); the flows are those of the steady-state traffic equations.
    [Theory]
    [InlineData("kestrel-general.yaml")]
    [InlineData("harbourside.yaml")]
    [InlineData("millbrook-clinic.yaml")]
    public void Without_a_profile_every_hour_carries_the_steady_state_flow_and_load(string file)
    {
        var network = Support.TestNetworks.Example(file) with { ArrivalProfile = null };
        var steady = NetworkSolver.Solve(network);

        var solution = TimeVaryingTraffic.Solve(network);

        Assert.Equal(24, solution.CycleHours);
        for (int j = 0; j < network.Units.Length; j++)
        {
            double flow = steady.Units[j].ArrivalsPerHour;
            double load = flow * network.Units[j].EffectiveService.MeanHours;
            foreach (double hourly in solution.Units[j].ArrivalsPerHourByHour)
            {
                Assert.Equal(flow, hourly, 1e-9 * Math.Max(1.0, flow));
            }

            foreach (double hourly in solution.Units[j].OfferedLoadByHour)
            {
                Assert.Equal(load, hourly, 1e-9 * Math.Max(1.0, load));
            }
        }
    }

    // Exact by hand: a unit routing half its patients back to itself sees twice the external rate in the steady
    // state; over a profiled day its load still averages external × 2 × mean service (the cycle mean of a linear
    // system is the stationary value), and its peak lags the arrivals' peak.
    [Fact]
    public void A_loop_settles_to_the_steady_state_mean_over_the_day()
    {
        var unit = new Unit("ward", "ward", Servers.Unlimited, 3.0, ServiceCv: 0.5);
        var network = new Network("loop", TimeUnit.Hour, [unit], [new Arrival("ward", 4.0)], [new Route("ward", "ward", 0.5)])
        {
            ArrivalProfile = ArrivalProfile.Create(TimeVaryingTestNetworks.EmergencyDay()),
        };

        var solution = TimeVaryingTraffic.Solve(network);

        var ward = solution.Units[0];
        Assert.Equal(8.0, ward.ArrivalsPerHourByHour.Average(), 1e-8);
        Assert.Equal(24.0, ward.OfferedLoadByHour.Average(), 1e-7);
        int arrivalPeak = ward.ArrivalsPerHourByHour.IndexOf(ward.ArrivalsPerHourByHour.Max());
        int loadPeak = ward.OfferedLoadByHour.IndexOf(ward.OfferedLoadByHour.Max());
        Assert.True(loadPeak > arrivalPeak, string.Create(CultureInfo.InvariantCulture, $"load peaks at {loadPeak}, arrivals at {arrivalPeak}"));
    }

    // Exact by hand: a profile with day-of-week multipliers makes the cycle a week of 168 hours, Monday first.
    [Fact]
    public void A_day_of_week_profile_makes_the_cycle_a_week()
    {
        var network = TimeVaryingTestNetworks.SingleUnit(4, 0.5, 3.0, null) with
        {
            ArrivalProfile = ArrivalProfile.Create(Enumerable.Repeat(1.0, 24), [2.0, 1, 1, 1, 1, 1, 1]),
        };

        var solution = TimeVaryingTraffic.Solve(network);

        Assert.Equal(168, solution.CycleHours);
        Assert.Equal(3.0 * 2.0 / (8.0 / 7.0), solution.Units[0].ArrivalsPerHourByHour[12], 1e-9);
        Assert.Equal(3.0 / (8.0 / 7.0), solution.Units[0].ArrivalsPerHourByHour[36], 1e-9);
    }

    // Exact by hand: two groups on one unit, each with its own profile, add their arrivals hour by hour.
    [Fact]
    public void Each_group_follows_its_own_profile_and_their_arrivals_add()
    {
        var quiet = Enumerable.Repeat(1.0, 24).ToArray();
        var mornings = Enumerable.Range(0, 24).Select(h => h < 12 ? 3.0 : 1.0).ToArray();
        var network = TimeVaryingTestNetworks.SingleUnit(4, 0.5, 2.0, quiet) with
        {
            Groups = [new PatientGroup("elective", "elective", [new Arrival("resus", 1.0)]) { ArrivalProfile = ArrivalProfile.Create(mornings) }],
        };

        var solution = TimeVaryingTraffic.Solve(network);

        Assert.Equal(2.0 + 1.5, solution.Units[0].ArrivalsPerHourByHour[3], 1e-9);
        Assert.Equal(2.0 + 0.5, solution.Units[0].ArrivalsPerHourByHour[15], 1e-9);
    }
}

using NetSolve.Model;
using NetSolve.Solving;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Core.Solving.Variability;

public sealed partial class ArrivalVariabilityTests
{
    // Exact by hand: the tandem above written as a file, with arrival_cv 0 and service_cv √0.5 and √2: the network
    // entry point reads cs² = cv² and c0² = arrival_cv², so it gives the same 0.125 and 1.325.
    [Fact]
    public void A_network_file_supplies_the_arrival_cv_and_service_cv()
    {
        const string Yaml = """
            units:
              clinic:
                servers: 1
                service: 30min
                service_cv: 0.7071067811865476
              ward:
                servers: 1
                service: 48min
                service_cv: 1.4142135623730951
            arrivals:
              clinic: 1/h
            arrival_cv:
              clinic: 0
            routes:
              clinic:
                ward: 1
            """;
        var network = TestNetworks.Parse(Yaml);

        var solution = ArrivalVariability.SolveNetwork(network, [1.0, 1.0], [0.5, 0.8]);

        Assert.Equal(0.125, solution.DepartureScv[0], 1e-12);
        Assert.Equal(0.125, solution.ArrivalScv[1], 1e-12);
        Assert.Equal(1.325, solution.DepartureScv[1], 1e-12);
    }

    // Common practice: dense LU and Gauss–Seidel solve the same linear system, so they agree to rounding; a random
    // 300-unit network with loops, external cv from 0.3 to 2 and service cv from 0.3 to 2.
    [Fact]
    public void Dense_and_sweeps_agree_on_a_random_network_with_loops()
    {
        var (units, routes) = Generated(300, seed: 11, loops: true);

        var dense = ArrivalVariability.Solve(units, routes, TrafficSolveMethod.Dense);
        var swept = ArrivalVariability.Solve(units, routes, TrafficSolveMethod.Sparse);

        Assert.True(dense.Dense);
        Assert.False(swept.Dense);
        for (int i = 0; i < units.Length; i++)
        {
            Assert.Equal(dense.ArrivalScv[i], swept.ArrivalScv[i], 1e-10);
            Assert.InRange(dense.ArrivalScv[i], 0.0, ArrivalVariability.MaxScv);
        }
    }

    // Common practice: 5,000 units go to the sweeps (above DenseLimit) and stay within the range the averages allow:
    // every ca² lies between the smallest and largest of 1, the external SCVs and the service terms.
    [Fact]
    public void A_five_thousand_unit_network_is_solved_by_sweeps()
    {
        var (units, routes) = Generated(5_000, seed: 5, loops: true);

        var solution = ArrivalVariability.Solve(units, routes);

        Assert.False(solution.Dense);
        double low = units.Min(unit => Math.Min(unit.ExternalScv, Math.Max(unit.ServiceScv, ArrivalVariability.MinimumDepartureServiceScv)));
        double high = units.Max(unit => Math.Max(unit.ExternalScv, unit.ServiceScv));
        Assert.All(solution.ArrivalScv, scv => Assert.InRange(scv, Math.Min(low, 1.0), Math.Max(high, 1.0)));
    }

    // Common practice: the variability functions solve one system per unit with the same solvers, so dense LU and
    // sweeps agree to rounding; with weights ω and w in [0, 1] every ca² stays a weighted average of 1, the external
    // SCVs and the service terms (docs/methods.md, "Variability functions").
    [Fact]
    public void Variability_functions_agree_between_dense_and_sweeps_and_stay_in_range()
    {
        var (units, routes) = Generated(60, seed: 13, loops: true);

        var dense = ArrivalVariability.Solve(units, routes, TrafficSolveMethod.Dense, ArrivalVariabilityMethod.VariabilityFunctions);
        var swept = ArrivalVariability.Solve(units, routes, TrafficSolveMethod.Sparse, ArrivalVariabilityMethod.VariabilityFunctions);

        double low = units.Min(unit => Math.Min(unit.ExternalScv, Math.Max(unit.ServiceScv, ArrivalVariability.MinimumDepartureServiceScv)));
        double high = units.Max(unit => Math.Max(unit.ExternalScv, unit.ServiceScv));
        for (int i = 0; i < units.Length; i++)
        {
            Assert.Equal(dense.ArrivalScv[i], swept.ArrivalScv[i], 1e-10);
            Assert.InRange(dense.ArrivalScv[i], Math.Min(low, 1.0), Math.Max(high, 1.0));
        }
    }

    // Exact by hand: Poisson and exponential everywhere gives exactly 1 on the sweep path too.
    [Fact]
    public void A_large_all_Poisson_network_has_arrival_scv_exactly_1()
    {
        var (units, routes) = Generated(5_000, seed: 7, loops: true);
        var poisson = units.Select(unit => unit with { ServiceScv = 1.0, ExternalScv = 1.0 }).ToArray();

        var solution = ArrivalVariability.Solve(poisson, routes);

        Assert.All(solution.ArrivalScv, scv => Assert.Equal(1.0, scv));
    }

    /// <summary>
    /// Units in a chain-like mesh: each routes to up to two later units and, with <paramref name="loops"/>, sometimes back
    /// to an earlier one; every unit keeps at least 20% exit. Flows solved by the traffic equations' own rule.
    /// </summary>
    private static (ArrivalVariabilityUnit[] Units, ArrivalVariabilityRoute[] Routes) Generated(int count, int seed, bool loops)
    {
        var random = new Random(seed);
        var routes = new List<ArrivalVariabilityRoute>();
        var external = new double[count];
        for (int i = 0; i < count; i++)
        {
            external[i] = i % 10 == 0 ? 1.0 + random.NextDouble() : 0.0;
            var targets = new HashSet<int>();
            double left = 0.8;
            for (int k = 0; k < 2 && i + 1 < count; k++)
            {
                int target = Math.Min(count - 1, i + 1 + random.Next(5));
                if (targets.Add(target))
                {
                    double p = left * random.NextDouble();
                    left -= p;
                    routes.Add(new ArrivalVariabilityRoute(i, target, p));
                }
            }

            if (loops && i > 5 && random.NextDouble() < 0.2)
            {
                int back = i - 1 - random.Next(5);
                if (targets.Add(back))
                {
                    routes.Add(new ArrivalVariabilityRoute(i, back, left * 0.5));
                }
            }
        }

        double[] flows = Flows(count, external, routes);
        var units = new ArrivalVariabilityUnit[count];
        for (int i = 0; i < count; i++)
        {
            int servers = 1 + random.Next(8);
            double cv = 0.3 + (1.7 * random.NextDouble());
            double externalCv = 0.3 + (1.7 * random.NextDouble());
            units[i] = new ArrivalVariabilityUnit(flows[i], Servers.Of(servers), 0.9 * random.NextDouble(), cv * cv)
            {
                ExternalPerHour = external[i],
                ExternalScv = externalCv * externalCv,
            };
        }

        return (units, [.. routes]);
    }

    private static double[] Flows(int count, double[] external, List<ArrivalVariabilityRoute> routes)
    {
        var flows = new double[count];
        for (int sweep = 0; sweep < 10_000; sweep++)
        {
            var next = (double[])external.Clone();
            foreach (var route in routes)
            {
                next[route.To] += route.Probability * flows[route.From];
            }

            double change = next.Select((value, i) => Math.Abs(value - flows[i])).Max();
            flows = next;
            if (change < 1e-13)
            {
                break;
            }
        }

        return flows;
    }
}

using NetSolve.Model;
using NetSolve.Solving;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Core.Solving;

public class TrafficEquationsTests
{
    // Exact by hand: lambda_E = 11.5 + 0.5 lambda_I + 0.7 lambda_L with lambda_I = 0.35 lambda_E and
    // lambda_L = 0.30 lambda_E gives lambda_E = 11.5 / 0.615; the ward gets 18/24 + 0.12 lambda_E + 0.1 lambda_I.
    [Theory]
    [InlineData("Dense")]
    [InlineData("Sparse")]
    [InlineData("Automatic")]
    public void The_harbourside_flows_match_the_hand_solution(string method)
    {
        var flows = TrafficEquations.Solve(RoutingTable.Build(TestNetworks.Example("harbourside.yaml")), Enum.Parse<TrafficSolveMethod>(method));
        double emergency = 11.5 / 0.615;
        double imaging = 0.35 * emergency;
        double ward = (18.0 / 24.0) + (0.12 * emergency) + (0.10 * imaging);

        Assert.Equal(emergency, flows[0], 1e-9);
        Assert.Equal(imaging, flows[1], 1e-9);
        Assert.Equal(0.30 * emergency, flows[2], 1e-9);
        Assert.Equal(ward, flows[3], 1e-9);
        Assert.Equal(0.6 * ward, flows[4], 1e-9);
    }

    // Exact by hand: a unit sending half its patients back to itself sees lambda = gamma / (1 - 0.5) = 2 gamma;
    // a loop among units nobody reaches gets flow 0.
    [Theory]
    [InlineData("Dense")]
    [InlineData("Sparse")]
    public void A_repeat_visit_doubles_the_flow_and_an_unreached_loop_gets_none(string method)
    {
        const string Yaml = """
            units:
              dialysis:
                servers: 4
                service: 4h
              orphan_a:
                servers: 1
                service: 1h
              orphan_b:
                servers: 1
                service: 1h
            arrivals:
              dialysis: 1.5/h
            routes:
              dialysis:
                dialysis: 0.5
              orphan_a:
                orphan_b: 1
              orphan_b:
                orphan_a: 1
            """;
        var flows = TrafficEquations.Solve(RoutingTable.Build(TestNetworks.Parse(Yaml)), Enum.Parse<TrafficSolveMethod>(method));

        Assert.Equal(3.0, flows[0], 1e-9);
        Assert.Equal(0.0, flows[1]);
        Assert.Equal(0.0, flows[2]);
    }

    // Exact by hand: two units sending each other 99.99% of their patients, fed 1/h from outside:
    // lambda_A = 1 / (1 - 0.9999^2), lambda_B = 0.9999 lambda_A. Padded with independent units so the sparse path
    // is taken; the sweeps converge slowly here (rate 0.9998 a sweep), which exercises the fallback.
    [Fact]
    public void A_strong_feedback_loop_above_the_dense_limit_is_solved_exactly()
    {
        var yaml = new System.Text.StringBuilder("units:\n  ward_a:\n    servers: 50\n    service: 1h\n  ward_b:\n    servers: 50\n    service: 1h\n");
        var arrivals = new System.Text.StringBuilder("arrivals:\n  ward_a: 1/h\n");
        for (int i = 0; i < TrafficEquations.DenseLimit + 20; i++)
        {
            yaml.Append(System.Globalization.CultureInfo.InvariantCulture, $"  pad{i}:\n    servers: 1\n    service: 1min\n");
            arrivals.Append(System.Globalization.CultureInfo.InvariantCulture, $"  pad{i}: 1/h\n");
        }

        yaml.Append(arrivals).Append("routes:\n  ward_a:\n    ward_b: 0.9999\n  ward_b:\n    ward_a: 0.9999\n");
        var flows = TrafficEquations.Solve(RoutingTable.Build(TestNetworks.Parse(yaml.ToString())));
        double wardA = 1.0 / (1.0 - (0.9999 * 0.9999));

        Assert.Equal(wardA, flows[0], 1e-6 * wardA);
        Assert.Equal(0.9999 * wardA, flows[1], 1e-6 * wardA);
        Assert.Equal(1.0, flows[2], 1e-12);
    }
}

using NetSolve.Simulation;

namespace NetSolve.Tests.Simulation;

public sealed class CumulativeSearchTests
{
    [Fact]
    public void Binary_search_over_one_row_of_routes_picks_what_a_scan_picks_and_minus_one_for_leaving()
    {
        // Exact by hand: the scan over the row [start, stop) returns the first route above the draw, or none.
        var random = new Xoshiro256StarStar(22, 0);
        for (int length = 1; length <= 30; length++)
        {
            var cumulative = RandomCumulative(ref random, length);
            for (int k = 0; k < length; k++)
            {
                // Rows that leave some patients out of the network: the last route below 1.
                cumulative[k] *= 0.9;
            }

            var routes = new RouteChoice[length + 6];
            for (int k = 0; k < routes.Length; k++)
            {
                routes[k] = new RouteChoice(k >= 3 && k < 3 + length ? cumulative[k - 3] : 0.5, k);
            }

            foreach (double draw in Draws(ref random, cumulative))
            {
                int expected = -1;
                for (int k = 3; k < 3 + length; k++)
                {
                    if (draw < routes[k].Cumulative)
                    {
                        expected = k;
                        break;
                    }
                }

                Assert.Equal(expected, CumulativeSearch.FirstAbove(routes, 3, 3 + length, draw));
            }
        }
    }

    /// <summary>Cumulative shares of <paramref name="length"/> outcomes, some of them zero (ties), the last exactly 1.</summary>
    private static double[] RandomCumulative(ref Xoshiro256StarStar random, int length)
    {
        var cumulative = new double[length];
        double running = 0.0;
        for (int k = 0; k < length; k++)
        {
            running += random.NextDouble() < 0.2 ? 0.0 : random.NextDouble();
            cumulative[k] = running;
        }

        for (int k = 0; k < length; k++)
        {
            cumulative[k] = running > 0.0 ? cumulative[k] / running : 1.0;
        }

        cumulative[^1] = 1.0;
        return cumulative;
    }

    /// <summary>Uniform draws, and every edge itself, where a scan and a search could most easily disagree.</summary>
    private static List<double> Draws(ref Xoshiro256StarStar random, double[] cumulative)
    {
        var draws = new List<double> { 0.0, Math.BitDecrement(1.0) };
        draws.AddRange(cumulative);
        draws.AddRange(cumulative.Select(Math.BitDecrement));
        for (int i = 0; i < 200; i++)
        {
            draws.Add(random.NextDouble());
        }

        return draws;
    }
}

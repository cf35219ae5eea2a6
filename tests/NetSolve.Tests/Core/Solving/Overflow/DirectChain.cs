using NetSolve.Solving;

namespace NetSolve.Tests.Core.Solving.Overflow;

/// <summary>A reference for <see cref="OverflowQueue"/>: the truncated joint chain of one interrupted stream, solved by Gauss-Seidel.</summary>
internal static class DirectChain
{
    public static (double MeanWaitHours, double WaitProbability) Solve(int servers, double serviceRate, double poisson, InterruptedPoisson stream, int levels)
    {
        var p = new double[levels + 1, 2];
        for (int l = 0; l <= levels; l++)
        {
            p[l, 0] = p[l, 1] = 1.0;
        }

        double[] rate = [poisson, poisson + stream.OnPerHour];
        double[] leave = [stream.OffToOnPerHour, stream.OnToOffPerHour];
        for (int sweep = 0; sweep < 200_000; sweep++)
        {
            double change = 0.0;
            for (int l = 0; l <= levels; l++)
            {
                for (int phase = 0; phase < 2; phase++)
                {
                    double outflow = (l < levels ? rate[phase] : 0.0) + (Math.Min(l, servers) * serviceRate) + leave[phase];
                    double inflow = (l > 0 ? p[l - 1, phase] * rate[phase] : 0.0)
                        + (l < levels ? p[l + 1, phase] * Math.Min(l + 1, servers) * serviceRate : 0.0)
                        + (p[l, 1 - phase] * leave[1 - phase]);
                    double next = inflow / outflow;
                    change = Math.Max(change, Math.Abs(next - p[l, phase]));
                    p[l, phase] = next;
                }
            }

            double total = 0.0;
            foreach (double value in p)
            {
                total += value;
            }

            for (int l = 0; l <= levels; l++)
            {
                p[l, 0] /= total;
                p[l, 1] /= total;
            }

            if (change < 1e-15)
            {
                break;
            }
        }

        double arrivals = 0.0, waiting = 0.0, queue = 0.0;
        for (int l = 0; l <= levels; l++)
        {
            double arriving = (p[l, 0] * rate[0]) + (p[l, 1] * rate[1]);
            arrivals += arriving;
            waiting += l >= servers ? arriving : 0.0;
            queue += Math.Max(0, l - servers) * (p[l, 0] + p[l, 1]);
        }

        return (queue / arrivals, waiting / arrivals);
    }
}

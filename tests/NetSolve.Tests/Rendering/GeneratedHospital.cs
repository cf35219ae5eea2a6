using System.Collections.Immutable;
using System.Globalization;
using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Tests.Rendering;

/// <summary>
/// Builds an invented hospital of any size for layout and speed tests: units in stages (front door, assessment,
/// diagnostics, procedures, wards, step-down, discharge), each routing forward to one or two units of the next
/// stage, some routing back for review, servers set so utilisations fall between about 45% and 95%.
/// </summary>
/// <remarks>Seeded: the same (units, seed) gives the same network. Shared with the benchmarks project.</remarks>
internal static class GeneratedHospital
{
    private static readonly string[] Kinds =
    [
        "Emergency department", "Urgent treatment centre", "Acute medical unit", "Surgical assessment unit",
        "Imaging", "Pathology laboratory", "Endoscopy", "Cardiac catheter lab", "Operating theatres",
        "Day surgery", "Critical care", "Coronary care", "Medical ward", "Surgical ward", "Frailty unit",
        "Stroke unit", "Orthopaedic ward", "Step-down beds", "Rehabilitation ward", "Discharge lounge",
    ];

    private const int UnitsPerStage = 5;

    public static Network Create(int unitCount, int seed)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(unitCount, 2);
        var random = new Random(seed);
        int stages = (unitCount + UnitsPerStage - 1) / UnitsPerStage;
        var ids = new string[unitCount];
        var labels = new string[unitCount];
        var stageOf = new int[unitCount];
        for (int i = 0; i < unitCount; i++)
        {
            stageOf[i] = i * stages / unitCount;
            string kind = Kinds[(i + (stageOf[i] * 3)) % Kinds.Length];
            ids[i] = string.Create(CultureInfo.InvariantCulture, $"u{i:000}");
            labels[i] = string.Create(CultureInfo.InvariantCulture, $"{kind} {i + 1}");
        }

        var routes = ImmutableArray.CreateBuilder<Route>();
        for (int i = 0; i < unitCount; i++)
        {
            var later = Enumerable.Range(0, unitCount).Where(j => stageOf[j] == stageOf[i] + 1).ToList();
            double forward = 0.5 + (0.25 * random.NextDouble());
            int count = Math.Min(later.Count, 1 + random.Next(2));
            for (int k = 0; k < count; k++)
            {
                int target = later[random.Next(later.Count)];
                later.Remove(target);
                routes.Add(new Route(ids[i], ids[target], forward / count));
            }

            var earlier = Enumerable.Range(0, unitCount).Where(j => stageOf[j] < stageOf[i]).ToList();
            if (earlier.Count > 0 && random.NextDouble() < 0.12)
            {
                routes.Add(new Route(ids[i], ids[earlier[random.Next(earlier.Count)]], 0.05 + (0.05 * random.NextDouble())));
            }
        }

        // Every unit past the first stage is reached from the stage before it.
        for (int i = 0; i < unitCount; i++)
        {
            if (stageOf[i] == 0 || routes.Any(route => route.To == ids[i]))
            {
                continue;
            }

            var sources = Enumerable.Range(0, unitCount)
                .Where(j => stageOf[j] == stageOf[i] - 1 && routes.Where(route => route.From == ids[j]).Sum(route => route.Probability) <= 0.85)
                .ToList();
            if (sources.Count > 0)
            {
                routes.Add(new Route(ids[sources[random.Next(sources.Count)]], ids[i], 0.1));
            }
        }

        var arrivals = ImmutableArray.CreateBuilder<Arrival>();
        for (int i = 0; i < unitCount; i++)
        {
            if (stageOf[i] == 0 || random.NextDouble() < 0.08)
            {
                arrivals.Add(new Arrival(ids[i], stageOf[i] == 0 ? 2.0 + (10.0 * random.NextDouble()) : 0.5 + random.NextDouble()));
            }
        }

        var serviceHours = Enumerable.Range(0, unitCount).Select(i => 0.3 + (stageOf[i] * 6.0 * random.NextDouble())).ToArray();
        var unlimited = Enumerable.Range(0, unitCount)
            .Select(i => new Unit(ids[i], labels[i], Servers.Unlimited, serviceHours[i])).ToImmutableArray();
        var draft = new Network("Generated hospital " + unitCount.ToString(CultureInfo.InvariantCulture), TimeUnit.Hour, unlimited, arrivals.ToImmutable(), routes.ToImmutable());
        var flows = NetworkSolver.Solve(draft).Units;

        var units = ImmutableArray.CreateBuilder<Unit>(unitCount);
        for (int i = 0; i < unitCount; i++)
        {
            double target = 0.45 + (0.5 * random.NextDouble());
            int servers = Math.Max(1, (int)Math.Ceiling(flows[i].OfferedLoad / target));
            units.Add(unlimited[i] with { Servers = Servers.Of(servers) });
        }

        return draft with { Units = units.MoveToImmutable() };
    }
}

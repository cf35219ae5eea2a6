using static NetSolve.Tests.Support.TestFiles;

namespace NetSolve.Tests.Golden;

/// <summary>Every command in every output format on the bundled examples in <c>networks/</c>.</summary>
internal static class GoldenCases
{
    private static readonly string[] Networks = ["fenwick-winter-surge", "harbourside", "kestrel-general", "larkspur-simulation", "millbrook-clinic"];

    private static readonly string[] Scenarios = ["harbourside-ambulatory-care", "harbourside-fourth-scanner", "harbourside-winter-beds"];

    private static readonly string[] PrintedFormats = ["table", "json", "csv"];

    // Seeded, two replications of a week after a day's warm-up: well under a second each, and still every section.
    private static readonly string[] ShortSimulation = ["--seed", "7", "--replications", "2", "--warmup", "1d", "--duration", "7d"];

    /// <summary>Every case, in a fixed order.</summary>
    public static IReadOnlyList<GoldenCase> All { get; } = [.. Build()];

    /// <summary>The case with this id.</summary>
    public static GoldenCase Find(string id) => All.Single(golden => golden.Id == id);

    private static IEnumerable<GoldenCase> Build()
    {
        foreach (string network in Networks)
        {
            yield return new GoldenCase($"check.{network}", "text", ["check", Network(network)]);
        }

        // A scenario file is not a network file: check reports why, which is pinned too.
        foreach (string scenario in Scenarios)
        {
            yield return new GoldenCase($"check.{scenario}", "text", ["check", Scenario(scenario)]);
        }

        foreach (string network in Networks)
        {
            foreach (var golden in Printed($"solve.{network}", "solve", Network(network)))
            {
                yield return golden;
            }

            foreach (var golden in Printed($"growth.{network}", "growth", Network(network)))
            {
                yield return golden;
            }
        }

        // A scenario file with --set on top: the changes line under the title and the JSON's changes array are pinned.
        foreach (var golden in Printed("solve.harbourside-fourth-scanner.set-lab-7", "solve", Scenario("harbourside-fourth-scanner"), "--set", "servers.lab=7"))
        {
            yield return golden;
        }

        foreach (var golden in Printed("compare.harbourside.scenarios", "compare", [Network("harbourside"), .. Scenarios.Select(Scenario)]))
        {
            yield return golden;
        }

        foreach (string network in Networks)
        {
            foreach (var golden in Printed($"staff.{network}.max-wait-30min", "staff", Network(network), "--max-wait", "30min"))
            {
                yield return golden;
            }

            foreach (var golden in Printed($"staff.{network}.budget-3", "staff", Network(network), "--budget", "3"))
            {
                yield return golden;
            }
        }

        foreach (string network in Networks)
        {
            // The clinic has no emergency unit; its patients enter at reception.
            string entry = network == "millbrook-clinic" ? "reception" : "emergency";
            foreach (var golden in Printed($"pathway.{network}.from-{entry}", "pathway", Network(network), "--from", entry))
            {
                yield return golden;
            }
        }

        foreach (var golden in Printed("pathway.harbourside.path", "pathway", Network("harbourside"), "--from", "emergency", "--path", "emergency,imaging,emergency"))
        {
            yield return golden;
        }

        foreach (string network in Networks)
        {
            foreach (var golden in Printed($"simulate.{network}", "simulate", [Network(network), .. ShortSimulation]))
            {
                yield return golden;
            }
        }

        foreach (var golden in Printed("simulate.larkspur-simulation.compare", "simulate", [Network("larkspur-simulation"), .. ShortSimulation, "--wait-over", "1h", "4h", "--compare"]))
        {
            yield return golden;
        }

        foreach (string network in Networks)
        {
            yield return new GoldenCase($"map.{network}", "svg", ["map", Network(network)], network + ".svg");
            yield return new GoldenCase($"map.{network}", "dot", ["map", Network(network)], network + ".dot");
        }

        yield return new GoldenCase("report.harbourside.scenarios", "html", ["report", Network("harbourside"), .. Scenarios.Select(Scenario)], "report.html");
        yield return new GoldenCase("report.kestrel-general", "html", ["report", Network("kestrel-general")], "report.html");
        yield return new GoldenCase("report.larkspur-simulation.simulate", "html", ["report", Network("larkspur-simulation"), "--simulate", .. ShortSimulation], "report.html");

        // Targets: the example with a targets section, staffed to them, and a budget weighed by cost.
        foreach (var golden in Printed("solve.ashcombe-targets", "solve", Network("ashcombe-targets"))
            .Concat(Printed("staff.ashcombe-targets", "staff", Network("ashcombe-targets")))
            .Concat(Printed("staff.kestrel-general.budget-10-costs", "staff", Network("kestrel-general"), "--budget", "10", "--cost", "critical_care=3", "--cost", "emergency=1.5")))
        {
            yield return golden;
        }

        // Staffing by hour on the roster example: every format with the short simulated check (under a second), and
        // shift blocks without it.
        foreach (var golden in Printed("staff.wrenfield-emergency-roster.by-hour-max-wait-10min", "staff", Network("wrenfield-emergency-roster"), "--by-hour", "--max-wait", "10min")
            .Concat(Printed("staff.wrenfield-emergency-roster.by-hour-shifts-no-check", "staff", Network("wrenfield-emergency-roster"), "--by-hour", "--max-wait", "10min", "--shifts", "07,15,23", "--no-check")))
        {
            yield return golden;
        }

        yield return new GoldenCase("map.ashcombe-targets", "svg", ["map", Network("ashcombe-targets")], "ashcombe-targets.svg");

        yield return new GoldenCase("fit.rowan-urgent-care", "yaml", ["fit", Log("rowan-urgent-care")], "rowan-urgent-care.yaml");
        yield return new GoldenCase("fit.rowan-urgent-care.minute", "yaml", ["fit", Log("rowan-urgent-care"), "--time-unit", "minute", "--name", "Rowan Urgent Care Centre"]);
    }

    /// <summary>One case per printed format; the table is the default, so it runs without <c>--format</c>.</summary>
    private static IEnumerable<GoldenCase> Printed(string name, string command, params string[] arguments) =>
        PrintedFormats.Select(format => new GoldenCase(name, format, format == "table" ? [command, .. arguments] : [command, .. arguments, "--format", format]));
}

using System.Globalization;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.Pathways;
using NetSolve.Solving;
using NetSolve.Tests.Analysis;

namespace NetSolve.Tests.Presentation.Pathways;

public sealed class PathwayOutputTests
{
    private static readonly string[] ClinicPath = ["reception", "clinician", "xray"];

    [Fact]
    public void The_registry_ids_are_the_json_fields_in_the_order_written()
    {
        var (network, pathway, path) = Clinic();

        using var json = Written.Json(output => PathwayOutput.WriteJson(network, pathway, path, output));
        var from = json.RootElement.GetProperty("from");
        var steps = json.RootElement.GetProperty("path");

        Assert.Equal(["network", "time_unit", "from", "path"], Written.FieldNames(json.RootElement));
        Assert.Equal([.. Written.MachineIds(PathwayTotalsColumns.All), "units"], Written.FieldNames(from));
        Assert.All(from.GetProperty("units").EnumerateArray(), unit => Assert.Equal(Written.MachineIds(PathwayColumns.Json), Written.FieldNames(unit)));
        Assert.Equal(["units", .. Written.MachineIds(PathTotalsColumns.All)], Written.FieldNames(steps));
        Assert.All(steps.GetProperty("units").EnumerateArray(), unit => Assert.Equal(Written.MachineIds(PathColumns.All), Written.FieldNames(unit)));
    }

    [Fact]
    public void The_path_rows_share_the_pathway_csv_header()
    {
        var (network, pathway, path) = Clinic();

        string csv = Written.Text(output => PathwayOutput.WriteCsv(network, pathway, path, output));

        Assert.Equal(PathwayOutput.CsvHeader, string.Join(',', Written.MachineIds(PathwayColumns.All)));
        Assert.Equal(Written.MachineIds(PathwayColumns.All), Written.MachineIds(PathColumns.Csv));
        Assert.Equal(PathwayOutput.CsvHeader, csv.Split('\n')[0]);
    }

    [Fact]
    public void The_table_shows_visits_chances_and_times_with_their_unit()
    {
        // Exact by hand (PathwayAnalysisTests): from reception the clinician is seen 1.25 times and one patient in
        // five has an x-ray. Clinic times are in minutes.
        var (network, pathway, path) = Clinic();

        string table = Written.Text(output => PathwayOutput.WriteTable(network, pathway, path, output));

        Assert.StartsWith("Millbrook Walk-in Clinic (teaching example): pathways  (rates per minute)\n", table, StringComparison.Ordinal);
        Assert.Contains("\nunit       expected visits  chance of visiting  expected time\n", table, StringComparison.Ordinal);
        Assert.Matches(@"\nclinician +1\.250 +100\.0% +\d+\.\d+ min\n", table);
        Assert.Matches(@"\nxray +0\.2500 +20\.0% +\d+\.\d+ min\n", table);
        Assert.DoesNotMatch(@"\dE[-+]?\d", table);
    }

    [Fact]
    public void A_path_through_an_unstable_unit_has_no_mean_time_and_no_time_unit_beside_the_dash()
    {
        // Exact by hand: 2 arrivals an hour at one server of 1 hour is utilisation 2, unstable.
        var network = SmallNetworks.Build([("a", 1, 1.0), ("b", 1, 0.1)], [("a", 2.0)], [("a", "b", 1.0)]);
        var path = PathwayAnalysis.Path(NetworkSolver.Solve(network), ["a", "b"]);

        string table = Written.Text(output => PathwayOutput.WriteTable(network, null, path, output));

        Assert.Contains("mean time along the path: - (a unit on it is unstable); chance of following it step by step from a: 100.0%\n", table, StringComparison.Ordinal);
    }

    [Fact]
    public void The_table_ignores_the_current_culture()
    {
        var (network, pathway, path) = Clinic();
        var culture = CultureInfo.CurrentCulture;
        string invariant = Written.Text(output => PathwayOutput.WriteTable(network, pathway, path, output));
        try
        {
            CultureInfo.CurrentCulture = new CultureInfo("de-DE");
            Assert.Equal(invariant, Written.Text(output => PathwayOutput.WriteTable(network, pathway, path, output)));
        }
        finally
        {
            CultureInfo.CurrentCulture = culture;
        }
    }

    private static (Network Network, PathwayResult Pathway, PathResult Path) Clinic()
    {
        var network = SmallNetworks.Example("millbrook-clinic.yaml");
        var solution = NetworkSolver.Solve(network);
        return (network, PathwayAnalysis.From(solution, "reception"), PathwayAnalysis.Path(solution, ClinicPath));
    }
}

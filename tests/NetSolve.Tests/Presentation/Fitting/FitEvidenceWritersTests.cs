using System.Globalization;
using System.Text;
using System.Text.Json;
using NetSolve.Model;
using NetSolve.Presentation.Fitting.Evidence;
using NetSolve.Tests.Fitting.Estimation;

namespace NetSolve.Tests.Presentation.Fitting;

public sealed class FitEvidenceWritersTests
{
    [Fact]
    public void The_table_shows_intervals_the_chosen_distribution_and_the_never_queued_servers()
    {
        var text = new StringWriter(CultureInfo.InvariantCulture);

        FitEvidenceTable.Write(EvidenceSamples.Larchmere(), null, TimeUnit.Hour, text);

        string shown = text.ToString();
        Assert.Contains("at least 12 (never queued)", shown, StringComparison.Ordinal);
        Assert.Contains("assessment -> ward: ", shown, StringComparison.Ordinal);
        Assert.Contains("warning: unit 'ward': only 4 stays", shown, StringComparison.Ordinal);
        Assert.Contains("exponential", shown, StringComparison.Ordinal);
        Assert.DoesNotContain("NaN", shown, StringComparison.Ordinal);
    }

    [Fact]
    public void The_json_gives_every_number_in_the_network_time_unit_and_the_routes_with_their_intervals()
    {
        var evidence = EvidenceSamples.Larchmere();
        var predicted = new Dictionary<string, double?>(StringComparer.Ordinal) { ["assessment"] = 0.1 };

        using var document = JsonDocument.Parse(Write(evidence, predicted, TimeUnit.Minute));

        var root = document.RootElement.GetProperty("fit_evidence");
        var assessment = root.GetProperty("units")[0];
        // Exact by hand: a 24 h window is 1,440 min; the mean stay and predicted wait are converted from hours the same way.
        Assert.Equal(1440.0, root.GetProperty("window").GetDouble(), 1e-9);
        Assert.Equal(evidence.Units[0].Stay.Mean!.Value.Value * 60.0, assessment.GetProperty("mean_stay").GetDouble(), 1e-9);
        Assert.Equal(6.0, assessment.GetProperty("predicted_wait").GetDouble(), 1e-9);
        var route = assessment.GetProperty("routes")[0];
        Assert.Equal("ward", route.GetProperty("to").GetString());
        Assert.Equal(6, route.GetProperty("count").GetInt32());
        Assert.Equal(38, route.GetProperty("of").GetInt32());
        Assert.True(route.GetProperty("fraction_lower").GetDouble() < 6.0 / 38.0);
        Assert.Equal(JsonValueKind.Null, root.GetProperty("units")[1].GetProperty("predicted_wait").ValueKind);
        Assert.Equal("yes", root.GetProperty("units")[1].GetProperty("never_queued").GetString());
        Assert.Equal("too_short", root.GetProperty("arrival_profile").GetProperty("hour_of_day").GetString());
        Assert.All(root.GetProperty("units").EnumerateArray(), unit =>
            Assert.Equal(unit.EnumerateObject().Count(), unit.EnumerateObject().Select(field => field.Name).Distinct(StringComparer.Ordinal).Count()));
    }

    private static string Write(global::NetSolve.Fitting.Estimation.NetworkEvidence evidence, IReadOnlyDictionary<string, double?> predicted, TimeUnit timeUnit)
    {
        using var stream = new MemoryStream();
        using (var json = new Utf8JsonWriter(stream))
        {
            json.WriteStartObject();
            FitEvidenceJson.Write(evidence, predicted, timeUnit, json);
            json.WriteEndObject();
        }

        return Encoding.UTF8.GetString(stream.ToArray());
    }
}

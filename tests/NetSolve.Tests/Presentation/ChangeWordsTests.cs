using NetSolve.Diagnostics;
using NetSolve.Model;
using NetSolve.Presentation.Scenarios;
using NetSolve.Scenarios;

namespace NetSolve.Tests.Presentation;

public sealed class ChangeWordsTests
{
    private static readonly SourceLocation Here = new("winter.yaml", 3, 1);

    // Exact by hand: each phrase restates the change as written, in the file's time unit for rates.
    [Fact]
    public void Every_kind_of_change_is_one_phrase_naming_its_unit_first()
    {
        Assert.Equal("imaging: 4 servers", ChangeWords.Describe(new SetServers(Here, "imaging", Servers.Of(4)), TimeUnit.Hour));
        Assert.Equal("imaging: unlimited servers", ChangeWords.Describe(new SetServers(Here, "imaging", Servers.Unlimited), TimeUnit.Hour));
        Assert.Equal("ward: -2 servers", ChangeWords.Describe(new AddServers(Here, "ward", -2), TimeUnit.Hour));
        Assert.Equal("lab: service \u00D70.8", ChangeWords.Describe(new ScaleService(Here, "lab", 0.8), TimeUnit.Hour));
        Assert.Equal("every arrival stream \u00D71.05", ChangeWords.Describe(new ScaleArrivals(Here, null, 1.05), TimeUnit.Hour));
        Assert.Equal("theatres to ward: route removed", ChangeWords.Describe(new SetRoute(Here, "theatres", "ward", 0.0), TimeUnit.Hour));
        Assert.Equal("lounge: closed, patients leave", ChangeWords.Describe(new CloseUnit(Here, "lounge", null), TimeUnit.Hour));
        Assert.Equal("lounge: closed, patients go to ward", ChangeWords.Describe(new CloseUnit(Here, "lounge", "ward"), TimeUnit.Hour));
    }

    [Fact]
    public void Rates_and_times_read_as_in_the_tables()
    {
        Assert.Contains("emergency: arrivals ", ChangeWords.Describe(new SetArrivals(Here, "emergency", 0.5), TimeUnit.Day), StringComparison.Ordinal);
        Assert.EndsWith("/d", ChangeWords.Describe(new SetArrivals(Here, "emergency", 0.5), TimeUnit.Day), StringComparison.Ordinal);
        Assert.Equal("lab: service 30.00 min", ChangeWords.Describe(new SetService(Here, "lab", 0.5), TimeUnit.Hour));
    }
}

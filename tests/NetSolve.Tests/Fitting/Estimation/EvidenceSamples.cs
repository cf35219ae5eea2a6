using NetSolve.Fitting.Estimation;

namespace NetSolve.Tests.Fitting.Estimation;

/// <summary>A small invented network's evidence for the writers' tests: an assessment unit and a ward of the Larchmere Clinic.</summary>
internal static class EvidenceSamples
{
    public static NetworkEvidence Larchmere(string wardId = "ward")
    {
        var assessment = new UnitObservations("assessment",
            [.. Enumerable.Range(0, 40).Select(i => 0.5 + (i % 4 * 0.25))],
            [.. Enumerable.Range(0, 40).Select(i => i >= 38)],
            [],
            [.. Enumerable.Range(0, 40).Select(i => i % 5 == 0 ? 0.25 : 0.0)],
            [.. Enumerable.Range(0, 40).Select(i => i * 0.6)],
            [new RouteCount(wardId, 6)],
            servers: 3);
        var ward = new UnitObservations(wardId, [30.0, 50.0, 70.0, 90.0], [false, false, true, true], [0.0, 10.0, 0.0, 0.0], [0.0, 0.0], [], [], servers: 12, neverQueued: true);
        return FitEvidence.Summarise([assessment, ward], ExtractWindow.Of(24.0));
    }
}

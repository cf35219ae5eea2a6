using NetSolve.Analysis;
using NetSolve.Model;

namespace NetSolve.Presentation.Pathways;

/// <summary>One unit reached by patients entering at a start unit, with what the pathway columns read beside it.</summary>
/// <param name="FromUnitId">The unit patients enter at.</param>
/// <param name="Visit">What they do at this unit, on average.</param>
/// <param name="TimeUnit">The network's time unit, named in every CSV row.</param>
public sealed record PathwayRow(string FromUnitId, PathwayVisit Visit, TimeUnit TimeUnit);

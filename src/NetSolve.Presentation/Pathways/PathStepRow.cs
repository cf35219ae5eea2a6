using NetSolve.Analysis;
using NetSolve.Model;

namespace NetSolve.Presentation.Pathways;

/// <summary>One unit of a named sequence, with what the path columns read beside it.</summary>
/// <param name="Path">The whole sequence.</param>
/// <param name="Index">The unit's place in it, from 0.</param>
/// <param name="TimeUnit">The network's time unit, named in every CSV row.</param>
public sealed record PathStepRow(PathResult Path, int Index, TimeUnit TimeUnit)
{
    /// <summary>The unit at this step.</summary>
    public string UnitId => Path.UnitIds[Index];

    /// <summary>Mean time in the unit per visit, in hours; null when it is unstable.</summary>
    public double? MeanTimeHours => Path.MeanTimesHours[Index];

    /// <summary>True for the last unit of the sequence.</summary>
    public bool IsLast => Index == Path.UnitIds.Length - 1;
}

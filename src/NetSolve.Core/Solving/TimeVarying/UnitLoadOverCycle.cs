using System.Collections.Immutable;

namespace NetSolve.Solving;

/// <summary>One unit's arrival rate and offered load through the cycle, from the infinite-server view. Immutable.</summary>
public sealed class UnitLoadOverCycle
{
    internal UnitLoadOverCycle(string unitId, double[] arrivalsByStep, double[] loadByNode, int stepsPerHour)
    {
        UnitId = unitId;
        ArrivalsByStep = arrivalsByStep;
        LoadByNode = loadByNode;
        StepsPerHour = stepsPerHour;
        ArrivalsPerHourByHour = HourlyMeans.OfSteps(arrivalsByStep, stepsPerHour);
        OfferedLoadByHour = HourlyMeans.OfNodes(loadByNode, stepsPerHour);
    }

    /// <summary>The unit's id.</summary>
    public string UnitId { get; }

    /// <summary>Mean arrival rate per hour in each hour of the cycle, hour 00–01 (Monday for a week) first.</summary>
    public ImmutableArray<double> ArrivalsPerHourByHour { get; }

    /// <summary>Mean offered load m(t) in erlangs in each hour: patients in service if nobody waited.</summary>
    public ImmutableArray<double> OfferedLoadByHour { get; }

    /// <summary>Arrival rate per hour over each step (constant within a step for outside arrivals).</summary>
    internal double[] ArrivalsByStep { get; }

    /// <summary>Offered load at each step boundary; the last equals the first.</summary>
    internal double[] LoadByNode { get; }

    /// <summary>Steps per hour of the grid.</summary>
    internal int StepsPerHour { get; }
}

namespace NetSolve.Solving;

/// <summary>Scratch arrays for one cycle, reused unit after unit so a sweep allocates nothing. Not thread-safe.</summary>
internal sealed class Workspace
{
    /// <summary>Creates buffers for a cycle of <paramref name="steps"/> steps.</summary>
    public Workspace(int steps)
    {
        InputStart = new double[steps];
        InputEnd = new double[steps];
        StageStart = new double[steps];
        StageEnd = new double[steps];
        Inflow = new double[steps + 1];
        Departures = new double[steps + 1];
        Stage = new double[steps + 1];
        PreviousStage = new double[steps + 1];
    }

    /// <summary>The unit's arrival rate at the start of each step.</summary>
    public double[] InputStart { get; }

    /// <summary>The unit's arrival rate at the end of each step.</summary>
    public double[] InputEnd { get; }

    /// <summary>One stage's input at the start of each step.</summary>
    public double[] StageStart { get; }

    /// <summary>One stage's input at the end of each step.</summary>
    public double[] StageEnd { get; }

    /// <summary>Arrivals routed in from other units at each step boundary.</summary>
    public double[] Inflow { get; }

    /// <summary>The unit's departure rate at each step boundary.</summary>
    public double[] Departures { get; }

    /// <summary>The stage being solved, at each step boundary.</summary>
    public double[] Stage { get; }

    /// <summary>The stage before it, which feeds it.</summary>
    public double[] PreviousStage { get; }
}

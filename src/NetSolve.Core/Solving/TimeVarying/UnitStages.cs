namespace NetSolve.Solving;

/// <summary>One infinite-server unit over the cycle: its service stages solved in order, each fed by the one before.</summary>
internal static class UnitStages
{
    /// <summary>
    /// Solves the unit for the arrival rate in <see cref="Workspace.InputStart"/> and <see cref="Workspace.InputEnd"/>;
    /// writes the offered load into <paramref name="load"/> and the departure rate into <paramref name="departures"/>.
    /// </summary>
    public static void Solve(ServiceStages stages, double stepHours, Workspace work, double[] load, double[] departures)
    {
        int steps = work.InputStart.Length;
        Array.Clear(load);
        Array.Clear(departures);
        double feedRate = 0.0;
        for (int s = 0; s < stages.Count; s++)
        {
            double entry = stages.EntryProbabilities[s];
            for (int k = 0; k < steps; k++)
            {
                work.StageStart[k] = (entry * work.InputStart[k]) + (feedRate * work.PreviousStage[k]);
                work.StageEnd[k] = (entry * work.InputEnd[k]) + (feedRate * work.PreviousStage[k + 1]);
            }

            double rate = stages.RatesPerHour[s];
            PeriodicStage.Solve(work.StageStart, work.StageEnd, rate, stepHours, work.Stage);
            double leaving = (1.0 - stages.ContinueProbabilities[s]) * rate;
            for (int k = 0; k <= steps; k++)
            {
                load[k] += work.Stage[k];
                departures[k] += leaving * work.Stage[k];
            }

            feedRate = stages.ContinueProbabilities[s] * rate;
            Array.Copy(work.Stage, work.PreviousStage, steps + 1);
        }
    }
}

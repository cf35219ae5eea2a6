namespace NetSolve.Solving;

/// <summary>
/// Sums moments over each hour and turns them into <see cref="HourlyWaits"/>: time averages of the queue and the
/// patients in the unit, the arrival-weighted chance of waiting, and the mean wait by Little's law over the hour.
/// </summary>
internal sealed class HourAccumulator
{
    private readonly double[] _queue;
    private readonly double[] _inUnit;
    private readonly double[] _allBusy;
    private readonly double[] _allBusyByArrivals;
    private readonly double[] _arrivals;

    public HourAccumulator(int cycleHours)
    {
        _queue = new double[cycleHours];
        _inUnit = new double[cycleHours];
        _allBusy = new double[cycleHours];
        _allBusyByArrivals = new double[cycleHours];
        _arrivals = new double[cycleHours];
    }

    /// <summary>Adds one sample of weight <paramref name="weight"/> steps to hour <paramref name="hour"/>.</summary>
    public void Add(int hour, double weight, double queue, double inUnit, double allBusy, double arrivalsPerHour)
    {
        _queue[hour] += weight * queue;
        _inUnit[hour] += weight * inUnit;
        _allBusy[hour] += weight * allBusy;
        _allBusyByArrivals[hour] += weight * allBusy * arrivalsPerHour;
        _arrivals[hour] += weight * arrivalsPerHour;
    }

    /// <summary>Hourly values when each hour received <paramref name="stepsPerHour"/> steps of weight.</summary>
    public HourlyWaits ToWaits(string method, int stepsPerHour)
    {
        int hours = _queue.Length;
        var queue = new double[hours];
        var inUnit = new double[hours];
        var waitProbability = new double[hours];
        var wait = new double[hours];
        for (int h = 0; h < hours; h++)
        {
            queue[h] = _queue[h] / stepsPerHour;
            inUnit[h] = _inUnit[h] / stepsPerHour;
            double arrivals = _arrivals[h] / stepsPerHour;
            waitProbability[h] = Math.Clamp(_arrivals[h] > 0.0 ? _allBusyByArrivals[h] / _arrivals[h] : _allBusy[h] / stepsPerHour, 0.0, 1.0);
            wait[h] = arrivals > 0.0 ? queue[h] / arrivals : 0.0;
        }

        return new HourlyWaits(method, [.. queue], [.. inUnit], [.. waitProbability], [.. wait]);
    }
}

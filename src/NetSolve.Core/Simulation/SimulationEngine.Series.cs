namespace NetSolve.Simulation;

/// <summary>
/// The number of patients in the network sampled at <see cref="SeriesPoints"/> evenly spaced moments over the whole
/// replication, warm-up included: the output series on which MSER-5 checks that the warm-up was long enough.
/// </summary>
internal sealed partial class SimulationEngine
{
    /// <summary>Samples per replication: 200 batches of MSER-5, enough to place a cut to half a percent of the run.</summary>
    public const int SeriesPoints = 1000;

    private readonly double[] _series = new double[SeriesPoints];
    private int _sampled;
    private double _nextSample;

    /// <summary>The sampled numbers in the network, the first at time 0; the moments not reached are 0 (none with a finished run).</summary>
    public IReadOnlyList<double> InNetworkSeries => _series;

    /// <summary>Time between samples, in hours.</summary>
    private double SeriesStep => _end / SeriesPoints;

    /// <summary>
    /// Records the number present at every sampling moment up to <paramref name="now"/>, before the event at
    /// <paramref name="now"/> changes it: between events the number is constant, so this is its value at each moment.
    /// </summary>
    private void SampleSeries(double now)
    {
        double present = _patientsAllocated - _freeCount;
        while (_sampled < SeriesPoints && _sampled * SeriesStep <= now)
        {
            _series[_sampled++] = present;
        }

        _nextSample = _sampled < SeriesPoints ? _sampled * SeriesStep : double.PositiveInfinity;
    }
}

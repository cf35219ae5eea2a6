namespace NetSolve.Solving;

/// <summary>
/// One unit's birth–death chain over one cycle of the grid, advanced by uniformization (see
/// <see cref="PeriodicBirthDeathChain"/>). Holds only the rates; the distribution is the caller's array. Not thread-safe.
/// </summary>
internal sealed class ChainCycle
{
    // The Poisson weights left out of each sub-step: below double precision of a total of 1.
    private const double PoissonTail = 1e-16;

    // Largest Λh in one sub-step: keeps the Poisson sum to about 20 terms.
    private const double MaxUniformizedStep = 1.0;

    private const double SimpsonEnd = 1.0 / 6.0;
    private const double SimpsonMiddle = 4.0 / 6.0;

    private readonly double[] _arrivals;
    private readonly ServerRoster _roster;
    private double[] _next = [];
    private double[] _power = [];
    private double[] _down = [];
    private double[] _stay = [];
    private double _birth;

    public ChainCycle(double[] arrivalsByStep, int stepsPerHour, ServerRoster roster, double servicePerHour)
    {
        _arrivals = arrivalsByStep;
        _roster = roster;
        StepsPerHour = stepsPerHour;
        ServicePerHour = servicePerHour;
        CycleHours = arrivalsByStep.Length / stepsPerHour;
        MeanArrivals = arrivalsByStep.Average();
        MeanCapacity = roster.MeanOver(CycleHours) * servicePerHour;
    }

    public int StepsPerHour { get; }

    public double ServicePerHour { get; }

    public int CycleHours { get; }

    /// <summary>Mean arrivals per hour over the cycle.</summary>
    public double MeanArrivals { get; }

    /// <summary>Mean completions per hour the servers could make over the cycle.</summary>
    public double MeanCapacity { get; }

    /// <summary>Arrival rate per hour in step <paramref name="step"/>.</summary>
    public double ArrivalsAt(int step) => _arrivals[step];

    /// <summary>Servers in step <paramref name="step"/>.</summary>
    public int ServersAt(int step) => _roster.At(step / StepsPerHour);

    /// <summary>The stationary M/M/c distribution at the cycle's mean arrivals and most servers: a start near the answer.</summary>
    public double[] StationaryStart(int states)
    {
        var p = new double[states];
        int servers = _roster.Max;
        double load = MeanArrivals / ServicePerHour;
        p[0] = 1.0;
        double total = 1.0;
        for (int n = 1; n < states; n++)
        {
            p[n] = servers > 0 ? p[n - 1] * load / Math.Min(n, servers) : 0.0;
            total += p[n];
            if (!double.IsFinite(total))
            {
                Array.Clear(p);
                p[0] = 1.0;
                return p;
            }
        }

        for (int n = 0; n < states; n++)
        {
            p[n] /= total;
        }

        return p;
    }

    /// <summary>Advances <paramref name="p"/> through one cycle, recording into <paramref name="stats"/> when given.</summary>
    /// <returns>The largest chance of the last state seen at any step boundary.</returns>
    public double Run(double[] p, ChainHourStats? stats)
    {
        if (_next.Length != p.Length)
        {
            _next = new double[p.Length];
            _power = new double[p.Length];
        }

        double halfStepHours = 0.5 / StepsPerHour;
        double lastState = p[^1];
        for (int step = 0; step < _arrivals.Length; step++)
        {
            // Simpson's rule over the step (start, middle, end) keeps the hourly means accurate to the fourth order.
            double arrivals = _arrivals[step];
            int servers = ServersAt(step);
            stats?.Record(step, this, p, SimpsonEnd);
            AdvanceFor(p, arrivals, servers, halfStepHours);
            stats?.Record(step, this, p, SimpsonMiddle);
            AdvanceFor(p, arrivals, servers, halfStepHours);
            stats?.Record(step, this, p, SimpsonEnd);
            lastState = Math.Max(lastState, p[^1]);
        }

        return lastState;
    }

    private void AdvanceFor(double[] p, double arrivals, int servers, double hours)
    {
        double uniform = arrivals + (servers * ServicePerHour);
        if (uniform <= 0.0)
        {
            return;
        }

        PrepareJump(arrivals, servers, uniform, p.Length);
        int subSteps = Math.Max(1, (int)Math.Ceiling(uniform * hours / MaxUniformizedStep));
        for (int s = 0; s < subSteps; s++)
        {
            Advance(p, uniform * hours / subSteps);
        }
    }

    // The jump chain's rates for one step, worked out once and used by every Poisson term of the step.
    private void PrepareJump(double arrivals, int servers, double uniform, int states)
    {
        if (_down.Length != states)
        {
            _down = new double[states];
            _stay = new double[states];
        }

        double birth = arrivals / uniform;
        _birth = birth;
        for (int n = 0; n < states; n++)
        {
            _down[n] = Math.Min(n, servers) * ServicePerHour / uniform;
            _stay[n] = 1.0 - (n < states - 1 ? birth : 0.0) - _down[n];
        }
    }

    private void Advance(double[] p, double expected)
    {
        double weight = Math.Exp(-expected);
        double covered = weight;
        Array.Copy(p, _power, p.Length);
        for (int n = 0; n < p.Length; n++)
        {
            _next[n] = weight * p[n];
        }

        for (int k = 1; 1.0 - covered > PoissonTail && k < 200; k++)
        {
            MultiplyByJump();
            weight *= expected / k;
            covered += weight;
            for (int n = 0; n < p.Length; n++)
            {
                _next[n] += weight * _power[n];
            }
        }

        double total = 0.0;
        for (int n = 0; n < p.Length; n++)
        {
            total += _next[n];
        }

        double scale = 1.0 / total;
        for (int n = 0; n < p.Length; n++)
        {
            p[n] = _next[n] * scale;
        }
    }

    // _power ← _power · (I + Q/Λ) for the birth–death generator Q; no births out of the last state.
    private void MultiplyByJump()
    {
        var power = _power;
        var down = _down;
        var stay = _stay;
        double birth = _birth;
        int last = power.Length - 1;
        double carried = 0.0;
        for (int n = 0; n < last; n++)
        {
            double current = power[n];
            power[n] = (current * stay[n]) + carried + (power[n + 1] * down[n + 1]);
            carried = current * birth;
        }

        power[last] = (power[last] * stay[last]) + carried;
    }
}

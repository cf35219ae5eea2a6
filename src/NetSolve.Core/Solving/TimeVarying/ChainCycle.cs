namespace NetSolve.Solving;

/// <summary>
/// One unit's birth–death chain over one cycle of the grid, advanced by uniformization (see
/// <see cref="PeriodicBirthDeathChain"/>). Holds only the rates; the distribution is the caller's array. Not thread-safe.
/// </summary>
/// <remarks>
/// Two things keep a cycle cheap. Each step's mean distribution comes from the same Poisson sum as its end
/// (∫p = (h/Λh)·Σ_k P(N &gt; k)·p·P^k, N the number of jumps), so steps need not be short for the hourly means to be
/// exact, and a long step costs about Λh + 6√Λh products instead of a fixed number per short step. And only the
/// states holding more than <see cref="WindowCut"/> are multiplied (the window widens by one state each jump): a unit
/// of 40 servers queueing in the afternoon holds nothing near 0, and a quiet night holds nothing far up.
/// </remarks>
internal sealed class ChainCycle
{
    // The Poisson weights left out of each sub-step: below double precision of a total of 1.
    private const double PoissonTail = 1e-16;

    // States holding less than this are left out of the products: dropping up to a few thousand of them each step
    // moves the distribution by far less than the convergence tolerance.
    private const double WindowCut = 1e-22;

    private readonly double[] _arrivals;
    private readonly ServerRoster _roster;
    private readonly double _maxJumps;
    private double[] _next = [];
    private double[] _power = [];
    private double[] _integral = [];
    private double[] _average = [];
    private double[] _down = [];
    private double[] _stay = [];
    private double _birth;

    public ChainCycle(double[] arrivalsByStep, int stepsPerHour, ServerRoster roster, double servicePerHour, double maxJumpsPerSum)
    {
        _arrivals = arrivalsByStep;
        _roster = roster;
        _maxJumps = maxJumpsPerSum;
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

    /// <summary>Products of the distribution with the jump matrix so far, each over the window of states that hold any chance: the work done.</summary>
    public long Products { get; private set; }

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

    /// <summary>Advances <paramref name="p"/> through one cycle, recording each step's mean into <paramref name="stats"/> when given.</summary>
    /// <returns>The largest chance of the last state seen at any step boundary.</returns>
    public double Run(double[] p, ChainHourStats? stats)
    {
        if (_next.Length != p.Length)
        {
            _next = new double[p.Length];
            _power = new double[p.Length];
            _integral = new double[p.Length];
            _average = new double[p.Length];
        }

        double stepHours = 1.0 / StepsPerHour;
        double lastState = p[^1];
        for (int step = 0; step < _arrivals.Length; step++)
        {
            double arrivals = _arrivals[step];
            int servers = ServersAt(step);
            double uniform = arrivals + (servers * ServicePerHour);
            double[]? average = stats is null ? null : _average;
            if (average is not null)
            {
                Array.Clear(average);
            }

            if (uniform <= 0.0)
            {
                // Nothing moves: the step's mean is its start.
                for (int n = 0; average is not null && n < p.Length; n++)
                {
                    average[n] = p[n] * stepHours;
                }
            }
            else
            {
                PrepareJump(arrivals, servers, uniform, p.Length);
                int subSteps = Math.Max(1, (int)Math.Ceiling(uniform * stepHours / _maxJumps));
                for (int s = 0; s < subSteps; s++)
                {
                    Advance(p, uniform * stepHours / subSteps, stepHours / subSteps, average);
                }
            }

            if (stats is not null)
            {
                stats.Record(step, this, _average, 1.0 / stepHours);
            }

            lastState = Math.Max(lastState, p[^1]);
        }

        return lastState;
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

    // p ← p·e^(Q·hours) = Σ_k Poisson(k; expected)·p·P^k; when average is given it gains ∫ p over the sub-step.
    private void Advance(double[] p, double expected, double hours, double[]? average)
    {
        int last = p.Length - 1;
        int lo = 0;
        while (lo < last && p[lo] <= WindowCut)
        {
            lo++;
        }

        int hi = last;
        while (hi > lo && p[hi] <= WindowCut)
        {
            hi--;
        }

        Array.Clear(_power);
        Array.Clear(_next);
        double weight = Math.Exp(-expected);
        double covered = weight;
        double beyond = Math.Max(0.0, 1.0 - covered);
        for (int n = lo; n <= hi; n++)
        {
            _power[n] = p[n];
            _next[n] = weight * p[n];
        }

        if (average is not null)
        {
            Array.Clear(_integral);
            for (int n = lo; n <= hi; n++)
            {
                _integral[n] = beyond * p[n];
            }
        }

        for (int k = 1; !Done(k, expected, weight); k++)
        {
            lo = Math.Max(0, lo - 1);
            hi = Math.Min(last, hi + 1);
            MultiplyByJump(lo, hi);
            Products++;
            weight *= expected / k;
            covered += weight;
            beyond = Math.Max(0.0, 1.0 - covered);
            for (int n = lo; n <= hi; n++)
            {
                _next[n] += weight * _power[n];
            }

            if (average is not null)
            {
                for (int n = lo; n <= hi; n++)
                {
                    _integral[n] += beyond * _power[n];
                }
            }
        }

        double total = 0.0;
        for (int n = lo; n <= hi; n++)
        {
            total += _next[n];
        }

        double scale = 1.0 / total;
        Array.Clear(p);
        for (int n = lo; n <= hi; n++)
        {
            p[n] = _next[n] * scale;
        }

        if (average is not null)
        {
            double perJump = hours / expected * scale;
            for (int n = lo; n <= hi; n++)
            {
                average[n] += perJump * _integral[n];
            }
        }
    }

    // The Poisson terms after k − 1 sum to less than PoissonTail: past the mode, each later weight is at most
    // expected/k times the one before, so the rest is below weight·r/(1 − r), r = expected/k.
    private static bool Done(int k, double expected, double weight)
    {
        double ratio = expected / k;
        return ratio < 1.0 && weight * ratio / (1.0 - ratio) <= PoissonTail;
    }

    // _power ← _power · (I + Q/Λ) over states lo..hi (zero outside them before and after); no births out of the last state.
    private void MultiplyByJump(int lo, int hi)
    {
        var power = _power;
        var down = _down;
        var stay = _stay;
        double birth = _birth;
        int last = power.Length - 1;
        double carried = lo > 0 ? power[lo - 1] * birth : 0.0;
        int end = Math.Min(hi, last - 1);
        for (int n = lo; n <= end; n++)
        {
            double current = power[n];
            power[n] = (current * stay[n]) + carried + (power[n + 1] * down[n + 1]);
            carried = current * birth;
        }

        if (hi == last)
        {
            power[last] = (power[last] * stay[last]) + carried;
        }
    }
}

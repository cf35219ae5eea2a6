using System.Runtime.CompilerServices;

namespace NetSolve.Simulation;

/// <summary>
/// Runs one replication: an event loop over <see cref="EventQueue"/> with FCFS queues, collecting statistics after
/// the warm-up. Mutable and single-threaded; allocates only when a pool first grows, so memory stays flat.
/// </summary>
internal sealed partial class SimulationEngine
{
    // Cancellation is checked after every chunk of events and progress reported every 16 chunks (65,536 events).
    private const int ChunkEvents = 4096;
    private const int ChunksPerProgress = 16;

    // Units from which route rows and samplers are hinted ahead: below it they stay in cache, and a hint only costs.
    private const int HintMemoryFrom = 1024;

    private readonly CompiledNetwork _network;
    private readonly MetricLayout _layout;
    private readonly double[] _waitThresholdsHours;
    private readonly double _warmupEnd;
    private readonly double _end;
    private readonly EventQueue _events;
    private Xoshiro256StarStar _random;

    // When each patient in the pool entered the network, in hours: all a patient needs of their own while in it, since
    // their group and times at a unit travel with their queue entry (QueuedPatient) or service-end event.
    private double[] _networkEntries = new double[256];
    private int[] _freePatients = new int[256];
    private int _freeCount;
    private int _patientsAllocated;

    private readonly UnitStateBlock _units;
    private readonly QueuedPatient[][] _queues;
    private readonly double[]?[] _queueAreaByHour;
    private readonly long[] _waitOver;
    private readonly DurationHistogram[] _unitHistograms;
    private readonly DeferredDurations _unitTimes;
    private readonly GroupPlan[] _groups;
    private readonly ServiceSampler[] _samplers;

    // Whether to hint the route row and the sampler of a unit ahead (CachePrefetch): only where they miss the cache.
    private readonly bool _hintMemory;

    private readonly long[] _groupExits;
    private readonly double[] _groupTimeSum;
    private readonly DurationHistogram[] _groupHistograms;
    private readonly JourneyTracker? _journeys;

    // Whether the event being handled is still in the queue, where the first event it schedules takes its slot.
    private bool _handledStillQueued;
    private long _entered;
    private long _networkTurnedAway;

    /// <summary>
    /// Sets up one replication. <paramref name="hintMemory"/>: whether to hint memory ahead and take each event out of
    /// the queue before handling it, by default from 1,024 units; either way gives the same results (tests run both).
    /// </summary>
    public SimulationEngine(CompiledNetwork network, MetricLayout layout, double[] waitThresholdsHours, double warmupHours, double durationHours, ulong seed, int replication, bool? hintMemory = null)
    {
        _network = network;
        _layout = layout;
        _waitThresholdsHours = waitThresholdsHours;
        _warmupEnd = warmupHours;
        _end = warmupHours + durationHours;
        _random = new Xoshiro256StarStar(seed, (ulong)replication);
        int n = network.UnitCount;
        int groups = network.Groups.Length;
        _hintMemory = hintMemory ?? n >= HintMemoryFrom;
        _events = new EventQueue(groups + 16, _hintMemory);
        _units = new UnitStateBlock(n);
        _queues = new QueuedPatient[n][];
        for (int i = 0; i < n; i++)
        {
            _queues[i] = [];
            _units[i].Servers = network.Rosters[i] is int[] roster ? roster[0] : network.Servers[i];
            _units[i].Capacity = network.Capacity[i];
            _units[i].DivertTo = network.DivertTo[i];
        }

        _queueAreaByHour = new double[n][];
        _waitOver = new long[n * waitThresholdsHours.Length];
        _unitHistograms = NewHistograms(n);
        _unitTimes = new DeferredDurations(_unitHistograms);
        _groups = network.Groups;
        _samplers = network.Samplers;
        _groupExits = new long[groups];
        _groupTimeSum = new double[groups];
        _groupHistograms = NewHistograms(groups);
        _journeys = JourneyTracker.For(network.Network, groups, warmupHours);
    }

    /// <summary>
    /// Handles up to <see cref="ChunkEvents"/> events, fewer only when the run reaches its end. The loop lives in a
    /// method of its own, called thousands of times per replication, rather than in <see cref="Run"/>, which is called
    /// once: the runtime optimises a method fully, with the profile of its first calls, only after it has been called
    /// a few dozen times, and before that runs a long loop in a method entered once as a less optimised version
    /// (measured about 30% slower per event on the 10-unit benchmark).
    /// </summary>
    private int RunChunk()
    {
        int handled = 0;
        while (handled < ChunkEvents && _events.EarliestTime <= _end)
        {
            // With many units the event leaves the queue before it is handled: the removal names the next earliest
            // event at once, so its slot is hinted now and read from cache when its turn comes, its miss overlapped
            // with the handling (see EventQueue.RemoveEarliest); the first event this one schedules takes the freed
            // slot back (last freed, first reused). With few units everything is in cache and the hint gains nothing,
            // while removing and adding walk the tree twice: the event stays in the queue while it is handled, and
            // the first event it schedules takes its place in one walk (ReplaceEarliest). Both leave every event in
            // the same slot and the tree in the same state, so the two ways simulate the same patients.
            var next = _events.Earliest;
            if (next.Time >= _nextSample)
            {
                SampleSeries(next.Time);
            }

            if (_hintMemory)
            {
                _events.RemoveEarliest();
            }
            else
            {
                _handledStillQueued = true;
            }

            handled++;
            if (next.IsArrival)
            {
                OnArrivalCandidate(next.Time, next.Unit);
            }
            else if (next.Patient == SimulationEvent.RosterMarker)
            {
                OnHourChange(next.Time, next.Unit);
            }
            else
            {
                OnServiceEnd(next);
            }

            if (_handledStillQueued)
            {
                _handledStillQueued = false;
                _events.RemoveEarliest();
            }
            else if (_hintMemory)
            {
                HintNextServiceEnd();
            }
        }

        return handled;
    }

    /// <summary>
    /// Hints what the next event, a service end, will read: its unit's state and route offsets, and where the patient
    /// goes (drawn when the service started) that unit's state, route offsets, service sampler and queue, or the
    /// patient's entry time when they leave. The event's slot was hinted when the event just handled left the queue,
    /// so it is in cache by now (unless the handling scheduled an earlier event): these lines then load while the
    /// next removal walks the tree, instead of one after another while the event is handled.
    /// </summary>
    private void HintNextServiceEnd()
    {
        var (unit, patient, group, next) = _events.EarliestTarget;
        if (patient >= 0)
        {
            var routeOffsets = _groups[group].RouteOffsets;
            _units.Prefetch(unit);
            CachePrefetch.Element(routeOffsets, unit);
            if (next >= 0)
            {
                _units.Prefetch(next);
                CachePrefetch.Element(routeOffsets, next);
                CachePrefetch.Element(_samplers, (group * _units.Length) + next);
                CachePrefetch.Element(_queues, next);
            }
            else
            {
                CachePrefetch.Element(_networkEntries, patient);
            }
        }
    }

    /// <summary>Events processed so far.</summary>
    public long EventCount { get; private set; }

    /// <summary>
    /// Runs to the end of the replication. Returns false if <paramref name="cancellation"/> fired first.
    /// <paramref name="progress"/>, when given, receives the fraction of simulated time done every 65,536 events.
    /// </summary>
    public bool Run(Action<double>? progress, CancellationToken cancellation)
    {
        var groups = _network.Groups;
        for (int g = 0; g < groups.Length; g++)
        {
            if (groups[g].CandidatesPerHour > 0.0)
            {
                _events.Push(new SimulationEvent(_random.NextExponential() / groups[g].CandidatesPerHour, g, SimulationEvent.ArrivalMarker));
            }
        }

        ScheduleFirstHourChanges();
        long events = 0;
        for (long chunks = 1; ; chunks++)
        {
            int done = RunChunk();
            events += done;
            if (done < ChunkEvents)
            {
                break;
            }

            if (cancellation.IsCancellationRequested)
            {
                EventCount = events;
                return false;
            }

            if (chunks % ChunksPerProgress == 0)
            {
                progress?.Invoke(Math.Min(_events.EarliestTime / _end, 1.0));
            }
        }

        EventCount = events;
        _unitTimes.Flush();
        SampleSeries(_end);
        CloseOpenSpans();
        return true;
    }

    private void OnArrivalCandidate(double now, int group)
    {
        var plan = _groups[group];
        Schedule(new SimulationEvent(now + (_random.NextExponential() / plan.CandidatesPerHour), group, SimulationEvent.ArrivalMarker));

        // Thinning (Lewis and Shedler, 1979): candidates come at the peak rate; keep each with multiplier / peak.
        if (plan.HourOfDay is not null && _random.NextDouble() * plan.MaxMultiplier >= plan.MultiplierAt(now))
        {
            return;
        }

        int entry = plan.EntryUnits[0];
        if (plan.EntryUnits.Length > 1)
        {
            entry = plan.EntryUnits[plan.EntryPick.Pick(_random.NextDouble())];
        }

        int patient = AllocatePatient();
        _networkEntries[patient] = now;
        if (now >= _warmupEnd)
        {
            _entered++;
        }

        ArriveAtUnit(now, entry, patient, group);
    }

    private void OnServiceEnd(in SimulationEvent end)
    {
        double now = end.Time;
        int unit = end.Unit;
        int patient = end.Patient;
        int group = end.Group;
        ref var state = ref _units[unit];

        // Times are recorded when they end, for every patient ending after the warm-up: in steady state the patient
        // leaving at any moment has the steady-state time, whereas keeping only those who also arrived after the
        // warm-up would leave out long stays that straddle the end of the run.
        if (now >= _warmupEnd)
        {
            state.BusyArea += now - InWindow(end.ServiceStart);
            double sojourn = now - end.UnitArrival;
            state.Completions++;
            state.SojournSum += sojourn;
            _unitTimes.Record(unit, sojourn);
        }

        // Busy above Servers only after a roster took servers off: the server who finishes then leaves (docs/network-file.md, "Servers by hour").
        if (state.Queued > 0 && state.Busy <= state.Servers)
        {
            StartQueued(now, unit);
        }
        else
        {
            state.Busy--;
        }

        int next = end.NextUnit;
        if (next >= 0)
        {
            ArriveAtUnit(now, next, patient, group);
        }
        else
        {
            Leave(now, patient, group);
        }
    }

    private void ArriveAtUnit(double now, int unit, int patient, int group)
    {
        // Hinted beside the unit's state, which decides whether a service starts: the misses then overlap. The
        // service start draws the patient's next unit from the unit's route row.
        if (_hintMemory)
        {
            CachePrefetch.Element(_samplers, (group * _units.Length) + unit);
            var plan = _groups[group];
            CachePrefetch.Element(plan.Routes, plan.RouteOffsets[unit]);
        }
        bool counted = now >= _warmupEnd;
        for (int hops = 0; ; hops++)
        {
            ref var candidate = ref _units[unit];
            if (candidate.Busy + candidate.Queued < candidate.Capacity)
            {
                break;
            }

            // A chain of diversions longer than the number of units has gone round a loop of full units.
            bool turnAway = candidate.DivertTo < 0 || hops >= _units.Length;
            if (counted)
            {
                candidate.Full++;
                if (turnAway)
                {
                    candidate.TurnedAway++;
                    _networkTurnedAway++;
                }
                else
                {
                    candidate.Diverted++;
                }
            }

            if (turnAway)
            {
                _journeys?.Leave(now, patient, group);
                ReleasePatient(patient);
                return;
            }

            unit = candidate.DivertTo;
        }

        ref var state = ref _units[unit];
        if (counted)
        {
            state.Accepted++;
        }

        _journeys?.Arrive(now, unit, patient, group);
        if (state.Busy < state.Servers)
        {
            state.Busy++;
            StartService(now, unit, patient, group, now);
        }
        else
        {
            Enqueue(unit, new QueuedPatient(patient, group, now));
        }
    }

    /// <summary>Starts the service of the patient at the head of <paramref name="unit"/>'s queue.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private void StartQueued(double now, int unit)
    {
        var waiting = Dequeue(unit);
        StartService(now, unit, waiting.Patient, waiting.Group, waiting.UnitArrival);
    }

    private void StartService(double now, int unit, int patient, int group, double unitArrival)
    {
        if (now >= _warmupEnd)
        {
            ref var state = ref _units[unit];
            double wait = now - unitArrival;
            state.Starts++;
            if (wait > 0.0)
            {
                state.Waited++;
                state.WaitSum += wait;
                AddQueueSpan(unit, InWindow(unitArrival), now);
                var thresholds = _waitThresholdsHours;
                for (int t = 0; t < thresholds.Length; t++)
                {
                    if (wait > thresholds[t])
                    {
                        _waitOver[(unit * thresholds.Length) + t]++;
                    }
                }
            }
        }

        ref readonly var sampler = ref _samplers[(group * _units.Length) + unit];
        double service = sampler.IsExponential ? sampler.ExponentialMeanHours * _random.NextExponential() : sampler.Sample(ref _random);
        int next = Route(_groups[group], unit);
        Schedule(new SimulationEvent(now + service, unit, patient) { Group = group, NextUnit = next, UnitArrival = unitArrival, ServiceStart = now });
    }

    /// <summary>Adds an event: in place of the event being handled if it is still queued, else as a new one.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private void Schedule(in SimulationEvent item)
    {
        if (_handledStillQueued)
        {
            _handledStillQueued = false;
            _events.ReplaceEarliest(item);
        }
        else
        {
            _events.Push(item);
        }
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private void Leave(double now, int patient, int group)
    {
        if (now >= _warmupEnd)
        {
            double time = now - _networkEntries[patient];
            _groupExits[group]++;
            _groupTimeSum[group] += time;
            _groupHistograms[group].Record(time);
        }

        _journeys?.Leave(now, patient, group);
        ReleasePatient(patient);
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private int Route(GroupPlan plan, int unit)
    {
        int start = plan.RouteOffsets[unit];
        int stop = plan.RouteOffsets[unit + 1];
        if (start == stop)
        {
            return -1;
        }

        double draw = _random.NextDouble();
        var routes = plan.Routes;
        if (stop - start > CumulativeSearch.ScanUpTo)
        {
            int chosen = CumulativeSearch.FirstAbove(routes, start, stop, draw);
            return chosen < 0 ? -1 : routes[chosen].Target;
        }

        for (int k = start; k < stop; k++)
        {
            if (draw < routes[k].Cumulative)
            {
                return routes[k].Target;
            }
        }

        return -1;
    }
}

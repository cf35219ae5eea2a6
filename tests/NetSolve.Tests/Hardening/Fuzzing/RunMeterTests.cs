using System.Globalization;

namespace NetSolve.Tests.Hardening.Fuzzing;

/// <summary>The hang rule counts one run's processor time, not the other workers'.</summary>
public sealed class RunMeterTests
{
    private static readonly TimeSpan Busy = TimeSpan.FromMilliseconds(400);

    [Fact]
    public void A_run_on_one_thread_is_not_charged_for_work_on_another_thread()
    {
        // The run itself waits while another thread (another worker's run) works.
        var (used, counted) = Measure(singleThreaded: true, () => OnAnotherThread(() => Spin(Busy)));

        Assert.True(used < Busy / 4, string.Create(CultureInfo.InvariantCulture, $"charged {used.TotalMilliseconds} ms ({counted}) for {Busy.TotalMilliseconds} ms of another thread's work"));
    }

    [Fact]
    public void A_run_that_works_on_its_own_thread_is_charged_for_it()
    {
        var (used, _) = Measure(singleThreaded: true, () => Spin(Busy));

        // The processor time spun, less the scheduler's accounting granularity (a few milliseconds).
        Assert.True(used >= Busy * 0.9, string.Create(CultureInfo.InvariantCulture, $"charged {used.TotalMilliseconds} ms for {Busy.TotalMilliseconds} ms of its own work"));
    }

    [Fact]
    public void A_parallel_run_is_charged_for_the_threads_it_starts()
    {
        var (used, _) = Measure(singleThreaded: false, () => OnAnotherThread(() => Spin(Busy)));

        Assert.True(used >= Busy * 0.9, string.Create(CultureInfo.InvariantCulture, $"charged {used.TotalMilliseconds} ms for {Busy.TotalMilliseconds} ms of its helper's work"));
    }

    /// <summary>Runs <paramref name="work"/> on a thread of its own, as the fuzzer runs an input, and reads its meter.</summary>
    private static (TimeSpan Time, string Counted) Measure(bool singleThreaded, Action work)
    {
        Assert.SkipWhen(ThreadClock.OfCurrentThread() is null, "no per-thread clock on this system");
        var meter = new RunMeter(singleThreaded);
        OnAnotherThread(() =>
        {
            meter.Enter();
            work();
            meter.Leave();
        });
        return meter.Used();
    }

    private static void OnAnotherThread(Action work)
    {
        var thread = new Thread(() => work());
        thread.Start();
        thread.Join();
    }

    /// <summary>Uses <paramref name="work"/> of this thread's processor time (not wall time: the machine may be shared).</summary>
    private static void Spin(TimeSpan work)
    {
        var clock = ThreadClock.OfCurrentThread()!;
        var start = clock.Read()!.Value;
        double sink = 0;
        while (clock.Read()!.Value - start < work)
        {
            for (int i = 0; i < 10_000; i++)
            {
                sink += Math.Sqrt(i);
            }
        }

        GC.KeepAlive(sink);
    }
}

using System.Globalization;

namespace NetSolve.Tests.Hardening.Fuzzing;

/// <summary>The hang rule counts one run's processor time, not the other workers'.</summary>
public sealed class RunMeterTests
{
    private static readonly TimeSpan Busy = TimeSpan.FromMilliseconds(400);

    [Fact]
    public void A_run_on_one_thread_is_not_charged_for_work_on_another_thread()
    {
        Assert.SkipWhen(ThreadClock.OfCurrentThread() is null, "no per-thread clock on this system");
        var meter = new RunMeter(singleThreaded: true);
        var run = new Thread(() =>
        {
            meter.Enter();
            // The run itself waits while another thread (another worker's run) works.
            var other = new Thread(() => Spin(Busy));
            other.Start();
            other.Join();
            meter.Leave();
        });

        run.Start();
        run.Join();

        var (used, counted) = meter.Used();
        Assert.True(used < Busy / 4, string.Create(CultureInfo.InvariantCulture, $"charged {used.TotalMilliseconds} ms ({counted}) for {Busy.TotalMilliseconds} ms of another thread's work"));
    }

    [Fact]
    public void A_run_that_works_on_its_own_thread_is_charged_for_it()
    {
        Assert.SkipWhen(ThreadClock.OfCurrentThread() is null, "no per-thread clock on this system");
        var meter = new RunMeter(singleThreaded: true);
        var run = new Thread(() =>
        {
            meter.Enter();
            Spin(Busy);
            meter.Leave();
        });

        run.Start();
        run.Join();

        // The processor time spun, less the scheduler's accounting granularity (a few milliseconds).
        Assert.True(meter.Used().Time >= Busy * 0.9, string.Create(CultureInfo.InvariantCulture, $"charged {meter.Used().Time.TotalMilliseconds} ms for {Busy.TotalMilliseconds} ms of its own work"));
    }

    [Fact]
    public void A_parallel_run_is_charged_for_the_threads_it_starts()
    {
        Assert.SkipWhen(ThreadClock.OfCurrentThread() is null, "no per-thread clock on this system");
        var meter = new RunMeter(singleThreaded: false);
        var run = new Thread(() =>
        {
            meter.Enter();
            var helper = new Thread(() => Spin(Busy));
            helper.Start();
            helper.Join();
            meter.Leave();
        });

        run.Start();
        run.Join();

        Assert.True(meter.Used().Time >= Busy * 0.9, string.Create(CultureInfo.InvariantCulture, $"charged {meter.Used().Time.TotalMilliseconds} ms for {Busy.TotalMilliseconds} ms of its helper's work"));
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

using System.Globalization;

namespace NetSolve.Tests.Hardening.Fuzzing;

/// <summary>
/// The processor time of one thread, from the kernel's per-thread scheduler statistics
/// (<c>/proc/self/task/TID/schedstat</c>, first field: nanoseconds on a processor). Linux only; elsewhere there is none.
/// </summary>
internal sealed class ThreadClock
{
    private readonly string _path;

    private ThreadClock(string path) => _path = path;

    /// <summary>The clock of the calling thread, or null where the system does not show one.</summary>
    public static ThreadClock? OfCurrentThread()
    {
        try
        {
            // /proc/thread-self links to "PID/task/TID" of the thread that reads it.
            string? target = new FileInfo("/proc/thread-self").LinkTarget;
            if (target is null)
            {
                return null;
            }

            var clock = new ThreadClock("/proc/" + target + "/schedstat");
            return clock.Read() is null ? null : clock;
        }
        catch (IOException)
        {
            return null;
        }
        catch (UnauthorizedAccessException)
        {
            return null;
        }
    }

    /// <summary>Processor time the thread has used so far; null once it has ended.</summary>
    public TimeSpan? Read()
    {
        try
        {
            string text = File.ReadAllText(_path);
            int end = text.IndexOf(' ', StringComparison.Ordinal);
            return end > 0 && long.TryParse(text.AsSpan(0, end), NumberStyles.None, CultureInfo.InvariantCulture, out long nanoseconds)
                ? TimeSpan.FromTicks(nanoseconds / 100)
                : null;
        }
        catch (IOException)
        {
            return null;
        }
        catch (UnauthorizedAccessException)
        {
            return null;
        }
    }
}

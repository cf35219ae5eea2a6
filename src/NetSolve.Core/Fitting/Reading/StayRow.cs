using System.Runtime.InteropServices;

namespace NetSolve.Fitting.Reading;

/// <summary>
/// One stay as held in memory: ids interned to numbers and times as milliseconds since 1970-01-01 UTC, 36 bytes a
/// row so that 10 million rows take about 360 MB.
/// </summary>
/// <param name="Patient">The patient's number (the order ids were first seen; only used to group stays).</param>
/// <param name="Unit">The unit's number in <see cref="MovementLog.Units"/>.</param>
/// <param name="ArrivedMs">When the patient reached the unit.</param>
/// <param name="StartedMs">When service began; <see cref="NotRecorded"/> when the log does not say.</param>
/// <param name="LeftMs">When the patient left; <see cref="NotRecorded"/> for a stay still running at the extract's end.</param>
/// <param name="Line">The line of the log the row was read from, for messages.</param>
[StructLayout(LayoutKind.Sequential, Pack = 4)]
internal readonly record struct StayRow(int Patient, int Unit, long ArrivedMs, long StartedMs, long LeftMs, int Line)
{
    /// <summary>The value of a time the log leaves empty.</summary>
    public const long NotRecorded = long.MinValue;

    /// <summary>Whether the stay was still running when the extract was taken (its <c>left</c> is empty).</summary>
    public bool IsCensored => LeftMs == NotRecorded;

    /// <summary>When the patient took a server: the start of service, or arrival when the log has none.</summary>
    public long ServiceStartMs => StartedMs == NotRecorded ? ArrivedMs : StartedMs;
}

using System.Runtime.CompilerServices;

namespace NetSolve.Tests.Support;

/// <summary>Fixes the date reports carry for the whole test run, so approved reports stay byte for byte the same.</summary>
internal static class FixedReportDate
{
    /// <summary>2026-01-15 00:00 UTC in seconds since 1970-01-01 (<c>date -u -d 2026-01-15 +%s</c>).</summary>
    public const string Epoch = "1768435200";

    [ModuleInitializer]
    internal static void Fix()
    {
        if (Environment.GetEnvironmentVariable("SOURCE_DATE_EPOCH") is null)
        {
            Environment.SetEnvironmentVariable("SOURCE_DATE_EPOCH", Epoch);
        }
    }
}

using System.Globalization;
using System.Security.Cryptography;
using NetSolve.Rendering.Report;

namespace NetSolve.Cli.Commands;

/// <summary>Gathers a report's provenance: the date, NetSolve's version and the SHA-256 of every input file.</summary>
/// <remarks>
/// The date is <c>SOURCE_DATE_EPOCH</c> (seconds since 1970-01-01 UTC, the reproducible-builds convention) when the
/// environment sets it, so tests and archived reports can be made again byte for byte; otherwise today's date (UTC).
/// </remarks>
internal static class ReportProvenanceReader
{
    /// <summary>The environment variable that fixes the report's date.</summary>
    public const string DateVariable = "SOURCE_DATE_EPOCH";

    /// <summary>The provenance of a report made from <paramref name="file"/> and <paramref name="scenarios"/>, already read and valid.</summary>
    public static ReportProvenance Read(string file, IReadOnlyList<string> scenarios)
    {
        var inputs = scenarios.Prepend(file)
            .Select(path => new ReportInput(Path.GetFileName(path), Convert.ToHexStringLower(SHA256.HashData(File.ReadAllBytes(path)))))
            .ToList();
        return new ReportProvenance(Today(), Version(), inputs);
    }

    private static DateOnly Today() => DateFrom(Environment.GetEnvironmentVariable(DateVariable), TimeProvider.System);

    /// <summary>The report's date: <paramref name="fixedDate"/> (a <c>SOURCE_DATE_EPOCH</c> value) when given, else today by <paramref name="clock"/>.</summary>
    internal static DateOnly DateFrom(string? fixedDate, TimeProvider clock)
    {
        if (fixedDate is null)
        {
            return DateOnly.FromDateTime(clock.GetUtcNow().UtcDateTime);
        }

        const long lastSecondOf9999 = 253_402_300_799;
        if (!long.TryParse(fixedDate, NumberStyles.None, CultureInfo.InvariantCulture, out long seconds) || seconds > lastSecondOf9999)
        {
            throw new InputException(Messages.BadSourceDateEpoch(fixedDate));
        }

        return DateOnly.FromDateTime(DateTimeOffset.FromUnixTimeSeconds(seconds).UtcDateTime);
    }

    /// <summary>Major.minor.patch of the program, without the build metadata that changes with every commit.</summary>
    private static string Version() => typeof(ReportProvenanceReader).Assembly.GetName().Version?.ToString(3) ?? "unknown";
}

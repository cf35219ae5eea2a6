using System.Globalization;
using System.Text;

namespace NetSolve.Benchmarks;

/// <summary>
/// Writes a large movement log with known parameters, for measuring <c>netsolve fit</c> as a whole process: an invented
/// regional hospital where 500 patients an hour enter the emergency department (mean stay 3 h); 30% of emergency stays
/// go on to imaging (30 min) and 25% to a ward (96 h); 80% of imaging patients return to the emergency department.
/// Servers are not modelled (every patient is served at once), so stays are exponential with these means exactly and
/// rows are about 2.04 per journey.
/// </summary>
internal static class MovementLogGenerator
{
    private const double EntriesPerHour = 500.0;
    private static readonly DateTime Origin = new(2026, 1, 1, 0, 0, 0, DateTimeKind.Utc);

    /// <summary>Writes at least <paramref name="rows"/> rows (whole journeys) to <paramref name="path"/>.</summary>
    public static void Write(string path, long rows, int seed, TextWriter report)
    {
        var random = new Random(seed);
        using var output = new StreamWriter(path, append: false, new UTF8Encoding(false), bufferSize: 1 << 20);
        output.Write("patient,unit,arrived,started,left\n");
        double clock = 0.0;
        long written = 0;
        long patient = 0;
        char[] line = new char[128];
        while (written < rows)
        {
            clock += Exponential(random, 1.0 / EntriesPerHour);
            patient++;
            double time = clock;
            string unit = "emergency";
            while (unit.Length > 0)
            {
                double stay = Exponential(random, MeanHours(unit));
                WriteRow(output, line, patient, unit, time, time + stay);
                written++;
                time += stay;
                unit = Next(unit, random.NextDouble());
            }
        }

        report.WriteLine(string.Create(CultureInfo.InvariantCulture, $"wrote {written:N0} rows of {patient:N0} patients over {clock / 24.0:0.#} days to {path}"));
    }

    private static double MeanHours(string unit) => unit switch
    {
        "emergency" => 3.0,
        "imaging" => 0.5,
        _ => 96.0,
    };

    private static string Next(string unit, double u) => unit switch
    {
        "emergency" => u < 0.30 ? "imaging" : u < 0.55 ? "ward" : string.Empty,
        "imaging" => u < 0.80 ? "emergency" : string.Empty,
        _ => string.Empty,
    };

    private static double Exponential(Random random, double mean) => -Math.Log(1.0 - random.NextDouble()) * mean;

    private static void WriteRow(StreamWriter output, char[] line, long patient, string unit, double arrivedHours, double leftHours)
    {
        var span = line.AsSpan();
        int n = 0;
        span[n++] = 'P';
        patient.TryFormat(span[n..], out int used, "D9", CultureInfo.InvariantCulture);
        n += used;
        span[n++] = ',';
        unit.AsSpan().CopyTo(span[n..]);
        n += unit.Length;
        span[n++] = ',';
        n += Time(span[n..], arrivedHours);
        span[n++] = ',';
        n += Time(span[n..], arrivedHours);
        span[n++] = ',';
        n += Time(span[n..], leftHours);
        span[n++] = '\n';
        output.Write(span[..n]);
    }

    private static int Time(Span<char> target, double hours)
    {
        Origin.AddSeconds(Math.Round(hours * 3600.0)).TryFormat(target, out int used, "yyyy-MM-dd'T'HH:mm:ss", CultureInfo.InvariantCulture);
        return used;
    }
}

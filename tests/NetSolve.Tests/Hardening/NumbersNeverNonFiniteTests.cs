using System.Text;
using System.Text.Json;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Metrics;

namespace NetSolve.Tests.Hardening;

/// <summary>The last guard: whatever number reaches a writer, JSON, CSV and tables never spell NaN or Infinity.</summary>
public sealed class NumbersNeverNonFiniteTests
{
    private static readonly double[] Specials =
        [double.NaN, double.PositiveInfinity, double.NegativeInfinity, double.Epsilon, -double.Epsilon, double.MaxValue, double.MinValue, 0.0, -0.0, 1e-320];

    private static Arbitrary<double> AnyDouble() =>
        Gen.OneOf(Gen.Elements(Specials), Gen.Choose(int.MinValue, int.MaxValue).Two().Select(pair => BitConverter.Int64BitsToDouble(((long)pair.Item1 << 32) | (uint)pair.Item2)))
            .ToArbitrary();

    [Property(MaxTest = 500)]
    public Property Json_numbers_are_finite_or_null_and_the_document_stays_valid() =>
        Prop.ForAll(AnyDouble(), value =>
        {
            using var stream = new MemoryStream();
            using (var json = new Utf8JsonWriter(stream))
            {
                json.WriteStartObject();
                JsonTableWriter.WriteNumber(json, "x", value);
                JsonTableWriter.WriteCell(json, "y", Cell.Of(value, MetricDimension.Time), TimeUnit.Minute);
                json.WriteEndObject();
            }

            string text = Encoding.UTF8.GetString(stream.ToArray());
            using var document = JsonDocument.Parse(text);
            var x = document.RootElement.GetProperty("x");
            return double.IsFinite(value) ? x.ValueKind == JsonValueKind.Number : x.ValueKind == JsonValueKind.Null;
        });

    [Property(MaxTest = 500)]
    public Property Csv_and_table_cells_never_spell_a_non_finite_number() =>
        Prop.ForAll(AnyDouble(), Gen.Elements(Enum.GetValues<MetricDimension>()).ToArbitrary(), (value, dimension) =>
        {
            var cell = Cell.Of(value, dimension);
            string csv = MachineFormat.CsvCell(cell, TimeUnit.Hour);
            string table = PeopleFormat.Cell(cell, TimeUnit.Hour);
            return !csv.Contains("Infinity", StringComparison.Ordinal) && !csv.Contains("NaN", StringComparison.Ordinal)
                && !table.Contains("Infinity", StringComparison.Ordinal) && !table.Contains("NaN", StringComparison.Ordinal)
                && (double.IsFinite(value) || (csv.Length == 0 && table == PeopleFormat.Missing));
        });
}

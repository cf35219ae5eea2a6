using System.Buffers;
using System.Text.Json;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.ByHour;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Journeys;
using NetSolve.Presentation.Metrics;
using NetSolve.Solving;

namespace NetSolve.Presentation.Solution;

/// <summary>Writes a solution as the contract's JSON document (one document, units in file order).</summary>
public static class SolutionJsonWriter
{
    /// <summary>Units a block of the units array holds (about 700 KB of JSON).</summary>
    private const int UnitsPerBlock = 1024;

    /// <summary>Writes <paramref name="solution"/> to <paramref name="output"/>, indented, UTF-8.</summary>
    public static void Write(NetworkSolution solution, Stream output)
    {
        ArgumentNullException.ThrowIfNull(solution);
        using var json = new Utf8JsonWriter(output, new JsonWriterOptions { Indented = true });
        Write(solution, json);
    }

    /// <summary>Writes <paramref name="solution"/> as one JSON object to <paramref name="json"/>.</summary>
    public static void Write(NetworkSolution solution, Utf8JsonWriter json)
    {
        ArgumentNullException.ThrowIfNull(solution);
        ArgumentNullException.ThrowIfNull(json);
        json.WriteStartObject();
        json.WriteString("network", solution.Network.Name);
        json.WriteString("time_unit", TimeConstants.Name(solution.Network.TimeUnit));
        json.WriteBoolean("stable", solution.IsStable);
        WriteUnits(solution, json);
        var totals = TotalsColumns.Table(solution);
        json.WritePropertyName("totals");
        JsonTableWriter.WriteObject(totals, totals.Rows[0], json);
        if (!solution.Groups.IsEmpty)
        {
            GroupColumns.WriteArray(solution, json);
        }

        JourneyJsonWriter.Write(JourneyFormula.Estimate(solution), solution.Network.TimeUnit, json);

        json.WriteEndObject();
        json.Flush();
    }

    /// <summary>
    /// The units array; <c>targets_breached</c>, present only when some unit has a target, is an array of keys; <c>by_hour</c>,
    /// present only with an hour-by-hour solution, is an object of arrays.
    /// </summary>
    /// <remarks>
    /// Each unit's values are read and written as it comes, not built into a table first: a table of 100,000 units
    /// held about 100 MB of cells only to be written once. The field names are encoded once. A long array is written
    /// in blocks of <see cref="UnitsPerBlock"/> units, every other block formatted on the machine's second core while
    /// this thread writes the one before (number formatting is most of the document's work); the bytes are the same.
    /// </remarks>
    private static void WriteUnits(NetworkSolution solution, Utf8JsonWriter json)
    {
        var units = new UnitFields(solution);
        json.WriteStartArray("units");
        int blocks = (solution.Units.Length + UnitsPerBlock - 1) / UnitsPerBlock;
        if (blocks < 2)
        {
            units.Write(0, solution.Units.Length, json);
            json.WriteEndArray();
            return;
        }

        // Two buffers in turn: the second core fills one while this thread copies the other into the document.
        int depth = json.CurrentDepth;
        var buffers = new[] { new ArrayBufferWriter<byte>(), new ArrayBufferWriter<byte>() };
        var formatted = Task.Run(() => units.Format(1, buffers[0], json.Options, depth));
        for (int block = 0; block < blocks; block += 2)
        {
            units.Write(block * UnitsPerBlock, UnitsPerBlock, json);
            if (block + 1 >= blocks)
            {
                break;
            }

            int from = formatted.GetAwaiter().GetResult();
            var ready = buffers[(block / 2) % 2];
            if (block + 3 < blocks)
            {
                int nextBlock = block + 3;
                var next = buffers[(nextBlock / 2) % 2];
                formatted = Task.Run(() => units.Format(nextBlock, next, json.Options, depth));
            }

            // The block's units, each after its line break and indentation; the writer puts the comma before them.
            json.WriteRawValue(ready.WrittenSpan[from..], skipInputValidation: true);
            JsonTableWriter.PassOnWhenFull(json);
        }

        json.WriteEndArray();
    }

    /// <summary>What writing a unit's object needs, worked out once for the whole array.</summary>
    private sealed class UnitFields
    {
        private readonly NetworkSolution _solution;
        private readonly Column<UnitResult>[] _columns;
        private readonly JsonEncodedText[] _names;
        private readonly int _targets;
        private readonly IReadOnlyList<ByHourUnit> _byHour;

        public UnitFields(NetworkSolution solution)
        {
            _solution = solution;
            _columns = UnitColumns.For(solution).Where(column => ResultTable.Shows(column.Audience, Audience.Machines)).ToArray();
            _names = _columns.Select(column => JsonEncodedText.Encode(column.Id)).ToArray();
            _targets = Array.FindIndex(_columns, column => column.Id == UnitColumns.TargetsBreached.Id);
            _byHour = ByHourUnit.All(solution);
        }

        /// <summary>
        /// Writes block <paramref name="block"/>'s units into <paramref name="buffer"/> (emptied first) as they would
        /// stand in the document, at <paramref name="depth"/>; the answer is where they start, after the arrays that
        /// nest them that deep (the indentation is the depth's).
        /// </summary>
        public int Format(int block, ArrayBufferWriter<byte> buffer, JsonWriterOptions options, int depth)
        {
            buffer.ResetWrittenCount();
            using var json = new Utf8JsonWriter(buffer, options);
            for (int level = 0; level < depth; level++)
            {
                json.WriteStartArray();
            }

            json.Flush();
            int from = buffer.WrittenCount;
            Write(block * UnitsPerBlock, UnitsPerBlock, json);
            json.Flush();
            return from;
        }

        /// <summary>Writes up to <paramref name="count"/> units' objects from row <paramref name="first"/>.</summary>
        public void Write(int first, int count, Utf8JsonWriter json)
        {
            var timeUnit = _solution.Network.TimeUnit;
            int end = Math.Min(_solution.Units.Length, first + count);
            for (int row = first; row < end; row++)
            {
                var unit = _solution.Units[row];
                json.WriteStartObject();
                for (int i = 0; i < _columns.Length; i++)
                {
                    if (i == _targets)
                    {
                        json.WriteStartArray(_names[i]);
                        foreach (var kind in unit.TargetsBreached)
                        {
                            json.WriteStringValue(TargetKeys.Of(kind));
                        }

                        json.WriteEndArray();
                    }
                    else
                    {
                        JsonTableWriter.WriteCell(json, _names[i], _columns[i].Read(unit), timeUnit);
                    }
                }

                if (_byHour.Count > 0)
                {
                    ByHourJsonWriter.Write(_byHour[row], timeUnit, json);
                }

                json.WriteEndObject();
                JsonTableWriter.PassOnWhenFull(json);
            }
        }
    }
}

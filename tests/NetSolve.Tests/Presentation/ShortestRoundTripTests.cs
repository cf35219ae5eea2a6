using System.Buffers.Text;
using System.Globalization;
using System.Text;
using NetSolve.Presentation.Formats;

namespace NetSolve.Tests.Presentation;

/// <summary>
/// The fast round-trip formatter against the runtime's own (<see cref="Utf8Formatter"/>, what the JSON writer used
/// before), byte for byte, and against reading the text back (IEEE 754 binary64: the shortest text must parse to the
/// same double).
/// </summary>
public class ShortestRoundTripTests
{
    [Theory]
    [InlineData(0.1, "0.1")]
    [InlineData(1.0 / 3.0, "0.3333333333333333")]
    [InlineData(0.0001, "0.0001")]
    [InlineData(0.00001, "1E-05")]
    [InlineData(1.5e-5, "1.5E-05")]
    [InlineData(100.5, "100.5")]
    [InlineData(1e16, "10000000000000000")]
    [InlineData(123456789012345680.0, "1.2345678901234568E+17")]
    [InlineData(1234567890123456.7, "1234567890123456.8")]
    [InlineData(-2.5e-300, "-2.5E-300")]
    [InlineData(double.MaxValue, "1.7976931348623157E+308")]
    [InlineData(double.Epsilon, "5E-324")]
    [InlineData(0.0, "0")]
    [InlineData(1.0, "1")]
    [InlineData(-42.0, "-42")]
    [InlineData(1e15, "1000000000000000")]
    [InlineData(-0.0, "-0")]
    [InlineData(2.9802322387695312e-8, "2.980232238769531E-08")]
    public void Known_values_are_written_as_the_runtime_writes_them(double value, string expected)
    {
        // Expected texts: .NET's round-trip formatting ("R"), notation switching to an exponent below 1E-04 and above
        // 17 integer digits (checked against the runtime by the test below). 2^-25 is a power of two whose text the
        // runtime writes a digit shorter than the narrower interval below it allows, so that it reads back as the next
        // double down (2^-25 - 2^-78); the formatter leaves powers of two to the runtime to keep its text.
        Assert.Equal(expected, Written(value));
        Assert.Equal(expected, value.ToString("R", CultureInfo.InvariantCulture));
    }

    [Fact]
    public void Random_doubles_of_every_magnitude_are_written_as_the_runtime_writes_them_and_read_back_the_same()
    {
        var random = new Random(20261202);
        var different = new List<string>();
        for (int i = 0; i < 300_000; i++)
        {
            Check(BitConverter.Int64BitsToDouble(random.NextInt64()), different);
            Check(random.NextDouble() * Math.Pow(10, random.Next(-9, 13)), different);
            Check(-random.Next(1, 1_000_000) / 64.0, different);
            Check(random.NextInt64(-1_000_000_000_000_001, 1_000_000_000_000_001), different);
            Check(random.Next(0, 1000), different);
        }

        for (int e = -324; e <= 308; e++)
        {
            double power = Math.Pow(10, e);
            Check(power, different);
            Check(Math.BitIncrement(power), different);
            Check(Math.BitDecrement(power), different);
        }

        for (int e = -1074; e <= 1023; e++)
        {
            Check(Math.ScaleB(1.0, e), different);
            Check(Math.BitIncrement(Math.ScaleB(1.0, e)), different);
        }

        Assert.Empty(different);
    }

    [Fact]
    public void Infinity_and_NaN_are_refused()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => Written(double.PositiveInfinity));
        Assert.Throws<ArgumentOutOfRangeException>(() => Written(double.NaN));
    }

    private static void Check(double value, List<string> different)
    {
        if (!double.IsFinite(value))
        {
            return;
        }

        Span<byte> runtime = stackalloc byte[64];
        Utf8Formatter.TryFormat(value, runtime, out int length);
        string expected = Encoding.ASCII.GetString(runtime[..length]);
        string written = Written(value);
        // A power of two is the runtime's text (its formatter's), which for a few of them does not read back (2^-25 above).
        bool powerOfTwo = (BitConverter.DoubleToUInt64Bits(value) & ((1UL << 52) - 1)) == 0;
        if (written != expected || (!powerOfTwo && double.Parse(written, CultureInfo.InvariantCulture) != value))
        {
            different.Add(string.Create(CultureInfo.InvariantCulture, $"{BitConverter.DoubleToInt64Bits(value):X16}: {written}, runtime {expected}"));
        }
    }

    private static string Written(double value)
    {
        Span<byte> text = stackalloc byte[ShortestRoundTrip.MaxLength];
        return Encoding.ASCII.GetString(text[..ShortestRoundTrip.Format(value, text)]);
    }
}

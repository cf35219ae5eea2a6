using System.Buffers.Text;
using System.Numerics;
using System.Runtime.CompilerServices;

namespace NetSolve.Presentation.Formats;

/// <summary>
/// Writes a finite double as the shortest UTF-8 text that reads back as the same double, exactly as .NET's round-trip
/// formatting writes it (<see cref="Utf8Formatter"/>, what <c>Utf8JsonWriter.WriteNumber</c> uses): the same digits,
/// fixed notation from 1E-04 to 17 integer digits, <c>1E-05</c> and <c>1.2345678901234568E+17</c> beyond. About twice as
/// fast, which a 100,000-unit document of two million numbers notices.
/// </summary>
/// <remarks>
/// The digits come from Ryū (U. Adams, "Ryū: fast float-to-string conversion", PLDI 2018, ACM SIGPLAN Notices 53(4),
/// pp. 270–282; from memory): the interval of reals that round to the double is scaled by a power of 5 held in 128
/// bits, and digits are dropped while both ends of the interval still differ. Where the double is a power of two the
/// interval is lopsided and the runtime's formatter sometimes keeps a digit fewer; those values are left to it, so the
/// text stays the runtime's to the byte. Thread-safe.
/// </remarks>
public static class ShortestRoundTrip
{
    /// <summary>The longest text written: <c>-1.2345678901234567E-308</c>.</summary>
    public const int MaxLength = 24;

    /// <summary>Whole numbers up to this are written as integers directly (well below 2^53 and 17 digits).</summary>
    private const long MaxWhole = 1_000_000_000_000_000;

    private const int MantissaBits = 52;
    private const int ExponentBias = 1023;
    private const int Pow5InverseBits = 125;
    private const int Pow5Bits = 125;

    /// <summary>⌊2^(bits(5^q) − 1 + 125) / 5^q⌋ + 1 for q = 0..341, as (low, high) 64-bit halves.</summary>
    private static readonly ulong[] Pow5Inverse = InverseTable(342);

    /// <summary>5^i scaled to its top 125 bits for i = 0..325, as (low, high) 64-bit halves.</summary>
    private static readonly ulong[] Pow5 = PowerTable(326);

    private static readonly ulong[] PowersOf10 = [.. Enumerable.Range(0, 20).Select(e => (ulong)BigInteger.Pow(10, e))];

    private static ReadOnlySpan<byte> TwoDigits =>
        "00010203040506070809101112131415161718192021222324252627282930313233343536373839404142434445464748495051525354555657585960616263646566676869707172737475767778798081828384858687888990919293949596979899"u8;

    /// <summary>Writes <paramref name="value"/> into <paramref name="destination"/> (at least <see cref="MaxLength"/> bytes) and returns the bytes written.</summary>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="value"/> is NaN or infinite (JSON has no such number).</exception>
    // Optimized from its first call: a one-time pass over 100,000 units spent most of its time here in tier-0 and
    // instrumented copies (docs/performance.md).
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static int Format(double value, Span<byte> destination)
    {
        if (!double.IsFinite(value))
        {
            throw new ArgumentOutOfRangeException(nameof(value), value, "Only finite numbers are written.");
        }

        // A whole number (0 and 1 fill many fields) is its digits: every double this size is an exact integer.
        if (Math.Abs(value) <= MaxWhole && (long)value is long whole && whole == value && (whole != 0 || !double.IsNegative(value)))
        {
            return Whole(whole, destination);
        }

        ulong bits = BitConverter.DoubleToUInt64Bits(value);
        ulong mantissa = bits & ((1UL << MantissaBits) - 1);
        int exponent = (int)((bits >> MantissaBits) & 0x7FF);
        if (mantissa == 0)
        {
            // Zero and the powers of two: the runtime's own text.
            Utf8Formatter.TryFormat(value, destination, out int written);
            return written;
        }

        int at = (bits >> 63) != 0 ? 1 : 0;
        if (at == 1)
        {
            destination[0] = (byte)'-';
        }

        var (digits, power) = ShortestDigits(mantissa, exponent);
        int length = DecimalLength(digits);
        int scale = power + length;
        if (scale > 17 || scale < -3)
        {
            return at + Scientific(destination[at..], digits, length, scale - 1);
        }

        if (scale <= 0)
        {
            destination[at++] = (byte)'0';
            destination[at++] = (byte)'.';
            destination.Slice(at, -scale).Fill((byte)'0');
            at += -scale;
            WriteDigits(destination, at + length, digits);
            return at + length;
        }

        if (scale < length)
        {
            // The digits one place to the right, then the integer part moved back over the gap and the point put in.
            WriteDigits(destination, at + length + 1, digits);
            destination.Slice(at + 1, scale).CopyTo(destination[at..]);
            destination[at + scale] = (byte)'.';
            return at + length + 1;
        }

        WriteDigits(destination, at + length, digits);
        destination.Slice(at + length, scale - length).Fill((byte)'0');
        return at + scale;
    }

    private static int Whole(long value, Span<byte> destination)
    {
        int at = 0;
        if (value < 0)
        {
            destination[at++] = (byte)'-';
            value = -value;
        }

        int length = DecimalLength((ulong)value);
        WriteDigits(destination, at + length, (ulong)value);
        return at + length;
    }

    /// <summary><c>d.dddE+XX</c>: at least two exponent digits, its sign always written.</summary>
    private static int Scientific(Span<byte> destination, ulong digits, int length, int exponent)
    {
        WriteDigits(destination, length + 1, digits);
        destination[0] = destination[1];
        int at = 1;
        if (length > 1)
        {
            destination[1] = (byte)'.';
            at = length + 1;
        }

        destination[at++] = (byte)'E';
        destination[at++] = exponent < 0 ? (byte)'-' : (byte)'+';
        int size = Math.Abs(exponent);
        if (size >= 100)
        {
            destination[at++] = (byte)('0' + (size / 100));
            size %= 100;
        }

        destination[at++] = TwoDigits[size * 2];
        destination[at++] = TwoDigits[(size * 2) + 1];
        return at;
    }

    /// <summary>The shortest digits d and power p with d · 10^p inside the interval that rounds to the double (Ryū's d2d).</summary>
    // Optimized from its first call: a one-time pass over 100,000 units spent most of its time here in tier-0 and
    // instrumented copies (docs/performance.md).
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static (ulong Digits, int Power) ShortestDigits(ulong mantissa, int exponent)
    {
        int e2 = (exponent == 0 ? 1 : exponent) - ExponentBias - MantissaBits - 2;
        ulong m2 = exponent == 0 ? mantissa : (1UL << MantissaBits) | mantissa;
        bool acceptBounds = (m2 & 1) == 0;
        ulong mv = 4 * m2;
        ulong lowerGap = mantissa != 0 || exponent <= 1 ? 2UL : 1UL;
        ulong vr;
        ulong vp;
        ulong vm;
        int e10;
        bool vmTrailingZeros = false;
        bool vrTrailingZeros = false;
        if (e2 >= 0)
        {
            int q = Log10Pow2(e2) - (e2 > 3 ? 1 : 0);
            e10 = q;
            int shift = -e2 + q + Pow5InverseBits + BitsOfPow5(q) - 1;
            (vr, vp, vm) = MulShiftAll(mv, lowerGap, Pow5Inverse[2 * q], Pow5Inverse[(2 * q) + 1], shift);
            if (q <= 21)
            {
                if (mv % 5 == 0)
                {
                    vrTrailingZeros = Pow5Factor(mv) >= q;
                }
                else if (acceptBounds)
                {
                    vmTrailingZeros = Pow5Factor(mv - lowerGap) >= q;
                }
                else if (Pow5Factor(mv + 2) >= q)
                {
                    vp--;
                }
            }
        }
        else
        {
            int q = Log10Pow5(-e2) - (-e2 > 1 ? 1 : 0);
            e10 = q + e2;
            int i = -e2 - q;
            int shift = q - (BitsOfPow5(i) - Pow5Bits);
            (vr, vp, vm) = MulShiftAll(mv, lowerGap, Pow5[2 * i], Pow5[(2 * i) + 1], shift);
            if (q <= 1)
            {
                vrTrailingZeros = true;
                if (acceptBounds)
                {
                    vmTrailingZeros = lowerGap == 2;
                }
                else
                {
                    vp--;
                }
            }
            else if (q < 63)
            {
                vrTrailingZeros = (mv & ((1UL << q) - 1)) == 0;
            }
        }

        var (digits, removed) = vmTrailingZeros || vrTrailingZeros
            ? RemoveDigitsExact(vr, vp, vm, vmTrailingZeros, vrTrailingZeros, acceptBounds)
            : RemoveDigits(vr, vp, vm);
        return (digits, e10 + removed);
    }

    /// <summary>The common case: no end of the interval is exactly a decimal, so only the last removed digit rounds.</summary>
    // Optimized from its first call: a one-time pass over 100,000 units spent most of its time here in tier-0 and
    // instrumented copies (docs/performance.md).
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static (ulong Digits, int Removed) RemoveDigits(ulong vr, ulong vp, ulong vm)
    {
        int removed = 0;
        bool roundUp = false;
        if (vp / 100 > vm / 100)
        {
            roundUp = vr % 100 >= 50;
            vr /= 100;
            vp /= 100;
            vm /= 100;
            removed = 2;
        }

        while (vp / 10 > vm / 10)
        {
            roundUp = vr % 10 >= 5;
            vr /= 10;
            vp /= 10;
            vm /= 10;
            removed++;
        }

        return (vr + (vr == vm || roundUp ? 1UL : 0UL), removed);
    }

    /// <summary>The rare case where an end of the interval, or the value, is a decimal: trailing zeros and ties to even count.</summary>
    private static (ulong Digits, int Removed) RemoveDigitsExact(ulong vr, ulong vp, ulong vm, bool vmTrailingZeros, bool vrTrailingZeros, bool acceptBounds)
    {
        int removed = 0;
        ulong lastRemoved = 0;
        while (vp / 10 > vm / 10)
        {
            vmTrailingZeros &= vm % 10 == 0;
            vrTrailingZeros &= lastRemoved == 0;
            lastRemoved = vr % 10;
            vr /= 10;
            vp /= 10;
            vm /= 10;
            removed++;
        }

        if (vmTrailingZeros)
        {
            while (vm % 10 == 0)
            {
                vrTrailingZeros &= lastRemoved == 0;
                lastRemoved = vr % 10;
                vr /= 10;
                vp /= 10;
                vm /= 10;
                removed++;
            }
        }

        if (vrTrailingZeros && lastRemoved == 5 && vr % 2 == 0)
        {
            lastRemoved = 4;
        }

        bool roundUp = (vr == vm && (!acceptBounds || !vmTrailingZeros)) || lastRemoved >= 5;
        return (vr + (roundUp ? 1UL : 0UL), removed);
    }

    /// <summary>The value and both ends of its interval (4m, 4m + 2, 4m − gap) times the 128-bit factor, shifted right.</summary>
    private static (ulong Value, ulong Upper, ulong Lower) MulShiftAll(ulong mv, ulong lowerGap, ulong low, ulong high, int shift) =>
        (MulShift(mv, low, high, shift), MulShift(mv + 2, low, high, shift), MulShift(mv - lowerGap, low, high, shift));

    /// <summary>(m · factor) >> shift for a 128-bit factor (low, high), with 64 &lt; shift &lt; 128.</summary>
    private static ulong MulShift(ulong m, ulong low, ulong high, int shift)
    {
        ulong lowProductHigh = Math.BigMul(m, low, out _);
        ulong highProductHigh = Math.BigMul(m, high, out ulong highProductLow);
        ulong sumLow = highProductLow + lowProductHigh;
        ulong sumHigh = highProductHigh + (sumLow < highProductLow ? 1UL : 0UL);
        int right = shift - 64;
        return (sumLow >> right) | (sumHigh << (64 - right));
    }

    private static int BitsOfPow5(int e) => (int)(((uint)e * 1217359) >> 19) + 1;

    private static int Log10Pow2(int e) => (int)(((uint)e * 78913) >> 18);

    private static int Log10Pow5(int e) => (int)(((uint)e * 732923) >> 20);

    private static int Pow5Factor(ulong value)
    {
        int count = 0;
        while (value % 5 == 0)
        {
            value /= 5;
            count++;
        }

        return count;
    }

    /// <summary>Digits of <paramref name="value"/>; 1 for 0.</summary>
    private static int DecimalLength(ulong value)
    {
        int estimate = ((64 - BitOperations.LeadingZeroCount(value | 1)) * 1233) >> 12;
        return estimate + ((value | 1) >= PowersOf10[estimate] ? 1 : 0);
    }

    /// <summary>Writes the decimal digits of <paramref name="value"/> so that the last lands just before <paramref name="end"/>.</summary>
    // Optimized from its first call: a one-time pass over 100,000 units spent most of its time here in tier-0 and
    // instrumented copies (docs/performance.md).
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static void WriteDigits(Span<byte> destination, int end, ulong value)
    {
        int at = end;
        while (value >= 100)
        {
            ulong rest = value / 100;
            int pair = (int)(value - (rest * 100)) * 2;
            destination[--at] = TwoDigits[pair + 1];
            destination[--at] = TwoDigits[pair];
            value = rest;
        }

        if (value >= 10)
        {
            destination[--at] = TwoDigits[((int)value * 2) + 1];
            destination[at - 1] = TwoDigits[(int)value * 2];
        }
        else
        {
            destination[at - 1] = (byte)('0' + (int)value);
        }
    }

    private static ulong[] InverseTable(int count)
    {
        var table = new ulong[2 * count];
        var power = BigInteger.One;
        for (int q = 0; q < count; q++, power *= 5)
        {
            int bits = (int)power.GetBitLength();
            Split((BigInteger.One << (bits - 1 + Pow5InverseBits)) / power + 1, table, q);
        }

        return table;
    }

    private static ulong[] PowerTable(int count)
    {
        var table = new ulong[2 * count];
        var power = BigInteger.One;
        for (int i = 0; i < count; i++, power *= 5)
        {
            int bits = (int)power.GetBitLength();
            Split(bits >= Pow5Bits ? power >> (bits - Pow5Bits) : power << (Pow5Bits - bits), table, i);
        }

        return table;
    }

    private static void Split(BigInteger value, ulong[] table, int row)
    {
        table[2 * row] = (ulong)(value & ulong.MaxValue);
        table[(2 * row) + 1] = (ulong)(value >> 64);
    }
}

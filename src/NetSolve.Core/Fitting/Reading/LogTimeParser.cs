using NodaTime;

namespace NetSolve.Fitting.Reading;

/// <summary>
/// Reads the time formats a movement log may use, without allocating: ISO 8601 (<c>2026-03-02T08:15</c>, seconds and
/// a fraction of up to nine digits optional, a space allowed for the <c>T</c>) with or without an offset (<c>Z</c>,
/// <c>+01:00</c>, <c>+0100</c>), and the day-first local forms <c>dd/MM/yyyy HH:mm[:ss]</c> and
/// <c>dd.MM.yyyy HH:mm[:ss]</c>. Month-first dates (<c>03/02/2026</c> in the United States) are refused on purpose:
/// they cannot be told apart from day-first ones.
/// </summary>
/// <remarks>A hand-written parser rather than a pattern library: a 10-million-row log holds 30 million times.</remarks>
internal static class LogTimeParser
{
    /// <summary>
    /// Parses <paramref name="text"/> into a local date and time and, when the text carries one, its offset from UTC.
    /// False for anything else, including impossible dates such as 31 April.
    /// </summary>
    public static bool TryParse(ReadOnlySpan<char> text, out LocalDateTime local, out Offset? offset)
    {
        local = default;
        offset = null;
        if (!TryDate(text, out int year, out int month, out int day, out int next)
            || next >= text.Length || text[next] is not ('T' or ' '))
        {
            return false;
        }

        var rest = text[(next + 1)..];
        if (!TryTime(rest, out int hour, out int minute, out int second, out int nanoseconds, out int used)
            || !TryOffset(rest[used..], out offset))
        {
            return false;
        }

        if (month is < 1 or > 12 || day < 1 || day > CalendarSystem.Iso.GetDaysInMonth(year, month) || hour > 23 || minute > 59 || second > 59)
        {
            return false;
        }

        local = new LocalDateTime(year, month, day, hour, minute, second).PlusNanoseconds(nanoseconds);
        return true;
    }

    private static bool TryDate(ReadOnlySpan<char> text, out int year, out int month, out int day, out int next)
    {
        year = month = day = next = 0;
        if (text.Length >= 10 && text[4] == '-' && text[7] == '-')
        {
            next = 10;
            return Digits(text[..4], out year) && Digits(text.Slice(5, 2), out month) && Digits(text.Slice(8, 2), out day) && year >= 1;
        }

        if (text.Length >= 10 && ((text[2] == '/' && text[5] == '/') || (text[2] == '.' && text[5] == '.')))
        {
            next = 10;
            return Digits(text[..2], out day) && Digits(text.Slice(3, 2), out month) && Digits(text.Slice(6, 4), out year) && year >= 1;
        }

        return false;
    }

    private static bool TryTime(ReadOnlySpan<char> text, out int hour, out int minute, out int second, out int nanoseconds, out int used)
    {
        hour = minute = second = nanoseconds = used = 0;
        if (text.Length < 5 || text[2] != ':' || !Digits(text[..2], out hour) || !Digits(text.Slice(3, 2), out minute))
        {
            return false;
        }

        used = 5;
        if (text.Length >= 8 && text[5] == ':')
        {
            if (!Digits(text.Slice(6, 2), out second))
            {
                return false;
            }

            used = 8;
            if (text.Length > 9 && text[8] is '.' or ',')
            {
                int end = 9;
                while (end < text.Length && char.IsAsciiDigit(text[end]))
                {
                    end++;
                }

                int digits = end - 9;
                if (digits is 0 or > 9 || !Digits(text[9..end], out nanoseconds))
                {
                    return false;
                }

                for (int k = digits; k < 9; k++)
                {
                    nanoseconds *= 10;
                }

                used = end;
            }
        }

        return true;
    }

    private static bool TryOffset(ReadOnlySpan<char> text, out Offset? offset)
    {
        offset = null;
        if (text.IsEmpty)
        {
            return true;
        }

        if (text is "Z" or "z")
        {
            offset = Offset.Zero;
            return true;
        }

        if (text[0] is not ('+' or '-'))
        {
            return false;
        }

        var body = text[1..];
        int hours;
        int minutes;
        if (body.Length == 5 && body[2] == ':')
        {
            if (!Digits(body[..2], out hours) || !Digits(body.Slice(3, 2), out minutes))
            {
                return false;
            }
        }
        else if (body.Length == 4)
        {
            if (!Digits(body[..2], out hours) || !Digits(body.Slice(2, 2), out minutes))
            {
                return false;
            }
        }
        else if (body.Length == 2)
        {
            minutes = 0;
            if (!Digits(body, out hours))
            {
                return false;
            }
        }
        else
        {
            return false;
        }

        if (hours > 18 || minutes > 59)
        {
            return false;
        }

        int seconds = ((hours * 60) + minutes) * 60;
        offset = Offset.FromSeconds(text[0] == '-' ? -seconds : seconds);
        return true;
    }

    private static bool Digits(ReadOnlySpan<char> text, out int value)
    {
        value = 0;
        foreach (char c in text)
        {
            if (!char.IsAsciiDigit(c))
            {
                return false;
            }

            value = (value * 10) + (c - '0');
        }

        return !text.IsEmpty;
    }
}

using System.Globalization;
using System.Text;
using CanopyAdvisor.Core.Advice.Labour;
using CanopyAdvisor.Core.Sites;
using NodaTime;
using NodaTime.Text;

namespace CanopyAdvisor.Reports.Calendar;

/// <summary>The rotation calendar as CSV (RFC 4180): one row per scheduled task, and a second table of tasks that did not fit.</summary>
/// <remarks>
/// <para>
/// RFC 4180: a header row, CRLF after every row, fields separated by commas; a field holding a comma, a double quote, CR
/// or LF is enclosed in double quotes with its quotes doubled. Numbers use a full stop for decimals (invariant culture).
/// Dates are ISO 8601 local dates; times are ISO 8601 local date-times in the site's time zone with their UTC offset
/// (<c>2026-12-07T07:00:00+01:00</c>), so a spreadsheet can tell the hours on each side of a daylight-saving change apart.
/// </para>
/// <para>
/// A text field that begins with <c>=</c>, <c>+</c>, <c>-</c>, <c>@</c>, tab or CR gets a leading apostrophe, so a
/// spreadsheet shows it instead of running it as a formula (CSV injection; OWASP's advice). Numbers are left alone.
/// </para>
/// </remarks>
public static class RotationCalendarCsv
{
    /// <summary>The columns of <see cref="Write"/>, in order.</summary>
    public static IReadOnlyList<string> Columns { get; } =
    [
        "date", "start", "end", "crewId", "crewName", "taskId", "bench", "lot", "crop", "pots", "angleDeg", "labourMinutes",
        "crewMinutes", "windowStart", "windowEnd",
    ];

    /// <summary>The columns of <see cref="WriteUnscheduled"/>, in order.</summary>
    public static IReadOnlyList<string> UnscheduledColumns { get; } =
    [
        "taskId", "bench", "lot", "crop", "pots", "angleDeg", "labourMinutes", "windowStart", "windowEnd", "reason", "extraLabour",
    ];

    private static readonly OffsetDateTimePattern LocalWithOffset =
        OffsetDateTimePattern.CreateWithInvariantCulture("uuuu'-'MM'-'dd'T'HH':'mm':'sso<+HH:mm>");

    /// <summary>The scheduled tasks, in the schedule's order (by start time).</summary>
    /// <param name="site">The site (its lots' crops and its crews' names).</param>
    /// <param name="schedule">The schedule.</param>
    public static string Write(Site site, LabourSchedule schedule)
    {
        ArgumentNullException.ThrowIfNull(site);
        ArgumentNullException.ThrowIfNull(schedule);
        var sb = new StringBuilder();
        Row(sb, Columns);
        foreach (ScheduledTask s in schedule.Scheduled)
        {
            RotationTask t = s.Task;
            Row(sb,
            [
                LocalDatePattern.Iso.Format(s.Date),
                Local(s.Start),
                Local(s.End),
                Text(s.CrewId),
                Text(RotationCalendarIcs.CrewName(site, s.CrewId)),
                Text(t.Id),
                Text(t.BenchId),
                Text(t.LotId),
                Text(RotationCalendarIcs.CropOf(site, t.LotId)),
                t.Pots.ToString(CultureInfo.InvariantCulture),
                Number(t.Angle.Degrees),
                Number(t.Labour.TotalMinutes),
                Number(s.CrewTime.TotalMinutes),
                Local(t.Earliest.InZone(schedule.Zone)),
                Local(t.Latest.InZone(schedule.Zone)),
            ]);
        }

        return sb.ToString();
    }

    /// <summary>
    /// The tasks that did not fit, in the schedule's order, with the reason (<c>no-working-time-in-window</c>,
    /// <c>longer-than-working-time-in-window</c> or <c>crews-fully-booked</c>) and the extra labour options
    /// (<c>2026-12-07 team +40 min; …</c>; <c>any crew</c> where nobody works that day).
    /// </summary>
    /// <param name="site">The site (its lots' crops).</param>
    /// <param name="schedule">The schedule.</param>
    public static string WriteUnscheduled(Site site, LabourSchedule schedule)
    {
        ArgumentNullException.ThrowIfNull(site);
        ArgumentNullException.ThrowIfNull(schedule);
        var sb = new StringBuilder();
        Row(sb, UnscheduledColumns);
        foreach (UnscheduledTask u in schedule.Unscheduled)
        {
            RotationTask t = u.Task;
            string extra = string.Join("; ", u.Options.Select(o =>
                $"{LocalDatePattern.Iso.Format(o.Date)} {o.CrewId ?? "any crew"} +{Number(o.Labour.TotalMinutes)} min"));
            Row(sb,
            [
                Text(t.Id),
                Text(t.BenchId),
                Text(t.LotId),
                Text(RotationCalendarIcs.CropOf(site, t.LotId)),
                t.Pots.ToString(CultureInfo.InvariantCulture),
                Number(t.Angle.Degrees),
                Number(t.Labour.TotalMinutes),
                Local(t.Earliest.InZone(schedule.Zone)),
                Local(t.Latest.InZone(schedule.Zone)),
                Reason(u.Reason),
                Text(extra),
            ]);
        }

        return sb.ToString();
    }

    /// <summary>One field as RFC 4180 writes it: enclosed in double quotes, quotes doubled, when it holds a comma, quote, CR or LF.</summary>
    internal static string Field(string value)
    {
        ArgumentNullException.ThrowIfNull(value);
        return value.AsSpan().IndexOfAny(",\"\r\n") >= 0 ? "\"" + value.Replace("\"", "\"\"", StringComparison.Ordinal) + "\"" : value;
    }

    /// <summary>A text value guarded against being run as a spreadsheet formula (see the class remarks).</summary>
    internal static string Text(string value)
    {
        ArgumentNullException.ThrowIfNull(value);
        return value.Length > 0 && value[0] is '=' or '+' or '-' or '@' or '\t' or '\r' ? "'" + value : value;
    }

    private static void Row(StringBuilder sb, IReadOnlyList<string> fields)
    {
        for (int i = 0; i < fields.Count; i++)
        {
            if (i > 0)
            {
                sb.Append(',');
            }

            sb.Append(Field(fields[i]));
        }

        sb.Append("\r\n");
    }

    private static string Local(ZonedDateTime time) => LocalWithOffset.Format(time.ToOffsetDateTime());

    private static string Number(double value) => value.ToString("0.##", CultureInfo.InvariantCulture);

    private static string Reason(UnscheduledReason reason) => reason switch
    {
        UnscheduledReason.NoWorkingTimeInWindow => "no-working-time-in-window",
        UnscheduledReason.LongerThanWorkingTimeInWindow => "longer-than-working-time-in-window",
        UnscheduledReason.CrewsFullyBooked => "crews-fully-booked",
        _ => reason.ToString(),
    };
}

using System.Globalization;
using System.Security.Cryptography;
using System.Text;
using CanopyAdvisor.Core.Advice.Labour;
using CanopyAdvisor.Core.Sites;
using NodaTime;
using NodaTime.Text;

namespace CanopyAdvisor.Reports.Calendar;

/// <summary>The rotation calendar as an iCalendar file (RFC 5545), one event per scheduled rotation task.</summary>
/// <remarks>
/// <para>
/// The file is a VCALENDAR with VERSION 2.0, our PRODID, CALSCALE GREGORIAN, METHOD PUBLISH (a calendar to
/// subscribe to or import, RFC 5546 §3.2.1) and a NAME (RFC 7986 §5.1), and one VEVENT per scheduled task with UID, DTSTAMP, SEQUENCE, DTSTART,
/// DTEND, SUMMARY, DESCRIPTION and LOCATION. Lines end in CRLF and are folded at 75 octets without splitting a UTF-8
/// character (§3.1); text values are escaped (§3.3.11).
/// </para>
/// <para>
/// Times are written in UTC (<c>DTSTART:20261207T060000Z</c>, the DATE-TIME "form #2" of §3.3.5), which needs no
/// VTIMEZONE and cannot be misread across a daylight-saving change; calendar programs show them in the reader's own
/// zone, which for the site's crews is the site's zone. The description gives the local times with their offsets too.
/// </para>
/// <para>
/// The UID of a task is made from the site id, the lot id and the task id only (<see cref="Uid"/>), never from its
/// time, so exporting again after a reschedule updates the same event; raise <c>sequence</c> with each new plan so that
/// calendar programs take the new times (§3.8.7.4). Deterministic: the same schedule, stamp and sequence give the same text.
/// </para>
/// </remarks>
public static class RotationCalendarIcs
{
    /// <summary>Our product identifier (RFC 5545 §3.7.3).</summary>
    public const string ProductId = "-//CanopyAdvisor//NONSGML Rotation calendar 1//EN";

    /// <summary>The right-hand part of every UID.</summary>
    public const string UidDomain = "rotation.canopyadvisor";

    // DATE-TIME in UTC, RFC 5545 §3.3.5 form #2.
    private static readonly InstantPattern UtcDateTime = InstantPattern.CreateWithInvariantCulture("uuuuMMdd'T'HHmmss'Z'");

    private static readonly OffsetDateTimePattern LocalWithOffset =
        OffsetDateTimePattern.CreateWithInvariantCulture("uuuu'-'MM'-'dd' 'HH':'mm' 'o<+HH:mm>");

    /// <summary>Writes the calendar of a schedule.</summary>
    /// <param name="site">The site (its id and name, its lots' crops and its crews' names).</param>
    /// <param name="schedule">The schedule; only placed tasks become events.</param>
    /// <param name="stamp">When the file is made (DTSTAMP, §3.8.7.2); the caller's clock, so the output is reproducible.</param>
    /// <param name="sequence">The plan's revision (SEQUENCE, §3.8.7.4, ≥ 0): raise it whenever the plan is exported again with changes.</param>
    /// <returns>The iCalendar text, CRLF line ends, UTF-8 when saved.</returns>
    public static string Write(Site site, LabourSchedule schedule, Instant stamp, int sequence = 0)
    {
        ArgumentNullException.ThrowIfNull(site);
        ArgumentNullException.ThrowIfNull(schedule);
        ArgumentOutOfRangeException.ThrowIfNegative(sequence);
        var sb = new StringBuilder();
        void Line(string text) => ICalendarText.AppendFolded(sb, text);

        Line("BEGIN:VCALENDAR");
        Line("VERSION:2.0");
        Line("PRODID:" + ProductId);
        Line("CALSCALE:GREGORIAN");
        Line("METHOD:PUBLISH");
        Line("NAME:" + ICalendarText.EscapeText($"Rotation calendar: {site.Name}"));
        foreach (ScheduledTask task in schedule.Scheduled)
        {
            RotationTask t = task.Task;
            string crop = CropOf(site, t.LotId);
            string crew = CrewName(site, task.CrewId);
            Line("BEGIN:VEVENT");
            Line("UID:" + Uid(t.SiteId, t.LotId, t.Id));
            Line("DTSTAMP:" + Utc(stamp));
            Line("SEQUENCE:" + sequence.ToString(CultureInfo.InvariantCulture));
            Line("DTSTART:" + Utc(task.Start.ToInstant()));
            Line("DTEND:" + Utc(task.End.ToInstant()));
            Line("SUMMARY:" + ICalendarText.EscapeText(Summary(t, crop)));
            Line("DESCRIPTION:" + ICalendarText.EscapeText(Description(task, crop, crew, schedule.Zone)));
            Line("LOCATION:" + ICalendarText.EscapeText($"{site.Name}, bench {t.BenchId}"));
            Line("END:VEVENT");
        }

        Line("END:VCALENDAR");
        return sb.ToString();
    }

    /// <summary>
    /// The UID of a task's event: <c>{32 hex digits}@rotation.canopyadvisor</c>, the first 128 bits of SHA-256 over the
    /// site id, lot id and task id (each prefixed with its length, so no two triples collide by where they split).
    /// </summary>
    /// <remarks>Stable across exports and independent of the task's time; RFC 5545 §3.8.4.7 asks for a globally unique, persistent id.</remarks>
    public static string Uid(string siteId, string lotId, string taskId)
    {
        ArgumentNullException.ThrowIfNull(siteId);
        ArgumentNullException.ThrowIfNull(lotId);
        ArgumentNullException.ThrowIfNull(taskId);
        string key = string.Create(CultureInfo.InvariantCulture, $"{siteId.Length}:{siteId}|{lotId.Length}:{lotId}|{taskId.Length}:{taskId}");
        byte[] hash = SHA256.HashData(Encoding.UTF8.GetBytes(key));
        return Convert.ToHexStringLower(hash, 0, 16) + "@" + UidDomain;
    }

    private static string Summary(RotationTask t, string crop) =>
        $"Turn pots {Turn(t)}: bench {t.BenchId}" + (crop.Length > 0 ? $" ({crop})" : string.Empty);

    private static string Description(ScheduledTask task, string crop, string crew, DateTimeZone zone)
    {
        RotationTask t = task.Task;
        var lines = new List<string>
        {
            $"Bench: {t.BenchId}",
            $"Lot: {t.LotId}" + (crop.Length > 0 ? $" ({crop})" : string.Empty),
            $"Pots: {t.Pots.ToString(CultureInfo.InvariantCulture)}",
            $"Turn: {Turn(t)} seen from above",
            $"Crew: {crew}",
            $"Labour: {Minutes(t.Labour)} min (crew time {Minutes(task.CrewTime)} min)",
            $"Local time: {LocalWithOffset.Format(task.Start.ToOffsetDateTime())} to {LocalWithOffset.Format(task.End.ToOffsetDateTime())}",
            $"Window: {LocalWithOffset.Format(t.Earliest.InZone(zone).ToOffsetDateTime())} to {LocalWithOffset.Format(t.Latest.InZone(zone).ToOffsetDateTime())}",
        };
        return string.Join('\n', lines);
    }

    private static string Turn(RotationTask t)
    {
        double deg = t.Angle.Degrees;
        string amount = Math.Abs(deg).ToString("0.#", CultureInfo.InvariantCulture);
        return deg >= 0 ? $"{amount}° clockwise" : $"{amount}° anticlockwise";
    }

    private static string Minutes(Duration d) => d.TotalMinutes.ToString("0.#", CultureInfo.InvariantCulture);

    private static string Utc(Instant instant) => UtcDateTime.Format(instant);

    internal static string CropOf(Site site, string lotId) =>
        site.Lots.FirstOrDefault(l => string.Equals(l.Id, lotId, StringComparison.Ordinal))?.CropId ?? string.Empty;

    internal static string CrewName(Site site, string crewId) =>
        site.Labour.Crews.FirstOrDefault(c => string.Equals(c.Id, crewId, StringComparison.Ordinal))?.Name ?? crewId;
}

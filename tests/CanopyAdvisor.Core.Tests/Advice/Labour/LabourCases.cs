using System.Collections.Immutable;
using CanopyAdvisor.Core.Advice.Labour;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;
using NodaTime;

namespace CanopyAdvisor.Core.Tests.Advice.Labour;

/// <summary>Small builders for labour test cases (invented test data).</summary>
internal static class LabourCases
{
    public static readonly DateTimeZone Amsterdam = DateTimeZoneProviders.Tzdb["Europe/Amsterdam"];

    public static readonly DateTimeZone Chicago = DateTimeZoneProviders.Tzdb["America/Chicago"];

    public static ImmutableArray<IsoDayOfWeek> EveryDay { get; } =
        [.. Enumerable.Range(1, 7).Select(d => (IsoDayOfWeek)d)];

    public static Crew Crew(string id, int people, ImmutableArray<IsoDayOfWeek> days, int startHour, int startMinute, int endHour, int endMinute) =>
        new(id, id, people, days, new LocalTime(startHour, startMinute), new LocalTime(endHour, endMinute));

    public static LabourSettings Settings(double secondsPerPot, double setUpMinutes, params Crew[] crews) =>
        new(secondsPerPot, setUpMinutes, [.. crews], []);

    /// <summary>A task whose window runs between two local date-times in the zone (resolved leniently).</summary>
    public static RotationTask Task(string id, int pots, LabourSettings settings, DateTimeZone zone, LocalDateTime from, LocalDateTime to) =>
        RotationTask.Create(id, "site", "bench-" + id, "lot-" + id, Angle.FromDegrees(180), zone.AtLeniently(from).ToInstant(), zone.AtLeniently(to).ToInstant(), pots, settings);

    /// <summary>An indoor room in Amsterdam with one bench 'b1' holding lot 'lot-1' of 600 pots (invented test data).</summary>
    public static Site SiteWithLot() => new Site(
        "site",
        "Test site",
        new GeoLocation(Angle.FromDegrees(52), Angle.FromDegrees(4.4), 0),
        Amsterdam,
        new IndoorRoom(new Footprint(0, 0, Angle.Zero, 10, 6), 3),
        [new Bench("b1", new Footprint(1, 1, Angle.Zero, 8, 1.2), 0.8, new Canopy(0.2, 0.05, 6), 4, 2)],
        [],
        [],
        new WeatherSettings(1, 1))
    {
        Lots = [new Lot("lot-1", "b1", "basil", new LocalDate(2026, 11, 20), new LocalDate(2027, 1, 15), 60, new LocalDate(2026, 12, 1), 0.12, 600, [])],
    };

    public static LocalDateTime At(int year, int month, int day, int hour = 0, int minute = 0) => new(year, month, day, hour, minute);
}

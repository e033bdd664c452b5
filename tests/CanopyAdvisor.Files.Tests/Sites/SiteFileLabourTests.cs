using CanopyAdvisor.Core.Advice.Labour;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Files.Sites;
using NodaTime;

namespace CanopyAdvisor.Files.Tests.Sites;

/// <summary>How the site file's <c>labour</c> section maps onto <see cref="LabourSettings"/> (Sites/README.md, "labour", is the reference).</summary>
public class SiteFileLabourTests
{
    private static Site Read(string json) => new SiteFileReader(new TestBeams()).Parse(json, "test.json", null);

    [Fact]
    public void Labour_maps_onto_the_records()
    {
        LabourSettings labour = Read(SiteJson.Glasshouse).Labour;

        Assert.Equal((3.0, 10.0), (labour.SecondsPerPot, labour.SetUpMinutesPerBench));
        Assert.Equal([new LocalDate(2026, 12, 25), new LocalDate(2027, 1, 1)], labour.Holidays.AsEnumerable());
        Assert.Equal(2, labour.Crews.Length);
        Crew team = labour.Crews[0];
        Assert.Equal(("team", "bench team", 2), (team.Id, team.Name, team.People));
        Assert.Equal(Crew.Weekdays.AsEnumerable(), team.WorkingDays.AsEnumerable());
        Assert.Equal((new LocalTime(7, 0), new LocalTime(15, 30)), (team.Start, team.End));

        // README: name defaults to the id and people to 1; "sat" is ISO 8601 day 6, Saturday.
        Crew saturday = labour.Crews[1];
        Assert.Equal(("sat", "sat", 1), (saturday.Id, saturday.Name, saturday.People));
        Assert.Equal([IsoDayOfWeek.Saturday], saturday.WorkingDays.AsEnumerable());
    }

    [Theory]
    [InlineData("mon", IsoDayOfWeek.Monday)]
    [InlineData("tue", IsoDayOfWeek.Tuesday)]
    [InlineData("wed", IsoDayOfWeek.Wednesday)]
    [InlineData("thu", IsoDayOfWeek.Thursday)]
    [InlineData("fri", IsoDayOfWeek.Friday)]
    [InlineData("sat", IsoDayOfWeek.Saturday)]
    [InlineData("sun", IsoDayOfWeek.Sunday)] // ISO 8601: Monday = 1 … Sunday = 7
    public void Day_names_map_to_ISO_days(string name, IsoDayOfWeek day)
    {
        Site site = Read(SiteJson.With(SiteJson.Glasshouse, ("labour.crews[1].days", $"[\"{name}\"]")));
        Assert.Equal([day], site.Labour.Crews[1].WorkingDays.AsEnumerable());
    }

    [Fact]
    public void Labour_is_optional_with_documented_defaults()
    {
        // README: without labour, one person Monday–Friday 07:00–16:00, 3 s per pot, 10 min set-up; inside it, both
        // times default to those values.
        Site bare = Read(SiteJson.With(SiteJson.Glasshouse, ("labour", SiteJson.Remove)));
        Site timesOnly = Read(SiteJson.With(SiteJson.Glasshouse, ("labour.secondsPerPot", SiteJson.Remove), ("labour.setUpMinutesPerBench", SiteJson.Remove)));

        Assert.Same(LabourSettings.Default, bare.Labour);
        Crew crew = Assert.Single(bare.Labour.Crews);
        Assert.Equal((1, new LocalTime(7, 0), new LocalTime(16, 0)), (crew.People, crew.Start, crew.End));
        Assert.Equal((3.0, 10.0), (timesOnly.Labour.SecondsPerPot, timesOnly.Labour.SetUpMinutesPerBench));
    }

    [Fact]
    public void A_bad_crew_reports_its_own_problems_once()
    {
        // An unreadable start time is reported where it is, not again as "end must be after start".
        var e = Assert.Throws<Core.Validation.InvalidInputException>(() => Read(SiteJson.With(SiteJson.Glasshouse, ("labour.crews[0].start", "\"7am\""))));

        Assert.Equal(["labour.crews[0].start"], e.Errors.Select(x => x.Path));
    }
}

using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Files.Sites;
using NodaTime;

namespace CanopyAdvisor.Files.Tests.Sites;

/// <summary>How the site file's <c>schedule</c> section maps onto <see cref="JobScheduleSettings"/> (Sites/README.md,
/// "schedule", is the reference).</summary>
public class SiteFileScheduleTests
{
    private static Site Read(string json) => new SiteFileReader(new TestBeams()).Parse(json, "test.json", null);

    [Fact]
    public void Without_a_schedule_the_defaults_hold()
    {
        // README: nightly forecast 02:00, outlook Monday 06:00.
        Site site = Read(SiteJson.With(SiteJson.Glasshouse, ("schedule", SiteJson.Remove)));
        Assert.Equal(new JobScheduleSettings(new LocalTime(2, 0), IsoDayOfWeek.Monday, new LocalTime(6, 0)), site.Schedule);
    }

    [Theory]
    // Each member alone; the others keep their defaults (README).
    [InlineData("""{"nightlyForecastAt": "03:15"}""", 3, 15, IsoDayOfWeek.Monday, 6, 0)]
    [InlineData("""{"outlookDay": "fri"}""", 2, 0, IsoDayOfWeek.Friday, 6, 0)]
    [InlineData("""{"outlookAt": "05:45"}""", 2, 0, IsoDayOfWeek.Monday, 5, 45)]
    [InlineData("""{"nightlyForecastAt": "02:30", "outlookDay": "sun", "outlookAt": "18:00"}""", 2, 30, IsoDayOfWeek.Sunday, 18, 0)]
    [InlineData("{}", 2, 0, IsoDayOfWeek.Monday, 6, 0)]
    public void A_schedule_is_read(string section, int nightlyHour, int nightlyMinute, IsoDayOfWeek day, int outlookHour, int outlookMinute)
    {
        Site site = Read(SiteJson.With(SiteJson.Glasshouse, ("schedule", section)));
        Assert.Equal(new JobScheduleSettings(new LocalTime(nightlyHour, nightlyMinute), day, new LocalTime(outlookHour, outlookMinute)), site.Schedule);
    }

    [Theory]
    [InlineData("""{"nightlyForecastAt": "2am"}""", "schedule.nightlyForecastAt")]
    [InlineData("""{"outlookAt": "24:00"}""", "schedule.outlookAt")]
    [InlineData("""{"outlookDay": "monday"}""", "schedule.outlookDay")]
    [InlineData("""{"outlookDay": 1}""", "schedule.outlookDay")]
    [InlineData("""{"at": "02:00"}""", "schedule.at")]
    [InlineData("\"02:00\"", "schedule")]
    public void A_bad_schedule_is_refused_with_its_path(string section, string path)
    {
        var e = Assert.Throws<InvalidInputException>(() => Read(SiteJson.With(SiteJson.Glasshouse, ("schedule", section))));
        Assert.Equal([path], e.Errors.Select(x => x.Path));
    }
}

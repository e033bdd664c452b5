using CanopyAdvisor.Core.Advice.Labour;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Validation;
using NodaTime;
using static CanopyAdvisor.Core.Tests.Advice.Labour.LabourCases;

namespace CanopyAdvisor.Core.Tests.Advice.Labour;

/// <summary>Bad labour input is reported, every problem at its path, never computed (DEVELOPERS.md, "Rules of the code").</summary>
public class LabourValidatorTests
{
    private static readonly Crew Good = Crew("a", 2, Core.Advice.Labour.Crew.Weekdays, 7, 0, 15, 30);

    private static readonly LabourSettings GoodSettings = Settings(3, 10, Good);

    private static readonly RotationTask GoodTask = new(
        "t1", "site", "b1", "lot-1", Angle.FromDegrees(90), Instant.FromUtc(2026, 12, 7, 0, 0), Instant.FromUtc(2026, 12, 8, 0, 0), 100, Duration.FromMinutes(15));

    [Fact]
    public void Sound_settings_and_tasks_have_no_errors()
    {
        Assert.Empty(LabourValidator.CheckSettings(GoodSettings, "labour"));
        Assert.Empty(LabourValidator.CheckSettings(LabourSettings.Default, "labour"));
        Assert.Empty(LabourValidator.CheckTasks([GoodTask], "tasks"));
    }

    public static TheoryData<string, LabourSettings, string, string> BadSettings() => new()
    {
        { "no crews (a calendar needs someone to do it)", GoodSettings with { Crews = [] }, "labour.crews", "must list at least one crew" },
        { "seconds per pot 0 (a turn takes time)", GoodSettings with { SecondsPerPot = 0 }, "labour.secondsPerPot", "must be within (0, 600] s, got 0" },
        { "seconds per pot NaN", GoodSettings with { SecondsPerPot = double.NaN }, "labour.secondsPerPot", "must be within (0, 600] s" },
        { "negative set-up (durations are not negative)", GoodSettings with { SetUpMinutesPerBench = -1 }, "labour.setUpMinutesPerBench", "must be within [0, 240] min, got -1" },
        { "end before start (hours do not run past midnight)", Settings(3, 10, Good with { End = new LocalTime(6, 0) }), "labour.crews[0].end", "must be after start (07:00), got 06:00" },
        { "end equal to start (no working time)", Settings(3, 10, Good with { End = new LocalTime(7, 0) }), "labour.crews[0].end", "must be after start (07:00), got 07:00" },
        { "no people", Settings(3, 10, Good with { People = 0 }), "labour.crews[0].people", "must be within [1, 100], got 0" },
        { "no working days", Settings(3, 10, Good with { WorkingDays = [] }), "labour.crews[0].days", "must name at least one working day" },
        { "a day twice", Settings(3, 10, Good with { WorkingDays = [IsoDayOfWeek.Monday, IsoDayOfWeek.Monday] }), "labour.crews[0].days[1]", "Monday is listed twice" },
        { "IsoDayOfWeek.None is not a day (NodaTime)", Settings(3, 10, Good with { WorkingDays = [IsoDayOfWeek.None] }), "labour.crews[0].days[0]", "must be a day of the week" },
        { "empty crew id", Settings(3, 10, Good with { Id = "" }), "labour.crews[0].id", "must not be empty" },
        { "empty crew name", Settings(3, 10, Good with { Name = " " }), "labour.crews[0].name", "must not be empty" },
        { "duplicate crew id", Settings(3, 10, Good, Good), "labour.crews[1].id", "duplicate crew id 'a' (first used at labour.crews[0])" },
        { "a holiday twice", GoodSettings with { Holidays = [new LocalDate(2026, 12, 25), new LocalDate(2026, 12, 25)] }, "labour.holidays[1]", "2026-12-25 is listed twice" },
    };

    [Theory]
    [MemberData(nameof(BadSettings))]
    public void Bad_settings_are_reported_at_their_path(string label, LabourSettings settings, string path, string message)
    {
        IReadOnlyList<ValidationError> errors = LabourValidator.CheckSettings(settings, "labour");
        Assert.True(errors.Any(e => e.Path == path && e.Message.Contains(message, StringComparison.Ordinal)), $"{label}: {string.Join("; ", errors)}");
    }

    public static TheoryData<string, RotationTask, string, string> BadTasks() => new()
    {
        { "window end before its start", GoodTask with { Latest = Instant.FromUtc(2026, 12, 6, 0, 0) }, "tasks[0].latest", "must not be before earliest (2026-12-07T00:00:00Z), got 2026-12-06T00:00:00Z" },
        { "negative duration", GoodTask with { Labour = Duration.FromMinutes(-5) }, "tasks[0].labour", "must be > 0 and at most 1000 h, got -5 min" },
        { "zero duration", GoodTask with { Labour = Duration.Zero }, "tasks[0].labour", "must be > 0" },
        { "no pots", GoodTask with { Pots = 0 }, "tasks[0].pots", "must be ≥ 1, got 0" },
        { "angle 0 (site file reference: not 0)", GoodTask with { Angle = Angle.Zero }, "tasks[0].angleDeg", "must be within (−360, 360) and not 0, got 0" },
        { "angle 360 (site file reference: (−360, 360))", GoodTask with { Angle = Angle.FromDegrees(360) }, "tasks[0].angleDeg", "got 360" },
        { "empty id", GoodTask with { Id = "" }, "tasks[0].id", "must not be empty" },
        { "empty bench", GoodTask with { BenchId = "" }, "tasks[0].benchId", "must not be empty" },
        { "empty lot", GoodTask with { LotId = "" }, "tasks[0].lotId", "must not be empty" },
        { "empty site", GoodTask with { SiteId = "" }, "tasks[0].siteId", "must not be empty" },
        { "unset start (default instant is 1970, fine; MinValue is not)", GoodTask with { Earliest = Instant.MinValue }, "tasks[0].earliest", "must be within [1900-01-01, 2200-01-01] UTC" },
        { "window of two years (guard: 366 days)", GoodTask with { Latest = Instant.FromUtc(2028, 12, 7, 0, 0) }, "tasks[0].latest", "the window must be at most 366 days long, got 731 days" },
        { "labour of 2000 h (guard: 1000 h)", GoodTask with { Labour = Duration.FromHours(2000) }, "tasks[0].labour", "at most 1000 h" },
        { "labour Duration.MaxValue", GoodTask with { Labour = Duration.MaxValue }, "tasks[0].labour", "at most 1000 h" },
    };

    [Theory]
    [MemberData(nameof(BadTasks))]
    public void Bad_tasks_are_reported_at_their_path(string label, RotationTask task, string path, string message)
    {
        IReadOnlyList<ValidationError> errors = LabourValidator.CheckTasks([task], "tasks");
        Assert.True(errors.Any(e => e.Path == path && e.Message.Contains(message, StringComparison.Ordinal)), $"{label}: {string.Join("; ", errors)}");
    }

    [Fact]
    public void Duplicate_task_ids_are_reported()
    {
        IReadOnlyList<ValidationError> errors = LabourValidator.CheckTasks([GoodTask, GoodTask], "tasks");
        Assert.Equal(new ValidationError("tasks[1].id", "duplicate task id 't1' (first used at tasks[0])"), Assert.Single(errors));
    }

    [Fact]
    public void The_scheduler_rejects_bad_input_with_every_problem_and_computes_nothing()
    {
        RotationTask bad = GoodTask with { Latest = Instant.FromUtc(2026, 12, 6, 0, 0), Pots = 0 };
        var e = Assert.Throws<InvalidInputException>(() => LabourScheduler.Schedule([bad], GoodSettings with { Crews = [] }, Amsterdam));
        Assert.Equal(["labour.crews", "tasks[0].latest", "tasks[0].pots"], e.Errors.Select(x => x.Path).Order(StringComparer.Ordinal));
    }

    [Fact]
    public void The_factory_rejects_bad_input()
    {
        var e = Assert.Throws<InvalidInputException>(() => RotationTask.Create(
            "t", "site", "b1", "lot-1", Angle.FromDegrees(90), Instant.FromUtc(2026, 12, 7, 0, 0), Instant.FromUtc(2026, 12, 6, 0, 0), 0, GoodSettings with { SecondsPerPot = -1 }));
        Assert.Equal(["labour.secondsPerPot", "task.latest", "task.pots"], e.Errors.Select(x => x.Path).Order(StringComparer.Ordinal));
    }

    [Theory]
    [InlineData(3.0, 10.0, 1500, 85.0)] // demo-like bench: 1,500 × 3 s = 75 min, + 10 (MODEL.md §6)
    [InlineData(2.5, 0.0, 1, 2.5 / 60)] // one pot, no set-up
    [InlineData(4.0, 15.0, 0, 15.0)] // set-up alone
    public void The_factory_computes_labour_from_the_settings(double secondsPerPot, double setUp, int pots, double minutes)
    {
        LabourSettings settings = Settings(secondsPerPot, setUp, Good);
        Assert.Equal(minutes, settings.LabourFor(pots).TotalMinutes, 9);
        if (pots >= 1)
        {
            RotationTask t = RotationTask.Create("t", "s", "b", "l", Angle.FromDegrees(180), Instant.FromUtc(2026, 12, 7, 0, 0), Instant.FromUtc(2026, 12, 8, 0, 0), pots, settings);
            Assert.Equal(minutes, t.Labour.TotalMinutes, 9);
        }
    }

    [Fact]
    public void Default_settings_are_the_documented_estimates()
    {
        // ModelConstants: 3 s per pot, 10 min set-up (estimates, from memory); one person Monday–Friday 07:00–16:00 (common practice).
        LabourSettings d = LabourSettings.Default;
        Assert.Equal((3.0, 10.0), (d.SecondsPerPot, d.SetUpMinutesPerBench));
        Crew crew = Assert.Single(d.Crews);
        Assert.Equal((1, new LocalTime(7, 0), new LocalTime(16, 0)), (crew.People, crew.Start, crew.End));
        Assert.Equal(Core.Advice.Labour.Crew.Weekdays, crew.WorkingDays);
        Assert.Equal(Duration.FromHours(9), crew.ShiftLength);
        Assert.Equal("lot-south-1/r3", RotationTask.IdFor("lot-south-1", 3));
    }
}

using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Light;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using CanopyAdvisor.Core.Validation;
using NodaTime;

namespace CanopyAdvisor.Core.Tests.Light;

public class LightSimulationTests
{
    /// <summary>A one-point bench under a downward Lambertian lamp 1 m above it giving exactly <paramref name="ppfd"/> on axis.</summary>
    private static CompiledLightField LampField(double ppfd, LampSchedule schedule, DateTimeZone? zone = null)
    {
        Bench bench = TestSites.Bench("b", 0, 0, 1, 1, 1, 1);
        // Lambertian on axis: E = Φ/(π h²) (MODEL.md §3), so Φ = π·ppfd at h = 1 m.
        Lamp lamp = TestSites.Lamp("l", new Vector3(0.5, 0.5, 2.0), LambertianTestDistribution.Instance, Math.PI * ppfd, schedule: schedule);
        return LightFieldCompiler.Compile(TestSites.Make(TestSites.Room, [bench], [lamp], zone), IndoorTestEnclosure.Instance);
    }

    // DLI definition (MODEL.md §0, ANSI/ASABE S640): DLI = PPFD × 3600 × hours / 10⁶; 200 µmol m⁻² s⁻¹ for 16 h
    // = 11.52 mol m⁻² d⁻¹, and the mean over the 24 h day is 200·16/24 = 133.33 µmol m⁻² s⁻¹.
    [Fact]
    public void Constant_lamp_for_sixteen_hours_gives_the_dli_of_the_definition()
    {
        CompiledLightField field = LampField(200, new LampSchedule(new LocalTime(6, 0), new LocalTime(22, 0), null));
        var day = LightSimulation.Run(field, FixedOutsideLight.Night, new LocalDate(2026, 6, 15), new LocalDate(2026, 6, 15)).Days.Single();

        Assert.Equal(11.52, day.Dli, 9);
        Assert.Equal(200.0 * 16 / 24, day.MeanHorizontalPpfd, 9);
        Assert.Equal(96, day.Steps);
        Assert.Equal(Duration.FromHours(24), day.DayLength);
        Assert.Equal(1.0, day.DliUniformity);
        Assert.Equal(0, day.LightVectorTilt.Degrees, 9);
    }

    // Daylight-saving days in Europe/London (IANA tz database): 2026-03-29 has 23 hours, 2026-10-25 has 25.
    // An always-on 200 µmol m⁻² s⁻¹ lamp then gives 200·3600·23/10⁶ = 16.56 and 200·3600·25/10⁶ = 18.00 mol m⁻² d⁻¹;
    // a 06:00–22:00 local photoperiod still gives 16 h (11.52) because schedules run in local time.
    [Theory]
    [InlineData(2026, 3, 29, 23, 16.56)]
    [InlineData(2026, 10, 25, 25, 18.00)]
    [InlineData(2026, 6, 15, 24, 17.28)]
    public void Daylight_saving_days_integrate_their_own_length(int year, int month, int dayOfMonth, int hours, double expectedDli)
    {
        var date = new LocalDate(year, month, dayOfMonth);
        BenchDayLight always = LightSimulation.Run(LampField(200, LampSchedule.AlwaysOn), FixedOutsideLight.Night, date, date).Days.Single();
        Assert.Equal(Duration.FromHours(hours), always.DayLength);
        Assert.Equal(hours * 4, always.Steps);
        Assert.Equal(expectedDli, always.Dli, 9);

        var photoperiod = new LampSchedule(new LocalTime(6, 0), new LocalTime(22, 0), null);
        BenchDayLight local = LightSimulation.Run(LampField(200, photoperiod), FixedOutsideLight.Night, date, date).Days.Single();
        Assert.Equal(11.52, local.Dli, 9);
    }

    // Missing outside light is skipped and counted, never filled in: a 2 h gap (8 quarter-hour steps) removes
    // 2 h of the always-on lamp: 200·3600·22/10⁶ = 15.84 (DLI definition, MODEL.md §0).
    [Fact]
    public void Gaps_in_outside_light_are_counted_and_not_filled()
    {
        var source = new GappyOutsideLight(Instant.FromUtc(2026, 1, 10, 10, 0), Instant.FromUtc(2026, 1, 10, 12, 0));
        var summary = LightSimulation.Run(LampField(200, LampSchedule.AlwaysOn), source, new LocalDate(2026, 1, 10), new LocalDate(2026, 1, 11));
        BenchDayLight day = summary.Days[0];
        Assert.Equal(8, day.MissingSteps);
        Assert.Equal(0, summary.Days[1].MissingSteps);
        Assert.Equal(8, summary.MissingSteps);
        Assert.Equal(15.84, day.Dli, 9);
        Assert.Equal(200, day.MeanHorizontalPpfd, 9);
    }

    // A side lamp makes the day's mean light vector lean toward it: the compass azimuth of the mean vector is the
    // lamp's direction (east, 90°) and its tilt is atan(horizontal/vertical) of the summed vectors (MODEL.md §3).
    [Fact]
    public void Mean_light_vector_leans_toward_a_side_lamp()
    {
        Bench bench = TestSites.Bench("b", 0, 0, 1, 1, 1, 1);
        Lamp top = TestSites.Lamp("top", new Vector3(0.5, 0.5, 2.0), LambertianTestDistribution.Instance, 1000);
        Lamp side = TestSites.Lamp("side", new Vector3(1.5, 0.5, 1.0), LambertianTestDistribution.Instance, 1000,
            aim: new LampAim(Angle.FromDegrees(270), Angle.FromDegrees(90), Angle.Zero));
        CompiledLightField field = LightFieldCompiler.Compile(TestSites.Make(TestSites.Room, [bench], [top, side]), IndoorTestEnclosure.Instance);
        var day = LightSimulation.Run(field, FixedOutsideLight.Night, new LocalDate(2026, 2, 1), new LocalDate(2026, 2, 1)).Days.Single();

        // Both lamps 1 m away on their axes: E = 1000/π each, one from above, one from the east: tilt 45°.
        Assert.Equal(90, day.LightVectorAzimuth.Degrees, 9);
        Assert.Equal(45, day.LightVectorTilt.Degrees, 9);
        Assert.Equal(90, day.BlueVectorAzimuth.Degrees, 9);
        Assert.Equal(1000 / Math.PI, day.MeanHorizontalPpfd, 9);
    }

    // Uniformity is min/avg of point DLI (common practice). Two points under one lamp: 318.31 and 79.58 µmol m⁻² s⁻¹
    // (MODEL.md §3 values) → min/avg = 79.577 / ((318.310 + 79.577)/2) = 0.4 exactly (= 2·(1/4)/(1 + 1/4)).
    [Fact]
    public void Uniformity_is_min_over_mean_point_dli()
    {
        Bench bench = TestSites.Bench("b", 0, 0, 2, 1, 2, 1);
        Lamp lamp = TestSites.Lamp("l", new Vector3(0.5, 0.5, 2.0), LambertianTestDistribution.Instance, 1000);
        CompiledLightField field = LightFieldCompiler.Compile(TestSites.Make(TestSites.Room, [bench], [lamp]), IndoorTestEnclosure.Instance);
        var day = LightSimulation.Run(field, FixedOutsideLight.Night, new LocalDate(2026, 2, 1), new LocalDate(2026, 2, 1)).Days.Single();
        Assert.Equal(0.4, day.DliUniformity!.Value, 9);
        Assert.Equal(2, day.Points.Length);
    }

    [Fact]
    public void Progress_is_reported_after_each_day_and_ends_at_one()
    {
        var progress = new RecordingProgress();
        var summary = LightSimulation.Run(
            LampField(100, LampSchedule.AlwaysOn), FixedOutsideLight.Night, new LocalDate(2026, 5, 1), new LocalDate(2026, 5, 4),
            Duration.FromHours(1), progress);
        Assert.Equal([0.25, 0.5, 0.75, 1.0], progress.Reports);
        Assert.Equal(4, summary.Days.Length);
        Assert.All(summary.Days, d => Assert.Equal(24, d.Steps));
    }

    // A step that does not divide the day: the last step is shortened, so the day still integrates to its length
    // (DLI definition, MODEL.md §0): 7-minute steps over 24 h, always-on 200 → 17.28.
    [Fact]
    public void Uneven_steps_still_cover_the_whole_day()
    {
        var day = LightSimulation.Run(LampField(200, LampSchedule.AlwaysOn), FixedOutsideLight.Night,
            new LocalDate(2026, 5, 1), new LocalDate(2026, 5, 1), Duration.FromMinutes(7)).Days.Single();
        Assert.Equal(206, day.Steps); // ceil(1440 / 7)
        Assert.Equal(17.28, day.Dli, 9);
    }

    [Fact]
    public void Bad_period_and_step_are_reported()
    {
        var error = Assert.Throws<InvalidInputException>(() => LightSimulation.Run(
            LampField(100, LampSchedule.AlwaysOn), FixedOutsideLight.Night, new LocalDate(2026, 5, 4), new LocalDate(2026, 5, 1), Duration.Zero));
        Assert.Equal(["step", "lastDay"], error.Errors.Select(e => e.Path));
    }
}

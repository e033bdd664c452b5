using CanopyAdvisor.Core.Advice.Labour;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Files.Sites;
using NodaTime;

namespace CanopyAdvisor.Files.Tests.Sites;

/// <summary>The demo sites load, validate clean and keep to the scenario of the product brief (BRIEF.md, "Scenario").</summary>
public class DemoSitesTests
{
    public static TheoryData<string> Names() => new(DemoSites.Names);

    private static Site Load(string name)
    {
        try
        {
            return DemoSites.Load(name, new TestBeams());
        }
        catch (InvalidInputException e)
        {
            Assert.Fail(e.Message);
            throw;
        }
    }

    [Theory]
    [MemberData(nameof(Names))]
    public void Demo_site_loads_and_validates_clean(string name)
    {
        Site site = Load(name);

        Assert.Empty(SiteValidator.Validate(site));
        Assert.Contains("demo data", site.Name, StringComparison.Ordinal);
        Assert.Contains("\"demoData\": true", DemoSites.ReadText(name), StringComparison.Ordinal);
    }

    [Theory]
    [MemberData(nameof(Names))]
    public void Demo_site_keeps_the_sample_grid_modest(string name)
    {
        // A design budget so that a demo week computes in about a second: at most 500 sample points per site.
        Site site = Load(name);
        Assert.InRange(site.Benches.Sum(b => b.SamplesAlongLength * b.SamplesAcrossWidth), 1, 500);
    }

    [Fact]
    public void Unknown_demo_name_is_refused() =>
        Assert.Throws<ArgumentException>(() => DemoSites.ReadText("orchard"));

    [Fact]
    public void Glasshouse_demo_matches_the_scenario()
    {
        Site site = Load("glasshouse");

        // About 52° N, in a zone with daylight saving: Europe/Amsterdam is UTC+1 in winter, UTC+2 in summer (IANA tz database).
        Assert.InRange(site.Location.Latitude.Degrees, 51.5, 52.5);
        Assert.Equal(Offset.FromHours(1), site.Zone.GetUtcOffset(Instant.FromUtc(2026, 1, 15, 12, 0)));
        Assert.Equal(Offset.FromHours(2), site.Zone.GetUtcOffset(Instant.FromUtc(2026, 7, 15, 12, 0)));

        // Six gutter-connected 8 m bays, ridges north–south, glass, opaque north end (back wall for axis 0).
        var g = Assert.IsType<Glasshouse>(site.Structure);
        Assert.Equal(6, g.BayCount);
        Assert.Equal(8.0, g.BayWidthM);
        Assert.Equal(0.0, g.Footprint.AxisAzimuth.Degrees);
        Assert.True(g.BackWall.Opaque);
        Assert.False(g.Roof.Opaque || g.LeftWall.Opaque || g.RightWall.Opaque || g.FrontWall.Opaque);
        Assert.Equal(1.526, g.Roof.RefractiveIndex); // glass, Duffie & Beckman
        Assert.Equal(0.004, g.Roof.ThicknessM);
        Assert.InRange(g.StructuralShading, 0.1, 0.2); // common practice (MODEL.md §2)

        Assert.InRange(site.Benches.Length, 6, 10);
        Assert.True(site.Benches.Select(b => b.Canopy).Distinct().Count() >= 3, "benches carry different crops' canopies");

        // Toplights: 1,800–2,500 µmol/s each (common practice for high-output fixtures); their flux per floor area
        // (an upper bound of the average PPFD) within the 150–250 µmol m⁻² s⁻¹ of supplemental lighting (common practice).
        Lamp[] top = site.Lamps.Where(l => l.Id.StartsWith("top-", StringComparison.Ordinal)).ToArray();
        Assert.All(top, l => Assert.InRange(l.PpfMicromolesPerSecond, 1800, 2500));
        double fluxPerFloor = top.Sum(l => l.PpfMicromolesPerSecond) / (g.Footprint.LengthM * g.Footprint.WidthM);
        Assert.InRange(fluxPerFloor, 150, 250);

        // LED efficacy 2.5–3.5 µmol/J (common practice for current fixtures).
        Assert.All(site.Lamps, l => Assert.InRange(l.PpfMicromolesPerSecond / l.Watts, 2.5, 3.5));

        // Photoperiod 04:00–22:00 local, off above 500 µmol m⁻² s⁻¹ outside.
        Assert.All(site.Lamps, l => Assert.Equal(new LampSchedule(new LocalTime(4, 0), new LocalTime(22, 0), 500), l.Schedule));

        // A few side lamps, all on one side (the north end), aimed sideways.
        Lamp[] side = site.Lamps.Where(l => l.Id.StartsWith("side-", StringComparison.Ordinal)).ToArray();
        Assert.InRange(side.Length, 2, 8);
        Assert.All(side, l => Assert.True(l.Position.Y > 59 && l.Aim.Tilt.Degrees > 30));

        // An obstruction south of the range.
        Assert.Contains(site.Obstructions, o => o.Footprint.CornerYM + o.Footprint.LengthM <= 0);
    }

    [Fact]
    public void Indoor_farm_demo_matches_the_scenario()
    {
        Site site = Load("indoor-farm");

        var room = Assert.IsType<IndoorRoom>(site.Structure);
        Assert.True(room.HeightM > 0);

        // Multi-tier racks: several benches share a footprint at different heights.
        Assert.Contains(site.Benches.GroupBy(b => b.Footprint), grp => grp.Count() >= 3);

        // A row of LED bars over each tier, under the tier above.
        foreach (Bench tier in site.Benches)
        {
            double top = tier.SurfaceHeightM + tier.Canopy.HeightM;
            Assert.Contains(site.Lamps, l => tier.Footprint.Contains(l.Position) && l.Position.Z > top && l.Position.Z < top + 1);
        }

        // Photoperiods of 16–18 h (common practice for leafy crops and herbs indoors).
        Assert.All(site.Lamps, l =>
        {
            double hours = Period.Between(l.Schedule.On, l.Schedule.Off, PeriodUnits.Minutes).Minutes / 60.0;
            hours = hours <= 0 ? hours + 24 : hours;
            Assert.InRange(hours, 16, 18);
        });
    }

    /// <summary>The crop ids the crop library defines for the demo sites (the demo scenario of the task, README "Demo sites").</summary>
    [Theory]
    [InlineData("glasshouse", "petunia,pelargonium,begonia,poinsettia,kalanchoe,basil,tomato-transplant,tagetes")]
    [InlineData("indoor-farm", "radish-microgreens,pea-shoots,sunflower-microgreens,basil,lettuce-transplant")]
    public void Demo_lots_stand_one_per_bench_with_the_library_crops(string name, string crops)
    {
        Site site = Load(name);

        Assert.Equal(site.Benches.Select(b => b.Id).Order(StringComparer.Ordinal), site.Lots.Select(l => l.BenchId).Order(StringComparer.Ordinal));
        Assert.Equal(crops.Split(',').Order(StringComparer.Ordinal), site.Lots.Select(l => l.CropId).Distinct().Order(StringComparer.Ordinal));

        // Dated for the season the README names: measured early December 2026, not sold before the measurement.
        Assert.All(site.Lots, l => Assert.Equal(new LocalDate(2026, 12, 1), l.MeasuredOn));
        Assert.Contains(site.Lots, l => !l.Rotations.IsEmpty);
    }

    [Fact]
    public void Glasshouse_demo_lots_fit_the_season()
    {
        Site site = Load("glasshouse");

        // README "Demo sites": planted October–November 2026, sold December 2026 – February 2027; 19/18 °C with a 3 °C,
        // 2 h pre-dawn drop (within the 2.8–8.3 °C, 2–3 h practice, common practice).
        Assert.All(site.Lots, l => Assert.InRange(l.PlantedOn, new LocalDate(2026, 10, 1), new LocalDate(2026, 11, 30)));
        Assert.All(site.Lots, l => Assert.InRange(l.SaleOn, new LocalDate(2026, 12, 1), new LocalDate(2027, 2, 28)));
        Assert.Equal(new TemperatureSetpoints(19, 18, 3, 2), site.Temperatures);
        Assert.Equal(new EnergyTariff(0.21, "EUR"), site.Tariff); // invented demo price

        // A lot's plants are shorter than its bench's canopy is tall (the canopy is the light model's crop layer).
        Assert.All(site.Lots, l => Assert.True(l.HeightMm / 1000 <= site.Benches.Single(b => b.Id == l.BenchId).Canopy.HeightM, l.Id));
    }

    [Fact]
    public void Indoor_demo_lots_are_short_crops()
    {
        Site site = Load("indoor-farm");

        // README "Demo sites": sown a few days before 2026-12-01, sold 7–21 days after sowing; 22/20 °C, no drop.
        Assert.All(site.Lots, l => Assert.InRange(Period.Between(l.PlantedOn, new LocalDate(2026, 12, 1), PeriodUnits.Days).Days, 1, 9));
        Assert.All(site.Lots, l => Assert.InRange(Period.Between(l.PlantedOn, l.SaleOn, PeriodUnits.Days).Days, 7, 21));
        Assert.Equal(new TemperatureSetpoints(22, 20, 0, 0), site.Temperatures);
        Assert.All(site.Lots, l => Assert.True(l.HeightMm / 1000 <= site.Benches.Single(b => b.Id == l.BenchId).Canopy.HeightM, l.Id));
    }

    [Fact]
    public void Demo_sites_carry_their_crews_and_holidays()
    {
        // README "Demo sites" (invented demo data): a bench team of three Monday–Friday 07:00–15:30 and a Saturday crew in
        // the glasshouse; a day shift of two and a weekend crew in the indoor farm; Christmas and New Year's Day off.
        LabourSettings glasshouse = Load("glasshouse").Labour;
        LabourSettings farm = Load("indoor-farm").Labour;

        Assert.Equal(["bench-team", "saturday-crew"], glasshouse.Crews.Select(c => c.Id));
        Assert.Equal((3, new LocalTime(7, 0), new LocalTime(15, 30)), (glasshouse.Crews[0].People, glasshouse.Crews[0].Start, glasshouse.Crews[0].End));
        Assert.Equal(Crew.Weekdays.AsEnumerable(), glasshouse.Crews[0].WorkingDays.AsEnumerable());
        Assert.Equal([IsoDayOfWeek.Saturday], glasshouse.Crews[1].WorkingDays.AsEnumerable());
        Assert.Equal([new LocalDate(2026, 12, 25), new LocalDate(2026, 12, 26), new LocalDate(2027, 1, 1)], glasshouse.Holidays.AsEnumerable());
        Assert.Equal(["day-shift", "weekend"], farm.Crews.Select(c => c.Id));
        Assert.Equal([new LocalDate(2026, 12, 25), new LocalDate(2027, 1, 1)], farm.Holidays.AsEnumerable());
    }
}

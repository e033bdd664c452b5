using System.Collections.Immutable;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;
using NodaTime;

namespace CanopyAdvisor.Core.Tests.Sites;

/// <summary>
/// SiteValidator on sites built in code. Expected values are computed by hand from the geometry stated in each test
/// (the roof height from gutter + distance to the gutter × tan(slope), MODEL.md §2).
/// </summary>
public class SiteValidatorTests
{
    private static readonly Cover Glass = new("glass", false, 1.526, 20, 0.004, 1);

    private static readonly LampSchedule Photoperiod = new(new LocalTime(4, 0), new LocalTime(22, 0), 500);

    private static readonly BandFractions Bands = new(0.1, 0.06, 0.84, 0.02);

    /// <summary>Six 8 m bays, 60 m long, ridges north–south, gutter 5.5 m, slope 22°; one bench; one lamp at 5 m.</summary>
    private static Site ValidSite() => new(
        "s",
        "Site",
        new GeoLocation(Angle.FromDegrees(52), Angle.FromDegrees(4.4), 0),
        DateTimeZoneProviders.Tzdb["Europe/Amsterdam"],
        new Glasshouse(
            new Footprint(0, 0, Angle.Zero, 60, 48), 6, 8, 5.5, Angle.FromDegrees(22),
            Glass, Glass, Glass, Glass, Cover.OpaqueSurface("panel"), 0.15),
        [new Bench("b1", new Footprint(2, 2, Angle.Zero, 20, 1.8), 0.75, new Canopy(0.3, 0.05, 6), 10, 3)],
        [Lamp("l1", new Vector3(4, 10, 5))],
        [new Obstruction("tank", new Footprint(5, -15, Angle.Zero, 8, 8), 0, 7)],
        new WeatherSettings(3, 0.5));

    private static Lamp Lamp(string id, Vector3 position) =>
        new(id, position, LampAim.Down, new FlatBeam(), 2100, Bands, 1, 750, Photoperiod);

    [Fact]
    public void A_sound_site_has_no_errors() => Assert.Empty(SiteValidator.Validate(ValidSite()));

    [Theory]
    [InlineData(0.0, 5.5, "at the gutter line the roof is at gutter height")]
    [InlineData(4.0, 7.116105, "mid-bay ridge: 5.5 + 4 × tan 22° = 5.5 + 1.616105")]
    [InlineData(2.0, 6.308053, "halfway up: 5.5 + 2 × tan 22°")]
    [InlineData(10.0, 6.308053, "2 m into the second bay")]
    [InlineData(47.0, 5.904026, "1 m from the east gutter: 5.5 + tan 22°")]
    public void Roof_height_follows_the_bays(double x, double expectedM, string reason)
    {
        var g = (Glasshouse)ValidSite().Structure;
        Assert.True(Math.Abs(SiteValidator.RoofHeightM(g, new Vector3(x, 30, 0)) - expectedM) < 1e-6, reason);
    }

    [Theory]
    [InlineData(4.0, 7.1, true, "just under the mid-bay ridge (7.116 m)")]
    [InlineData(4.0, 7.2, false, "above the mid-bay ridge")]
    [InlineData(8.0, 5.6, false, "above the gutter between bays (5.5 m + 1 cm slack)")]
    [InlineData(8.0, 5.505, true, "within 1 cm of the gutter")]
    public void Lamps_must_stay_under_the_roof(double x, double z, bool ok, string reason)
    {
        Site site = ValidSite() with { Lamps = [Lamp("l1", new Vector3(x, 10, z))] };
        IReadOnlyList<ValidationError> errors = SiteValidator.Validate(site);
        Assert.True(ok == (errors.Count == 0), $"{reason}: {string.Join("; ", errors)}");
    }

    [Theory]
    [InlineData(8.005, false, "6 × 8.005 = 48.03 m is 3 cm off")]
    [InlineData(8.001, true, "6 × 8.001 = 48.006 m is within 1 cm")]
    public void Bays_must_fill_the_width_within_one_centimetre(double bayWidthM, bool ok, string reason)
    {
        Site site = ValidSite();
        site = site with { Structure = ((Glasshouse)site.Structure) with { BayWidthM = bayWidthM } };
        IReadOnlyList<ValidationError> errors = SiteValidator.Validate(site);
        Assert.True(ok == errors.All(e => e.Path != "structure.bayWidthM"), reason);
    }

    [Fact]
    public void Containment_follows_a_rotated_footprint()
    {
        // Ridge axis 90° (east): the 60 m length runs east and the 48 m width runs south of the corner (right of east).
        Site site = ValidSite();
        var g = (Glasshouse)site.Structure;
        site = site with
        {
            Structure = g with { Footprint = new Footprint(0, 0, Angle.FromDegrees(90), 60, 48) },
            Benches = [new Bench("b1", new Footprint(2, -2, Angle.FromDegrees(90), 20, 1.8), 0.75, new Canopy(0.3, 0.05, 6), 10, 3)],
            Lamps = [Lamp("l1", new Vector3(10, -4, 5))],
        };
        Assert.Empty(SiteValidator.Validate(site));

        Site north = site with { Benches = [site.Benches[0] with { Footprint = new Footprint(2, 2, Angle.FromDegrees(90), 20, 1.8) }] };
        Assert.Contains(SiteValidator.Validate(north), e => e.Path == "benches[0].footprint");
    }

    [Fact]
    public void Default_paths_name_parts_as_a_site_built_in_code()
    {
        Site site = ValidSite();
        var g = (Glasshouse)site.Structure;
        site = site with
        {
            Structure = g with { Roof = Glass with { Layers = 0 } },
            Lamps = [Lamp("l1", new Vector3(4, 10, 5)) with { Dimming = 2, Bands = new BandFractions(0.5, 0.5, 0.5, 0) }],
        };

        IReadOnlyList<ValidationError> errors = SiteValidator.Validate(site);

        Assert.Contains(errors, e => e.Path == "structure.covers.roof.layers");
        Assert.Contains(errors, e => e.Path == "lamps[0].dimming");
        Assert.Contains(errors, e => e.Path == "lamps[0].bands" && e.Message == "blue + green + red must be 1 (±0.01), got 1.5");
    }

    [Fact]
    public void Custom_paths_name_parts_as_the_file_does_and_shared_problems_are_listed_once()
    {
        Site site = ValidSite();
        var g = (Glasshouse)site.Structure;
        var badGlass = Glass with { RefractiveIndex = 0.5 };
        site = site with { Structure = g with { Roof = badGlass, LeftWall = badGlass, RightWall = badGlass } };
        var paths = SitePaths.Default with { Cover = _ => "coverTypes.glass" };

        IReadOnlyList<ValidationError> errors = SiteValidator.Validate(site, paths);

        ValidationError only = Assert.Single(errors);
        Assert.Equal("coverTypes.glass.refractiveIndex: must be ≥ 1, got 0.5", only.ToString());
    }

    [Theory]
    [InlineData(3.0, 0.75, true, "overlap 0.8 m side by side at the same height")]
    [InlineData(3.8, 0.75, false, "edge to edge (b1 spans x 2–3.8): touching is not overlapping")]
    [InlineData(3.79, 0.75, false, "1 cm overlap is within the tolerance")]
    [InlineData(2.0, 1.05, false, "a tier whose surface is at b1's canopy top (0.75 + 0.3)")]
    [InlineData(2.0, 1.0, true, "a tier inside b1's canopy")]
    public void Benches_must_not_share_space(double cornerXM, double surfaceHeightM, bool overlap, string reason)
    {
        Site site = ValidSite();
        Bench second = site.Benches[0] with { Id = "b2", Footprint = site.Benches[0].Footprint with { CornerXM = cornerXM }, SurfaceHeightM = surfaceHeightM };
        site = site with { Benches = [site.Benches[0], second], Lamps = [Lamp("l1", new Vector3(10, 10, 5))] };

        IReadOnlyList<ValidationError> errors = SiteValidator.Validate(site);

        Assert.True(overlap == errors.Any(e => e.Path == "benches[1].footprint" && e.Message == "bench 'b2' overlaps bench 'b1' (benches[0]) at the same height"), reason);
    }

    [Fact]
    public void Rotated_benches_overlap_when_they_cross()
    {
        // A 20 m × 1.8 m bench along north, and one along east crossing it at its middle (separating axis theorem).
        Site site = ValidSite();
        Bench cross = site.Benches[0] with { Id = "b2", Footprint = new Footprint(1, 13, Angle.FromDegrees(90), 6, 1.8) };
        site = site with { Benches = [site.Benches[0], cross], Lamps = [Lamp("l1", new Vector3(10, 10, 5))] };

        Assert.Contains(SiteValidator.Validate(site), e => e.Path == "benches[1].footprint");
    }

    [Fact]
    public void Lamp_in_a_canopy_is_named_with_the_bench()
    {
        // Bench top 0.75 m + canopy 0.3 m: a lamp at 0.9 m over the bench sits in the canopy.
        Site site = ValidSite() with { Lamps = [Lamp("low", new Vector3(2.5, 5, 0.9))] };

        ValidationError e = Assert.Single(SiteValidator.Validate(site));

        Assert.Equal("lamps[0]", e.Path);
        Assert.Equal("lamp 'low' at (2.5, 5, 0.9) m is inside the canopy of bench 'b1' (0.75–1.05 m)", e.Message);
    }

    [Fact]
    public void Duplicate_ids_are_reported_at_the_second_use()
    {
        Site site = ValidSite() with { Lamps = [Lamp("l1", new Vector3(4, 10, 5)), Lamp("l1", new Vector3(4, 20, 5))] };

        ValidationError e = Assert.Single(SiteValidator.Validate(site));

        Assert.Equal("lamps[1].id: duplicate lamp id 'l1' (first used at lamps[0])", e.ToString());
    }

    [Fact]
    public void Indoor_room_checks_the_ceiling()
    {
        Site site = ValidSite() with
        {
            Structure = new IndoorRoom(new Footprint(0, 0, Angle.Zero, 60, 48), 3),
            Lamps = [Lamp("l1", new Vector3(4, 10, 3.2))],
        };

        ValidationError e = Assert.Single(SiteValidator.Validate(site));

        Assert.Equal("lamps[0]", e.Path);
        Assert.EndsWith("is not between the floor and the ceiling (3 m there)", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Opaque_covers_skip_the_optical_checks()
    {
        // Cover.OpaqueSurface has n = 1, 0 layers, 0 thickness: those values mean nothing for an opaque surface.
        Assert.Empty(SiteValidator.CheckCover(Cover.OpaqueSurface("wall"), "c"));
        Assert.Equal(2, SiteValidator.CheckCover(Cover.OpaqueSurface("wall") with { Opaque = false }, "c").Count());
    }

    /// <summary>A private stand-in for a beam distribution; the validator never evaluates beams.</summary>
    private sealed class FlatBeam : BeamDistribution
    {
        public override bool IsAxiallySymmetric => true;

        public override double IntensityPerUnitFlux(double polarRadians, double aroundRadians) => 1 / (4 * Math.PI);
    }
}

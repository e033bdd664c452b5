using System.Collections.Immutable;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Structures;
using CanopyAdvisor.Core.Validation;
using static CanopyAdvisor.Core.Tests.Structures.GlasshouseFixtures;

namespace CanopyAdvisor.Core.Tests.Structures;

public sealed class EnclosureBuilderTests
{
    [Fact]
    public void Indoor_room_has_no_sky_and_only_obstructions_block()
    {
        var room = new IndoorRoom(new Footprint(0, 0, Angle.Zero, 12, 6), 3);
        IEnclosure enclosure = EnclosureBuilder.Build(room, [Box("rack", 2, 2, 0, 1, 1, 0, 2)]);
        Assert.IsType<IndoorEnclosure>(enclosure);
        Assert.Equal(0, enclosure.SkyTransmittance(new Vector3(3, 3, 1), Vector3.UnitZ));
        Assert.True(enclosure.IsBlocked(new Vector3(1.5, 2.5, 1), new Vector3(3.5, 2.5, 1)));
        Assert.False(enclosure.IsBlocked(new Vector3(1.5, 2.5, 2.5), new Vector3(3.5, 2.5, 2.5)));
        // The room's own walls do not block (lamps and benches are inside it).
        Assert.False(enclosure.IsBlocked(new Vector3(1, 1, 1), new Vector3(-5, 1, 1)));
    }

    [Fact]
    public void Glasshouse_builds_a_glasshouse_enclosure()
    {
        IEnclosure enclosure = EnclosureBuilder.Build(House(bays: 4), ImmutableArray<Obstruction>.Empty);
        Assert.IsType<GlasshouseEnclosure>(enclosure);
        IEnclosure withDefault = EnclosureBuilder.Build(House(), default);
        Assert.True(withDefault.SkyTransmittance(new Vector3(4, 10, 1), Vector3.UnitZ) > 0);
    }

    [Fact]
    public void Every_problem_is_reported()
    {
        Glasshouse bad = House(bays: 3, bayWidthM: 6) with
        {
            Footprint = new Footprint(0, 0, Angle.Zero, -5, 20),
            GutterHeightM = 0,
            RoofSlope = Angle.FromDegrees(95),
            StructuralShading = 1.2,
            Roof = new Cover("bad", false, 0.8, 4, 0.004, 1),
        };
        Obstruction[] obstructions = [Box("flat", 0, 0, 0, 2, 0, 3, 1)];
        var ex = Assert.Throws<InvalidInputException>(() => EnclosureBuilder.Build(bad, [.. obstructions]));
        string[] paths = [.. ex.Errors.Select(e => e.Path)];
        Assert.Contains("structure.footprint.lengthM", paths);
        Assert.Contains("structure.footprint.widthM", paths);
        Assert.Contains("structure.gutterHeightM", paths);
        Assert.Contains("structure.roofSlopeDeg", paths);
        Assert.Contains("structure.structuralShading", paths);
        Assert.Contains("structure.roof.refractiveIndex", paths);
        Assert.Contains("obstructions[0].footprint.widthM", paths);
        Assert.Contains("obstructions[0].topHeightM", paths);
        Assert.Equal(8, paths.Length);
    }

    [Fact]
    public void Site_overload_uses_structure_and_obstructions()
    {
        var site = new Site(
            "demo", "Demo range (demo data)",
            new GeoLocation(Angle.FromDegrees(52), Angle.FromDegrees(5), 0),
            NodaTime.DateTimeZoneProviders.Tzdb["Europe/Amsterdam"],
            House(),
            [], [],
            [Box("wall", -20, -20, 0, 60, 60, 0, 100)],
            new WeatherSettings(3, 1));
        IEnclosure enclosure = EnclosureBuilder.Build(site);
        // A point inside a huge obstruction box is blocked in every direction.
        Assert.Equal(0, enclosure.SkyTransmittance(new Vector3(4, 10, 1), Vector3.UnitZ));
    }
}

using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;

namespace CanopyAdvisor.Core.Tests.EndToEnd;

/// <summary>Mirrors a whole site east–west about the plane x = 0 (x → −x, y and z unchanged).</summary>
/// <remarks>
/// A reflection flips handedness. A footprint's width runs to the <em>right</em> of its axis, so after mirroring the
/// width of the image would run to the left: the mirrored footprint therefore starts at the image of the corner on the
/// far side of the width, with axis azimuth a → −a, and the glasshouse's left and right side walls swap. A lamp's
/// optical axis and C = 0° reference are mirrored by yaw → −yaw; its C = 90° direction (reference × axis, a cross
/// product) flips sign, so spin → −spin and the around angle φ → −φ: the mirror image of a lamp is the mirrored lamp
/// only for distributions with I(θ, −φ) = I(θ, φ), which all distributions used here have.
/// </remarks>
internal static class SiteMirror
{
    public static Vector3 Point(Vector3 p) => new(-p.X, p.Y, p.Z);

    public static Footprint Footprint(Footprint f)
    {
        Vector3 farCorner = Point(f.Corner + (f.WidthM * f.WidthDirection));
        return new Footprint(farCorner.X, farCorner.Y, -f.AxisAzimuth, f.LengthM, f.WidthM);
    }

    public static Structure Structure(Structure structure) => structure switch
    {
        Glasshouse g => g with { Footprint = Footprint(g.Footprint), LeftWall = g.RightWall, RightWall = g.LeftWall },
        IndoorRoom r => r with { Footprint = Footprint(r.Footprint) },
        _ => throw new ArgumentException("unknown structure kind", nameof(structure)),
    };

    public static Bench Bench(Bench b) => b with { Footprint = Footprint(b.Footprint) };

    public static Obstruction Obstruction(Obstruction o) => o with { Footprint = Footprint(o.Footprint) };

    public static LampAim Aim(LampAim aim) => new(-aim.Yaw, aim.Tilt, -aim.Spin);

    public static Lamp Lamp(Lamp lamp) => lamp with { Position = Point(lamp.Position), Aim = Aim(lamp.Aim) };

    public static Site Site(Site site) => site with
    {
        Id = site.Id + "-mirrored",
        Structure = Structure(site.Structure),
        Benches = [.. site.Benches.Select(Bench)],
        Lamps = [.. site.Lamps.Select(Lamp)],
        Obstructions = [.. site.Obstructions.Select(Obstruction)],
    };

    /// <summary>The same outside light with the sun mirrored: azimuth a → 360° − a, (x, y, z) → (−x, y, z).</summary>
    public static OutsideLight Outside(OutsideLight o) => o with { SunDirection = Point(o.SunDirection) };
}

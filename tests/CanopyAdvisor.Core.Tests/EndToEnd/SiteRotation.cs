using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;

namespace CanopyAdvisor.Core.Tests.EndToEnd;

/// <summary>Turns a whole site about the vertical through the origin, clockwise seen from above (every azimuth grows by the turn).</summary>
/// <remarks>A rotation keeps handedness: footprints keep their reference corner (rotated) and gain the turn in azimuth, lamps
/// gain it in yaw and keep tilt and spin, the glasshouse walls keep their names.</remarks>
internal sealed class SiteRotation(double turnDeg)
{
    private readonly double cos = Math.Cos(turnDeg * Math.PI / 180);
    private readonly double sin = Math.Sin(turnDeg * Math.PI / 180);
    private readonly Angle turn = Angle.FromDegrees(turnDeg);

    public Vector3 Point(Vector3 p) => new((p.X * cos) + (p.Y * sin), (-p.X * sin) + (p.Y * cos), p.Z);

    public Footprint Footprint(Footprint f)
    {
        Vector3 c = Point(f.Corner);
        return new Footprint(c.X, c.Y, f.AxisAzimuth + turn, f.LengthM, f.WidthM);
    }

    public Site Site(Site site) => site with
    {
        Id = site.Id + "-turned",
        Structure = site.Structure switch
        {
            Glasshouse g => g with { Footprint = Footprint(g.Footprint) },
            IndoorRoom r => r with { Footprint = Footprint(r.Footprint) },
            _ => throw new ArgumentException("unknown structure kind", nameof(site)),
        },
        Benches = [.. site.Benches.Select(b => b with { Footprint = Footprint(b.Footprint) })],
        Lamps = [.. site.Lamps.Select(l => l with { Position = Point(l.Position), Aim = l.Aim with { Yaw = l.Aim.Yaw + turn } })],
        Obstructions = [.. site.Obstructions.Select(o => o with { Footprint = Footprint(o.Footprint) })],
    };

    public OutsideLight Outside(OutsideLight o) => o with { SunDirection = Point(o.SunDirection) };
}

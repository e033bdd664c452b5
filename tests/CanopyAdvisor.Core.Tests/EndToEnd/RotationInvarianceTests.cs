using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Light;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using CanopyAdvisor.Core.Structures;
using NodaTime;

namespace CanopyAdvisor.Core.Tests.EndToEnd;

// Turning the whole site and the sun about the vertical must turn every light vector and leave every scalar unchanged:
// the governing equations (MODEL.md §3: the lamp law E = Φ·I/d² in the lamp's own frame, Fresnel transmittance by incidence
// angle, Beer–Lambert by path length) have no preferred compass direction. Checked for the sun beam and the lamps only
// (DHI = 0): the sky view is integrated on a quadrature whose azimuth sectors are fixed to north (HemisphereQuadrature),
// which is mirror-symmetric about the north–south plane but not invariant under an arbitrary turn, so the diffuse part
// would differ by the quadrature's own error (MirrorSymmetryTests covers it exactly).
public sealed class RotationInvarianceTests
{
    private const double Relative = 1e-9;

    [Theory]
    [InlineData(57.0)]
    [InlineData(-133.0)]
    [InlineData(90.0)]
    public void Turned_site_under_a_turned_sun_gives_turned_beam_and_lamp_light(double turnDeg)
    {
        var rotation = new SiteRotation(turnDeg);
        Site site = MirrorScene.Build();
        Site turned = rotation.Site(site);
        Assert.Empty(SiteValidator.Validate(turned));
        CompiledLightField a = LightFieldCompiler.Compile(site, EnclosureBuilder.Build(site));
        CompiledLightField b = LightFieldCompiler.Compile(turned, EnclosureBuilder.Build(turned));

        // (sun azimuth, zenith, DNI, local time): beam with the side lamps, beam alone above the toplight threshold,
        // a low sun across the ridges, and lamps alone at night.
        (double Az, double Zen, double Dni, LocalTime Time)[] cases =
        [
            (95, 70, 900, new LocalTime(8, 30)),
            (170, 35, 1500, new LocalTime(12, 30)),
            (255, 75, 700, new LocalTime(17, 0)),
            (300, 110, 0, new LocalTime(21, 0)),
        ];
        double largestBeam = 0;
        foreach ((double az, double zen, double dni, LocalTime time) in cases)
        {
            Vector3 sun = Direction.FromAzimuthZenith(Angle.FromDegrees(az), Angle.FromDegrees(zen));
            var outside = new OutsideLight(Instant.FromUtc(2026, 6, 21, 10, 0), sun, dni, 0, Math.Max(0, dni * sun.Z));
            var x = new PointLight[a.Points.Length];
            var y = new PointLight[b.Points.Length];
            a.Step(outside, time, x);
            b.Step(rotation.Outside(outside), time, y);
            for (int p = 0; p < x.Length; p++)
            {
                // Rotation keeps the point order: same benches, same grids.
                Assert.True((rotation.Point(a.Points[p].Position) - b.Points[p].Position).Length < 1e-9);
                string where = $"turn {turnDeg}°, sun {az}°/{zen}°, point {p}";
                Assert.True(Math.Abs(x[p].HorizontalPpfd - y[p].HorizontalPpfd) <= Relative * (1 + x[p].HorizontalPpfd),
                    $"{where}: PPFD {x[p].HorizontalPpfd} vs {y[p].HorizontalPpfd}");
                Assert.True((rotation.Point(x[p].LightVector) - y[p].LightVector).Length <= Relative * (1 + x[p].LightVector.Length),
                    $"{where}: light vector {x[p].LightVector} turned vs {y[p].LightVector}");
                Assert.True((rotation.Point(x[p].BlueVector) - y[p].BlueVector).Length <= Relative * (1 + x[p].BlueVector.Length),
                    $"{where}: blue vector");
                Assert.True(Math.Abs(x[p].FarRed730 - y[p].FarRed730) <= Relative * (1 + x[p].FarRed730), $"{where}: 730 nm");
                Assert.True(Math.Abs(x[p].Red660 - y[p].Red660) <= Relative * (1 + x[p].Red660), $"{where}: 660 nm");
                largestBeam = Math.Max(largestBeam, x[p].HorizontalPpfd);
            }
        }

        Assert.True(largestBeam > 100, "the scene must be lit for the check to mean anything");
    }
}

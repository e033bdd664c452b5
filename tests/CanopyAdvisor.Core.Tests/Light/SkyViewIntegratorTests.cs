using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Light;

namespace CanopyAdvisor.Core.Tests.Light;

// Hemisphere integrals with closed forms (solid-angle calculus): ∫dω = 2π, ∫cos θ dω = π, ∫ω̂ dω = π ẑ over the upper
// hemisphere; over the east half ∫ω̂ dω = (π/2, 0, π/2); ∫cos²θ dω = 2π/3.
public sealed class SkyViewIntegratorTests
{
    private readonly struct OpenSky : ISkyViewWeight
    {
        public double Weight(Vector3 towardSky) => 1;
    }

    private readonly struct EastHalf : ISkyViewWeight
    {
        public double Weight(Vector3 towardSky) => towardSky.X > 0 ? 1 : 0;
    }

    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(7)]
    [InlineData(16)]
    [InlineData(41)]
    public void Open_hemisphere_is_exact_at_any_resolution(int bands)
    {
        var q = HemisphereQuadrature.Create(bands);
        SkyView view = SkyViewIntegrator.Integrate(q, new OpenSky());
        Assert.Equal(1.0, view.ViewFactor, 12);
        Assert.Equal(2.0, view.ScalarFactor, 12);
        Assert.Equal(0.0, view.SkyVector.X, 12);
        Assert.Equal(0.0, view.SkyVector.Y, 12);
        Assert.Equal(view.ViewFactor, view.SkyVector.Z);
        Assert.Equal(2 * Math.PI, q.SolidAnglesSr.Sum(), 10);
        Assert.Equal(Math.PI, q.ProjectedSolidAnglesSr.Sum(), 10);
        Assert.Equal(q.Count, q.Directions.Length);
        Assert.All(q.Directions, d => Assert.True(d.Z > 0 && Math.Abs(d.Length - 1) < 1e-12));
    }

    [Fact]
    public void Default_resolution_and_cell_sizes()
    {
        HemisphereQuadrature q = HemisphereQuadrature.Default;
        Assert.Equal(HemisphereQuadrature.DefaultZenithBands, q.ZenithBands);
        Assert.Equal(651, q.Count);
        // Nearly equal cells: every cell within a factor 2 of the mean solid angle 2π/N (construction property).
        double mean = 2 * Math.PI / q.Count;
        Assert.All(q.SolidAnglesSr, s => Assert.InRange(s / mean, 0.5, 2.0));
    }

    [Fact]
    public void East_half_sky()
    {
        // Closed form: f = 1/2, v = (1/2, 0, 1/2), s = 1. Cell edges at azimuth 0° and 180° make it exact to rounding
        // for bands whose sector count is even; odd sector counts straddle the edge, hence the 0.5 % tolerance at
        // a fine resolution.
        SkyView view = SkyViewIntegrator.Integrate(HemisphereQuadrature.Create(200), new EastHalf());
        Assert.Equal(0.5, view.ViewFactor, 0.0025);
        Assert.Equal(0.5, view.SkyVector.X, 0.0025);
        Assert.Equal(0.0, view.SkyVector.Y, 0.0025);
        Assert.Equal(1.0, view.ScalarFactor, 0.005);
    }

    [Theory]
    [InlineData(16, 0.005)]
    [InlineData(64, 0.0005)]
    public void Smooth_weight_converges(int bands, double tolerance)
    {
        // w = cos θ: f = (1/π)∫cos²θ dω = 2/3, s = (1/π)∫cos θ dω = 1.
        SkyView view = SkyViewIntegrator.Integrate(HemisphereQuadrature.Create(bands), d => d.Z);
        Assert.Equal(2.0 / 3.0, view.ViewFactor, tolerance);
        Assert.Equal(1.0, view.ScalarFactor, tolerance);
    }

    [Fact]
    public void Delegate_and_struct_weights_agree()
    {
        var q = HemisphereQuadrature.Create(12);
        Assert.Equal(SkyViewIntegrator.Integrate(q, new EastHalf()), SkyViewIntegrator.Integrate(q, d => d.X > 0 ? 1 : 0));
    }

    [Fact]
    public void Mirrored_weight_gives_mirrored_sky_vector()
    {
        // The cell layout is symmetric under azimuth φ → −φ (x → −x), so an east–west mirrored scene gives a mirrored
        // sky vector to rounding; light-field symmetry tests rely on this.
        var q = HemisphereQuadrature.Default;
        static double Weight(Vector3 d) => d.X > 0.3 && d.Y < 0.5 ? 0.8 : d.Z > 0.7 ? 0.4 : 0.1;
        SkyView a = SkyViewIntegrator.Integrate(q, Weight);
        SkyView b = SkyViewIntegrator.Integrate(q, d => Weight(new Vector3(-d.X, d.Y, d.Z)));
        Assert.Equal(a.ViewFactor, b.ViewFactor, 12);
        Assert.Equal(a.SkyVector.X, -b.SkyVector.X, 12);
        Assert.Equal(a.SkyVector.Y, b.SkyVector.Y, 12);
        Assert.Equal(a.ScalarFactor, b.ScalarFactor, 12);
    }

    [Theory]
    [InlineData(-0.1)]
    [InlineData(1.5)]
    [InlineData(double.NaN)]
    public void Weight_outside_zero_to_one_is_rejected(double bad)
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => SkyViewIntegrator.Integrate(HemisphereQuadrature.Create(4), _ => bad));
    }

    [Theory]
    [InlineData(0)]
    [InlineData(HemisphereQuadrature.MaximumZenithBands + 1)]
    public void Band_count_out_of_range_is_rejected(int bands)
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => HemisphereQuadrature.Create(bands));
    }

    [Fact]
    public void Indoor_enclosure_sees_no_sky()
    {
        var room = Core.Structures.EnclosureBuilder.Build(
            new Core.Sites.IndoorRoom(new Core.Sites.Footprint(0, 0, Angle.Zero, 10, 5), 3), []);
        Assert.Equal(SkyView.None, SkyViewIntegrator.Integrate(HemisphereQuadrature.Default, room, new Vector3(2, 2, 1)));
    }
}

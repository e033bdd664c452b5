using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Glazing;
using CanopyAdvisor.Core.Sites;

namespace CanopyAdvisor.Core.Tests.Glazing;

public sealed class CoverOpticsTests
{
    // Glass n = 1.526 as in Duffie & Beckman, ch. 5; K·L = 0 isolates reflection losses.
    private static Cover Glass(int layers, double extinctionPerM = 0, double thicknessM = 0) =>
        new("glass", false, 1.526, extinctionPerM, thicknessM, layers);

    [Theory]
    // Expected values: MODEL.md §2, computed from Duffie & Beckman ch. 5 equations (n = 1.526, one cover).
    [InlineData(1, 0.0, 0.9169)]
    [InlineData(1, 45.0, 0.9011)]
    [InlineData(1, 60.0, 0.8421)]
    [InlineData(1, 80.0, 0.4554)]
    // Two covers, same source.
    [InlineData(2, 0.0, 0.8465)]
    [InlineData(2, 60.0, 0.7588)]
    public void Reflection_transmittance_matches_Duffie_Beckman_values(int layers, double incidenceDeg, double expected)
    {
        double tau = CoverOptics.ReflectionTransmittance(Glass(layers), Angle.FromDegrees(incidenceDeg));
        Assert.Equal(expected, tau, 4);
    }

    [Theory]
    // MODEL.md §2 (Duffie & Beckman ch. 5 equations): n = 1.526, K = 4 m⁻¹, L = 2 mm, one cover.
    [InlineData(0.0, 0.9096)]
    [InlineData(60.0, 0.8340)]
    public void Transmittance_with_absorption_matches_Duffie_Beckman_values(double incidenceDeg, double expected)
    {
        double tau = CoverOptics.Transmittance(Glass(1, 4, 0.002), Angle.FromDegrees(incidenceDeg));
        Assert.Equal(expected, tau, 4);
    }

    [Fact]
    public void Normal_incidence_equals_the_Fresnel_limit()
    {
        // Normal-incidence reflectance ((n−1)/(n+1))² and τ_r = (1−r)/(1+r) for one layer (Duffie & Beckman ch. 5).
        double r = Math.Pow(0.526 / 2.526, 2);
        double expected = (1 - r) / (1 + r);
        Assert.Equal(expected, CoverOptics.ReflectionTransmittance(Glass(1), Angle.Zero), 12);
        Assert.Equal(expected, CoverOptics.ReflectionTransmittance(Glass(1), Angle.FromDegrees(1e-6)), 10);
    }

    [Theory]
    [InlineData(1, 1.526)]
    [InlineData(2, 1.526)]
    [InlineData(3, 1.49)]
    public void Cosine_form_equals_Duffie_Beckman_sine_tangent_form(int layers, double n)
    {
        // Duffie & Beckman ch. 5 write r⊥ = sin²(θ₂−θ₁)/sin²(θ₂+θ₁), r∥ = tan²(θ₂−θ₁)/tan²(θ₂+θ₁) (θ₁ > 0).
        var cover = new Cover("glass", false, n, 0, 0, layers);
        for (double deg = 0.5; deg < 90; deg += 0.5)
        {
            double t1 = deg * Math.PI / 180;
            double t2 = Math.Asin(Math.Sin(t1) / n);
            double rPerp = Math.Pow(Math.Sin(t2 - t1), 2) / Math.Pow(Math.Sin(t2 + t1), 2);
            double rPar = Math.Pow(Math.Tan(t2 - t1), 2) / Math.Pow(Math.Tan(t2 + t1), 2);
            double tau = 0.5 * (((1 - rPar) / (1 + ((2 * layers - 1) * rPar))) + ((1 - rPerp) / (1 + ((2 * layers - 1) * rPerp))));
            Assert.Equal(tau, CoverOptics.ReflectionTransmittance(cover, Angle.FromDegrees(deg)), 12);
        }
    }

    [Fact]
    public void Absorption_follows_Bouguer_law_along_the_refracted_path()
    {
        // τ_a = exp(−K·L/cos θ₂), sin θ₂ = sin θ₁/n (Duffie & Beckman ch. 5, Snell's law).
        var cover = Glass(1, 4, 0.002);
        double theta2 = Math.Asin(Math.Sin(Math.PI / 3) / 1.526);
        Assert.Equal(Math.Exp(-0.008 / Math.Cos(theta2)), CoverOptics.AbsorptionTransmittance(cover, Angle.FromDegrees(60)), 12);
    }

    [Fact]
    public void Opaque_cover_transmits_nothing_and_grazing_light_is_reflected()
    {
        Assert.Equal(0, CoverOptics.Transmittance(Cover.OpaqueSurface("panel"), Angle.Zero));
        Assert.Equal(0, CoverOptics.DiffuseTransmittance(Cover.OpaqueSurface("panel")));
        Assert.Equal(0, CoverOptics.Transmittance(Glass(1), Angle.RightAngle), 12);
    }

    [Fact]
    public void Transmittance_falls_with_incidence_angle()
    {
        // Property of the Fresnel equations (Duffie & Beckman ch. 5, fig. of τ_r against θ).
        var cover = Glass(2, 16, 0.004);
        double previous = double.MaxValue;
        for (int deg = 0; deg <= 90; deg++)
        {
            double tau = CoverOptics.Transmittance(cover, Angle.FromDegrees(deg));
            Assert.True(tau <= previous + 1e-15, $"τ rose at {deg}°");
            previous = tau;
        }
    }

    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    public void Diffuse_transmittance_matches_equivalent_incidence_near_60_degrees(int layers)
    {
        // Brandemuehl & Beckman (1980), as summarised by Duffie & Beckman ch. 5: the equivalent beam incidence angle
        // for isotropic diffuse radiation on a horizontal cover is about 60° (from memory). Loose tolerance: ±3°.
        var cover = Glass(layers, 4, 0.002);
        Angle equivalent = CoverOptics.EquivalentDiffuseIncidence(cover);
        Assert.InRange(equivalent.Degrees, 57.0, 63.0);
        double tauDiffuse = CoverOptics.DiffuseTransmittance(cover);
        Assert.Equal(CoverOptics.Transmittance(cover, equivalent), tauDiffuse, 9);
        Assert.Equal(CoverOptics.Transmittance(cover, Angle.FromDegrees(60)), tauDiffuse, 0.01);
    }

    [Fact]
    public void Diffuse_transmittance_of_a_clear_opening_is_one()
    {
        // n = 1, no absorption: no reflection at any angle, so the cos-weighted hemispherical mean is exactly 1
        // (2∫cos θ sin θ dθ = 1; Duffie & Beckman ch. 5 definition of diffuse transmittance).
        var open = new Cover("open vent", false, 1.0, 0, 0, 1);
        Assert.Equal(1.0, CoverOptics.DiffuseTransmittance(open), 6);
    }

    [Fact]
    public void Validate_reports_every_bad_field()
    {
        var bad = new Cover("bad", false, 0.5, -1, double.NaN, 0);
        var errors = CoverOptics.Validate(bad, "structure.roof");
        Assert.Equal(4, errors.Count);
        Assert.Contains(errors, e => e.Path == "structure.roof.refractiveIndex");
        Assert.Contains(errors, e => e.Path == "structure.roof.layers");
        Assert.Empty(CoverOptics.Validate(Glass(1), "x"));
        Assert.Empty(CoverOptics.Validate(Cover.OpaqueSurface("wall"), "x"));
    }
}

using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Validation;

namespace CanopyAdvisor.Core.Tests.Lamps;

public class DistributionTests
{
    public static TheoryData<string> Names => ["isotropic", "lambertian", "cos^0", "cos^4", "cos^37.3", "beam 30°", "tabulated", "tabulated 0-90 non-uniform", "tabulated partial around"];

    internal static BeamDistribution Make(string name) => name switch
    {
        "isotropic" => IsotropicDistribution.Instance,
        "lambertian" => LambertianDistribution.Instance,
        "cos^0" => new CosinePowerDistribution(0),
        "cos^4" => new CosinePowerDistribution(4),
        "cos^37.3" => new CosinePowerDistribution(37.3),
        "beam 30°" => CosinePowerDistribution.FromBeamAngle(Angle.FromDegrees(30)),
        "tabulated" => TabulatedFrom((t, p) => 1.6 + (0.5 * Math.Cos(p)) + Math.Cos(t), 5, 15, 180),
        "tabulated 0-90 non-uniform" => new TabulatedDistribution(
            [.. new[] { 0.0, 2, 5, 10, 20, 35, 50, 70, 90 }.Select(Angle.FromDegrees)],
            [Angle.Zero, Angle.FromDegrees(90), Angle.FromDegrees(100), Angle.FromDegrees(270)],
            new double[,] { { 9, 9, 8, 7, 6, 5, 4, 2, 1 }, { 9, 8, 8, 7, 5, 4, 3, 1, 0 }, { 9, 8, 7, 7, 5, 4, 3, 1, 0 }, { 9, 9, 8, 6, 6, 5, 4, 2, 1 } }),
        "tabulated partial around" => new TabulatedDistribution(
            [Angle.FromDegrees(90), Angle.FromDegrees(135), Angle.FromDegrees(180)],
            [Angle.FromDegrees(30), Angle.FromDegrees(200)],
            new double[,] { { 0, 1, 3 }, { 2, 2, 3 } }),
        _ => throw new ArgumentOutOfRangeException(nameof(name)),
    };

    [Theory]
    [MemberData(nameof(Names))]
    public void The_intensity_at_a_cosine_is_the_intensity_at_its_angle(string name)
    {
        // Definition: I(cos θ) and I(θ) describe the same distribution; the cosine form only skips an arc cosine.
        BeamDistribution distribution = Make(name);
        for (int p = 0; p <= 180; p += 3)
        {
            for (int a = 0; a < 360; a += 45)
            {
                double polar = p * Math.PI / 180, around = a * Math.PI / 180;
                double byAngle = distribution.IntensityPerUnitFlux(polar, around);
                double byCosine = distribution.IntensityPerUnitFluxAtCosine(Math.Cos(polar), around);
                Assert.True(Math.Abs(byAngle - byCosine) <= 1e-12 * Math.Max(1, Math.Abs(byAngle)), $"{name} at θ = {p}°, C = {a}°: {byAngle} vs {byCosine}");
            }
        }
    }

    internal static TabulatedDistribution TabulatedFrom(Func<double, double, double> f, double polarStepDeg, double aroundStepDeg, double lastPolarDeg)
    {
        int np = (int)Math.Round(lastPolarDeg / polarStepDeg) + 1;
        int na = (int)Math.Round(360 / aroundStepDeg);
        var values = new double[na, np];
        for (int a = 0; a < na; a++)
        {
            for (int p = 0; p < np; p++)
            {
                values[a, p] = f(p * polarStepDeg * Math.PI / 180, a * aroundStepDeg * Math.PI / 180);
            }
        }

        return new TabulatedDistribution(
            [.. Enumerable.Range(0, np).Select(i => Angle.FromDegrees(i * polarStepDeg))],
            [.. Enumerable.Range(0, na).Select(i => Angle.FromDegrees(i * aroundStepDeg))],
            values);
    }

    // Definition of the normalisation (BeamDistribution contract): ∫ I dω over the sphere = 1. Checked by an independent
    // midpoint quadrature (1800 × 360 cells), within 0.1 % as the task asks.
    [Theory]
    [MemberData(nameof(Names))]
    public void Integrates_to_one_over_the_sphere(string name)
    {
        double total = SphereIntegral.Of(Make(name));
        Assert.InRange(total, 0.999, 1.001);
    }

    // Isotropic point source: I = Φ/(4π) (definition of intensity; any photometry text).
    [Fact]
    public void Isotropic_is_one_over_four_pi_everywhere()
    {
        Assert.Equal(1 / (4 * Math.PI), IsotropicDistribution.Instance.IntensityPerUnitFlux(2.0, 1.0), 15);
    }

    // Lambert's cosine law: on-axis intensity of a Lambertian emitter is Φ/π; zero behind.
    [Theory]
    [InlineData(0, 1 / Math.PI)]
    [InlineData(60, 0.5 / Math.PI)]
    [InlineData(120, 0)]
    public void Lambertian_follows_the_cosine_law(double polarDeg, double expected)
    {
        Assert.Equal(expected, LambertianDistribution.Instance.IntensityPerUnitFlux(polarDeg * Math.PI / 180, 0), 12);
    }

    // cosⁿ normalisation (n + 1)/(2π) from ∫₀^{π/2} cosⁿθ sinθ dθ = 1/(n + 1) (elementary integral).
    [Theory]
    [InlineData(0)]
    [InlineData(1)]
    [InlineData(4)]
    [InlineData(10)]
    public void Cosine_power_axial_value_is_n_plus_one_over_two_pi(double n)
    {
        Assert.Equal((n + 1) / (2 * Math.PI), new CosinePowerDistribution(n).IntensityPerUnitFlux(0, 0), 12);
    }

    // Half-intensity beam angle (IES definition, common practice): I(beam/2) = 0.5 I(0).
    [Theory]
    [InlineData(10)]
    [InlineData(30)]
    [InlineData(60)]
    [InlineData(90)]
    [InlineData(120)]
    [InlineData(150)]
    public void Beam_angle_is_where_intensity_halves(double beamDeg)
    {
        var d = CosinePowerDistribution.FromBeamAngle(Angle.FromDegrees(beamDeg));
        double axial = d.IntensityPerUnitFlux(0, 0);
        double edge = d.IntensityPerUnitFlux(beamDeg / 2 * Math.PI / 180, 0);
        Assert.Equal(0.5, edge / axial, 10);
        Assert.Equal(beamDeg, d.BeamAngle.Degrees, 8);
    }

    // A Lambertian emitter has a 120° half-intensity beam angle (cos 60° = 1/2): common practice figure for flat LED boards.
    [Fact]
    public void Beam_angle_of_120_degrees_is_lambertian()
    {
        Assert.Equal(1.0, CosinePowerDistribution.FromBeamAngle(Angle.FromDegrees(120)).Exponent, 12);
    }

    [Theory]
    [InlineData(0)]
    [InlineData(-10)]
    [InlineData(180)]
    [InlineData(double.NaN)]
    public void Impossible_beam_angles_are_rejected(double beamDeg)
    {
        Assert.Throws<InvalidInputException>(() => CosinePowerDistribution.FromBeamAngle(Angle.FromDegrees(beamDeg)));
    }

    [Theory]
    [InlineData(-1)]
    [InlineData(double.PositiveInfinity)]
    [InlineData(double.NaN)]
    public void Impossible_exponents_are_rejected(double n)
    {
        Assert.Throws<InvalidInputException>(() => new CosinePowerDistribution(n));
    }
}

using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Validation;

namespace CanopyAdvisor.Core.Tests.Lamps;

public class TabulatedDistributionTests
{
    private static Angle[] Deg(params double[] d) => [.. d.Select(Angle.FromDegrees)];

    // Bilinear interpolation (definition): the value at a cell centre is the mean of its four corners; a node returns
    // its own value. Checked against the normalised node values.
    [Fact]
    public void Interpolates_bilinearly_between_nodes()
    {
        var d = new TabulatedDistribution(Deg(0, 10, 20), Deg(0, 90, 180, 270), new double[,] { { 4, 2, 0 }, { 6, 4, 2 }, { 4, 2, 0 }, { 2, 0, 0 } });
        double n(int a, int p) => d.NodeIntensityPerUnitFlux(a, p);
        double rad(double x) => x * Math.PI / 180;
        Assert.Equal(n(1, 1), d.IntensityPerUnitFlux(rad(10), rad(90)), 14);
        Assert.Equal((n(0, 0) + n(0, 1) + n(1, 0) + n(1, 1)) / 4, d.IntensityPerUnitFlux(rad(5), rad(45)), 14);

        // Periodic: between 270° and 360° the interpolation wraps to the 0° column.
        Assert.Equal((n(3, 1) + n(0, 1)) / 2, d.IntensityPerUnitFlux(rad(10), rad(315)), 14);
        Assert.Equal(d.IntensityPerUnitFlux(rad(12), rad(315)), d.IntensityPerUnitFlux(rad(12), rad(-45)), 14);
        Assert.Equal(d.IntensityPerUnitFlux(rad(12), rad(30)), d.IntensityPerUnitFlux(rad(12), rad(30 + 720)), 12);

        // Beyond the last polar angle nothing is emitted.
        Assert.Equal(0, d.IntensityPerUnitFlux(rad(21), 0));
    }

    // Uniform grids take the O(1) index path, irregular ones binary search: both must give the same answer for the same
    // data. The irregular grid below holds the same nodes plus one extra node placed on the interpolated line.
    [Fact]
    public void Uniform_and_irregular_grids_agree()
    {
        var uniform = new TabulatedDistribution(Deg(0, 30, 60, 90), Deg(0, 120, 240), new double[,] { { 3, 3, 2, 0 }, { 3, 2, 1, 0 }, { 3, 3, 3, 1 } });
        var irregular = new TabulatedDistribution(Deg(0, 30, 45, 60, 90), Deg(0, 120, 240), new double[,] { { 3, 3, 2.5, 2, 0 }, { 3, 2, 1.5, 1, 0 }, { 3, 3, 3, 3, 1 } });
        Assert.Equal(uniform.InputIntegral, irregular.InputIntegral, 12);
        var random = new Random(7);
        for (int i = 0; i < 2000; i++)
        {
            double t = random.NextDouble() * Math.PI / 2;
            double p = (random.NextDouble() * 4 * Math.PI) - (2 * Math.PI);
            Assert.Equal(uniform.IntensityPerUnitFlux(t, p), irregular.IntensityPerUnitFlux(t, p), 12);
        }
    }

    // A constant grid over the whole sphere integrates to 4π × the constant (solid angle of a sphere).
    [Fact]
    public void Input_integral_of_a_constant_is_four_pi_times_it()
    {
        var d = new TabulatedDistribution(Deg(0, 45, 90, 135, 180), Deg(0), new double[,] { { 2, 2, 2, 2, 2 } });
        Assert.Equal(8 * Math.PI, d.InputIntegral, 12);
        Assert.True(d.IsAxiallySymmetric);
    }

    // A constant grid over 0–90° integrates to 2π × the constant (solid angle of a hemisphere).
    [Fact]
    public void Input_integral_of_a_constant_hemisphere_is_two_pi_times_it()
    {
        var d = new TabulatedDistribution(Deg(0, 30, 90), Deg(0, 90, 180, 270), new double[,] { { 5, 5, 5 }, { 5, 5, 5 }, { 5, 5, 5 }, { 5, 5, 5 } });
        Assert.Equal(10 * Math.PI, d.InputIntegral, 12);
        Assert.True(d.IsAxiallySymmetric);
    }

    public static TheoryData<string, Angle[], Angle[], double[,]> BadGrids => new()
    {
        { "one polar angle", Deg(0), Deg(0), new double[,] { { 1 } } },
        { "polar not increasing", Deg(0, 10, 10), Deg(0), new double[,] { { 1, 1, 1 } } },
        { "polar beyond 180", Deg(0, 90, 190), Deg(0), new double[,] { { 1, 1, 1 } } },
        { "around span over 360", Deg(0, 90), Deg(10, 371), new double[,] { { 1, 1 }, { 1, 1 } } },
        { "shape mismatch", Deg(0, 90), Deg(0, 180), new double[,] { { 1, 1 } } },
        { "negative value", Deg(0, 90), Deg(0), new double[,] { { 1, -1 } } },
        { "NaN value", Deg(0, 90), Deg(0), new double[,] { { 1, double.NaN } } },
        { "all zero", Deg(0, 90), Deg(0), new double[,] { { 0, 0 } } },
    };

    [Theory]
    [MemberData(nameof(BadGrids))]
    public void Bad_grids_are_rejected(string label, Angle[] polar, Angle[] around, double[,] values)
    {
        Assert.NotNull(label);
        Assert.Throws<InvalidInputException>(() => new TabulatedDistribution(polar, around, values));
    }

    // Regression (found by the IES mutation property test): subnormal inputs must still normalise to finite values
    // that integrate to 1 (checked by the independent quadrature).
    [Theory]
    [InlineData(1e-320)]
    [InlineData(1e300)]
    public void Extreme_magnitudes_normalise(double scale)
    {
        var d = new TabulatedDistribution(Deg(0, 45, 90), Deg(0, 180), new double[,] { { scale, scale / 2, 0 }, { scale, 0, 0 } });
        Assert.True(d.InputIntegral > 0 && double.IsFinite(d.InputIntegral));
        Assert.InRange(SphereIntegral.Of(d), 0.999, 1.001);
    }
}

using CanopyAdvisor.Core.Plants.Growth;
using CanopyAdvisor.Core.Validation;
using CsCheck;

namespace CanopyAdvisor.Core.Tests.Plants.Growth;

// Source: the beta function of Yan & Hunt (1999), Annals of Botany 84:607–614, eq. 4:
// r(T) = ((Tmax − T)/(Tmax − Topt)) · ((T − Tmin)/(Topt − Tmin))^((Topt − Tmin)/(Tmax − Topt)); values below by hand.
public class CardinalTemperatureResponseTests
{
    public static TheoryData<double, double, double, double, double, string> HandValues => new()
    {
        // Tmin 5, Topt 25, Tmax 35: exponent (25−5)/(35−25) = 2
        { 15, 5, 25, 35, 0.5, "(35−15)/10 · (10/20)² = 2 · 0.25 = 0.5" },
        { 30, 5, 25, 35, 0.78125, "(35−30)/10 · (25/20)² = 0.5 · 1.5625 = 0.78125" },
        { 10, 5, 25, 35, 0.15625, "(35−10)/10 · (5/20)² = 2.5 · 0.0625 = 0.15625" },
        { 34, 5, 25, 35, 0.21025, "(35−34)/10 · (29/20)² = 0.1 · 2.1025 = 0.21025" },
        // Tmin 0, Topt 20, Tmax 40: exponent 1, a symmetric parabola
        { 10, 0, 20, 40, 0.75, "(40−10)/20 · 10/20 = 1.5 · 0.5 = 0.75" },
        { 30, 0, 20, 40, 0.75, "(40−30)/20 · 30/20 = 0.5 · 1.5 = 0.75" },
        // Tmin 10, Topt 30, Tmax 40 with T = 20: exponent 2 → (20/10) · (10/20)² = 0.5
        { 20, 10, 30, 40, 0.5, "(40−20)/10 · (10/20)² = 0.5" },
        // Tmin 4, Topt 22, Tmax 28: exponent 18/6 = 3 → T = 13: (15/6) · (9/18)³ = 2.5 · 0.125 = 0.3125
        { 13, 4, 22, 28, 0.3125, "(28−13)/6 · (9/18)³ = 2.5 · 0.125 = 0.3125" },
    };

    [Theory]
    [MemberData(nameof(HandValues))]
    public void MatchesHandArithmetic(double t, double tMin, double tOpt, double tMax, double expected, string arithmetic)
    {
        Assert.False(string.IsNullOrEmpty(arithmetic));
        Assert.Equal(expected, CardinalTemperatureResponse.Relative(t, tMin, tOpt, tMax), 12);
    }

    [Theory]
    // Yan & Hunt (1999): r = 0 at and outside the base and maximum, r = 1 at the optimum.
    [InlineData(5, 0)]
    [InlineData(-10, 0)]
    [InlineData(35, 0)]
    [InlineData(50, 0)]
    [InlineData(25, 1)]
    public void CardinalPoints(double t, double expected) =>
        Assert.Equal(expected, CardinalTemperatureResponse.Relative(t, 5, 25, 35), 12);

    [Fact]
    public void RisesToTheOptimumAndFallsAfter()
    {
        // Yan & Hunt (1999): the beta function is unimodal with its peak at Topt.
        double previous = 0;
        for (double t = 5.1; t <= 25; t += 0.1)
        {
            double r = CardinalTemperatureResponse.Relative(t, 5, 25, 35);
            Assert.True(r > previous, $"not rising at {t}");
            previous = r;
        }

        for (double t = 25.1; t < 35; t += 0.1)
        {
            double r = CardinalTemperatureResponse.Relative(t, 5, 25, 35);
            Assert.True(r < previous, $"not falling at {t}");
            previous = r;
        }
    }

    [Fact]
    public void UsesTheCropsCardinalTemperatures()
    {
        var crop = TestCrops.Make(baseC: 5, optimumC: 25, maximumC: 35);
        Assert.Equal(0.5, CardinalTemperatureResponse.Relative(15, crop), 12);
    }

    [Fact]
    public void RejectsUnorderedCardinalTemperatures_WithPaths()
    {
        var crop = TestCrops.Make(baseC: 25, optimumC: 25, maximumC: 20);
        var ex = Assert.Throws<InvalidInputException>(() => CardinalTemperatureResponse.Relative(15, crop));
        Assert.Equal(
            ["crop.baseTemperatureC: must be below the optimum (25 °C)", "crop.maximumTemperatureC: must be above the optimum (25 °C)"],
            ex.Errors.Select(e => e.ToString()));
        var ex2 = Assert.Throws<InvalidInputException>(() => CardinalTemperatureResponse.Relative(double.NaN, 5, 25, double.PositiveInfinity));
        Assert.Equal(["temperatureC", "maximumTemperatureC"], ex2.Errors.Select(e => e.Path));
    }

    [Fact]
    public void StaysInUnitInterval_AndPeaksAtTheOptimum()
    {
        // Yan & Hunt (1999): 0 ≤ r ≤ 1 with r = 1 only at Topt, for any Tmin < Topt < Tmax.
        Gen.Select(Gen.Double[-5, 15], Gen.Double[1, 20], Gen.Double[1, 20], Gen.Double[0, 1])
            .Sample((tMin, up, down, u) =>
            {
                double tOpt = tMin + up;
                double tMax = tOpt + down;
                double t = tMin - 5 + (u * (tMax - tMin + 10));
                double r = CardinalTemperatureResponse.Relative(t, tMin, tOpt, tMax);
                return r >= 0 && r <= 1 + 1e-12 && Math.Abs(CardinalTemperatureResponse.Relative(tOpt, tMin, tOpt, tMax) - 1) < 1e-12;
            });
    }
}

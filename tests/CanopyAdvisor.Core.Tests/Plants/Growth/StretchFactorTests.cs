using CanopyAdvisor.Core.Plants.Growth;
using CanopyAdvisor.Core.Validation;

namespace CanopyAdvisor.Core.Tests.Plants.Growth;

public class StretchFactorTests
{
    [Theory]
    // f = max(0.2, 1 + s·DIF): linear in DIF after Erwin, Heins & Karlsson (1989, Am J Bot 76:47; from memory);
    // floor 0.2 is this project's choice (ModelConstants.DifFactorFloor).
    [InlineData(4, 0.05, 1.2)]     // 1 + 0.05·4
    [InlineData(-4, 0.05, 0.8)]    // 1 − 0.05·4
    [InlineData(0, 0.05, 1.0)]     // DIF 0: no effect
    [InlineData(-20, 0.05, 0.2)]   // 1 − 1.0 = 0 → clamped to 0.2
    [InlineData(6, 0, 1.0)]        // an insensitive crop
    public void Dif(double dif, double s, double expected) =>
        Assert.Equal(expected, DifResponse.Factor(dif, s), 12);

    [Fact]
    public void Dif_IsMonotoneInDif()
    {
        // Erwin et al. (1989): internode length rises with DIF.
        double previous = 0;
        for (double dif = -15; dif <= 15; dif += 0.5)
        {
            double f = DifResponse.Factor(dif, 0.05);
            Assert.True(f >= previous);
            previous = f;
        }
    }

    [Theory]
    // f = 1 + k·max(0, PSS_sun − PSS): linear in PSS after Smith (1982, Annu Rev Plant Physiol 33:481; from memory).
    [InlineData(0.0, 2, 1.0)]     // at full sun's PSS
    [InlineData(-0.1, 2, 1.2)]    // 0.1 below: 1 + 2·0.1
    [InlineData(-0.3, 0.5, 1.15)] // 0.3 below: 1 + 0.5·0.3
    [InlineData(0.1, 2, 1.0)]     // above full sun: no shortening in this model
    public void Shade(double pssOffset, double k, double expected) =>
        Assert.Equal(expected, ShadeAvoidanceResponse.Factor(PhytochromeState.FullSun + pssOffset, k), 12);

    [Theory]
    // f = 1 + c·max(0, DLI_min − DLI); DLI_min 10 is the low end for bedding-plant young plants (Craver, Boldt & Lopez 2019).
    [InlineData(6, 10, 0.03, 1.12)]  // 1 + 0.03·4
    [InlineData(0, 10, 0.03, 1.30)]  // 1 + 0.03·10
    [InlineData(10, 10, 0.03, 1.0)]  // at the minimum
    [InlineData(17, 10, 0.03, 1.0)]  // above it
    public void LowLight(double dli, double minimum, double c, double expected) =>
        Assert.Equal(expected, LowLightResponse.Factor(dli, minimum, c), 12);

    [Fact]
    public void RejectInvalidInputs_WithPaths()
    {
        Assert.Equal("difK", Assert.Throws<InvalidInputException>(() => DifResponse.Factor(double.NaN, 0.05)).Errors[0].Path);
        Assert.Equal(
            ["phytochromeState", "shadeAvoidanceSensitivity"],
            Assert.Throws<InvalidInputException>(() => ShadeAvoidanceResponse.Factor(1.2, -1)).Errors.Select(e => e.Path));
        Assert.Equal(
            ["dliMolPerM2Day", "dliMinimum", "lowLightStretchPerMole"],
            Assert.Throws<InvalidInputException>(() => LowLightResponse.Factor(-1, double.NaN, -0.1)).Errors.Select(e => e.Path));
    }
}

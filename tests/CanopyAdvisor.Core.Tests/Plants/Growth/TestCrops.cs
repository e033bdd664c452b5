using CanopyAdvisor.Core.Plants;

namespace CanopyAdvisor.Core.Tests.Plants.Growth;

// An invented test crop (demo data, not a real cultivar's parameters): only the elongation parameters matter here.
internal static class TestCrops
{
    public static Crop Make(
        double referenceMmPerDay = 10,
        double baseC = 5,
        double optimumC = 25,
        double maximumC = 35,
        double difPerK = 0.05,
        double shade = 2,
        double dliMinimum = 10,
        double lowLightPerMole = 0.03,
        double heightLimitMm = 250)
    {
        static CropParameter P(double v, string unit = "1") => new(v, unit, v, v, "test value (demo data)");
        return new Crop(
            "test", "Test crop", default, null,
            P(1), P(1), P(1), P(0.5), P(20, "mm"),
            P(referenceMmPerDay, "mm/d"),
            P(baseC, "C"), P(optimumC, "C"), P(maximumC, "C"),
            P(difPerK, "1/K"), P(shade), P(dliMinimum, "mol/m2/d"), P(12, "mol/m2/d"), P(lowLightPerMole),
            P(2, "h"), P(5, "deg"), P(1), P(0.5, "h"), P(3, "m2/m3"), P(10, "deg"), P(heightLimitMm, "mm"));
    }
}

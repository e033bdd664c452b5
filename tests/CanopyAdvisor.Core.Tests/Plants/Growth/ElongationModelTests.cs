using CanopyAdvisor.Core;
using CanopyAdvisor.Core.Plants.Growth;
using CanopyAdvisor.Core.Validation;

namespace CanopyAdvisor.Core.Tests.Plants.Growth;

// Ė = Ė_ref · r(T) · f_DIF · f_shade · f_lowlight (MODEL.md §5); each factor's source is in its own test file.
public class ElongationModelTests
{
    [Fact]
    public void FactorsMultiply_ByHand()
    {
        var crop = TestCrops.Make(referenceMmPerDay: 10, baseC: 5, optimumC: 25, maximumC: 35, difPerK: 0.05, shade: 2, dliMinimum: 10, lowLightPerMole: 0.03);
        var conditions = new ElongationConditions(15, 4, PhytochromeState.FullSun - 0.1, 6);
        ElongationFactors f = ElongationModel.Factors(crop, conditions);
        Assert.Equal(0.5, f.Temperature, 12);   // Yan & Hunt: (20/10)·(10/20)²
        Assert.Equal(1.2, f.Dif, 12);           // 1 + 0.05·4
        Assert.Equal(1.2, f.Shade, 12);         // 1 + 2·0.1
        Assert.Equal(1.12, f.LowLight, 12);     // 1 + 0.03·(10 − 6)
        Assert.Equal(0.8064, f.Product, 12);    // 0.5·1.2·1.2·1.12
        Assert.Equal(8.064, ElongationModel.RateMmPerDay(crop, conditions), 12);
        // 8.064 mm/d = 0.008064 m / 24 h = 3.36e-4 m/h
        Assert.Equal(3.36e-4, ElongationModel.RateMetresPerHour(crop, conditions), 15);
    }

    [Fact]
    public void ReferenceConditions_GiveTheReferenceRate()
    {
        // At the optimum, DIF 0, full-sun PSS and DLI at the minimum every factor is 1 (definition of Ė_ref).
        var crop = TestCrops.Make(referenceMmPerDay: 7.5);
        var conditions = new ElongationConditions(25, 0, PhytochromeState.FullSun, 10);
        Assert.Equal(7.5, ElongationModel.RateMmPerDay(crop, conditions), 12);
    }

    [Fact]
    public void NoGrowthOutsideTheCardinalRange_WhateverTheStretch()
    {
        var crop = TestCrops.Make();
        Assert.Equal(0, ElongationModel.RateMmPerDay(crop, new ElongationConditions(4, 8, 0.2, 1)));
        Assert.Equal(0, ElongationModel.RateMmPerDay(crop, new ElongationConditions(36, 8, 0.2, 1)));
    }

    [Fact]
    public void ReportsEveryProblem_WithPaths()
    {
        var crop = TestCrops.Make(referenceMmPerDay: -1, baseC: 30, optimumC: 25, shade: -1);
        var ex = Assert.Throws<InvalidInputException>(() =>
            ElongationModel.Factors(crop, new ElongationConditions(double.NaN, 1, 1.5, -2)));
        Assert.Equal(
            [
                "crop.referenceElongationMmPerDay",
                "crop.baseTemperatureC",
                "crop.shadeAvoidanceSensitivity",
                "conditions.airTemperatureC",
                "conditions.phytochromeState",
                "conditions.recentDliMolPerM2Day",
            ],
            ex.Errors.Select(e => e.Path));
    }

    [Fact]
    public void LegginessCauses_ListEachActiveCause()
    {
        // Limits: crop DLI minimum (10), PSS 0.55 and DIF +2 K (ModelConstants, this project's choices), height grade limit (250 mm).
        var crop = TestCrops.Make(dliMinimum: 10, heightLimitMm: 250);
        LegginessCauses all = LegginessCauses.Evaluate(crop, 8, 0.5, 3, 260);
        Assert.Equal(
            [
                new LegginessCause(LegginessCauseKind.LowDli, 8, 10, "mol m-2 d-1"),
                new LegginessCause(LegginessCauseKind.LowPhytochromeState, 0.5, ModelConstants.LegginessPhytochromeStateLimit, "1"),
                new LegginessCause(LegginessCauseKind.HighDif, 3, 2, "K"),
                new LegginessCause(LegginessCauseKind.HeightOverGrade, 260, 250, "mm"),
            ],
            all.Active.ToArray());
        Assert.True(all.Any);

        // At the limits exactly, nothing is active; an unknown height is not a cause.
        LegginessCauses none = LegginessCauses.Evaluate(crop, 10, 0.55, 2, null);
        Assert.False(none.Any);
        Assert.Empty(none.Active);

        var ex = Assert.Throws<InvalidInputException>(() => LegginessCauses.Evaluate(crop, -1, 2, double.NaN, -5));
        Assert.Equal(["meanDliMolPerM2Day", "meanPhytochromeState", "meanDifK", "projectedHeightMm"], ex.Errors.Select(e => e.Path));
    }
}

using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Core.Validation;

namespace CanopyAdvisor.Core.Tests.Plants;

/// <summary>The crop rules hold for crops made in code too (crops/README.md, "Rules").</summary>
public class CropValidatorTests
{
    // An invented, valid test crop (not crop data).
    internal static Crop Sample() => new(
        "test-crop",
        "Test crop",
        CropGroup.BeddingPlant,
        null,
        P(3, "1", 2, 6),
        P(1.5, "1", 0.5, 4),
        P(0.8, "(umol m-2 s-1)^-b", 0.2, 3),
        P(0.3, "1", 0.1, 0.6),
        P(20, "mm", 10, 40),
        P(5, "mm/d", 2, 10),
        P(4, "°C", 1, 7),
        P(24, "°C", 21, 27),
        P(35, "°C", 32, 39),
        P(0.03, "K-1", 0, 0.08),
        P(1.5, "1", 0.5, 3),
        P(10, "mol m-2 d-1", 8, 11),
        P(12, "mol m-2 d-1", 11, 16),
        P(0.03, "(mol m-2 d-1)-1", 0.01, 0.08),
        P(2, "h", 1, 3),
        P(5, "deg", 1, 15),
        P(1, "1", -1, 1),
        P(0.5, "h", 0.25, 1.5),
        P(10, "m2 m-3", 5, 20),
        P(15, "deg", 10, 20),
        P(150, "mm", 120, 200));

    private static CropParameter P(double value, string unit, double min, double max) => new(value, unit, min, max, "estimate (from memory)");

    [Fact]
    public void The_sample_crop_is_valid()
    {
        Assert.Empty(CropValidator.Validate(Sample()));
        Assert.Equal(Sample(), CropValidator.EnsureValid(Sample()));
    }

    public static TheoryData<string, CropParameter, string, string> BrokenParameters() => new()
    {
        // Rule (crops/README.md "Rules"): value inside its range.
        { "balanceNumber", new(15, "1", 2, 6, "demo"), "balanceNumber.value", "15 is outside its range [2, 6]" },
        // Rule: minimum ≤ maximum.
        { "balanceNumber", new(3, "1", 6, 2, "demo"), "balanceNumber.range", "minimum 6 is above maximum 2" },
        // Rule: finite numbers.
        { "balanceNumber", new(double.NaN, "1", 2, 6, "demo"), "balanceNumber.value", "NaN is not a finite number" },
        { "balanceNumber", new(3, "1", double.NegativeInfinity, 6, "demo"), "balanceNumber.range", "[-Infinity, 6] must hold finite numbers" },
        // Rule: fixed units.
        { "growthZoneLengthMm", new(20, "cm", 10, 40, "demo"), "growthZoneLengthMm.unit", "'cm' is not the unit of growthZoneLengthMm; write \"mm\"" },
        { "baseTemperatureC", new(4, "C", 1, 7, "demo"), "baseTemperatureC.unit", "'C' is not the unit of baseTemperatureC; write \"°C\"" },
        // Rule: physical limits (growth zone > 0).
        { "growthZoneLengthMm", new(0, "mm", 0, 40, "demo"), "growthZoneLengthMm.value", "0 must be > 0 and ≤ 1000" },
        // Rule: nutation sense ±1.
        { "nutationSense", new(0, "1", -1, 1, "demo"), "nutationSense.value", "0 must be 1 (counter-clockwise seen from above) or -1 (clockwise)" },
        // Rule: provenance forms.
        { "balanceNumber", new(3, "1", 2, 6, "my guess"), "balanceNumber.source", $"'my guess' must start with {CropValidator.ProvenanceForms}" },
        { "balanceNumber", new(3, "1", 2, 6, "calibrated: site A, March"), "balanceNumber.source", $"'calibrated: site A, March' must start with {CropValidator.ProvenanceForms}" },
        { "balanceNumber", new(3, "1", 2, 6, "published: "), "balanceNumber.source", $"'published: ' must start with {CropValidator.ProvenanceForms}" },
    };

    [Theory]
    [MemberData(nameof(BrokenParameters))]
    public void A_broken_parameter_is_reported_with_its_field(string key, CropParameter parameter, string path, string message)
    {
        IReadOnlyList<ValidationError> errors = CropValidator.Validate(Sample().WithParameter(key, parameter));
        Assert.Contains(new ValidationError(path, message), errors);
    }

    [Theory]
    [InlineData("published: Craver, Boldt & Lopez 2019, HortScience 54:52")]
    [InlineData("common practice")]
    [InlineData("common practice; extension guides")]
    [InlineData("estimate (from memory)")]
    [InlineData("estimate (from memory); informed by Bastien et al. 2013")]
    [InlineData("calibrated: site A, 2026-03-01 to 2026-04-15, n = 24")]
    [InlineData("demo")]
    public void The_five_provenance_forms_are_accepted(string provenance) =>
        Assert.True(CropValidator.IsValidProvenance(provenance));

    [Theory]
    [InlineData("")]
    [InlineData("estimate")]
    [InlineData("Published: x")]
    [InlineData("calibrated: site A, n = 3")]
    [InlineData("democracy")]
    public void Other_provenance_is_rejected(string provenance) =>
        Assert.False(CropValidator.IsValidProvenance(provenance));

    [Fact]
    public void Temperatures_must_be_in_cardinal_order()
    {
        // Yan & Hunt 1999 cardinal temperatures: base < optimum < maximum.
        Crop crop = Sample()
            .WithParameter("baseTemperatureC", new CropParameter(20, "°C", 15, 22, "demo"))
            .WithParameter("optimumTemperatureC", new CropParameter(18, "°C", 16, 27, "demo"));
        ValidationError e = Assert.Single(CropValidator.Validate(crop));
        Assert.Equal("optimumTemperatureC.value", e.Path);
        Assert.StartsWith("18 must be above baseTemperatureC (20)", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Ordered_ranges_must_not_overlap()
    {
        Crop crop = Sample().WithParameter("maximumTemperatureC", new CropParameter(35, "°C", 26, 39, "demo"));
        ValidationError e = Assert.Single(CropValidator.Validate(crop));
        Assert.Equal("optimumTemperatureC.range", e.Path);
        Assert.StartsWith("maximum 27 must be below the minimum of maximumTemperatureC.range (26)", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Dli_minimum_may_equal_the_target_but_not_exceed_it()
    {
        Crop equal = Sample()
            .WithParameter("dliMinimum", new CropParameter(12, "mol m-2 d-1", 8, 12, "demo"))
            .WithParameter("dliTarget", new CropParameter(12, "mol m-2 d-1", 12, 16, "demo"));
        Assert.Empty(CropValidator.Validate(equal));
        Crop above = Sample().WithParameter("dliMinimum", new CropParameter(13, "mol m-2 d-1", 8, 14, "demo"));
        Assert.Contains(CropValidator.Validate(above), e => e.Path == "dliTarget.value" && e.Message.StartsWith("12 must be at least dliMinimum (13)", StringComparison.Ordinal));
    }

    [Fact]
    public void Header_fields_are_checked()
    {
        Crop crop = Sample() with { Id = "Test Crop", Name = " ", Group = (CropGroup)42, BaseId = "Test Crop" };
        string[] paths = CropValidator.Validate(crop).Select(e => e.Path).ToArray();
        Assert.Equal(["id", "name", "group", "base"], paths);
        Assert.Contains(CropValidator.Validate(Sample() with { BaseId = "test-crop" }), e => e == new ValidationError("base", "a crop cannot be its own base"));
    }

    [Fact]
    public void Many_problems_are_reported_at_once()
    {
        Crop crop = Sample()
            .WithParameter("balanceNumber", new CropParameter(15, "1", 2, 6, "demo"))
            .WithParameter("growthZoneLengthMm", new CropParameter(20, "cm", 10, 40, "demo"))
            .WithParameter("nutationSense", new CropParameter(0.5, "1", -1, 1, "guess"));
        InvalidInputException ex = Assert.Throws<InvalidInputException>(() => CropValidator.EnsureValid(crop));
        Assert.Equal(["balanceNumber.value", "growthZoneLengthMm.unit", "nutationSense.value", "nutationSense.source"], ex.Errors.Select(e => e.Path));
    }

    [Fact]
    public void Every_key_has_a_unit_and_limits()
    {
        Assert.Equal(21, CropConversions.ParameterKeys.Count);
        foreach (string key in CropConversions.ParameterKeys)
        {
            Assert.NotEmpty(CropValidator.ExpectedUnit(key));
            Assert.NotEmpty(CropValidator.LimitsText(key));
        }

        Assert.Throws<ArgumentOutOfRangeException>(() => CropValidator.ExpectedUnit("colour"));
    }
}

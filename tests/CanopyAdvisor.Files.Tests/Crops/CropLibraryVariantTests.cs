using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Files.Crops;

namespace CanopyAdvisor.Files.Tests.Crops;

/// <summary>Variants (crops/README.md, "Variants"): override only what they list, chain, and never cycle.</summary>
public class CropLibraryVariantTests
{
    private static CropSourceFile Base(string id) => CropFileTemplate.File($"crops/{id}.toml", CropFileTemplate.Text());

    private static CropSourceFile Variant(string id, string baseId, string body = "") =>
        CropFileTemplate.File($"crops/{id}.toml", $"name = \"{id}\"\nbase = \"{baseId}\"\n{body}");

    private const string Elongation = "\n[referenceElongationMmPerDay]\nvalue = 3\nunit = \"mm/d\"\nrange = [2, 7]\nsource = \"calibrated: site A, 2026-03-01 to 2026-04-15, n = 24\"\n";

    [Fact]
    public void A_variant_overrides_its_listed_parameters_and_keeps_the_rest()
    {
        CropLibrary library = CropLibrary.Build([Base("test"), Variant("test-slow", "test", Elongation)], []);
        Crop variant = library.Get("test-slow");
        Crop baseCrop = library.Get("test");
        Assert.Equal(3, variant.ReferenceElongationMmPerDay.Value);
        Assert.Equal(5, baseCrop.ReferenceElongationMmPerDay.Value);
        Assert.Equal("test", variant.BaseId);
        Assert.Equal(baseCrop.Group, variant.Group);
        Assert.Equal(baseCrop.BalanceNumber, variant.BalanceNumber);
    }

    [Fact]
    public void Variants_chain()
    {
        const string Lean = "\n[leanGradeLimitDeg]\nvalue = 12\nunit = \"deg\"\nrange = [10, 15]\nsource = \"common practice\"\n";
        CropLibrary library = CropLibrary.Build([Base("test"), Variant("test-slow", "test", Elongation), Variant("test-slow-tight", "test-slow", Lean)], []);
        Crop last = library.Get("test-slow-tight");
        Assert.Equal("test-slow", last.BaseId);
        Assert.Equal(3, last.ReferenceElongationMmPerDay.Value);
        Assert.Equal(12, last.LeanGradeLimitDeg.Value);
        Assert.Equal(15, library.Get("test-slow").LeanGradeLimitDeg.Value);
    }

    [Fact]
    public void A_variant_may_change_the_group()
    {
        CropLibrary library = CropLibrary.Build([Base("test"), Variant("test-pot", "test", "group = \"potPlant\"\n")], []);
        Assert.Equal(CropGroup.PotPlant, library.Get("test-pot").Group);
    }

    [Fact]
    public void A_cycle_is_an_error_at_the_base_line()
    {
        InvalidInputException ex = Assert.Throws<InvalidInputException>(() =>
            CropLibrary.Build([Base("test"), Variant("loop-a", "loop-b"), Variant("loop-b", "loop-a"), Variant("loop-c", "loop-a")], []));
        ValidationError e = Assert.Single(ex.Errors);
        Assert.Equal("crops/loop-a.toml:2", e.Path);
        Assert.Equal("base: variant cycle loop-a → loop-b → loop-a", e.Message);
    }

    [Fact]
    public void A_crop_cannot_be_its_own_base()
    {
        InvalidInputException ex = Assert.Throws<InvalidInputException>(() => CropLibrary.Build([Variant("loop", "loop")], []));
        Assert.Contains(ex.Errors, e => e.Path == "crops/loop.toml:2" && e.Message == "base: a crop cannot be its own base");
    }

    [Fact]
    public void An_unknown_base_is_an_error_with_a_hint()
    {
        InvalidInputException ex = Assert.Throws<InvalidInputException>(() => CropLibrary.Build([Base("test"), Variant("test-slow", "tset", Elongation)], []));
        ValidationError e = Assert.Single(ex.Errors);
        Assert.Equal("crops/test-slow.toml:2", e.Path);
        Assert.Equal("base: unknown crop 'tset'; did you mean 'test'?", e.Message);
    }

    [Fact]
    public void A_variant_that_breaks_a_cross_field_rule_is_reported_in_its_own_file()
    {
        // The variant raises the base temperature above the inherited optimum (24 °C).
        const string Warm = "\n[baseTemperatureC]\nvalue = 25\nunit = \"°C\"\nrange = [22, 26]\nsource = \"demo\"\n";
        InvalidInputException ex = Assert.Throws<InvalidInputException>(() => CropLibrary.Build([Base("test"), Variant("test-warm", "test", Warm)], []));
        ValidationError e = Assert.Single(ex.Errors);
        Assert.Equal("crops/test-warm.toml:2", e.Path);
        Assert.StartsWith("optimumTemperatureC.value (inherited from 'test'): 24 must be above baseTemperatureC (25)", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_variant_of_a_broken_base_adds_no_second_error()
    {
        List<string> lines = CropFileTemplate.Lines();
        lines[4] = "value = 15";
        InvalidInputException ex = Assert.Throws<InvalidInputException>(() =>
            CropLibrary.Build([CropFileTemplate.File("crops/test.toml", CropFileTemplate.Text(lines)), Variant("test-slow", "test", Elongation)], []));
        ValidationError e = Assert.Single(ex.Errors);
        Assert.Equal("crops/test.toml:5", e.Path);
    }
}

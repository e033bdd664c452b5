using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Files.Crops;

namespace CanopyAdvisor.Files.Tests.Crops;

/// <summary>The built-in library (crops/*.toml): every file loads and validates, the ids other parts rely on are
/// there, and the values that come from outside the project match their stated source.</summary>
public class CropLibraryBuiltInTests
{
    private static readonly CropLibrary Library = CropLibrary.LoadBuiltIn();

    public static TheoryData<string, CropGroup> RequiredCrops() => new()
    {
        // The ids the demo sites and other parts use (task list of the crop library).
        { "petunia", CropGroup.BeddingPlant },
        { "impatiens", CropGroup.BeddingPlant },
        { "tagetes", CropGroup.BeddingPlant },
        { "begonia", CropGroup.BeddingPlant },
        { "pelargonium", CropGroup.BeddingPlant },
        { "poinsettia", CropGroup.PotPlant },
        { "kalanchoe", CropGroup.PotPlant },
        { "pot-chrysanthemum", CropGroup.PotPlant },
        { "cyclamen", CropGroup.PotPlant },
        { "basil", CropGroup.Herb },
        { "parsley", CropGroup.Herb },
        { "coriander", CropGroup.Herb },
        { "tomato-transplant", CropGroup.VegetableTransplant },
        { "pepper-transplant", CropGroup.VegetableTransplant },
        { "lettuce-transplant", CropGroup.VegetableTransplant },
        { "radish-microgreens", CropGroup.Microgreen },
        { "pea-shoots", CropGroup.Microgreen },
        { "sunflower-microgreens", CropGroup.Microgreen },
    };

    public static TheoryData<string> BuiltInIds() => new(CropLibrary.BuiltInIds);

    [Theory]
    [MemberData(nameof(RequiredCrops))]
    public void Required_crop_is_built_in_with_its_group(string id, CropGroup group)
    {
        Crop crop = Library.Get(id);
        Assert.Equal(group, crop.Group);
        Assert.Null(crop.BaseId);
    }

    [Theory]
    [MemberData(nameof(BuiltInIds))]
    public void Every_built_in_file_loads_and_validates_clean(string id)
    {
        Crop crop = Library.Get(id);
        Assert.Empty(CropValidator.Validate(crop));
    }

    [Theory]
    [MemberData(nameof(BuiltInIds))]
    public void Every_single_parameter_extreme_of_a_built_in_crop_is_still_valid(string id)
    {
        // The uncertainty band (MODEL.md §7) moves one parameter at a time to an end of its range.
        Crop crop = Library.Get(id);
        foreach (string key in CropConversions.ParameterKeys)
        {
            Assert.Empty(CropValidator.Validate(crop.WithParameterAtMinimum(key)));
            Assert.Empty(CropValidator.Validate(crop.WithParameterAtMaximum(key)));
        }
    }

    [Fact]
    public void Each_group_has_at_least_two_crops()
    {
        foreach (CropGroup group in Enum.GetValues<CropGroup>())
        {
            Assert.True(Library.All.Count(c => c.Group == group && c.BaseId is null) >= 2, $"{group} has fewer than two crops");
        }
    }

    [Fact]
    public void Built_in_library_has_no_notes_and_is_sorted()
    {
        Assert.Empty(Library.Notes);
        Assert.Equal(Library.All.Select(c => c.Id).Order(StringComparer.Ordinal), Library.All.Select(c => c.Id));
        Assert.Equal(CropLibrary.BuiltInIds.Count, Library.All.Count);
    }

    [Fact]
    public void The_example_variant_overrides_only_what_it_lists()
    {
        Crop petunia = Library.Get("petunia");
        Crop compact = Library.Get("petunia-compact");
        Assert.Equal("petunia", compact.BaseId);
        Assert.Equal(CropGroup.BeddingPlant, compact.Group);
        Assert.Equal(2, compact.ReferenceElongationMmPerDay.Value);
        Assert.StartsWith("demo", compact.ReferenceElongationMmPerDay.Provenance, StringComparison.Ordinal);
        string[] overridden = ["referenceElongationMmPerDay", "difSensitivityPerKelvin", "heightGradeLimitMm"];
        foreach (string key in CropConversions.ParameterKeys.Except(overridden))
        {
            Assert.Equal(petunia.GetParameter(key), compact.GetParameter(key));
        }
    }

    [Theory]
    // Craver, Boldt & Lopez 2019, HortScience 54:52: young bedding plants 10-12 mol m-2 d-1 (as MODEL.md §5 cites it).
    [InlineData("petunia", 10, 12)]
    [InlineData("impatiens", 10, 12)]
    [InlineData("tagetes", 10, 12)]
    [InlineData("begonia", 10, 12)]
    [InlineData("pelargonium", 10, 12)]
    public void Bedding_plant_dli_follows_the_published_young_plant_figures(string id, double minimum, double target)
    {
        Crop crop = Library.Get(id);
        Assert.Equal(minimum, crop.DliMinimum.Value);
        Assert.Equal(target, crop.DliTarget.Value);
        Assert.StartsWith("published: Craver, Boldt & Lopez 2019", crop.DliMinimum.Provenance, StringComparison.Ordinal);
    }

    [Theory]
    // Leafy greens and herbs at least 12 mol m-2 d-1; lettuce about 17 (MODEL.md §5, from memory).
    [InlineData("basil", 12)]
    [InlineData("parsley", 12)]
    [InlineData("coriander", 12)]
    [InlineData("lettuce-transplant", 12)]
    public void Herb_and_leafy_dli_minimum_is_at_least_12(string id, double atLeast)
    {
        Assert.True(Library.Get(id).DliMinimum.Value >= atLeast);
    }

    [Fact]
    public void Lettuce_dli_target_is_about_17()
    {
        // About 17 mol m-2 d-1 for lettuce (MODEL.md §5; from memory).
        Assert.Equal(17, Library.Get("lettuce-transplant").DliTarget.Value);
    }

    [Theory]
    // Common practice: pot plants sell at grade with a lean of about 10-15 degrees at most.
    [InlineData("poinsettia")]
    [InlineData("kalanchoe")]
    [InlineData("pot-chrysanthemum")]
    [InlineData("cyclamen")]
    public void Pot_plant_lean_limit_is_the_common_practice_10_to_15_degrees(string id)
    {
        CropParameter lean = Library.Get(id).LeanGradeLimitDeg;
        Assert.InRange(lean.Value, 10, 15);
        Assert.Equal(10, lean.Minimum);
        Assert.Equal(15, lean.Maximum);
        Assert.StartsWith("common practice", lean.Provenance, StringComparison.Ordinal);
    }

    [Theory]
    [MemberData(nameof(BuiltInIds))]
    public void Model_numbers_sit_in_the_ranges_of_the_AC_model_papers(string id)
    {
        // B from about 1 to about 10 across organs (Bastien et al. 2013, 2018; from memory); circumnutation periods
        // of young shoots about 1-3 h (from memory).
        Crop crop = Library.Get(id);
        Assert.InRange(crop.BalanceNumber.Minimum, 1, 10);
        Assert.InRange(crop.BalanceNumber.Maximum, 1, 10);
        Assert.InRange(crop.NutationPeriodHours.Minimum, 1, 3);
        Assert.InRange(crop.NutationPeriodHours.Maximum, 1, 3);
        Assert.StartsWith("estimate (from memory)", crop.BalanceNumber.Provenance, StringComparison.Ordinal);
    }

    [Fact]
    public void The_schema_readme_lists_every_key_with_its_unit()
    {
        // crops/README.md is the schema's documentation; it must agree with the validator's unit table.
        string? folder = AppContext.BaseDirectory;
        while (folder is not null && !File.Exists(Path.Combine(folder, "crops", "README.md")))
        {
            folder = Path.GetDirectoryName(folder);
        }

        Assert.NotNull(folder);
        string readme = File.ReadAllText(Path.Combine(folder, "crops", "README.md"));
        foreach (string key in CropConversions.ParameterKeys)
        {
            Assert.Contains($"| `{key}` | `{CropValidator.ExpectedUnit(key)}` |", readme, StringComparison.Ordinal);
        }

        foreach (string id in CropLibrary.BuiltInIds)
        {
            Assert.Contains($"| `{id}` |", readme, StringComparison.Ordinal);
        }
    }

    [Fact]
    public void Unknown_id_gives_a_hint()
    {
        Assert.False(Library.TryGet("petnia", out _));
        KeyNotFoundException ex = Assert.Throws<KeyNotFoundException>(() => Library.Get("petnia"));
        Assert.Contains("did you mean 'petunia'?", ex.Message, StringComparison.Ordinal);
    }
}

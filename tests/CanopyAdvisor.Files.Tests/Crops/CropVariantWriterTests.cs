using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Files.Crops;

namespace CanopyAdvisor.Files.Tests.Crops;

/// <summary>A calibrated variant written as a crop file reads back through the crop library unchanged (crops/README.md,
/// "Variants": base plus complete tables of the parameters it changes).</summary>
public sealed class CropVariantWriterTests : IDisposable
{
    private readonly string _folder = Directory.CreateTempSubdirectory("canopy-variant-").FullName;

    public void Dispose() => Directory.Delete(_folder, recursive: true);

    private static Crop Calibrated()
    {
        Crop petunia = CropLibrary.LoadBuiltIn().Get("petunia");
        const string source = "calibrated: glasshouse-demo, 2026-11-14 to 2026-12-01, n = 20; standard error 0.0123; replaces 0.8 (estimate \"from memory\" \\ note)";
        return petunia.WithParameter("photoCoefficient", new CropParameter(1.2345678901234567, petunia.PhotoCoefficient.Unit, 1.1, 1.3, source))
            .WithParameter("proprioceptiveSensitivity", new CropParameter(1.1e-1 * 10, "1", 0.9, 1.35, source)) with
        {
            Id = "petunia-glasshouse-demo",
            Name = "Petunia, calibrated for Glasshouse range (demo)",
            BaseId = "petunia",
        };
    }

    [Fact]
    public void A_written_variant_reads_back_equal_through_the_library()
    {
        Crop variant = Calibrated();
        Crop petunia = CropLibrary.LoadBuiltIn().Get("petunia");

        string path = CropVariantWriter.WriteToFolder(_folder, variant, petunia, ["DEMO: calibrated from the demo observations", "second line"]);
        Crop read = CropLibrary.Load([_folder]).Get(variant.Id);

        Assert.Equal(Path.Combine(_folder, "petunia-glasshouse-demo.toml"), path);
        Assert.Equal(variant, read);
        string text = File.ReadAllText(path);
        Assert.StartsWith("# DEMO: calibrated from the demo observations\n# second line\nname = ", text, StringComparison.Ordinal);
        Assert.DoesNotContain("[balanceNumber]", text, StringComparison.Ordinal);
        Assert.Contains("[photoCoefficient]", text, StringComparison.Ordinal);
    }

    [Fact]
    public void An_invalid_variant_or_a_wrong_base_is_refused()
    {
        Crop petunia = CropLibrary.LoadBuiltIn().Get("petunia");
        Crop basil = CropLibrary.LoadBuiltIn().Get("basil");
        Assert.Throws<InvalidInputException>(() => CropVariantWriter.Write(Calibrated(), basil));
        Crop broken = Calibrated().WithParameter("photoCoefficient", 5.0);
        var ex = Assert.Throws<InvalidInputException>(() => CropVariantWriter.Write(broken, petunia));
        Assert.Contains(ex.Errors, e => e.Path == "photoCoefficient.value");
    }
}

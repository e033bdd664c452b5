using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Files.Crops;

namespace CanopyAdvisor.Files.Tests.Crops;

/// <summary>User folders (crops/README.md, "Your own crops"): add crops and variants, replace built-ins, report all.</summary>
public sealed class CropLibraryUserFolderTests : IDisposable
{
    private readonly string _folder = Path.Combine(Path.GetTempPath(), "canopy-crops-" + Guid.NewGuid().ToString("N"));

    public CropLibraryUserFolderTests() => Directory.CreateDirectory(_folder);

    public void Dispose() => Directory.Delete(_folder, recursive: true);

    private string Write(string name, string text)
    {
        string path = Path.Combine(_folder, name);
        File.WriteAllText(path, text);
        return path;
    }

    [Fact]
    public void A_user_file_with_a_new_id_adds_a_crop()
    {
        string path = Write("rosemary.toml", CropFileTemplate.Text());
        CropLibrary library = CropLibrary.Load([_folder]);
        Assert.Equal("Test crop", library.Get("rosemary").Name);
        Assert.Equal(CropLibrary.BuiltInIds.Count + 1, library.All.Count);
        Assert.Equal($"crop 'rosemary': added from {path}", Assert.Single(library.Notes));
    }

    [Fact]
    public void A_user_variant_of_a_built_in_crop_is_added()
    {
        string path = Write("petunia-site-a.toml", "name = \"Petunia, calibrated for site A\"\nbase = \"petunia\"\n\n[balanceNumber]\nvalue = 2.2\nunit = \"1\"\nrange = [1.5, 3]\nsource = \"calibrated: site A, 2026-03-01 to 2026-04-15, n = 24\"\n");
        CropLibrary library = CropLibrary.Load([_folder]);
        Crop variant = library.Get("petunia-site-a");
        Assert.Equal(2.2, variant.BalanceNumber.Value);
        Assert.Equal(library.Get("petunia").DliTarget, variant.DliTarget);
        Assert.Equal($"crop 'petunia-site-a': variant of 'petunia' added from {path}", Assert.Single(library.Notes));
    }

    [Fact]
    public void A_user_file_with_a_built_in_id_replaces_it_and_says_so()
    {
        string path = Write("basil.toml", CropFileTemplate.Text());
        CropLibrary library = CropLibrary.Load([_folder]);
        Assert.Equal("Test crop", library.Get("basil").Name);
        Assert.Equal(CropGroup.BeddingPlant, library.Get("basil").Group);
        Assert.Equal(CropLibrary.BuiltInIds.Count, library.All.Count);
        Assert.Equal($"crop 'basil': {path} replaces the built-in crops/basil.toml", Assert.Single(library.Notes));
    }

    [Fact]
    public void Built_in_variants_follow_a_replaced_base()
    {
        Write("petunia.toml", CropFileTemplate.Text());
        CropLibrary library = CropLibrary.Load([_folder]);
        Assert.Equal(3, library.Get("petunia-compact").BalanceNumber.Value);     // from the user's petunia
        Assert.Equal(2, library.Get("petunia-compact").ReferenceElongationMmPerDay.Value); // the variant's own
    }

    [Fact]
    public void Errors_in_user_files_carry_their_own_path()
    {
        string path = Write("thyme.toml", CropFileTemplate.Text().Replace("value = 3.0", "value = 15.0", StringComparison.Ordinal));
        InvalidInputException ex = Assert.Throws<InvalidInputException>(() => CropLibrary.Load([_folder]));
        ValidationError e = Assert.Single(ex.Errors);
        Assert.Equal($"{path}:5", e.Path);
        Assert.Equal("balanceNumber.value: 15 is outside its range [2, 6]", e.Message);
    }

    [Fact]
    public void The_same_id_in_two_user_folders_is_an_error()
    {
        string second = Path.Combine(_folder, "more");
        Directory.CreateDirectory(second);
        string first = Write("thyme.toml", CropFileTemplate.Text());
        string again = Path.Combine(second, "thyme.toml");
        File.WriteAllText(again, CropFileTemplate.Text());
        InvalidInputException ex = Assert.Throws<InvalidInputException>(() => CropLibrary.Load([_folder, second]));
        ValidationError e = Assert.Single(ex.Errors);
        Assert.Equal(again, e.Path);
        Assert.Equal($"crop id 'thyme' is already defined by {first}", e.Message);
    }

    [Fact]
    public void A_missing_folder_is_an_error()
    {
        string missing = Path.Combine(_folder, "nowhere");
        InvalidInputException ex = Assert.Throws<InvalidInputException>(() => CropLibrary.Load([missing]));
        Assert.Equal(new ValidationError(missing, "crop folder not found"), Assert.Single(ex.Errors));
    }

    [Fact]
    public void Other_files_in_the_folder_are_ignored()
    {
        Write("notes.txt", "not a crop");
        CropLibrary library = CropLibrary.Load([_folder]);
        Assert.Equal(CropLibrary.BuiltInIds.Count, library.All.Count);
    }
}

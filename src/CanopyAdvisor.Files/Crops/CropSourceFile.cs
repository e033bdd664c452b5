namespace CanopyAdvisor.Files.Crops;

/// <summary>The text of one crop file and the path used in error messages.</summary>
/// <param name="Path">The path shown in errors, e.g. <c>crops/petunia.toml</c> for a built-in file.</param>
/// <param name="Text">The TOML text.</param>
internal sealed record CropSourceFile(string Path, string Text)
{
    /// <summary>The crop id: the file name without extension.</summary>
    public string Id => System.IO.Path.GetFileNameWithoutExtension(Path);
}

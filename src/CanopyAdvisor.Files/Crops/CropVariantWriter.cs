using System.Globalization;
using System.Text;
using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Core.Validation;

namespace CanopyAdvisor.Files.Crops;

/// <summary>Writes a crop variant as a crop file (TOML, crops/README.md "Variants") that <see cref="CropLibrary"/>
/// reads back: <c>name</c>, <c>base</c> and one complete table for each parameter that differs from the base.</summary>
/// <remarks>The file must be named after the variant's id (<see cref="FileName"/>) and placed in a crop folder given
/// to the library; the library then resolves the other parameters from the base. Numbers are written in the shortest
/// form that reads back to the same double.</remarks>
public static class CropVariantWriter
{
    /// <summary>The file name a variant must have: its id plus <c>.toml</c>.</summary>
    /// <param name="variant">The variant.</param>
    /// <returns>The file name.</returns>
    public static string FileName(Crop variant)
    {
        ArgumentNullException.ThrowIfNull(variant);
        return variant.Id + ".toml";
    }

    /// <summary>The TOML text of a variant: the parameters that differ from its base.</summary>
    /// <param name="variant">The variant (valid, with a <see cref="Crop.BaseId"/>).</param>
    /// <param name="baseCrop">The crop it overrides (its id is the variant's base).</param>
    /// <param name="comment">Lines for the header comment (each written after <c>#</c>), e.g. what was measured.</param>
    /// <returns>The file text.</returns>
    /// <exception cref="InvalidInputException">The variant is not valid, has no base, or its base is not <paramref name="baseCrop"/>.</exception>
    public static string Write(Crop variant, Crop baseCrop, IEnumerable<string>? comment = null)
    {
        ArgumentNullException.ThrowIfNull(variant);
        ArgumentNullException.ThrowIfNull(baseCrop);
        var errors = new List<ValidationError>(CropValidator.Validate(variant));
        if (variant.BaseId is null || variant.BaseId != baseCrop.Id)
        {
            errors.Add(new ValidationError("base", $"the variant's base '{variant.BaseId}' must be the crop given, '{baseCrop.Id}'"));
        }

        if (errors.Count > 0)
        {
            throw new InvalidInputException(errors);
        }

        var text = new StringBuilder();
        foreach (string line in comment ?? [])
        {
            foreach (string part in line.Split('\n'))
            {
                text.Append("# ").Append(part.TrimEnd('\r')).Append('\n');
            }
        }

        text.Append("name = ").Append(Quote(variant.Name)).Append('\n');
        text.Append("base = ").Append(Quote(baseCrop.Id)).Append('\n');
        if (variant.Group != baseCrop.Group)
        {
            text.Append("group = ").Append(Quote(GroupName(variant.Group))).Append('\n');
        }

        foreach (string key in CropConversions.ParameterKeys)
        {
            CropParameter p = variant.GetParameter(key);
            if (p == baseCrop.GetParameter(key))
            {
                continue;
            }

            text.Append('\n').Append('[').Append(key).Append("]\n");
            text.Append("value = ").Append(Number(p.Value)).Append('\n');
            text.Append("unit = ").Append(Quote(p.Unit)).Append('\n');
            text.Append("range = [").Append(Number(p.Minimum)).Append(", ").Append(Number(p.Maximum)).Append("]\n");
            text.Append("source = ").Append(Quote(p.Provenance)).Append('\n');
        }

        return text.ToString();
    }

    /// <summary>Writes the variant file into a folder, named <see cref="FileName"/>.</summary>
    /// <param name="folder">The folder (a crop folder given to the library).</param>
    /// <param name="variant">The variant.</param>
    /// <param name="baseCrop">Its base.</param>
    /// <param name="comment">Header comment lines.</param>
    /// <returns>The path written.</returns>
    public static string WriteToFolder(string folder, Crop variant, Crop baseCrop, IEnumerable<string>? comment = null)
    {
        string text = Write(variant, baseCrop, comment);
        string path = Path.Combine(folder, FileName(variant));
        File.WriteAllText(path, text, new UTF8Encoding(false));
        return path;
    }

    private static string GroupName(CropGroup group)
    {
        string name = group.ToString();
        return char.ToLowerInvariant(name[0]) + name[1..];
    }

    private static string Number(double x)
    {
        string s = x.ToString("R", CultureInfo.InvariantCulture);
        return s.Contains('E', StringComparison.Ordinal) ? s.Replace("E", "e", StringComparison.Ordinal) : s;
    }

    // A TOML basic string: backslash, quote and control characters escaped.
    private static string Quote(string s)
    {
        var b = new StringBuilder("\"");
        foreach (char c in s)
        {
            switch (c)
            {
                case '"':
                    b.Append("\\\"");
                    break;
                case '\\':
                    b.Append("\\\\");
                    break;
                case '\n':
                    b.Append("\\n");
                    break;
                case '\t':
                    b.Append("\\t");
                    break;
                case '\r':
                    b.Append("\\r");
                    break;
                default:
                    if (char.IsControl(c))
                    {
                        b.Append(CultureInfo.InvariantCulture, $"\\u{(int)c:X4}");
                    }
                    else
                    {
                        b.Append(c);
                    }

                    break;
            }
        }

        return b.Append('"').ToString();
    }
}

using System.Security.Cryptography;
using System.Text;
using System.Text.Json;
using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Files.Crops;
using CanopyAdvisor.Server.Contracts;
using CanopyAdvisor.Storage;

namespace CanopyAdvisor.Server.Forecasting;

/// <summary>The built-in crop library, loaded once, with its views and a version: the SHA-256 of every crop's
/// parameters, so a forecast made with other crop values never matches a stored one.</summary>
internal sealed class CropCatalogue
{
    /// <summary>Loads the built-in library.</summary>
    public CropCatalogue()
    {
        Library = CropLibrary.LoadBuiltIn();
        Views = Library.All.Select(ToView).ToList();
        Version = Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(JsonSerializer.Serialize(Views))));
    }

    /// <summary>The library.</summary>
    public CropLibrary Library { get; }

    /// <summary>Every crop with its parameters, by id.</summary>
    public IReadOnlyList<CropView> Views { get; }

    /// <summary>Lower-case hex SHA-256 of <see cref="Views"/> as JSON.</summary>
    public string Version { get; }

    /// <summary>The library of an organisation: the built-in crops plus its stored variants, and its version (the built-in
    /// <see cref="Version"/> when it has none, else the SHA-256 of that version and every variant's id and text), so a
    /// forecast made before a variant changed never matches one made after. The last few libraries are kept.</summary>
    /// <exception cref="Core.Validation.InvalidInputException">A stored variant no longer reads against the library.</exception>
    public (CropLibrary Library, string Version) ForOrganisation(IReadOnlyList<CropVariantRecord> variants)
    {
        ArgumentNullException.ThrowIfNull(variants);
        if (variants.Count == 0)
        {
            return (Library, Version);
        }

        var text = new StringBuilder(Version).Append('\n');
        foreach (CropVariantRecord v in variants.OrderBy(v => v.CropId, StringComparer.Ordinal))
        {
            text.Append(v.CropId).Append(' ').Append(v.Toml.Length).Append('\n').Append(v.Toml).Append('\n');
        }

        string version = Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(text.ToString())));
        lock (_gate)
        {
            if (_libraries.TryGetValue(version, out CropLibrary? kept))
            {
                return (kept, version);
            }
        }

        CropLibrary library = CropLibrary.LoadBuiltInWith(variants.Select(v => KeyValuePair.Create(v.CropId, v.Toml)));
        lock (_gate)
        {
            if (_libraries.Count >= 64)
            {
                _libraries.Clear();
            }

            _libraries[version] = library;
        }

        return (library, version);
    }

    private readonly Lock _gate = new();

    private readonly Dictionary<string, CropLibrary> _libraries = new(StringComparer.Ordinal);

    /// <summary>The view of one crop.</summary>
    public static CropView ToView(Crop crop)
    {
        ArgumentNullException.ThrowIfNull(crop);
        var parameters = new SortedDictionary<string, CropParameterView>(StringComparer.Ordinal);
        foreach (string key in CropConversions.ParameterKeys)
        {
            CropParameter p = crop.GetParameter(key);
            parameters[key] = new CropParameterView(p.Value, p.Unit, p.Minimum, p.Maximum, p.Provenance);
        }

        return new CropView(crop.Id, crop.Name, GroupName(crop.Group), crop.BaseId, parameters);
    }

    /// <summary>A crop group's camelCase name.</summary>
    public static string GroupName(CropGroup group) => JsonNamingPolicy.CamelCase.ConvertName(group.ToString());
}

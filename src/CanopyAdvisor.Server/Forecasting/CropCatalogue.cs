using System.Security.Cryptography;
using System.Text;
using System.Text.Json;
using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Files.Crops;
using CanopyAdvisor.Server.Contracts;

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

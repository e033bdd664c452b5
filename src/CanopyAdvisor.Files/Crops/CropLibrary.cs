using System.Collections.ObjectModel;
using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Core.Validation;

namespace CanopyAdvisor.Files.Crops;

/// <summary>The crop library: the built-in crop files (crops/*.toml, embedded in this assembly) plus the grower's
/// own folders, with variants resolved against their bases and every crop validated.</summary>
/// <remarks>
/// File format and rules: crops/README.md. A user file with a new id adds a crop (or, with <c>base = "…"</c>, a
/// variant); a user file with the id of a built-in crop replaces it, and <see cref="Notes"/> says so. Loading is
/// all or nothing: every problem in every file is collected (file, line, field) and thrown together as one
/// <see cref="InvalidInputException"/>. Immutable once loaded; safe to share between threads.
/// </remarks>
public sealed class CropLibrary
{
    private const string ResourcePrefix = "Crops.";
    private const string BuiltInFolder = "crops/";

    private readonly Dictionary<string, Crop> _byId;

    private CropLibrary(IReadOnlyList<Crop> crops, IReadOnlyList<string> notes)
    {
        All = crops;
        Notes = notes;
        _byId = crops.ToDictionary(c => c.Id, StringComparer.Ordinal);
    }

    /// <summary>Every crop and variant, sorted by id.</summary>
    public IReadOnlyList<Crop> All { get; }

    /// <summary>What the loader did that a user should know: user crops added, built-in crops replaced.</summary>
    public IReadOnlyList<string> Notes { get; }

    /// <summary>The ids of the built-in crop files (embedded from crops/*.toml), sorted.</summary>
    public static IReadOnlyList<string> BuiltInIds { get; } = ReadBuiltInFiles().Select(f => f.Id).ToArray();

    /// <summary>Loads the built-in crops plus the <c>*.toml</c> files in each user folder (not recursive).</summary>
    /// <param name="userFolders">Folders of the grower's own crop files, in order; may be empty.</param>
    /// <returns>The library.</returns>
    /// <exception cref="InvalidInputException">Any problem in any file, or a missing folder: every problem at once.</exception>
    public static CropLibrary Load(IEnumerable<string> userFolders)
    {
        ArgumentNullException.ThrowIfNull(userFolders);
        var errors = new List<ValidationError>();
        var userFiles = new List<CropSourceFile>();
        foreach (string folder in userFolders)
        {
            if (!Directory.Exists(folder))
            {
                errors.Add(new ValidationError(folder, "crop folder not found"));
                continue;
            }

            foreach (string path in Directory.EnumerateFiles(folder, "*.toml").Order(StringComparer.Ordinal))
            {
                try
                {
                    userFiles.Add(new CropSourceFile(path, File.ReadAllText(path)));
                }
                catch (IOException ex)
                {
                    errors.Add(new ValidationError(path, $"cannot be read: {ex.Message}"));
                }
                catch (UnauthorizedAccessException ex)
                {
                    errors.Add(new ValidationError(path, $"cannot be read: {ex.Message}"));
                }
            }
        }

        return Build(ReadBuiltInFiles(), userFiles, errors);
    }

    /// <summary>Loads the built-in crops plus crop files given as text (e.g. an organisation's stored variants), checked
    /// as user files are.</summary>
    /// <param name="files">Each file's crop id (its file name without <c>.toml</c>) and TOML text, in order.</param>
    /// <returns>The library.</returns>
    /// <exception cref="InvalidInputException">Any problem in any file: every problem at once.</exception>
    public static CropLibrary LoadBuiltInWith(IEnumerable<KeyValuePair<string, string>> files)
    {
        ArgumentNullException.ThrowIfNull(files);
        return Build(ReadBuiltInFiles(), [.. files.Select(f => new CropSourceFile(f.Key + ".toml", f.Value))]);
    }

    /// <summary>Loads the built-in crops only.</summary>
    /// <returns>The library.</returns>
    public static CropLibrary LoadBuiltIn() => Load([]);

    /// <summary>The crop or variant with this id.</summary>
    /// <param name="id">The crop id (its file name without <c>.toml</c>).</param>
    /// <returns>The crop.</returns>
    /// <exception cref="KeyNotFoundException">No crop has this id (the message suggests a close one).</exception>
    public Crop Get(string id) =>
        TryGet(id, out Crop? crop) ? crop : throw new KeyNotFoundException($"no crop '{id}' in the library{Suggestions.Hint(id, _byId.Keys)}");

    /// <summary>Looks up a crop or variant by id.</summary>
    /// <param name="id">The crop id.</param>
    /// <param name="crop">The crop, when found.</param>
    /// <returns>True when found.</returns>
    public bool TryGet(string id, [System.Diagnostics.CodeAnalysis.NotNullWhen(true)] out Crop? crop) =>
        _byId.TryGetValue(id, out crop);

    /// <summary>Builds the library from file texts (built-in files first, then user files in order).</summary>
    internal static CropLibrary Build(IReadOnlyList<CropSourceFile> builtIn, IReadOnlyList<CropSourceFile> user, List<ValidationError>? errors = null)
    {
        errors ??= [];
        var notes = new List<string>();
        var files = new Dictionary<string, CropFileContent>(StringComparer.Ordinal);
        var userIds = new Dictionary<string, string>(StringComparer.Ordinal);
        foreach (CropSourceFile file in builtIn)
        {
            files[file.Id] = CropFileParser.Parse(file, errors);
        }

        foreach (CropSourceFile file in user)
        {
            CropFileContent content = CropFileParser.Parse(file, errors);
            if (userIds.TryGetValue(file.Id, out string? other))
            {
                errors.Add(new ValidationError(file.Path, $"crop id '{file.Id}' is already defined by {other}"));
                continue;
            }

            userIds[file.Id] = file.Path;
            if (files.TryGetValue(file.Id, out CropFileContent? replaced))
            {
                notes.Add($"crop '{file.Id}': {file.Path} replaces the built-in {replaced.Source.Path}");
            }
            else
            {
                notes.Add(content.BaseId is null
                    ? $"crop '{file.Id}': added from {file.Path}"
                    : $"crop '{file.Id}': variant of '{content.BaseId}' added from {file.Path}");
            }

            files[file.Id] = content;
        }

        var resolved = new Dictionary<string, Crop?>(StringComparer.Ordinal);
        var origin = new Dictionary<string, Dictionary<string, ParsedParameter>>(StringComparer.Ordinal);
        foreach (string id in files.Keys.Order(StringComparer.Ordinal))
        {
            Resolve(id, files, resolved, origin, errors, []);
        }

        if (errors.Count > 0)
        {
            throw new InvalidInputException(Deduplicate(errors));
        }

        Crop[] crops = resolved.Values.OfType<Crop>().OrderBy(c => c.Id, StringComparer.Ordinal).ToArray();
        return new CropLibrary(Array.AsReadOnly(crops), new ReadOnlyCollection<string>(notes));
    }

    // Resolves one crop (and, first, its base chain). Null means it could not be built; its problems are reported.
    private static Crop? Resolve(
        string id,
        Dictionary<string, CropFileContent> files,
        Dictionary<string, Crop?> resolved,
        Dictionary<string, Dictionary<string, ParsedParameter>> origin,
        List<ValidationError> errors,
        List<string> chain)
    {
        if (resolved.TryGetValue(id, out Crop? done))
        {
            return done;
        }

        CropFileContent file = files[id];
        string where = $"{file.Source.Path}:{file.HeaderLine("base")}";
        if (chain.Contains(id))
        {
            int start = chain.IndexOf(id);
            string cycle = string.Join(" → ", chain.Skip(start).Append(id));
            errors.Add(new ValidationError(where, $"base: variant cycle {cycle}"));
            return null;
        }

        Crop? crop = null;
        if (file.BaseId is null)
        {
            if (!file.HasErrors && file.Name is not null && file.Group is { } group)
            {
                crop = Assemble(id, file.Name, group, null, file.Parameters);
                origin[id] = new Dictionary<string, ParsedParameter>(file.Parameters, StringComparer.Ordinal);
            }
        }
        else if (!files.ContainsKey(file.BaseId))
        {
            errors.Add(new ValidationError(where, $"base: unknown crop '{file.BaseId}'{Suggestions.Hint(file.BaseId, files.Keys)}"));
        }
        else
        {
            chain.Add(id);
            Crop? baseCrop = Resolve(file.BaseId, files, resolved, origin, errors, chain);
            chain.RemoveAt(chain.Count - 1);
            if (resolved.TryGetValue(id, out Crop? reached))
            {
                // Reached again through a cycle that has already been reported.
                return reached;
            }

            if (baseCrop is not null && !file.HasErrors && file.Name is not null)
            {
                Crop merged = baseCrop with { Id = id, Name = file.Name, Group = file.Group ?? baseCrop.Group, BaseId = file.BaseId };
                foreach ((string key, ParsedParameter p) in file.Parameters)
                {
                    merged = merged.WithParameter(key, p.Parameter);
                }

                crop = merged;
                var own = new Dictionary<string, ParsedParameter>(origin[file.BaseId], StringComparer.Ordinal);
                foreach ((string key, ParsedParameter p) in file.Parameters)
                {
                    own[key] = p;
                }

                origin[id] = own;
            }
        }

        if (crop is not null)
        {
            IReadOnlyList<ValidationError> crossField = CropValidator.ValidateCrossField(crop);
            foreach (ValidationError e in crossField)
            {
                string key = e.Path.Split('.')[0];
                string field = e.Path.Contains('.', StringComparison.Ordinal) ? e.Path[(key.Length + 1)..] : "value";
                if (file.Parameters.TryGetValue(key, out ParsedParameter? p))
                {
                    errors.Add(new ValidationError($"{file.Source.Path}:{p.LineOf(field)}", $"{e.Path}: {e.Message}"));
                }
                else
                {
                    // Inherited from the base: the variant's combination is what is wrong, so point at its base line.
                    errors.Add(new ValidationError(where, $"{e.Path} (inherited from '{file.BaseId}'): {e.Message}"));
                }
            }

            if (crossField.Count > 0)
            {
                crop = null;
            }
        }

        resolved[id] = crop;
        return crop;
    }

    private static Crop Assemble(string id, string name, CropGroup group, string? baseId, IReadOnlyDictionary<string, ParsedParameter> p)
    {
        CropParameter P(string key) => p[key].Parameter;
        return new Crop(
            id,
            name,
            group,
            baseId,
            P("balanceNumber"),
            P("proprioceptiveSensitivity"),
            P("photoCoefficient"),
            P("photoExponent"),
            P("growthZoneLengthMm"),
            P("referenceElongationMmPerDay"),
            P("baseTemperatureC"),
            P("optimumTemperatureC"),
            P("maximumTemperatureC"),
            P("difSensitivityPerKelvin"),
            P("shadeAvoidanceSensitivity"),
            P("dliMinimum"),
            P("dliTarget"),
            P("lowLightStretchPerMole"),
            P("nutationPeriodHours"),
            P("nutationAmplitudeDeg"),
            P("nutationSense"),
            P("gravitropicDelayHours"),
            P("leafAreaDensityM2PerM3"),
            P("leanGradeLimitDeg"),
            P("heightGradeLimitMm"));
    }

    private static List<ValidationError> Deduplicate(List<ValidationError> errors)
    {
        var seen = new HashSet<ValidationError>();
        return errors.Where(seen.Add).ToList();
    }

    /// <summary>The embedded crop files, sorted by id, with their repository path (<c>crops/&lt;id&gt;.toml</c>).</summary>
    internal static IReadOnlyList<CropSourceFile> ReadBuiltInFiles()
    {
        var assembly = typeof(CropLibrary).Assembly;
        var files = new List<CropSourceFile>();
        foreach (string resource in assembly.GetManifestResourceNames().Where(n => n.StartsWith(ResourcePrefix, StringComparison.Ordinal) && n.EndsWith(".toml", StringComparison.Ordinal)).Order(StringComparer.Ordinal))
        {
            using Stream stream = assembly.GetManifestResourceStream(resource)!;
            using var reader = new StreamReader(stream);
            files.Add(new CropSourceFile(BuiltInFolder + resource[ResourcePrefix.Length..], reader.ReadToEnd()));
        }

        return files;
    }
}

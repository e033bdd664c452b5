using NodaTime;

namespace CanopyAdvisor.Storage;

/// <summary>An organisation's crop variant (a crop file with <c>base = "…"</c>), as stored; the service validates it.</summary>
/// <param name="OrganisationId">The owning organisation.</param>
/// <param name="CropId">The variant's crop id (unique per organisation).</param>
/// <param name="BaseId">The library crop it overrides.</param>
/// <param name="Name">Display name.</param>
/// <param name="Toml">The crop file text (crops/README.md "Variants").</param>
/// <param name="SiteId">The site it was calibrated for, or null.</param>
/// <param name="CreatedAt">When it was saved.</param>
/// <param name="CreatedBy">The id of the user who saved it.</param>
public sealed record CropVariantRecord(
    string OrganisationId,
    string CropId,
    string BaseId,
    string Name,
    string Toml,
    string? SiteId,
    Instant CreatedAt,
    string CreatedBy);

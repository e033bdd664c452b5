using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Files.Crops;
using CanopyAdvisor.Storage;

namespace CanopyAdvisor.Server.Forecasting;

/// <summary>A stored site read for a computation: the model with its rotations done applied, and its organisation's
/// crop library (built-in crops plus the organisation's variants) with that library's version.</summary>
/// <param name="Model">The site with the stored rotations done in its lots.</param>
/// <param name="Done">The stored rotations done.</param>
/// <param name="Crops">The organisation's crop library.</param>
/// <param name="CropsVersion">Its version (<see cref="CropCatalogue.ForOrganisation"/>).</param>
internal sealed record LoadedSite(Site Model, IReadOnlyList<RotationDoneRecord> Done, CropLibrary Crops, string CropsVersion);

namespace CanopyAdvisor.Core.Sites;

/// <summary>A growing surface (a bench, a table, a rack tier) and the canopy on it.</summary>
/// <remarks>
/// Sample points form a grid of <see cref="SamplesAlongLength"/> × <see cref="SamplesAcrossWidth"/> cell centres at
/// the sensing height: <see cref="SurfaceHeightM"/> + <see cref="Canopy"/>.HeightM − <see cref="Canopy"/>.SensingDepthM.
/// </remarks>
/// <param name="Id">Identifier, unique within the site.</param>
/// <param name="Footprint">The bench top rectangle.</param>
/// <param name="SurfaceHeightM">Height of the bench top (where pots stand) above ground, metres.</param>
/// <param name="Canopy">The crop canopy standing on the bench.</param>
/// <param name="SamplesAlongLength">Grid points along the length (≥ 1).</param>
/// <param name="SamplesAcrossWidth">Grid points across the width (≥ 1).</param>
public sealed record Bench(
    string Id,
    Footprint Footprint,
    double SurfaceHeightM,
    Canopy Canopy,
    int SamplesAlongLength,
    int SamplesAcrossWidth);

using System.Collections.Immutable;
using CanopyAdvisor.Core.Geometry;
using NodaTime;

namespace CanopyAdvisor.Core.Light;

/// <summary>The light on one bench over one local day: means over its sample points and over the day.</summary>
/// <remarks>
/// The day runs from the start of the local date to the start of the next in the site's time zone, so it lasts 23 or
/// 25 hours on a daylight-saving change (<see cref="DayLength"/>). Steps whose outside light is missing (NaN, a gap in
/// a measured log) add nothing: <see cref="Dli"/> then counts only the usable steps, <see cref="MissingSteps"/> says
/// how many were skipped, and the means are over the usable time. No light is invented for a gap.
/// Tilt is the angle of a mean vector from the upward vertical, azimuth the compass direction of its horizontal part
/// (where the light comes from).
/// </remarks>
/// <param name="BenchIndex">Index of the bench in the site.</param>
/// <param name="BenchId">Id of the bench.</param>
/// <param name="Date">The local date.</param>
/// <param name="DayLength">Length of the local day (24 h, or 23 h / 25 h on a daylight-saving change).</param>
/// <param name="Steps">Number of time steps in the day.</param>
/// <param name="MissingSteps">Steps skipped because the outside light was missing.</param>
/// <param name="MeanHorizontalPpfd">Mean horizontal PPFD over the bench and the usable time, µmol m⁻² s⁻¹.</param>
/// <param name="Dli">Mean daily light integral of the bench's points, mol m⁻² d⁻¹ (MODEL.md §0: PPFD × 3600 × hours / 10⁶).</param>
/// <param name="DliUniformity">Lowest point DLI over the mean point DLI (min/avg), or null when the bench got no light.</param>
/// <param name="MeanLightVector">Light vector averaged over the bench's points and the usable time, µmol m⁻² s⁻¹.</param>
/// <param name="LightVectorTilt">Tilt of the mean light vector from the vertical.</param>
/// <param name="LightVectorAzimuth">Compass azimuth of the mean light vector's horizontal part.</param>
/// <param name="MeanBlueVector">Blue light vector averaged over the bench's points and the usable time, µmol m⁻² s⁻¹.</param>
/// <param name="BlueVectorTilt">Tilt of the mean blue vector from the vertical.</param>
/// <param name="BlueVectorAzimuth">Compass azimuth of the mean blue vector's horizontal part.</param>
/// <param name="RedToFarRed">Photon-weighted R:FR over points and time (Σ 660 / Σ 730), or null without far-red light.</param>
/// <param name="Red660Integral">Photons in the 655–665 nm window over the usable time, mean over points, µmol m⁻² (the numerator of R:FR).</param>
/// <param name="FarRed730Integral">Photons in the 725–735 nm window over the usable time, mean over points, µmol m⁻² (the denominator of R:FR).</param>
/// <param name="Points">Per-point values, in the order of the bench's sample points.</param>
public sealed record BenchDayLight(
    int BenchIndex,
    string BenchId,
    LocalDate Date,
    Duration DayLength,
    int Steps,
    int MissingSteps,
    double MeanHorizontalPpfd,
    double Dli,
    double? DliUniformity,
    Vector3 MeanLightVector,
    Angle LightVectorTilt,
    Angle LightVectorAzimuth,
    Vector3 MeanBlueVector,
    Angle BlueVectorTilt,
    Angle BlueVectorAzimuth,
    double? RedToFarRed,
    double Red660Integral,
    double FarRed730Integral,
    ImmutableArray<PointDayLight> Points);

using NodaTime;

namespace CanopyAdvisor.Core.Sky;

/// <summary>One reading of a site's outside light log.</summary>
/// <remarks>
/// Either value may be missing. When both are given, the PAR reading is used (it is the photon quantity the model
/// needs; converting GHI needs the assumed PAR fraction). A record with neither is a missing reading: it carries no
/// light and does not bridge a gap.
/// </remarks>
/// <param name="Time">When the reading was taken (instantaneous or interval-centred value).</param>
/// <param name="GlobalHorizontalWm2">Global horizontal shortwave irradiance, W m⁻², ≥ 0; null if not logged.</param>
/// <param name="GlobalHorizontalPpfd">Outside PAR on the horizontal, µmol m⁻² s⁻¹, ≥ 0; null if not logged.</param>
public sealed record WeatherRecord(Instant Time, double? GlobalHorizontalWm2, double? GlobalHorizontalPpfd)
{
    /// <summary>Whether the record carries a light value.</summary>
    public bool HasValue => GlobalHorizontalWm2.HasValue || GlobalHorizontalPpfd.HasValue;
}

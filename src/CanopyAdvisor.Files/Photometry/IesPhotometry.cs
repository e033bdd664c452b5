using CanopyAdvisor.Core.Lamps;

namespace CanopyAdvisor.Files.Photometry;

/// <summary>An IES LM-63 photometric file as read: its header fields, the raw grid, and the lamp distribution it becomes.</summary>
/// <remarks>
/// Field meanings follow ANSI/IES LM-63-19 (and LM-63-2002/-1995/-1991/-1986, which share the numeric layout).
/// Absolute intensity toward a direction = file value × <see cref="CandelaMultiplier"/> × <see cref="BallastFactor"/>
/// (× the photon-per-lumen factor for lumen files); <see cref="TotalPhotonFluxMicromolesPerSecond"/> is its integral over
/// the sphere and <see cref="Distribution"/> its shape normalised to unit flux.
/// </remarks>
public sealed record IesPhotometry
{
    /// <summary>The file name used in error paths.</summary>
    public required string FileName { get; init; }

    /// <summary>Which edition the first line declares: "LM-63-2019", "LM-63-2002", "LM-63-1995", "LM-63-1991", or "LM-63-1986" (no format line).</summary>
    public required string Edition { get; init; }

    /// <summary>Keyword lines in file order (<c>[MORE]</c> lines joined to the keyword before them).</summary>
    public required IReadOnlyList<IesKeyword> Keywords { get; init; }

    /// <summary>Header lines that are not keywords (LM-63-1986 free-form labels, stray text), in file order.</summary>
    public required IReadOnlyList<string> OtherHeaderLines { get; init; }

    /// <summary>The TILT=INCLUDE table, or null for TILT=NONE.</summary>
    public required IesTilt? Tilt { get; init; }

    /// <summary>Number of lamps.</summary>
    public required int LampCount { get; init; }

    /// <summary>Rated lumens per lamp, or −1 for absolute photometry.</summary>
    public required double LumensPerLamp { get; init; }

    /// <summary>Multiplier applied to every value in the file.</summary>
    public required double CandelaMultiplier { get; init; }

    /// <summary>Goniometer type of the file.</summary>
    public required IesPhotometricType PhotometricType { get; init; }

    /// <summary>Units of the luminous opening's dimensions in the file: 1 = feet, 2 = metres.</summary>
    public required int UnitsType { get; init; }

    /// <summary>Luminous opening width, metres (negative values mean round shapes in LM-63-2002 and later; sign kept).</summary>
    public required double LuminousWidthM { get; init; }

    /// <summary>Luminous opening length, metres (sign kept, see <see cref="LuminousWidthM"/>).</summary>
    public required double LuminousLengthM { get; init; }

    /// <summary>Luminous opening height, metres (sign kept, see <see cref="LuminousWidthM"/>).</summary>
    public required double LuminousHeightM { get; init; }

    /// <summary>Ballast factor (applied to the intensities).</summary>
    public required double BallastFactor { get; init; }

    /// <summary>
    /// The field after the ballast factor: "ballast-lamp photometric factor" in LM-63-1995, "future use" in LM-63-2002,
    /// "file generation type" in LM-63-19. Kept as read, not applied.
    /// </summary>
    public required double FutureUse { get; init; }

    /// <summary>Electrical input power, W.</summary>
    public required double InputWatts { get; init; }

    /// <summary>Angles and values exactly as in the file.</summary>
    public required IesGrid Grid { get; init; }

    /// <summary>The unit the caller said the values are in.</summary>
    public required IesValueUnits Units { get; init; }

    /// <summary>The distribution in the lamp frame (symmetric files expanded to full 0–360°; types A and B resampled).</summary>
    public required TabulatedDistribution Distribution { get; init; }

    /// <summary>Total photon flux, µmol s⁻¹: the integral over the sphere of the absolute intensity.</summary>
    public required double TotalPhotonFluxMicromolesPerSecond { get; init; }
}

namespace CanopyAdvisor.Files.Photometry;

/// <summary>How to interpret the intensity values of an IES LM-63 file.</summary>
/// <param name="Units">Photon or lumen values; <see cref="IesValueUnits.Unspecified"/> is rejected.</param>
/// <param name="MicromolesPerLumen">
/// For <see cref="IesValueUnits.Lumen"/> only and then required: PPF per lumen of the lamp's spectrum, µmol s⁻¹ lm⁻¹
/// (&gt; 0; it depends strongly on the spectrum, so take it from the lamp's own spectral data). Must be null for photon units.
/// </param>
public sealed record IesReadOptions(IesValueUnits Units, double? MicromolesPerLumen = null)
{
    /// <summary>Values are photon intensities, µmol s⁻¹ sr⁻¹.</summary>
    public static IesReadOptions Photon { get; } = new(IesValueUnits.Photon);

    /// <summary>Values are candelas, converted with the given photon-per-lumen factor (µmol s⁻¹ lm⁻¹).</summary>
    public static IesReadOptions Lumen(double micromolesPerLumen) => new(IesValueUnits.Lumen, micromolesPerLumen);
}

namespace CanopyAdvisor.Files.Photometry;

/// <summary>What the intensity values of an IES LM-63 file mean. The reader never guesses: the caller says.</summary>
/// <remarks>
/// LM-63 (ANSI/IES LM-63-19 and earlier editions) defines the values as candelas. Horticultural photometry reports are
/// often written in the same format with photon intensities (µmol s⁻¹ sr⁻¹) in place of candelas; nothing in the file
/// says which, so the choice is the user's.
/// </remarks>
public enum IesValueUnits
{
    /// <summary>Not chosen. Always rejected: the reader will not guess the unit from the numbers.</summary>
    Unspecified = 0,

    /// <summary>Values (after the candela multiplier) are photon intensities, µmol s⁻¹ sr⁻¹.</summary>
    Photon = 1,

    /// <summary>Values are candelas; a photon-per-lumen factor for the lamp's spectrum converts them (µmol s⁻¹ sr⁻¹ = cd × µmol/lm).</summary>
    Lumen = 2,
}

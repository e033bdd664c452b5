namespace CanopyAdvisor.Files.Sites;

/// <summary>What the intensity values of an IES LM-63 file measure; the user says so, it is never guessed.</summary>
public enum IesIntensityUnit
{
    /// <summary>Photon intensity, µmol s⁻¹ sr⁻¹ (site file value <c>"photon"</c>).</summary>
    Photon,

    /// <summary>Luminous intensity, candela (site file value <c>"lumen"</c>); converted with the lamp type's µmol per lumen.</summary>
    Lumen,
}

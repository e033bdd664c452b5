namespace CanopyAdvisor.Core.Sites;

/// <summary>A glazing on one facet of a structure, or an opaque surface.</summary>
/// <param name="Name">What the user calls it ("float glass 4 mm", "insulated panel").</param>
/// <param name="Opaque">True for a surface that lets no light through; the optical fields are then ignored.</param>
/// <param name="RefractiveIndex">Refractive index of the glazing material (glass ≈ 1.526, Duffie &amp; Beckman).</param>
/// <param name="ExtinctionPerM">Extinction coefficient K, per metre (low-iron glass ≈ 4, Duffie &amp; Beckman).</param>
/// <param name="ThicknessM">Thickness L of one layer, metres.</param>
/// <param name="Layers">Number of identical layers (single glazing 1, double 2).</param>
public sealed record Cover(string Name, bool Opaque, double RefractiveIndex, double ExtinctionPerM, double ThicknessM, int Layers)
{
    /// <summary>An opaque surface.</summary>
    public static Cover OpaqueSurface(string name) => new(name, true, 1, 0, 0, 0);
}

namespace CanopyAdvisor.Core.Lamps;

/// <summary>The spectral make-up of a source as photon fractions (MODEL.md §0 bands).</summary>
/// <remarks>
/// <see cref="Blue"/> (400–500 nm), <see cref="Green"/> (500–600 nm) and <see cref="Red"/> (600–700 nm) are
/// fractions of PPF and add up to 1. <see cref="FarRed"/> (700–750 nm) lies outside PAR and is given as a ratio to
/// PPF (it may be any value ≥ 0).
/// </remarks>
/// <param name="Blue">Blue photons per PAR photon.</param>
/// <param name="Green">Green photons per PAR photon.</param>
/// <param name="Red">Red photons per PAR photon.</param>
/// <param name="FarRed">Far-red (700–750 nm) photons per PAR photon.</param>
public sealed record BandFractions(double Blue, double Green, double Red, double FarRed);

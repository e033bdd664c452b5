using CanopyAdvisor.Core.Geometry;

namespace CanopyAdvisor.Core.Plants;

/// <summary>What a grower sees of a stem at one instant.</summary>
/// <param name="HeightM">Vertical height of the apex above the pot, m.</param>
/// <param name="LengthM">Length of the stem along its axis, m.</param>
/// <param name="LeanTilt">Lean: tilt of the base-to-apex line from the vertical (GLOSSARY "lean").</param>
/// <param name="LeanAzimuth">Compass direction the apex points to (the base-to-apex line's horizontal part).</param>
/// <param name="ApexAngle">Tilt of the apex tangent from the vertical.</param>
/// <param name="CrookM">Largest distance of the stem from its base-to-apex line, m (GLOSSARY "crook").</param>
public sealed record StemShape(double HeightM, double LengthM, Angle LeanTilt, Angle LeanAzimuth, Angle ApexAngle, double CrookM);

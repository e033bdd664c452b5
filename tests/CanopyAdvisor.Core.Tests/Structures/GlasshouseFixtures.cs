using System.Collections.Immutable;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Structures;

namespace CanopyAdvisor.Core.Tests.Structures;

/// <summary>Invented test houses (not real sites).</summary>
internal static class GlasshouseFixtures
{
    // Float glass 4 mm: n = 1.526, K = 4 m⁻¹ (Duffie & Beckman ch. 5 typical values).
    public static readonly Cover Glass = new("float glass 4 mm", false, 1.526, 4, 0.004, 1);

    public static readonly Cover TwinWall = new("twin-wall sheet", false, 1.586, 10, 0.001, 2);

    public static readonly Cover Opaque = Cover.OpaqueSurface("insulated panel");

    public static Glasshouse House(
        int bays = 1,
        double bayWidthM = 8,
        double lengthM = 20,
        double gutterM = 4,
        double slopeDeg = 30,
        double azimuthDeg = 0,
        double cornerX = 0,
        double cornerY = 0,
        Cover? roof = null,
        Cover? left = null,
        Cover? right = null,
        Cover? front = null,
        Cover? back = null,
        double shading = 0.1) =>
        new(
            new Footprint(cornerX, cornerY, Angle.FromDegrees(azimuthDeg), lengthM, bays * bayWidthM),
            bays,
            bayWidthM,
            gutterM,
            Angle.FromDegrees(slopeDeg),
            roof ?? Glass,
            left ?? Glass,
            right ?? Glass,
            front ?? Glass,
            back ?? Glass,
            shading);

    public static GlasshouseEnclosure Enclose(Glasshouse house, params Obstruction[] obstructions) =>
        (GlasshouseEnclosure)EnclosureBuilder.Build(house, [.. obstructions]);

    public static Obstruction Box(string id, double x, double y, double azimuthDeg, double length, double width, double baseM, double topM) =>
        new(id, new Footprint(x, y, Angle.FromDegrees(azimuthDeg), length, width), baseM, topM);

    public static Vector3 Toward(double azimuthDeg, double elevationDeg) =>
        Direction.FromAzimuthZenith(Angle.FromDegrees(azimuthDeg), Angle.FromDegrees(90 - elevationDeg));

    public static double Tau(Cover cover, double incidenceDeg) =>
        Core.Glazing.CoverOptics.Transmittance(cover, Angle.FromDegrees(incidenceDeg));

    public static ImmutableArray<Obstruction> None => [];
}

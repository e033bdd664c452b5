using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;

namespace CanopyAdvisor.Core.Light;

/// <summary>
/// A lamp's own frame in the site frame: optical axis, photometric reference (C = 0°) and the third axis, used to
/// turn a world direction into the (polar, around) angles of <see cref="BeamDistribution"/>.
/// </summary>
/// <remarks>
/// Interim: the lamps part delivers <c>CanopyAdvisor.Core.Lamps.LampFrame</c> with the same meaning; this internal
/// copy keeps the light field independent until it is merged, and can be replaced by it (one call site in
/// <see cref="LightFieldCompiler"/>). Convention (<see cref="LampAim"/>): unaimed the axis points straight down and
/// C = 0° points to compass azimuth Yaw; tilt swings the axis up toward Yaw (the C = 0° reference swings with it, so
/// at 90° tilt it points up); spin turns the lamp about its axis, moving C = 0° toward C = 90°. The angle about the
/// axis increases counter-clockwise when looking against the beam (right-handed about the axis), so for a downward
/// lamp C = 90° lies 90° clockwise (seen from above) from C = 0°, as IES type C photometry seen from below.
/// </remarks>
internal readonly struct LampOrientation
{
    /// <summary>Creates the frame of an aim.</summary>
    public LampOrientation(LampAim aim)
    {
        double sy = aim.Yaw.Sin(), cy = aim.Yaw.Cos();
        double st = aim.Tilt.Sin(), ct = aim.Tilt.Cos();

        // Horizontal unit toward Yaw (h), and its clockwise normal (k = h × ẑ, i.e. Yaw + 90°).
        var h = new Vector3(sy, cy, 0);
        var k = new Vector3(cy, -sy, 0);
        Vector3 axis = (h * st) - (Vector3.UnitZ * ct);
        Vector3 reference = (h * ct) + (Vector3.UnitZ * st);

        // axis × reference = k for every tilt; spin moves the reference toward k (C = 90°).
        double ss = aim.Spin.Sin(), cs = aim.Spin.Cos();
        Vector3 spunReference = (reference * cs) + (k * ss);
        Axis = axis;
        Reference = spunReference;
        Third = Vector3.Cross(axis, spunReference);
    }

    /// <summary>Unit vector of the optical axis (the beam direction).</summary>
    public Vector3 Axis { get; }

    /// <summary>Unit vector of the photometric reference direction C = 0°.</summary>
    public Vector3 Reference { get; }

    /// <summary>Unit vector of C = 90°: Axis × Reference.</summary>
    public Vector3 Third { get; }

    /// <summary>Intensity per unit flux (sr⁻¹) toward a world direction (unit vector) leaving the lamp.</summary>
    public double IntensityPerUnitFlux(BeamDistribution distribution, Vector3 directionFromLamp)
    {
        double cosPolar = Math.Clamp(Vector3.Dot(directionFromLamp, Axis), -1.0, 1.0);
        double around = 0;
        if (!distribution.IsAxiallySymmetric)
        {
            around = Math.Atan2(Vector3.Dot(directionFromLamp, Third), Vector3.Dot(directionFromLamp, Reference));
            if (around < 0)
            {
                around += 2 * Math.PI;
            }
        }

        return distribution.IntensityPerUnitFlux(Math.Acos(cosPolar), around);
    }
}

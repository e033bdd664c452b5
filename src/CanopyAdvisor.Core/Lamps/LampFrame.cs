using CanopyAdvisor.Core.Geometry;

namespace CanopyAdvisor.Core.Lamps;

/// <summary>A lamp's own orthonormal frame in the site frame, built from its <see cref="LampAim"/>.</summary>
/// <remarks>
/// <para>
/// <see cref="Axis"/> is the optical axis (polar angle 0). For an unaimed lamp it is straight down (−z). Tilt t swings it
/// up toward the compass direction Yaw, ĥ = (sin Yaw, cos Yaw, 0): Axis = sin t ĥ − cos t ẑ, so 90° tilt at Yaw 90°
/// points east. The C = 0° <see cref="Reference"/> of an unaimed, unspun lamp is ĥ; tilting carries it along in the same
/// vertical plane, so before spin it is cos t ĥ + sin t ẑ (straight up for a lamp tilted to horizontal).
/// </para>
/// <para>
/// <see cref="Lateral"/> (C = 90°) is Reference × Axis, so the around angle increases counter-clockwise when looking
/// along the beam from behind the lamp (from above for a downward lamp), as <see cref="BeamDistribution"/> states. Spin s turns the
/// reference about the axis toward the lateral direction: Reference = cos s R₀ + sin s L₀. A positive spin therefore
/// moves the pattern by +s in the around angle: what the unspun lamp sent toward around angle φ now goes toward φ + s.
/// </para>
/// <para>Immutable and thread safe; the conversions allocate nothing.</para>
/// </remarks>
public sealed class LampFrame
{
    /// <summary>Builds the frame of a lamp with the given aim.</summary>
    public LampFrame(LampAim aim)
    {
        ArgumentNullException.ThrowIfNull(aim);
        Aim = aim;
        var horizontal = new Vector3(aim.Yaw.Sin(), aim.Yaw.Cos(), 0);
        double st = aim.Tilt.Sin();
        double ct = aim.Tilt.Cos();
        Vector3 axis = (st * horizontal) - (ct * Vector3.UnitZ);
        Vector3 reference0 = (ct * horizontal) + (st * Vector3.UnitZ);
        Vector3 lateral0 = Vector3.Cross(reference0, axis);
        double ss = aim.Spin.Sin();
        double cs = aim.Spin.Cos();
        Axis = axis.Normalized();
        Reference = ((cs * reference0) + (ss * lateral0)).Normalized();
        Lateral = Vector3.Cross(Reference, Axis).Normalized();
    }

    /// <summary>The frame of an unaimed lamp (pointing down, C = 0° toward north).</summary>
    public static LampFrame Down { get; } = new(LampAim.Down);

    /// <summary>The aim this frame was built from.</summary>
    public LampAim Aim { get; }

    /// <summary>Unit vector along the optical axis (polar angle 0), site frame.</summary>
    public Vector3 Axis { get; }

    /// <summary>Unit vector of the C = 0° reference direction (polar 90°, around 0°), site frame.</summary>
    public Vector3 Reference { get; }

    /// <summary>Unit vector of the C = 90° direction (polar 90°, around 90°), Axis × Reference, site frame.</summary>
    public Vector3 Lateral { get; }

    /// <summary>The lamp-frame angles of a site-frame direction (need not be unit length; must not be zero).</summary>
    public LampAngles ToLampAngles(Vector3 worldDirection)
    {
        ToLampRadians(worldDirection, out double polar, out double around);
        return new LampAngles(Angle.FromRadians(polar), Angle.FromRadians(around));
    }

    /// <summary>The site-frame unit vector of a lamp-frame direction.</summary>
    public Vector3 ToWorld(LampAngles angles)
    {
        double sp = angles.Polar.Sin();
        return (angles.Polar.Cos() * Axis)
            + (sp * angles.Around.Cos() * Reference)
            + (sp * angles.Around.Sin() * Lateral);
    }

    /// <summary>
    /// Intensity per unit flux (sr⁻¹) that a distribution mounted in this frame sends toward a site-frame direction
    /// (from the lamp toward the point; need not be unit length).
    /// </summary>
    public double IntensityPerUnitFlux(BeamDistribution distribution, Vector3 worldDirection)
    {
        ArgumentNullException.ThrowIfNull(distribution);
        double z = Vector3.Dot(worldDirection, Axis);
        double x = Vector3.Dot(worldDirection, Reference);
        double y = Vector3.Dot(worldDirection, Lateral);
        double polar = Math.Atan2(Math.Sqrt((x * x) + (y * y)), z);

        // Called millions of times when a site is compiled: skip the second atan2 when the answer cannot depend on it.
        if (distribution.IsAxiallySymmetric)
        {
            return distribution.IntensityPerUnitFlux(polar, 0.0);
        }

        double around = Math.Atan2(y, x);
        return distribution.IntensityPerUnitFlux(polar, around < 0 ? around + (2.0 * Math.PI) : around);
    }

    private void ToLampRadians(Vector3 d, out double polar, out double around)
    {
        double z = Vector3.Dot(d, Axis);
        double x = Vector3.Dot(d, Reference);
        double y = Vector3.Dot(d, Lateral);

        // atan2 forms are accurate near the axis and do not need a unit vector.
        polar = Math.Atan2(Math.Sqrt((x * x) + (y * y)), z);
        around = Math.Atan2(y, x);
        if (around < 0)
        {
            around += 2.0 * Math.PI;
        }
    }
}

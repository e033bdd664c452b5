using CanopyAdvisor.Core.Geometry;

namespace CanopyAdvisor.Core.Lamps;

/// <summary>Which way a lamp's optical axis points.</summary>
/// <remarks>
/// An unaimed lamp points straight down. <see cref="Tilt"/> swings the axis up from the nadir toward the compass
/// direction <see cref="Yaw"/>; 90° tilt points the axis horizontally at <see cref="Yaw"/>. <see cref="Spin"/> turns
/// the lamp about its own axis, which matters only for distributions that are not rotationally symmetric.
/// The photometric reference direction (IES C = 0°) of an unaimed, unspun lamp points to compass azimuth
/// <see cref="Yaw"/>.
/// </remarks>
/// <param name="Yaw">Compass azimuth toward which the axis is tilted (and of the C = 0° reference).</param>
/// <param name="Tilt">Angle of the axis from straight down, in [0°, 180°].</param>
/// <param name="Spin">Rotation about the optical axis.</param>
public sealed record LampAim(Angle Yaw, Angle Tilt, Angle Spin)
{
    /// <summary>Pointing straight down.</summary>
    public static LampAim Down { get; } = new(Angle.Zero, Angle.Zero, Angle.Zero);
}

using CanopyAdvisor.Core.Geometry;

namespace CanopyAdvisor.Core.Sites;

/// <summary>Where a site is on the Earth.</summary>
/// <param name="Latitude">Geodetic latitude, north positive, in [−90°, 90°].</param>
/// <param name="Longitude">Longitude, east positive, in [−180°, 180°].</param>
/// <param name="ElevationM">Elevation above mean sea level, metres.</param>
public sealed record GeoLocation(Angle Latitude, Angle Longitude, double ElevationM);

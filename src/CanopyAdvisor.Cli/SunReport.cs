namespace CanopyAdvisor.Cli;

/// <summary>The JSON shape of <c>canopy sun --json</c>. Angles in degrees; times as ISO-8601 with offset.</summary>
internal sealed record SunReport(
    double LatitudeDeg,
    double LongitudeDeg,
    double ElevationM,
    string Time,
    double ZenithDeg,
    double AzimuthDeg,
    double ElevationAngleDeg,
    string Day,
    string? Sunrise,
    string Transit,
    string? Sunset);

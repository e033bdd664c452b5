using System.Text.Json.Serialization;

namespace CanopyAdvisor.Cli;

/// <summary>One proposed lamp in <see cref="LampsReport"/>.</summary>
internal sealed record ProposedLampReport(
    string Id,
    string Rail,
    string LampType,
    double PositionFraction,
    double AlongRailM,
    [property: JsonPropertyName("xM")] double XM,
    [property: JsonPropertyName("yM")] double YM,
    [property: JsonPropertyName("zM")] double ZM,
    double YawDeg,
    double TiltDeg,
    double Dimming,
    double Watts);

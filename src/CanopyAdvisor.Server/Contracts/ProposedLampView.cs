namespace CanopyAdvisor.Server.Contracts;

/// <summary>One proposed side lamp.</summary>
/// <param name="Id">The lamp's id in the proposed site.</param>
/// <param name="Rail">The rail it hangs on.</param>
/// <param name="LampType">Its type (the site's <c>lampTypes</c>).</param>
/// <param name="AlongRailM">Metres from the rail's start.</param>
/// <param name="XM">Site x (east), m.</param>
/// <param name="YM">Site y (north), m.</param>
/// <param name="ZM">Height, m.</param>
/// <param name="YawDeg">Compass direction it faces, degrees.</param>
/// <param name="TiltDeg">Tilt from straight down, degrees (90 = horizontal).</param>
/// <param name="Dimming">Dimming, 0 to 1.</param>
/// <param name="Watts">Electrical power at that dimming, W.</param>
public sealed record ProposedLampView(
    string Id, string Rail, string LampType, double AlongRailM, double XM, double YM, double ZM, double YawDeg, double TiltDeg, double Dimming, double Watts);

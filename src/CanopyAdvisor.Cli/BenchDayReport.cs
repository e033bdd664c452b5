namespace CanopyAdvisor.Cli;

/// <summary>One bench on one local day in <see cref="LightReport"/>.</summary>
internal sealed record BenchDayReport(
    string Date,
    double HoursInDay,
    double Ppfd,
    double Dli,
    double? Uniformity,
    double LightTiltDeg,
    double LightAzimuthDeg,
    double BlueTiltDeg,
    double BlueAzimuthDeg,
    double? Rfr,
    int MissingSteps);

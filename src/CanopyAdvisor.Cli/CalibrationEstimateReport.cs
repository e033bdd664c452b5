namespace CanopyAdvisor.Cli;

/// <summary>One fitted parameter in <see cref="CalibrationReport"/>.</summary>
internal sealed record CalibrationEstimateReport(
    string Key, string Symbol, double Value, double StandardError, double PreviousValue, double Minimum, double Maximum, string Unit, bool AtBound);

namespace CanopyAdvisor.Reports.Outlook;

/// <summary>What the rotation advice says about one bench for the outlook's week, supplied from outside the report
/// (the rotation policy and the labour calendar fill it).</summary>
/// <param name="BenchId">The bench (a bench of the site with a lot).</param>
/// <param name="Recommendation">The recommended rotation in words, e.g. "turn 180° every 3 days" or "no rotation needed".</param>
/// <param name="RotationsThisWeek">Rotation tasks planned on the bench within the week (≥ 0).</param>
/// <param name="LabourHoursThisWeek">Labour those tasks take, hours (≥ 0, finite).</param>
public sealed record BenchAdviceSummary(string BenchId, string Recommendation, int RotationsThisWeek, double LabourHoursThisWeek);

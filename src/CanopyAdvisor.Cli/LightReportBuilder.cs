using CanopyAdvisor.Core.Light;
using CanopyAdvisor.Core.Sites;
using NodaTime.Text;

namespace CanopyAdvisor.Cli;

/// <summary>Turns a light simulation's summary into the command line's report (degrees, ISO dates, rounding).</summary>
internal static class LightReportBuilder
{
    public static LightReport Build(Site site, LightPeriodSummary summary, int dayCount, string? weatherPath)
    {
        var benches = new List<BenchLightReport>(site.Benches.Length);
        for (int b = 0; b < site.Benches.Length; b++)
        {
            List<BenchDayLight> days = [.. summary.ForBench(b)];
            BenchPeriodLight period = BenchPeriodLight.From(days);
            benches.Add(new BenchLightReport(
                site.Benches[b].Id,
                R(period.MeanHorizontalPpfd, 1),
                R(period.MeanDli, 3),
                R(period.DliUniformity, 3),
                R(period.LightVectorTilt.Degrees, 2),
                R(period.LightVectorAzimuth.Degrees, 1),
                R(period.BlueVectorTilt.Degrees, 2),
                R(period.BlueVectorAzimuth.Degrees, 1),
                R(period.RedToFarRed, 3),
                [.. days.Select(Day)]));
        }

        return new LightReport(
            site.Id,
            site.Name,
            site.Zone.Id,
            LocalDatePattern.Iso.Format(summary.FirstDay),
            dayCount,
            summary.Step.TotalMinutes,
            DaylightSource.Describe(site, weatherPath),
            summary.MissingSteps,
            benches);
    }

    private static BenchDayReport Day(BenchDayLight d) => new(
        LocalDatePattern.Iso.Format(d.Date),
        d.DayLength.TotalHours,
        R(d.MeanHorizontalPpfd, 1),
        R(d.Dli, 3),
        R(d.DliUniformity, 3),
        R(d.LightVectorTilt.Degrees, 2),
        R(d.LightVectorAzimuth.Degrees, 1),
        R(d.BlueVectorTilt.Degrees, 2),
        R(d.BlueVectorAzimuth.Degrees, 1),
        R(d.RedToFarRed, 3),
        d.MissingSteps);

    private static double R(double value, int decimals) => Math.Round(value, decimals);

    private static double? R(double? value, int decimals) => value is double v ? Math.Round(v, decimals) : null;
}

using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Light;
using CanopyAdvisor.Core.Plants.Growth;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using NodaTime;

namespace CanopyAdvisor.Reports.Tests.Outlook;

/// <summary>One short real forecast of the demo glasshouse (1 day, 2 days' spin-up, no band), made once per test run.</summary>
internal static class RealRun
{
    private static readonly Lazy<(Site, SiteForecast, LightPeriodSummary)> Run = new(() =>
    {
        Site site = OutlookFixture.Site;
        var outside = new ClearSkyOutsideLight(site.Location, site.Zone, site.Weather);
        var request = new ForecastRequest(site, OutlookFixture.Crops, outside, new SetpointTemperature(site.Temperatures, site.Location, site.Zone), OutlookFixture.Now)
        {
            Horizon = Duration.FromDays(1),
            SpinUp = Duration.FromDays(2),
            IncludeUncertainty = false,
        };
        ForecastSession session = ForecastSession.Prepare(request);
        SiteForecast forecast = session.Run();
        LocalDate first = forecast.Now.InZone(site.Zone).Date;
        LocalDate last = (forecast.HorizonEnd - Duration.Epsilon).InZone(site.Zone).Date;
        return (site, forecast, LightSimulation.Run(session.Field, outside, first, last, Duration.FromMinutes(30)));
    });

    public static (Site Site, SiteForecast Forecast, LightPeriodSummary Light) Glasshouse() => Run.Value;
}

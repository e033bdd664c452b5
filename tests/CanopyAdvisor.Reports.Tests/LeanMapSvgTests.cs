using System.Xml.Linq;
using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Core.Plants.Growth;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using CanopyAdvisor.Files.Crops;
using CanopyAdvisor.Files.Sites;
using NodaTime;

namespace CanopyAdvisor.Reports.Tests;

/// <summary>The lean floor map of a forecast: valid SVG (SVG 1.1 is XML) with a cell per sample point of every bench with a lot.</summary>
public class LeanMapSvgTests
{
    [Fact]
    public void Map_has_a_cell_per_forecast_point_and_an_arrow_per_bench()
    {
        Site site = DemoSites.Load("glasshouse", StandardBeamFactory.Instance);
        CropLibrary library = CropLibrary.LoadBuiltIn();
        var crops = site.Lots.Select(l => l.CropId).Distinct().ToDictionary(id => id, library.Get);
        var request = new ForecastRequest(
            site,
            crops,
            new ClearSkyOutsideLight(site.Location, site.Zone, site.Weather),
            new SetpointTemperature(site.Temperatures, site.Location, site.Zone),
            Instant.FromUtc(2026, 12, 2, 7, 0))
        {
            Horizon = Duration.FromDays(1),
            SpinUp = Duration.FromDays(2),
            IncludeUncertainty = false,
        };
        SiteForecast forecast = BenchForecaster.Run(request);

        XNamespace svg = "http://www.w3.org/2000/svg";
        XDocument doc = XDocument.Parse(LeanMapSvg.Render(site, forecast, "lean"));
        int cells = doc.Descendants(svg + "polygon").Count(p => p.Element(svg + "title")?.Value.Contains("% of the grade limit", StringComparison.Ordinal) == true);
        Assert.Equal(forecast.Benches.Sum(b => b.PointLeansAtHorizon.Length), cells);
        Assert.Equal(site.Benches.Sum(b => b.SamplesAlongLength * b.SamplesAcrossWidth), cells); // every demo bench carries a lot
        var arrows = doc.Descendants(svg + "g").Where(g => (string?)g.Attribute("class") == "arrow").ToList();
        Assert.Equal(forecast.Benches.Length, arrows.Count);
        Assert.All(arrows, a => Assert.Single(a.Elements(svg + "line"), l => (string?)l.Attribute("stroke") == "#b3202a"));
    }
}

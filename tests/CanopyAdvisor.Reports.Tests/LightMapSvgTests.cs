using System.Globalization;
using System.Xml.Linq;
using CanopyAdvisor.Core.Light;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using CanopyAdvisor.Core.Structures;
using CanopyAdvisor.Files.Sites;
using NodaTime;

namespace CanopyAdvisor.Reports.Tests;

/// <summary>The light floor map: valid SVG (W3C SVG 1.1 is XML), one coloured cell per sample point, one panel per rack level.</summary>
public class LightMapSvgTests
{
    private static readonly XNamespace Svg = "http://www.w3.org/2000/svg";

    private static (Site Site, string Text) Render(string demo)
    {
        Site site = DemoSites.Load(demo, StandardBeamFactory.Instance);
        CompiledLightField field = LightFieldCompiler.Compile(site, EnclosureBuilder.Build(site));
        var outside = new ClearSkyOutsideLight(site.Location, site.Zone, site.Weather);
        var day = new LocalDate(2026, 12, 14);
        LightPeriodSummary summary = LightSimulation.Run(field, outside, day, day, Duration.FromHours(1));
        return (site, LightMapSvg.Render(site, summary, $"{site.Name} <test & check>"));
    }

    [Theory]
    [InlineData("glasshouse", 1)]
    [InlineData("indoor-farm", 4)] // four rack tiers share plan space: one panel per tier level
    public void Map_is_well_formed_with_a_cell_per_sample_point(string demo, int panels)
    {
        var (site, text) = Render(demo);
        XDocument doc = XDocument.Parse(text); // throws if not well-formed XML
        Assert.Equal(Svg + "svg", doc.Root!.Name);

        int cells = doc.Descendants(Svg + "polygon")
            .Count(p => p.Element(Svg + "title")?.Value.Contains("DLI", StringComparison.Ordinal) == true);
        Assert.Equal(site.Benches.Sum(b => b.SamplesAlongLength * b.SamplesAcrossWidth), cells);

        foreach (Bench bench in site.Benches)
        {
            Assert.Contains(doc.Descendants(Svg + "text"), t => t.Value == bench.Id);
        }

        int levelTitles = doc.Descendants(Svg + "text").Count(t => t.Value.StartsWith("level ", StringComparison.Ordinal));
        Assert.Equal(panels == 1 ? 0 : panels, levelTitles);
        Assert.Contains("&lt;test &amp; check&gt;", text, StringComparison.Ordinal); // titles are escaped
    }

    [Fact]
    public void Same_input_gives_the_same_picture()
    {
        Assert.Equal(Render("glasshouse").Text, Render("glasshouse").Text);
    }

    // The ramp must read in grey print: WCAG 2.x relative luminance, L = 0.2126 R + 0.7152 G + 0.0722 B of the
    // linearised sRGB channels (IEC 61966-2-1), rises along the ramp.
    [Fact]
    public void Colour_ramp_lightness_rises_monotonically()
    {
        double previous = -1;
        for (int i = 0; i <= 100; i++)
        {
            double luminance = Luminance(ColourRamp.At(i / 100.0));
            Assert.True(luminance > previous, $"luminance falls at {i}%");
            previous = luminance;
        }
    }

    private static double Luminance(string hex)
    {
        double Channel(int offset)
        {
            double c = int.Parse(hex.AsSpan(offset, 2), NumberStyles.HexNumber, CultureInfo.InvariantCulture) / 255.0;
            return c <= 0.04045 ? c / 12.92 : Math.Pow((c + 0.055) / 1.055, 2.4);
        }

        return (0.2126 * Channel(1)) + (0.7152 * Channel(3)) + (0.0722 * Channel(5));
    }
}

using System.Globalization;
using System.Xml.Linq;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Files.Sites;

namespace CanopyAdvisor.Reports.Tests;

/// <summary>The floor map's arrows and categories: one length scale for the whole map, arrows that stop short of the
/// neighbouring bench, and categories drawn with their pattern and words.</summary>
public class FloorMapSvgTests
{
    private static readonly XNamespace Svg = "http://www.w3.org/2000/svg";

    private static double Length(XElement arrow) =>
        -double.Parse((string)arrow.Elements(Svg + "line").Last().Attribute("y2")!, CultureInfo.InvariantCulture);

    [Fact]
    public void Arrows_share_one_scale_and_stop_short_of_close_neighbours()
    {
        // The indoor demo racks stand about a metre apart: 14° at 4 px per degree would reach the next rack.
        Site site = DemoSites.Load("indoor-farm", StandardBeamFactory.Instance);
        var benches = site.Benches.Select((b, i) => (FloorMapBench?)new FloorMapBench([], Angle.FromDegrees(i % 2 == 0 ? 14 : 7), Angle.FromDegrees(90))
        {
            Category = new FloorMapCategory("a", "class a", "#eeeeee", "#000000", FloorMapPattern.Dots),
        }).ToList();
        XDocument doc = XDocument.Parse(FloorMapSvg.Render(new FloorMap(site, "t", benches, "x", "v", "a")));
        var arrows = doc.Descendants(Svg + "g").Where(g => (string?)g.Attribute("class") == "arrow").ToList();
        Assert.Equal(site.Benches.Length, arrows.Count);

        // Same scale: a 14° arrow is twice a 7° one.
        XElement Of(int b) => arrows.Single(a => (string?)a.Attribute("data-bench") == site.Benches[b].Id);
        Assert.InRange(Length(Of(0)) / Length(Of(1)), 1.98, 2.02); // lengths are written to 0.1 px

        // With room the map draws 4 px per degree; here the arrows had to be shortened.
        Assert.True(Length(Of(0)) < 4 * 14);

        // Category: pattern defined, words printed under the bench with the arrow's label.
        Assert.Single(doc.Descendants(Svg + "pattern"), p => (string?)p.Attribute("id") == "pattern-a");
        Assert.Contains(doc.Descendants(Svg + "text"), t => t.Value == "14.0° E");
        Assert.Contains(doc.Descendants(Svg + "text"), t => t.Value == "class a");
        Assert.Single(doc.Descendants(Svg + "g"), g => (string?)g.Attribute("class") == "arrow-scale");
    }
}

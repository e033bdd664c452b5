using AngleSharp.Dom;
using AngleSharp.Html.Dom;
using AngleSharp.Html.Parser;
using CanopyAdvisor.Reports.Outlook;

namespace CanopyAdvisor.Reports.Tests.Outlook;

/// <summary>The outlook page read by an HTML5 parser (AngleSharp, which follows the WHATWG HTML parsing algorithm) in
/// strict mode, where any parse error the standard defines throws: the page is valid HTML5 syntax as well as
/// well-formed XML, and a browser builds the same tree from it.</summary>
public class OutlookPageHtml5Tests
{
    private static IHtmlDocument Parse(string page) =>
        new HtmlParser(new HtmlParserOptions { IsStrictMode = true }).ParseDocument(page);

    [Fact]
    public void Page_parses_without_html5_parse_errors()
    {
        var input = OutlookFixture.Input(OutlookFixture.Eight()) with
        {
            Advice = [new BenchAdviceSummary("south-3", "turn 180° every 2 days & check <edges>", 3, 1.25)],
            RotationHoursThisWeek = 4.5,
        };
        IHtmlDocument doc = Parse(OutlookPage.Render(OutlookReport.Build(input)));
        Assert.Equal("en", doc.DocumentElement.GetAttribute("lang"));
        Assert.Equal("utf-8", doc.CharacterSet.ToLowerInvariant());
        Assert.Contains("2026-W49", doc.Title, StringComparison.Ordinal);

        // The SVGs land in the SVG namespace (foreign content), each arrow inside the map.
        var svgs = doc.QuerySelectorAll("svg").ToList();
        Assert.All(svgs, s => Assert.Equal(NamespaceNames.SvgUri, s.NamespaceUri));
        Assert.Equal(8, doc.QuerySelectorAll("#map svg g.arrow").Length);
        Assert.Equal(OutlookFixture.EightRanked, doc.QuerySelectorAll("#ranking-table tbody tr").Select(r => r.GetAttribute("data-bench")));
        Assert.Equal(8, doc.QuerySelectorAll("svg.lean-chart").Length);
        Assert.Single(doc.QuerySelectorAll("svg.dli-chart"));
        Assert.Contains("turn 180° every 2 days & check <edges>", doc.QuerySelector("#rotation-table")!.TextContent, StringComparison.Ordinal);
    }

    [Theory]
    // WHATWG HTML §13.2 parse errors: a stray end tag, a missing doctype, a duplicate attribute.
    [InlineData("<!DOCTYPE html><html><head><title>t</title></head><body><p>a</span></p></body></html>")]
    [InlineData("<html><head><title>t</title></head><body></body></html>")]
    [InlineData("<!DOCTYPE html><html><head><title>t</title></head><body><p id=\"a\" id=\"b\">x</p></body></html>")]
    public void Strict_parser_refuses_known_parse_errors(string html) =>
        Assert.Throws<HtmlParseException>(() => Parse(html));

    [Fact]
    public void Every_picture_has_a_title_and_a_text_alternative()
    {
        IHtmlDocument doc = Parse(OutlookPage.Render(OutlookReport.Build(OutlookFixture.Input(OutlookFixture.Eight()))));
        foreach (IElement svg in doc.QuerySelectorAll("svg"))
        {
            Assert.False(string.IsNullOrWhiteSpace(svg.Children.FirstOrDefault(c => c.LocalName == "title")?.TextContent));
            Assert.False(string.IsNullOrWhiteSpace(svg.Children.FirstOrDefault(c => c.LocalName == "desc")?.TextContent));
            Assert.NotNull(svg.Closest("figure")?.QuerySelector("figcaption"));
        }
    }
}

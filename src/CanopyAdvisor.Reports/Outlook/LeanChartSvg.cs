using System.Collections.Immutable;
using System.Text;
using CanopyAdvisor.Core.Forecast;
using NodaTime;
using static CanopyAdvisor.Reports.Markup;

namespace CanopyAdvisor.Reports.Outlook;

/// <summary>One bench's lean over the week as a small SVG chart: the hourly bench lean from now to the week end, the
/// crop's grade limit, the uncertainty band at the week end, and when the bench leaves grade.</summary>
/// <remarks>
/// The band is only computed at the week end (the lean there with each crop parameter at the ends of its range), so
/// it is drawn as a bar at the right-hand end and nowhere else: drawing a fan that widens from now would invent the
/// band's shape in between.
/// </remarks>
internal static class LeanChartSvg
{
    public const double WidthPx = 330;
    public const double HeightPx = 190;
    private const double Left = 40, Right = 44, Top = 24, Bottom = 28;

    public static string Render(OutlookBench bench, Instant now, Instant end, DateTimeZone zone)
    {
        BenchForecast f = bench.Forecast;
        ImmutableArray<LeanSample> track = bench.WeekTrack(now);
        double limit = f.LeanGradeLimit.Degrees;
        double top = Math.Max(limit * 1.15, 1);
        foreach (LeanSample s in track)
        {
            top = Math.Max(top, s.Tilt.Degrees * 1.05);
        }

        if (f.Uncertainty is LeanUncertainty band)
        {
            top = Math.Max(top, band.High.Degrees * 1.05);
        }

        double step = NiceStep(top / 4);
        top = Math.Ceiling(top / step) * step;
        double plotW = WidthPx - Left - Right, plotH = HeightPx - Top - Bottom;
        double span = Math.Max((end - now).TotalSeconds, 1);
        double X(Instant t) => Left + (plotW * Math.Clamp((t - now).TotalSeconds / span, 0, 1));
        double Y(double deg) => Top + (plotH * (1 - (Math.Clamp(deg, 0, top) / top)));

        string id = bench.BenchId;
        var svg = new StringBuilder();
        svg.Append(Invariant($"<svg xmlns=\"http://www.w3.org/2000/svg\" class=\"lean-chart\" data-bench=\"{Escape(id)}\" width=\"{WidthPx}\" height=\"{HeightPx}\" viewBox=\"0 0 {WidthPx} {HeightPx}\" font-family=\"sans-serif\" font-size=\"10\" role=\"img\">"));
        svg.Append(Invariant($"<title>Lean of bench {Escape(id)} over the week</title>"));
        svg.Append(Invariant($"<desc>{Escape(Describe(bench, now, zone))}</desc>"));
        svg.Append(Invariant($"<rect x=\"{Left}\" y=\"{Top}\" width=\"{plotW}\" height=\"{plotH}\" fill=\"#ffffff\" stroke=\"#9aa5b1\" stroke-width=\"0.8\"/>"));
        svg.Append(Invariant($"<text x=\"{Left}\" y=\"14\" font-size=\"11\" font-weight=\"bold\">#{bench.Rank} {Escape(id)} · {Escape(bench.CropName)}</text>"));

        // Y ticks: lean in degrees.
        for (double v = 0; v <= top + 1e-9; v += step)
        {
            svg.Append(Invariant($"<line x1=\"{Left - 3}\" y1=\"{Y(v):0.#}\" x2=\"{Left + plotW:0.#}\" y2=\"{Y(v):0.#}\" stroke=\"#e3e7eb\" stroke-width=\"0.6\"/>"));
            svg.Append(Invariant($"<text x=\"{Left - 5}\" y=\"{Y(v) + 3:0.#}\" text-anchor=\"end\">{v:0.#}°</text>"));
        }

        // X ticks: local midnights, labelled with the day.
        LocalDate day = now.InZone(zone).Date.PlusDays(1);
        for (Instant midnight = zone.AtStartOfDay(day).ToInstant(); midnight < end; day = day.PlusDays(1), midnight = zone.AtStartOfDay(day).ToInstant())
        {
            double x = X(midnight);
            svg.Append(Invariant($"<line x1=\"{x:0.#}\" y1=\"{Top}\" x2=\"{x:0.#}\" y2=\"{Top + plotH + 3:0.#}\" stroke=\"#e3e7eb\" stroke-width=\"0.6\"/>"));
            if (midnight + Duration.FromHours(12) < end)
            {
                double labelX = X(midnight + Duration.FromHours(12));
                svg.Append(Invariant($"<text x=\"{labelX:0.#}\" y=\"{Top + plotH + 13:0.#}\" text-anchor=\"middle\">{day.ToString("ddd", System.Globalization.CultureInfo.InvariantCulture)}</text>"));
            }
        }

        // Grade limit: a dashed line, named at its right end.
        svg.Append(Invariant($"<line class=\"grade-limit\" x1=\"{Left}\" y1=\"{Y(limit):0.#}\" x2=\"{Left + plotW:0.#}\" y2=\"{Y(limit):0.#}\" stroke=\"{OutlookPalette.Ink}\" stroke-width=\"1.2\" stroke-dasharray=\"6 3\"/>"));
        svg.Append(Invariant($"<text x=\"{Left + plotW + 14:0.#}\" y=\"{Y(limit) + 3:0.#}\">limit</text>"));

        // When the bench leaves grade: a dotted vertical line.
        if (f.LeavesGradeAt is Instant leaves)
        {
            double x = X(leaves);
            svg.Append(Invariant($"<line class=\"leaves-grade\" x1=\"{x:0.#}\" y1=\"{Top}\" x2=\"{x:0.#}\" y2=\"{Top + plotH:0.#}\" stroke=\"{OutlookPalette.LeavesGradeFill}\" stroke-width=\"1.5\" stroke-dasharray=\"2 2\"/>"));
            svg.Append(Invariant($"<text x=\"{Math.Min(x + 3, Left + plotW - 60):0.#}\" y=\"{Top + 10}\" fill=\"{OutlookPalette.LeavesGradeFill}\">leaves grade</text>"));
        }

        // The lean track.
        if (track.Length > 0)
        {
            string points = string.Join(' ', track.Select(s => Invariant($"{X(s.At):0.#},{Y(s.Tilt.Degrees):0.#}")));
            svg.Append(Invariant($"<polyline class=\"lean-track\" points=\"{points}\" fill=\"none\" stroke=\"{OutlookPalette.Ink}\" stroke-width=\"2\" stroke-linejoin=\"round\"/>"));
        }

        // The band at the week end: an I-bar from low to high, with the forecast as a dot on it.
        double xe = Left + plotW + 6;
        if (f.Uncertainty is LeanUncertainty u)
        {
            double y0 = Y(u.Low.Degrees), y1 = Y(u.High.Degrees);
            svg.Append(Invariant($"<g class=\"band\"><title>range at week end over the crop parameters: {u.Low.Degrees:0.0}–{u.High.Degrees:0.0}°</title>"));
            svg.Append(Invariant($"<line x1=\"{xe:0.#}\" y1=\"{y0:0.#}\" x2=\"{xe:0.#}\" y2=\"{y1:0.#}\" stroke=\"#5a6570\" stroke-width=\"2\"/>"));
            svg.Append(Invariant($"<line x1=\"{xe - 4:0.#}\" y1=\"{y0:0.#}\" x2=\"{xe + 4:0.#}\" y2=\"{y0:0.#}\" stroke=\"#5a6570\" stroke-width=\"2\"/>"));
            svg.Append(Invariant($"<line x1=\"{xe - 4:0.#}\" y1=\"{y1:0.#}\" x2=\"{xe + 4:0.#}\" y2=\"{y1:0.#}\" stroke=\"#5a6570\" stroke-width=\"2\"/></g>"));
        }

        svg.Append(Invariant($"<circle cx=\"{xe:0.#}\" cy=\"{Y(f.LeanAtHorizon.Tilt.Degrees):0.#}\" r=\"2.5\" fill=\"{OutlookPalette.Ink}\"/>"));
        svg.Append("</svg>");
        return svg.ToString();
    }

    /// <summary>The chart in words (its SVG <c>desc</c> and the page's text alternative).</summary>
    public static string Describe(OutlookBench bench, Instant now, DateTimeZone zone)
    {
        BenchForecast f = bench.Forecast;
        string band = f.Uncertainty is LeanUncertainty u
            ? Invariant($"; range at week end over the crop parameters {u.Low.Degrees:0.0}–{u.High.Degrees:0.0}°")
            : "; no uncertainty band computed";
        string leaves = f.LeavesGradeAt is Instant at
            ? (at <= now ? "; already over the limit now" : $"; crosses the limit {OutlookText.When(at, zone)}")
            : "; stays within the limit";
        return Invariant($"Bench {bench.BenchId}: lean {f.LeanNow.Tilt.Degrees:0.0}° now, {f.LeanAtHorizon.Tilt.Degrees:0.0}° toward {f.LeanAtHorizon.CompassPoint} at week end; grade limit {f.LeanGradeLimit.Degrees:0.#}°{band}{leaves}.");
    }

    /// <summary>1, 2 or 5 times a power of ten, at least <paramref name="rough"/>.</summary>
    internal static double NiceStep(double rough)
    {
        if (!(rough > 0) || !double.IsFinite(rough))
        {
            return 1;
        }

        double power = Math.Pow(10, Math.Floor(Math.Log10(rough)));
        foreach (double m in new[] { 1.0, 2.0, 5.0, 10.0 })
        {
            if (m * power >= rough)
            {
                return m * power;
            }
        }

        return 10 * power;
    }
}

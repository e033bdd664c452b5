using System.Globalization;
using System.Text;
using NodaTime;
using static CanopyAdvisor.Reports.Markup;

namespace CanopyAdvisor.Reports.Outlook;

/// <summary>The DLI per day over the outlook's benches as SVG: per local day a bar from the lowest to the highest bench
/// with the mean as a diamond, and the crops' DLI targets as a dashed line (one target) or a shaded band between the
/// lowest and highest target.</summary>
internal static class DliChartSvg
{
    public const double WidthPx = 680;
    public const double HeightPx = 250;
    private const double Left = 48, Right = 150, Top = 28, Bottom = 34;

    /// <summary>One day's spread over benches (NaN values left out).</summary>
    internal sealed record DaySpread(LocalDate Date, double Min, string MinBench, double Mean, double Max, string MaxBench, int Count);

    public static IReadOnlyList<DaySpread> Spread(OutlookReport report)
    {
        var days = new List<DaySpread>();
        for (int d = 0; d < report.Days.Length; d++)
        {
            var values = report.Benches.Where(b => double.IsFinite(b.DailyDli[d])).Select(b => (b.BenchId, Dli: b.DailyDli[d])).ToList();
            if (values.Count == 0)
            {
                continue;
            }

            var min = values.MinBy(v => v.Dli);
            var max = values.MaxBy(v => v.Dli);
            days.Add(new DaySpread(report.Days[d], min.Dli, min.BenchId, values.Average(v => v.Dli), max.Dli, max.BenchId, values.Count));
        }

        return days;
    }

    public static string Render(OutlookReport report)
    {
        IReadOnlyList<DaySpread> days = Spread(report);
        double targetLow = report.Benches.Length > 0 ? report.Benches.Min(b => b.DliTargetMolPerM2Day) : 0;
        double targetHigh = report.Benches.Length > 0 ? report.Benches.Max(b => b.DliTargetMolPerM2Day) : 0;
        double top = Math.Max(targetHigh * 1.15, days.Count > 0 ? days.Max(d => d.Max) * 1.05 : 1);
        double step = LeanChartSvg.NiceStep(top / 5);
        top = Math.Max(step, Math.Ceiling(top / step) * step);
        double plotW = WidthPx - Left - Right, plotH = HeightPx - Top - Bottom;
        double Y(double v) => Top + (plotH * (1 - (Math.Clamp(v, 0, top) / top)));
        int n = Math.Max(report.Days.Length, 1);
        double slot = plotW / n;

        var svg = new StringBuilder();
        svg.Append(Invariant($"<svg xmlns=\"http://www.w3.org/2000/svg\" class=\"dli-chart\" width=\"{WidthPx}\" height=\"{HeightPx}\" viewBox=\"0 0 {WidthPx} {HeightPx}\" font-family=\"sans-serif\" font-size=\"10\" role=\"img\">"));
        svg.Append("<title>Daily light integral per day over the benches</title>");
        svg.Append(Invariant($"<desc>{Escape(Describe(report, days, targetLow, targetHigh))}</desc>"));
        svg.Append(Invariant($"<rect x=\"{Left}\" y=\"{Top}\" width=\"{plotW}\" height=\"{plotH}\" fill=\"#ffffff\" stroke=\"#9aa5b1\" stroke-width=\"0.8\"/>"));
        svg.Append(Invariant($"<text x=\"12\" y=\"{Top - 10}\">DLI, mol m⁻² d⁻¹</text>"));
        for (double v = 0; v <= top + 1e-9; v += step)
        {
            svg.Append(Invariant($"<line x1=\"{Left - 3}\" y1=\"{Y(v):0.#}\" x2=\"{Left + plotW:0.#}\" y2=\"{Y(v):0.#}\" stroke=\"#e3e7eb\" stroke-width=\"0.6\"/>"));
            svg.Append(Invariant($"<text x=\"{Left - 5}\" y=\"{Y(v) + 3:0.#}\" text-anchor=\"end\">{v:0.#}</text>"));
        }

        // Crop DLI targets: a line when all crops share one, else the band between the lowest and highest.
        if (report.Benches.Length > 0)
        {
            if (targetHigh - targetLow < 1e-9)
            {
                svg.Append(Invariant($"<line class=\"dli-target\" x1=\"{Left}\" y1=\"{Y(targetLow):0.#}\" x2=\"{Left + plotW:0.#}\" y2=\"{Y(targetLow):0.#}\" stroke=\"{OutlookPalette.Ink}\" stroke-width=\"1.2\" stroke-dasharray=\"6 3\"/>"));
                svg.Append(Invariant($"<text x=\"{Left + plotW + 8:0.#}\" y=\"{Y(targetLow) + 3:0.#}\">crop target {targetLow:0.#}</text>"));
            }
            else
            {
                svg.Append(Invariant($"<rect class=\"dli-target\" x=\"{Left}\" y=\"{Y(targetHigh):0.#}\" width=\"{plotW}\" height=\"{Y(targetLow) - Y(targetHigh):0.#}\" fill=\"#dde3e8\" stroke=\"{OutlookPalette.Ink}\" stroke-width=\"1\" stroke-dasharray=\"6 3\"/>"));
                svg.Append(Invariant($"<text x=\"{Left + plotW + 8:0.#}\" y=\"{Y(targetHigh) + 3:0.#}\">highest crop target {targetHigh:0.#}</text>"));
                svg.Append(Invariant($"<text x=\"{Left + plotW + 8:0.#}\" y=\"{Y(targetLow) + 3:0.#}\">lowest crop target {targetLow:0.#}</text>"));
            }
        }

        for (int d = 0; d < report.Days.Length; d++)
        {
            double cx = Left + (slot * (d + 0.5));
            LocalDate date = report.Days[d];
            svg.Append(Invariant($"<text x=\"{cx:0.#}\" y=\"{Top + plotH + 13:0.#}\" text-anchor=\"middle\">{date.ToString("ddd", CultureInfo.InvariantCulture)}</text>"));
            svg.Append(Invariant($"<text x=\"{cx:0.#}\" y=\"{Top + plotH + 25:0.#}\" text-anchor=\"middle\">{date.ToString("d MMM", CultureInfo.InvariantCulture)}</text>"));
            DaySpread? s = days.FirstOrDefault(x => x.Date == date);
            if (s is null)
            {
                svg.Append(Invariant($"<text x=\"{cx:0.#}\" y=\"{Top + (plotH / 2):0.#}\" text-anchor=\"middle\" fill=\"#5a6570\">no data</text>"));
                continue;
            }

            double yMin = Y(s.Min), yMax = Y(s.Max), yMean = Y(s.Mean);
            svg.Append(Invariant($"<g class=\"dli-day\" data-date=\"{date:uuuu-MM-dd}\"><title>{Escape(DayText(s))}</title>"));
            svg.Append(Invariant($"<rect x=\"{cx - 7:0.#}\" y=\"{yMax:0.#}\" width=\"14\" height=\"{Math.Max(yMin - yMax, 1):0.#}\" fill=\"#8fa3b3\" stroke=\"{OutlookPalette.Ink}\" stroke-width=\"0.8\"/>"));
            svg.Append(Invariant($"<polygon points=\"{cx:0.#},{yMean - 6:0.#} {cx + 6:0.#},{yMean:0.#} {cx:0.#},{yMean + 6:0.#} {cx - 6:0.#},{yMean:0.#}\" fill=\"#ffffff\" stroke=\"{OutlookPalette.Ink}\" stroke-width=\"1.2\"/></g>"));
        }

        double lx = Left + plotW + 8, ly = Top + plotH - 36;
        svg.Append(Invariant($"<rect x=\"{lx:0.#}\" y=\"{ly:0.#}\" width=\"10\" height=\"14\" fill=\"#8fa3b3\" stroke=\"{OutlookPalette.Ink}\" stroke-width=\"0.8\"/><text x=\"{lx + 16:0.#}\" y=\"{ly + 11:0.#}\">lowest–highest bench</text>"));
        svg.Append(Invariant($"<polygon points=\"{lx + 5:0.#},{ly + 20:0.#} {lx + 11:0.#},{ly + 26:0.#} {lx + 5:0.#},{ly + 32:0.#} {lx - 1:0.#},{ly + 26:0.#}\" fill=\"#ffffff\" stroke=\"{OutlookPalette.Ink}\" stroke-width=\"1.2\"/><text x=\"{lx + 16:0.#}\" y=\"{ly + 30:0.#}\">mean of benches</text>"));
        svg.Append("</svg>");
        return svg.ToString();
    }

    public static string DayText(DaySpread s) =>
        Invariant($"{s.Date.ToString("ddd d MMM", CultureInfo.InvariantCulture)}: mean {s.Mean:0.0}, lowest {s.Min:0.0} ({s.MinBench}), highest {s.Max:0.0} ({s.MaxBench}) mol m⁻² d⁻¹ over {s.Count} bench(es)");

    private static string Describe(OutlookReport report, IReadOnlyList<DaySpread> days, double targetLow, double targetHigh)
    {
        if (days.Count == 0)
        {
            return "No daily light was supplied for this outlook.";
        }

        string targets = targetHigh - targetLow < 1e-9
            ? Invariant($"the crops' DLI target is {targetLow:0.#}")
            : Invariant($"the crops' DLI targets range from {targetLow:0.#} to {targetHigh:0.#}");
        return Invariant($"DLI per local day over {report.Benches.Length} bench(es), mol m⁻² d⁻¹; {targets}. ") + string.Join("; ", days.Select(DayText)) + ".";
    }
}

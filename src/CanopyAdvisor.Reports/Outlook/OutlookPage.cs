using System.Globalization;
using System.Text;
using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Sites;
using NodaTime;
using static CanopyAdvisor.Reports.Markup;

namespace CanopyAdvisor.Reports.Outlook;

/// <summary>Writes the outlook as one self-contained printable page: HTML with inline CSS and SVG, no scripts and no
/// outside files.</summary>
/// <remarks>
/// <para>The page is polyglot markup (HTML5 that is also well-formed XML, in the XHTML namespace), so any HTML or XML
/// parser reads it. Sections: at a glance, floor map, ranking table, lean charts, daily light, rotation, change against
/// last week, notes. In print each section after the first starts on a new page; the layout fits the printable width
/// of both A4 and US Letter with 12 mm margins (186 mm), and the wide ranking table asks for a landscape page (CSS
/// named pages; a browser without them prints it upright, columns wrapping).</para>
/// <para>Colour never carries meaning alone: risk classes also have a pattern on the map and a shape and words in the
/// table; chart lines differ in dash and carry labels; every picture has a title, a description and a text alternative.</para>
/// </remarks>
public static class OutlookPage
{
    /// <summary>At most this many lean charts are drawn; with more benches the ones at risk and the top of the ranking are.</summary>
    public const int MaximumLeanCharts = 12;

    private const string Style = """
        :root { color: #1a1a1a; background: #ffffff; font: 10pt/1.4 "DejaVu Sans", "Segoe UI", Helvetica, Arial, sans-serif; }
        body { max-width: 250mm; margin: 0 auto; padding: 6mm; }
        p, ul, figcaption { max-width: 186mm; }
        h1 { font-size: 17pt; margin: 0 0 2mm; }
        h2 { font-size: 13pt; margin: 6mm 0 2mm; border-bottom: 1.5px solid #1a1a1a; }
        h3 { font-size: 11pt; margin: 4mm 0 1mm; }
        p, ul { margin: 1mm 0 2mm; }
        .meta { color: #3d4650; }
        table { border-collapse: collapse; width: 100%; font-size: 8.5pt; margin: 2mm 0; }
        caption { text-align: left; font-weight: bold; padding: 1mm 0; }
        th, td { border: 0.6pt solid #8a96a3; padding: 1px 3px; vertical-align: top; text-align: left; }
        thead th { background: #e6eaee; }
        tbody th { font-weight: bold; }
        td.num { text-align: right; font-variant-numeric: tabular-nums; white-space: nowrap; }
        .risk { font-weight: bold; white-space: nowrap; }
        .risk-leavesGrade { background: #4b1942; color: #ffffff; }
        .risk-watch { background: #c7772a; color: #1a1a1a; }
        .risk-low { background: #eef2e2; color: #1a1a1a; }
        figure { margin: 2mm 0 4mm; break-inside: avoid; page-break-inside: avoid; }
        figcaption { font-size: 8.5pt; color: #3d4650; }
        svg { max-width: 100%; height: auto; }
        .charts { display: flex; flex-wrap: wrap; gap: 3mm; }
        .charts figure { width: 88mm; margin: 0; }
        .note { font-size: 8.5pt; color: #3d4650; }
        tr { break-inside: avoid; page-break-inside: avoid; }
        h2, h3, caption { break-after: avoid; page-break-after: avoid; }
        @page { margin: 12mm; }
        @page wide { size: landscape; margin: 12mm; }
        #ranking { page: wide; }
        @media print {
          body { max-width: none; padding: 0; }
          section { break-before: page; page-break-before: always; }
          section.first { break-before: auto; page-break-before: auto; }
          * { print-color-adjust: exact; -webkit-print-color-adjust: exact; }
        }
        """;

    /// <summary>The page's HTML text.</summary>
    public static string Render(OutlookReport report)
    {
        ArgumentNullException.ThrowIfNull(report);
        DateTimeZone zone = report.Site.Zone;
        var html = new StringBuilder();
        string title = $"Lean outlook: {report.Site.Name}, week {report.WeekLabel}";
        html.Append("<!DOCTYPE html>\n<html xmlns=\"http://www.w3.org/1999/xhtml\" lang=\"en\" xml:lang=\"en\">\n<head>\n<meta charset=\"utf-8\"/>\n");
        html.Append(Invariant($"<title>{Escape(title)}</title>\n<style>\n{Style}\n</style>\n</head>\n<body>\n"));
        html.Append(Invariant($"<header>\n<h1>{Escape(title)}</h1>\n"));
        html.Append(Invariant($"<p class=\"meta\">From {Escape(OutlookText.When(report.Now, zone))} to {Escape(OutlookText.When(report.WeekEnd, zone))} ({Escape(zone.Id)}); site {Escape(report.Site.Id)}; {report.Benches.Length} bench(es) with a crop.</p>\n</header>\n"));
        AppendGlance(html, report);
        AppendMap(html, report);
        AppendRanking(html, report);
        AppendLeanCharts(html, report);
        AppendDli(html, report);
        AppendRotation(html, report);
        AppendChange(html, report);
        AppendNotes(html, report);
        html.Append("</body>\n</html>\n");
        return html.ToString();
    }

    /// <summary>The benches whose lean is charted: all of them up to <see cref="MaximumLeanCharts"/>, else the top
    /// <see cref="MaximumLeanCharts"/> of the ranking (which starts with every bench that leaves grade), in rank order.</summary>
    public static IReadOnlyList<OutlookBench> ChartedBenches(OutlookReport report)
    {
        ArgumentNullException.ThrowIfNull(report);
        if (report.Benches.Length <= MaximumLeanCharts)
        {
            return report.Benches;
        }

        // The ranking puts every bench that leaves grade first, so the top of it holds the most at risk.
        return [.. report.Benches.Take(MaximumLeanCharts)];
    }

    private static void AppendGlance(StringBuilder html, OutlookReport report)
    {
        DateTimeZone zone = report.Site.Zone;
        html.Append("<section id=\"glance\" class=\"first\">\n<h2>This week at a glance</h2>\n<ul>\n");
        var leaving = report.Benches.Where(b => b.Risk == OutlookRisk.LeavesGrade).ToList();
        var watch = report.Benches.Where(b => b.Risk == OutlookRisk.Watch).ToList();
        var stretch = report.Benches.Where(b => b.StretchFlags.Length > 0).ToList();
        html.Append(Invariant($"<li><strong>{Escape(OutlookPalette.Symbol(OutlookRisk.LeavesGrade))} Leave grade this week: {leaving.Count}</strong>"));
        if (leaving.Count > 0)
        {
            html.Append(" (").Append(Escape(string.Join(", ", leaving.Select(b => $"{b.BenchId}: {OutlookText.LeavesGrade(b.Forecast, report.Now, zone)}")))).Append(')');
        }

        html.Append("</li>\n");
        html.Append(Invariant($"<li>{Escape(OutlookPalette.Symbol(OutlookRisk.Watch))} On watch: {watch.Count}"));
        if (watch.Count > 0)
        {
            html.Append(" (").Append(Escape(string.Join(", ", watch.Select(b => b.BenchId)))).Append(')');
        }

        html.Append(Invariant($" — lean at week end at least {100 * OutlookRanking.WatchShareOfLimit:0}% of the grade limit, or its range reaching the limit</li>\n"));
        html.Append(Invariant($"<li>Stretch flags on {stretch.Count} bench(es)"));
        if (stretch.Count > 0)
        {
            html.Append(" (").Append(Escape(string.Join("; ", stretch.Select(b => $"{b.BenchId}: {string.Join(", ", b.StretchFlags.Select(f => OutlookText.Cause(f.Cause)))}")))).Append(')');
        }

        html.Append("</li>\n");
        html.Append("<li>Rotation work this week: ").Append(Escape(RotationHours(report))).Append("</li>\n");
        if (report.Change is OutlookChange change)
        {
            var up = change.Benches.Where(c => c.LeanAtWeekEndChangeDeg is double d && d > 0).OrderByDescending(c => c.LeanAtWeekEndChangeDeg).FirstOrDefault();
            string riser = up is null ? "no bench leans more at week end than last week's outlook said for its week end" : Invariant($"largest rise in lean at week end: {up.BenchId}, {OutlookText.Signed(up.LeanAtWeekEndChangeDeg!.Value, "0.0")}°");
            html.Append(Invariant($"<li>Against the outlook of {Escape(change.PreviousWeekLabel)}: {Escape(riser)}; new flags on {change.Benches.Count(c => c.NewFlags.Length > 0)} bench(es), cleared on {change.Benches.Count(c => c.ClearedFlags.Length > 0)}.</li>\n"));
        }
        else
        {
            html.Append("<li>Against last week: no earlier outlook to compare with.</li>\n");
        }

        html.Append("</ul>\n</section>\n");
    }

    private static string RotationHours(OutlookReport report) =>
        report.RotationHoursThisWeek is double h ? Invariant($"{h:0.#} h planned") : "not planned";

    private static void AppendMap(StringBuilder html, OutlookReport report)
    {
        html.Append("<section id=\"map\">\n<h2>Floor map</h2>\n<figure>\n");
        html.Append(MapSvg(report));
        html.Append("<figcaption>Seen from above, north up. Each bench is filled by its risk class (plum with cross-hatch: leaves grade; ochre with diagonal lines: watch; pale plain: low) and named under its south end; the arrow from its middle points where the tops lean at week end, its length growing with the lean on one scale for the whole map (the legend’s reference arrow gives it); under each bench are its risk words, its lean at week end with the compass point, and “stretch” when it has stretch flags. The same facts are in the ranking table.</figcaption>\n");
        html.Append("</figure>\n</section>\n");
    }

    /// <summary>The floor map SVG of the outlook (risk fill and pattern per bench, lean arrow at week end).</summary>
    internal static string MapSvg(OutlookReport report)
    {
        Site site = report.Site;
        var byBench = report.Benches.ToDictionary(b => b.BenchId, StringComparer.Ordinal);
        var benches = site.Benches.Select(bench => byBench.TryGetValue(bench.Id, out OutlookBench? b)
            ? new FloorMapBench([], b.Forecast.LeanAtHorizon.Tilt, b.Forecast.LeanAtHorizon.Azimuth)
            {
                Category = OutlookPalette.Category(b.Risk),
                Badge = b.StretchFlags.Length > 0 ? "stretch" : null,
                Tooltip = Invariant($"#{b.Rank} {b.BenchId} ({b.CropName}): {OutlookPalette.Label(b.Risk)}; lean at week end {b.Forecast.LeanAtHorizon.Tilt.Degrees:0.0}° toward {b.Forecast.LeanAtHorizon.CompassPoint}"),
            }
            : null).ToList();
        string description = "Floor map of the benches, north up. " + string.Join(" ", report.Benches.Select(b =>
            Invariant($"{b.BenchId}: {OutlookPalette.Label(b.Risk)}, leans {b.Forecast.LeanAtHorizon.Tilt.Degrees:0.0}° toward {b.Forecast.LeanAtHorizon.CompassPoint} ({b.Forecast.LeanAtHorizon.Azimuth.Degrees:0}°) at week end{(b.StretchFlags.Length > 0 ? ", stretch flags" : string.Empty)}.")));
        return FloorMapSvg.Render(new FloorMap(
            site,
            $"{site.Name}: lean risk at week end ({report.WeekLabel})",
            benches,
            "risk",
            "bench fill: lean risk class this week",
            "where the tops lean at week end (bench mean); length ∝ lean")
        {
            Categories = OutlookPalette.Categories,
            ArrowColour = OutlookPalette.Ink,
            Description = description,
        });
    }

    private static void AppendRanking(StringBuilder html, OutlookReport report)
    {
        DateTimeZone zone = report.Site.Zone;
        html.Append("<section id=\"ranking\">\n<h2>Benches ranked by risk</h2>\n");
        html.Append("<p class=\"note\">Order: benches that leave grade this week first, earliest first; then by lean at week end as a share of the crop’s grade limit; then by the number of stretch flags. Lean is the tilt of the stem’s base-to-apex line from vertical (bench mean); its direction is where the tops point, as a compass bearing and point. The range is the lean at week end with each crop parameter at the ends of its plausible range.</p>\n");
        html.Append("<table id=\"ranking-table\">\n<caption>Lean and stretch risk per bench, week ").Append(Escape(report.WeekLabel)).Append("</caption>\n<thead><tr>");
        foreach (string h in new[] { "Rank", "Risk", "Bench", "Crop", "Lean now", "Lean at week end (range)", "Share of limit", "Direction at week end", "Rate °/day", "Leaves grade", "Stretch flags", "Rotation", "vs last week" })
        {
            html.Append("<th scope=\"col\">").Append(Escape(h)).Append("</th>");
        }

        html.Append("</tr></thead>\n<tbody>\n");
        foreach (OutlookBench b in report.Benches)
        {
            BenchForecast f = b.Forecast;
            string risk = OutlookSnapshotJson.RiskName(b.Risk);
            string range = f.Uncertainty is LeanUncertainty u ? Invariant($" ({u.Low.Degrees:0.0}–{u.High.Degrees:0.0})") : string.Empty;
            string direction = f.LeanAtHorizon.Tilt.Degrees < 0.05 ? "upright" : Invariant($"{f.LeanAtHorizon.Azimuth.Degrees:0}° {f.LeanAtHorizon.CompassPoint}");
            html.Append(Invariant($"<tr data-bench=\"{Escape(b.BenchId)}\"><td class=\"num\">{b.Rank}</td>"));
            html.Append(Invariant($"<td class=\"risk risk-{risk}\">{Escape(OutlookPalette.Symbol(b.Risk))} {Escape(OutlookPalette.Label(b.Risk))}</td>"));
            html.Append(Invariant($"<th scope=\"row\">{Escape(b.BenchId)}</th><td>{Escape(b.CropName)}<br/><span class=\"note\">lot {Escape(f.LotId)}, sale {b.SaleOn:d MMM}</span></td>"));
            html.Append(Invariant($"<td class=\"num\">{f.LeanNow.Tilt.Degrees:0.0}°</td><td class=\"num\">{f.LeanAtHorizon.Tilt.Degrees:0.0}°{range}</td>"));
            html.Append(Invariant($"<td class=\"num\">{100 * b.ShareOfLimit:0}% of {f.LeanGradeLimit.Degrees:0.#}°</td><td>{Escape(direction)}</td>"));
            html.Append(Invariant($"<td class=\"num\">{Escape(OutlookText.Signed(f.LeanRateDegreesPerDay, "0.00"))}</td><td>{Escape(OutlookText.LeavesGrade(f, report.Now, zone))}</td>"));
            string flags = b.StretchFlags.Length > 0 ? string.Join("; ", b.StretchFlags.Select(OutlookText.Flag)) : "none";
            html.Append(Invariant($"<td>{Escape(flags)}</td><td>{Escape(b.Advice?.Recommendation ?? "not planned")}</td><td>{Escape(ChangeShort(b, report.Change is not null))}</td></tr>\n"));
        }

        html.Append("</tbody>\n</table>\n</section>\n");
    }

    private static string ChangeShort(OutlookBench b, bool compared)
    {
        if (!compared || b.Change is not BenchChange c)
        {
            return "no comparison";
        }

        if (c.IsNew)
        {
            return "new";
        }

        string rank = c.RankChange switch
        {
            > 0 => $"up {c.RankChange}",
            < 0 => $"down {-c.RankChange}",
            _ => "same rank",
        };
        return Invariant($"{OutlookText.Signed(c.LeanAtWeekEndChangeDeg ?? 0, "0.0")}°, {rank}");
    }

    private static void AppendLeanCharts(StringBuilder html, OutlookReport report)
    {
        DateTimeZone zone = report.Site.Zone;
        IReadOnlyList<OutlookBench> charted = ChartedBenches(report);
        html.Append("<section id=\"lean-charts\">\n<h2>Lean over the week</h2>\n");
        html.Append("<p class=\"note\">Solid line: bench lean, hour by hour, from now to the week end. Dashed line: the crop’s grade limit. Bar at the right-hand end: the range of the lean at week end over the crop parameters’ plausible ranges (computed at the week end only, so nothing is drawn between now and then); the dot on it is the forecast. A dotted vertical line marks when a bench leaves grade.");
        if (charted.Count < report.Benches.Length)
        {
            html.Append(Invariant($" The {charted.Count} benches at the top of the ranking are shown; the others are in the table."));
        }

        html.Append("</p>\n<div class=\"charts\">\n");
        foreach (OutlookBench b in charted)
        {
            html.Append("<figure>\n").Append(LeanChartSvg.Render(b, report.Now, report.WeekEnd, zone)).Append('\n');
            html.Append("<figcaption>").Append(Escape(LeanChartSvg.Describe(b, report.Now, zone))).Append("</figcaption>\n</figure>\n");
        }

        html.Append("</div>\n</section>\n");
    }

    private static void AppendDli(StringBuilder html, OutlookReport report)
    {
        html.Append("<section id=\"dli\">\n<h2>Daily light integral</h2>\n<figure>\n").Append(DliChartSvg.Render(report)).Append('\n');
        html.Append("<figcaption>Per local day: the bar spans the lowest to the highest bench DLI, the diamond is the mean over the benches; the dashed line (or shaded band) is the crops’ DLI target. Full local days the week touches are shown; the table below gives every bench.</figcaption>\n</figure>\n");
        html.Append("<table id=\"dli-table\">\n<caption>DLI per bench and day, mol m⁻² d⁻¹ (target of the bench’s crop in the last column)</caption>\n<thead><tr><th scope=\"col\">Bench</th>");
        foreach (LocalDate d in report.Days)
        {
            html.Append(Invariant($"<th scope=\"col\">{d.ToString("ddd d MMM", CultureInfo.InvariantCulture)}</th>"));
        }

        html.Append("<th scope=\"col\">Week mean</th><th scope=\"col\">Target</th></tr></thead>\n<tbody>\n");
        foreach (OutlookBench b in report.Benches)
        {
            html.Append(Invariant($"<tr><th scope=\"row\">{Escape(b.BenchId)}</th>"));
            foreach (double v in b.DailyDli)
            {
                string mark = double.IsFinite(v) && v < b.DliMinimumMolPerM2Day ? " ↓" : string.Empty;
                html.Append(Invariant($"<td class=\"num\">{(double.IsFinite(v) ? v.ToString("0.0", CultureInfo.InvariantCulture) : "–")}{mark}</td>"));
            }

            html.Append(Invariant($"<td class=\"num\">{b.Forecast.MeanDliMolPerM2Day:0.0}</td><td class=\"num\">{b.DliTargetMolPerM2Day:0.#}</td></tr>\n"));
        }

        html.Append("</tbody>\n</table>\n<p class=\"note\">↓: under the crop’s DLI minimum that day (plants stretch and finish slowly). Week mean: the forecast’s mean DLI over the week at the bench’s sample points.</p>\n</section>\n");
    }

    private static void AppendRotation(StringBuilder html, OutlookReport report)
    {
        html.Append("<section id=\"rotation\">\n<h2>Rotation this week</h2>\n");
        html.Append("<p>Rotation work for the site this week: <strong>").Append(Escape(RotationHours(report))).Append("</strong>.</p>\n");
        html.Append("<table id=\"rotation-table\">\n<caption>Recommended rotation per bench</caption>\n<thead><tr><th scope=\"col\">Bench</th><th scope=\"col\">Recommendation</th><th scope=\"col\">Rotations this week</th><th scope=\"col\">Labour this week</th></tr></thead>\n<tbody>\n");
        foreach (OutlookBench b in report.Benches)
        {
            html.Append(Invariant($"<tr><th scope=\"row\">{Escape(b.BenchId)}</th>"));
            if (b.Advice is BenchAdviceSummary a)
            {
                html.Append(Invariant($"<td>{Escape(a.Recommendation)}</td><td class=\"num\">{a.RotationsThisWeek}</td><td class=\"num\">{a.LabourHoursThisWeek:0.0} h</td></tr>\n"));
            }
            else
            {
                html.Append("<td>not planned</td><td class=\"num\">–</td><td class=\"num\">–</td></tr>\n");
            }
        }

        html.Append("</tbody>\n</table>\n<p class=\"note\">The lean forecast above assumes the rotations already recorded and those planned in the forecast request; a bench shown “not planned” is forecast as if nobody turns its pots.</p>\n</section>\n");
    }

    private static void AppendChange(StringBuilder html, OutlookReport report)
    {
        DateTimeZone zone = report.Site.Zone;
        html.Append("<section id=\"change\">\n<h2>Change against last week</h2>\n");
        if (report.Change is not OutlookChange change)
        {
            html.Append("<p>No earlier outlook of this site to compare with.</p>\n</section>\n");
            return;
        }

        html.Append(Invariant($"<p>Compared with the outlook of week {Escape(change.PreviousWeekLabel)} (from {Escape(OutlookText.When(change.PreviousNow, zone))}). Lean change: this outlook’s lean at week end minus that outlook’s lean at its week end. Rank change: up means nearer the top (more risk).</p>\n"));
        html.Append("<table id=\"change-table\">\n<caption>Change per bench</caption>\n<thead><tr><th scope=\"col\">Bench</th><th scope=\"col\">Rank now (before)</th><th scope=\"col\">Lean at week end change</th><th scope=\"col\">New flags</th><th scope=\"col\">Cleared flags</th></tr></thead>\n<tbody>\n");
        foreach (OutlookBench b in report.Benches)
        {
            BenchChange? c = b.Change;
            html.Append(Invariant($"<tr><th scope=\"row\">{Escape(b.BenchId)}</th>"));
            if (c is null || c.IsNew)
            {
                html.Append(Invariant($"<td class=\"num\">{b.Rank} (new)</td><td>new lot or bench</td><td>{Escape(Causes(c?.NewFlags ?? []))}</td><td>–</td></tr>\n"));
                continue;
            }

            string rank = c.RankChange switch
            {
                > 0 => $"up {c.RankChange}",
                < 0 => $"down {-c.RankChange}",
                _ => "same",
            };
            html.Append(Invariant($"<td class=\"num\">{b.Rank} ({c.PreviousRank}), {rank}</td><td class=\"num\">{Escape(OutlookText.Signed(c.LeanAtWeekEndChangeDeg ?? 0, "0.0"))}°</td><td>{Escape(Causes(c.NewFlags))}</td><td>{Escape(Causes(c.ClearedFlags))}</td></tr>\n"));
        }

        html.Append("</tbody>\n</table>\n");
        if (change.Gone.Length > 0)
        {
            html.Append("<p>No longer forecast (lot sold, moved or replaced): ").Append(Escape(string.Join(", ", change.Gone.Select(g => $"{g.BenchId} (lot {g.LotId}, was #{g.Rank})")))).Append(".</p>\n");
        }

        html.Append("</section>\n");
    }

    private static string Causes(IEnumerable<string> causes)
    {
        string text = string.Join(", ", causes.Select(OutlookText.Cause));
        return text.Length == 0 ? "none" : text;
    }

    private static void AppendNotes(StringBuilder html, OutlookReport report)
    {
        html.Append("<section id=\"notes\">\n<h2>Notes and method</h2>\n<ul>\n");
        foreach (string note in report.Notes)
        {
            html.Append("<li>").Append(Escape(note)).Append("</li>\n");
        }

        if (report.MissingLightSteps > 0 || report.MissingTemperatureSteps > 0)
        {
            html.Append(Invariant($"<li>{report.MissingLightSteps} forecast step(s) had no outside light and {report.MissingTemperatureSteps} no air temperature in the logs; nothing was invented for them (dark outside; no growth or bending).</li>\n"));
        }

        html.Append("<li>The forecast rests on crop parameters that are mostly estimates with plausible ranges; the range in the table and the bars in the charts show how far the lean at week end moves when each parameter is set to the ends of its range, one at a time (not a joint confidence interval). Measure lean on a few benches to calibrate them.</li>\n");
        html.Append(Invariant($"<li>Risk classes: leaves grade — the bench crosses its crop’s lean grade limit before the week end or its sale; watch — lean at week end at least {100 * OutlookRanking.WatchShareOfLimit:0}% of the limit (our own threshold) or its range reaching the limit; low — otherwise.</li>\n"));
        html.Append("<li>Stretch flags: low DLI, low R:FR (phytochrome state), high DIF, or height at sale over the crop’s height grade limit; each is shown with its value and limit.</li>\n");
        html.Append("</ul>\n</section>\n");
    }
}

using System.Text;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;

namespace CanopyAdvisor.Reports;

/// <summary>A floor map of a site as SVG: a value per bench sample cell, and an arrow per bench (light or lean direction).</summary>
/// <remarks>
/// Seen from above with north up. Each bench is divided into its sample cells, coloured on <see cref="ColourRamp"/>
/// between the lowest and highest cell of the site. The arrow from a bench's centre points along the bench's
/// direction (where light comes from, or where the tops lean), its length growing with the tilt; the label gives tilt
/// and compass point. Lamps are small marks (side lamps, tilted more than 30°, as wedges pointing
/// where they aim); obstructions are grey. Pure: the same input gives the same text.
/// </remarks>
public static class FloorMapSvg
{
    private const double WidthPx = 960;
    private const double MarginPx = 40;
    private const double LegendPx = 110;
    private const double SideLampTiltDeg = 30;
    private const double GapPx = 24;

    /// <summary>Benches that share plan space at different heights (rack tiers) are drawn one level per panel.</summary>
    private static List<Level> Levels(Site site)
    {
        var heights = site.Benches.Select(b => Math.Round(b.SurfaceHeightM, 2)).Distinct().Order().ToList();
        bool stacked = false;
        for (int i = 0; i < site.Benches.Length && !stacked; i++)
        {
            for (int j = i + 1; j < site.Benches.Length && !stacked; j++)
            {
                stacked = Math.Round(site.Benches[i].SurfaceHeightM, 2) != Math.Round(site.Benches[j].SurfaceHeightM, 2)
                    && Overlap(site.Benches[i].Footprint, site.Benches[j].Footprint);
            }
        }

        if (!stacked)
        {
            return [new Level("all benches", [.. Enumerable.Range(0, site.Benches.Length)], double.NegativeInfinity, double.PositiveInfinity)];
        }

        var levels = new List<Level>();
        for (int h = 0; h < heights.Count; h++)
        {
            double below = heights[h], above = h + 1 < heights.Count ? heights[h + 1] : double.PositiveInfinity;
            int[] members = [.. Enumerable.Range(0, site.Benches.Length).Where(b => Math.Round(site.Benches[b].SurfaceHeightM, 2) == below)];
            levels.Add(new Level(Invariant($"level {h + 1}: benches at {below:0.00} m"), members, below, above));
        }

        return levels;
    }

    private static bool Overlap(Footprint a, Footprint b)
    {
        // Axis-aligned bounds are enough to decide whether to draw levels apart.
        Vector3[] ca = Corners(a), cb = Corners(b);
        return ca.Min(c => c.X) < cb.Max(c => c.X) && cb.Min(c => c.X) < ca.Max(c => c.X)
            && ca.Min(c => c.Y) < cb.Max(c => c.Y) && cb.Min(c => c.Y) < ca.Max(c => c.Y);
    }

    /// <summary>Renders a floor map.</summary>
    public static string Render(FloorMap map)
    {
        ArgumentNullException.ThrowIfNull(map);
        Site site = map.Site;
        string title = map.Title;
        var benches = map.Benches;
        double[] all = [.. benches.Where(b => b is not null).SelectMany(b => b!.Cells)];
        double low = map.Low ?? (all.Length > 0 ? all.Min() : 0), high = map.High ?? (all.Length > 0 ? all.Max() : 1);
        List<Level> levels = Levels(site);
        int columns = levels.Count == 1 ? 1 : 2;
        double panelWidthPx = (WidthPx - (2 * MarginPx) - ((columns - 1) * GapPx)) / columns;
        Frame first = Frame.Fit(Extent(site), panelWidthPx, MarginPx, MarginPx + 20);
        int rows = (levels.Count + columns - 1) / columns;
        double panelHeightPx = first.HeightPx + (levels.Count == 1 ? 0 : 24);
        double mapHeightPx = (rows * panelHeightPx) + ((rows - 1) * GapPx);
        var svg = new StringBuilder();
        double heightPx = mapHeightPx + (2 * MarginPx) + 20 + LegendPx;
        svg.Append(Invariant($"<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"{WidthPx}\" height=\"{heightPx:0}\" viewBox=\"0 0 {WidthPx} {heightPx:0}\" font-family=\"sans-serif\" font-size=\"12\">\n"));
        svg.Append(Invariant($"<title>{Escape(title)}</title>\n"));
        if (map.Description is string description)
        {
            svg.Append(Invariant($"<desc>{Escape(description)}</desc>\n"));
        }

        // Every category a bench uses gets its pattern, listed or not; the legend shows the listed ones, else those used.
        List<FloorMapCategory> used = [.. map.Categories.Concat(benches.Where(b => b?.Category is not null).Select(b => b!.Category!)).DistinctBy(c => c.Key)];
        if (map.Categories.Count == 0 && used.Count > 0)
        {
            map = map with { Categories = used };
        }

        AppendPatterns(svg, used);
        svg.Append("<rect width=\"100%\" height=\"100%\" fill=\"#fbfaf6\"/>\n");
        svg.Append(Invariant($"<text x=\"{MarginPx}\" y=\"24\" font-size=\"16\" font-weight=\"bold\">{Escape(title)}</text>\n"));

        double pxPerDegree = ArrowScale(site, levels, benches, first.PxPerM);
        Frame frame = first;
        for (int l = 0; l < levels.Count; l++)
        {
            Level level = levels[l];
            double top = MarginPx + 20 + ((l / columns) * (panelHeightPx + GapPx)) + (levels.Count == 1 ? 0 : 24);
            frame = first with { Left = MarginPx + ((l % columns) * (panelWidthPx + GapPx)), Top = top };
            if (levels.Count > 1)
            {
                svg.Append(Invariant($"<text x=\"{frame.Left}\" y=\"{top - 8:0.#}\" font-weight=\"bold\">{Escape(level.Title)}</text>\n"));
            }

            AppendStructure(svg, frame, site.Structure);
            foreach (Obstruction o in site.Obstructions)
            {
                svg.Append(Polygon(frame, Corners(o.Footprint), "#9a9a9a", "#555555", 1)).Append('\n');
                AppendLabel(svg, frame, Centre(o.Footprint), o.Id, "#333333");
            }

            foreach (int b in level.Benches)
            {
                AppendBench(svg, frame, site.Benches[b], benches[b], low, high, map.CellLabel);
            }

            foreach (Lamp lamp in site.Lamps.Where(lamp => level.HoldsLampAt(lamp.Position.Z)))
            {
                AppendLamp(svg, frame, lamp);
            }

            foreach (int b in level.Benches)
            {
                if (benches[b] is FloorMapBench layer)
                {
                    AppendArrow(svg, frame, site.Benches[b], layer, map.ArrowColour, pxPerDegree);
                }
            }
        }

        frame = first with { Top = MarginPx + 20, HeightPx = mapHeightPx };
        AppendNorthAndScale(svg, frame);
        AppendLegend(svg, frame, low, high, map, pxPerDegree);
        svg.Append("</svg>\n");
        return svg.ToString();
    }

    private static void AppendStructure(StringBuilder svg, Frame frame, Structure structure)
    {
        Footprint? footprint = structure switch
        {
            Glasshouse g => g.Footprint,
            IndoorRoom r => r.Footprint,
            _ => null,
        };
        if (footprint is null)
        {
            return;
        }

        svg.Append(Polygon(frame, Corners(footprint), "#ffffff", "#7d8b99", 2)).Append('\n');
        if (structure is Glasshouse house)
        {
            // Ridge lines, one per bay, along the footprint axis.
            for (int bay = 0; bay < house.BayCount; bay++)
            {
                Vector3 start = footprint.Corner + (footprint.WidthDirection * ((bay + 0.5) * house.BayWidthM));
                Vector3 end = start + (footprint.AxisDirection * footprint.LengthM);
                svg.Append(Invariant($"<line x1=\"{frame.X(start):0.#}\" y1=\"{frame.Y(start):0.#}\" x2=\"{frame.X(end):0.#}\" y2=\"{frame.Y(end):0.#}\" stroke=\"#c9d3dc\" stroke-dasharray=\"6 4\"/>\n"));
            }
        }
    }

    private static void AppendBench(StringBuilder svg, Frame frame, Bench bench, FloorMapBench? layer, double low, double high, string cellLabel)
    {
        Footprint f = bench.Footprint;
        double[]? cells = layer?.Category is null ? layer?.Cells : null;
        double along = f.LengthM / bench.SamplesAlongLength, across = f.WidthM / bench.SamplesAcrossWidth;
        for (int i = 0; i < bench.SamplesAlongLength && cells is not null; i++)
        {
            for (int j = 0; j < bench.SamplesAcrossWidth; j++)
            {
                // Cell order follows SampleGrid: along-index outer, across-index inner.
                double value = cells[(i * bench.SamplesAcrossWidth) + j];
                Vector3 corner = f.Corner + (f.AxisDirection * (i * along)) + (f.WidthDirection * (j * across));
                Vector3[] quad =
                [
                    corner,
                    corner + (f.AxisDirection * along),
                    corner + (f.AxisDirection * along) + (f.WidthDirection * across),
                    corner + (f.WidthDirection * across),
                ];
                string colour = ColourRamp.At(high > low ? (value - low) / (high - low) : 0.5);
                svg.Append(Polygon(frame, quad, colour, colour, 0.5, Invariant($"{bench.Id}: {cellLabel} {value:0.0#}")));
            }
        }

        if (layer?.Category is FloorMapCategory category)
        {
            svg.Append(Polygon(frame, Corners(f), category.Fill, "none", 0, layer.Tooltip ?? $"{bench.Id}: {category.Label}")).Append('\n');
            if (category.Pattern != FloorMapPattern.None)
            {
                svg.Append(Polygon(frame, Corners(f), $"url(#{PatternId(category)})", "none", 0)).Append('\n');
            }
        }

        svg.Append(Polygon(frame, Corners(f), "none", "#1f2a33", 1.5)).Append('\n');
        Vector3 labelAt = f.Corner + (f.AxisDirection * (f.LengthM + 0.6)) + (f.WidthDirection * (f.WidthM / 2));
        AppendLabel(svg, frame, labelAt, bench.Id, "#1f2a33");
        if (layer?.Category is not null || layer?.Badge is not null)
        {
            // Category and badge words go beyond the bench's start end, so the arrow and its label keep the middle.
            Vector3 under = f.Corner - (f.AxisDirection * 0.3) + (f.WidthDirection * (f.WidthM / 2));
            double x = frame.X(under), y = frame.Y(under) + 12;
            if (layer.Category is FloorMapCategory c)
            {
                svg.Append(Invariant($"<text x=\"{x:0.#}\" y=\"{y:0.#}\" text-anchor=\"middle\" font-size=\"11\" font-weight=\"bold\" fill=\"#1f2a33\">{Escape(c.Label)}</text>\n"));
                y += 13;
                if (double.IsFinite(layer.ArrowTilt.Degrees))
                {
                    svg.Append(Invariant($"<text x=\"{x:0.#}\" y=\"{y:0.#}\" text-anchor=\"middle\" font-size=\"11\" fill=\"#1f2a33\">{Escape(ArrowLabel(layer))}</text>\n"));
                    y += 13;
                }
            }

            if (layer.Badge is string badge)
            {
                svg.Append(Invariant($"<text x=\"{x:0.#}\" y=\"{y:0.#}\" text-anchor=\"middle\" font-size=\"11\" font-style=\"italic\" fill=\"#1f2a33\">{Escape(badge)}</text>\n"));
            }
        }
    }

    private static void AppendPatterns(StringBuilder svg, List<FloorMapCategory> categories)
    {
        if (categories.Count == 0)
        {
            return;
        }

        svg.Append("<defs>");
        foreach (FloorMapCategory c in categories)
        {
            string id = PatternId(c);
            string ink = Escape(c.Ink);
            switch (c.Pattern)
            {
                case FloorMapPattern.Diagonal:
                    svg.Append(Invariant($"<pattern id=\"{id}\" width=\"8\" height=\"8\" patternUnits=\"userSpaceOnUse\"><path d=\"M-2,2 l4,-4 M0,8 l8,-8 M6,10 l4,-4\" stroke=\"{ink}\" stroke-width=\"1.2\"/></pattern>"));
                    break;
                case FloorMapPattern.CrossHatch:
                    svg.Append(Invariant($"<pattern id=\"{id}\" width=\"8\" height=\"8\" patternUnits=\"userSpaceOnUse\"><path d=\"M0,8 l8,-8 M0,0 l8,8\" stroke=\"{ink}\" stroke-width=\"1.2\"/></pattern>"));
                    break;
                case FloorMapPattern.Dots:
                    svg.Append(Invariant($"<pattern id=\"{id}\" width=\"8\" height=\"8\" patternUnits=\"userSpaceOnUse\"><circle cx=\"4\" cy=\"4\" r=\"1.3\" fill=\"{ink}\"/></pattern>"));
                    break;
                default:
                    break;
            }
        }

        svg.Append("</defs>\n");
    }

    private static string PatternId(FloorMapCategory c) =>
        "pattern-" + new string([.. c.Key.Select(ch => char.IsAsciiLetterOrDigit(ch) ? ch : '-')]);

    private static void AppendLamp(StringBuilder svg, Frame frame, Lamp lamp)
    {
        double x = frame.X(lamp.Position), y = frame.Y(lamp.Position);
        if (lamp.Aim.Tilt.Degrees > SideLampTiltDeg)
        {
            // A wedge pointing where the lamp aims.
            double a = lamp.Aim.Yaw.Radians;
            double dx = Math.Sin(a), dy = -Math.Cos(a);
            string points = Invariant($"{x + (9 * dx):0.#},{y + (9 * dy):0.#} {x - (4 * dy) - (3 * dx):0.#},{y + (4 * dx) - (3 * dy):0.#} {x + (4 * dy) - (3 * dx):0.#},{y - (4 * dx) - (3 * dy):0.#}");
            svg.Append(Invariant($"<polygon points=\"{points}\" fill=\"#d9822b\" stroke=\"#7a3f0a\" stroke-width=\"0.8\"><title>{Escape(lamp.Id)} (side lamp, aimed {lamp.Aim.Yaw.Degrees:0}°)</title></polygon>\n"));
        }
        else
        {
            svg.Append(Invariant($"<circle cx=\"{x:0.#}\" cy=\"{y:0.#}\" r=\"1.6\" fill=\"#6b6b6b\"><title>{Escape(lamp.Id)}</title></circle>\n"));
        }
    }

    private static void AppendArrow(StringBuilder svg, Frame frame, Bench bench, FloorMapBench layer, string colour, double pxPerDegree)
    {
        Vector3 centre = Centre(bench.Footprint);
        double tilt = layer.ArrowTilt.Degrees;
        if (!double.IsFinite(tilt))
        {
            return;
        }

        // One scale for the whole map (so lengths compare), at least a stub, at most 120 px.
        double lengthPx = Math.Clamp(pxPerDegree * tilt, 6, 120);
        double x0 = frame.X(centre), y0 = frame.Y(centre);

        // Drawn pointing north (up, −y) and turned by the compass bearing: SVG's rotate(a) turns clockwise on screen
        // (y down), as a bearing does with north up.
        double bearing = layer.ArrowAzimuth.Normalized().Degrees;
        string c = Escape(colour);
        svg.Append(Invariant($"<g class=\"arrow\" data-bench=\"{Escape(bench.Id)}\" transform=\"translate({x0:0.##} {y0:0.##}) rotate({bearing:0.##})\">"));
        svg.Append(Invariant($"<line x1=\"0\" y1=\"0\" x2=\"0\" y2=\"{-lengthPx:0.#}\" stroke=\"#ffffff\" stroke-width=\"6\" stroke-linecap=\"round\"/>"));
        svg.Append(Invariant($"<polygon points=\"0,{-lengthPx - 10:0.#} -7,{-lengthPx + 1:0.#} 7,{-lengthPx + 1:0.#}\" fill=\"#ffffff\"/>"));
        svg.Append(Invariant($"<line x1=\"0\" y1=\"0\" x2=\"0\" y2=\"{-lengthPx:0.#}\" stroke=\"{c}\" stroke-width=\"3\" stroke-linecap=\"round\"/>"));
        svg.Append(Invariant($"<polygon points=\"0,{-lengthPx - 8:0.#} -5,{-lengthPx:0.#} 5,{-lengthPx:0.#}\" fill=\"{c}\"/></g>\n"));
        if (layer.Category is not null)
        {
            // A categorised bench prints its arrow label with its other words under the bench (see AppendBench).
            return;
        }

        // The label sits behind the arrow's tail (opposite to where it points), so the two never cross.
        double ex = Math.Sin(layer.ArrowAzimuth.Radians), sy = -Math.Cos(layer.ArrowAzimuth.Radians);
        string anchor = ex > 0.3 ? "end" : ex < -0.3 ? "start" : "middle";
        double lx = x0 - (8 * ex), ly = y0 - (12 * sy) + 4;
        svg.Append(Invariant($"<text x=\"{lx:0.#}\" y=\"{ly:0.#}\" text-anchor=\"{anchor}\" fill=\"{c}\" font-weight=\"bold\" stroke=\"#ffffff\" stroke-width=\"3\" paint-order=\"stroke\">{Escape(ArrowLabel(layer))}</text>\n"));
    }

    private static string ArrowLabel(FloorMapBench layer) =>
        layer.ArrowTilt.Degrees < 0.05 ? "vertical" : Invariant($"{layer.ArrowTilt.Degrees:0.0}° {Direction.CompassPoint(layer.ArrowAzimuth)}");

    /// <summary>Pixels per degree of arrow tilt: 4, or less when the longest arrow would reach past 60 % of the way to
    /// the nearest other bench of its level, so arrows of neighbouring benches do not run into each other.</summary>
    private static double ArrowScale(Site site, List<Level> levels, IReadOnlyList<FloorMapBench?> benches, double pxPerM)
    {
        double scale = 4;
        foreach (Level level in levels)
        {
            foreach (int b in level.Benches)
            {
                if (benches[b] is not FloorMapBench layer || !(layer.ArrowTilt.Degrees > 0))
                {
                    continue;
                }

                Vector3 centre = Centre(site.Benches[b].Footprint);
                double nearestPx = level.Benches.Where(o => o != b)
                    .Select(o => (Centre(site.Benches[o].Footprint) - centre).Length * pxPerM)
                    .DefaultIfEmpty(double.PositiveInfinity).Min();
                scale = Math.Min(scale, 0.6 * nearestPx / layer.ArrowTilt.Degrees);
            }
        }

        return Math.Max(scale, 0.5);
    }

    private static void AppendNorthAndScale(StringBuilder svg, Frame frame)
    {
        double x = WidthPx - MarginPx - 10, y = MarginPx + 4;
        svg.Append(Invariant($"<polygon points=\"{x},{y - 22} {x - 8},{y} {x + 8},{y}\" fill=\"#1f2a33\"/><text x=\"{x}\" y=\"{y + 16}\" text-anchor=\"middle\" font-weight=\"bold\">N</text>\n"));
        double metres = NiceLength(120 / frame.PxPerM);
        double px = metres * frame.PxPerM;
        double sy = frame.Top + frame.HeightPx + 30;
        svg.Append(Invariant($"<line x1=\"{MarginPx}\" y1=\"{sy}\" x2=\"{MarginPx + px:0.#}\" y2=\"{sy}\" stroke=\"#1f2a33\" stroke-width=\"3\"/>"));
        svg.Append(Invariant($"<text x=\"{MarginPx}\" y=\"{sy + 16}\">{metres:0.##} m</text>\n"));
    }

    private static void AppendLegend(StringBuilder svg, Frame frame, double low, double high, FloorMap map, double pxPerDegree)
    {
        double x = MarginPx + 140, y = frame.Top + frame.HeightPx + 20, w = 280, h = 12;
        if (map.Categories.Count > 0)
        {
            double cx = x;
            foreach (FloorMapCategory c in map.Categories)
            {
                svg.Append(Invariant($"<rect x=\"{cx:0.#}\" y=\"{y}\" width=\"22\" height=\"14\" fill=\"{Escape(c.Fill)}\" stroke=\"#1f2a33\" stroke-width=\"0.8\"/>"));
                if (c.Pattern != FloorMapPattern.None)
                {
                    svg.Append(Invariant($"<rect x=\"{cx:0.#}\" y=\"{y}\" width=\"22\" height=\"14\" fill=\"url(#{PatternId(c)})\"/>"));
                }

                svg.Append(Invariant($"<text x=\"{cx + 28:0.#}\" y=\"{y + 11}\">{Escape(c.Label)}</text>\n"));
                cx += 36 + (6.5 * c.Label.Length);
            }

            svg.Append(Invariant($"<text x=\"{x}\" y=\"{y + h + 22}\">{Escape(map.ValueLegend)}</text>\n"));
        }
        else
        {
            svg.Append("<defs><linearGradient id=\"ramp\">");
            for (int i = 0; i <= 10; i++)
            {
                svg.Append(Invariant($"<stop offset=\"{i * 10}%\" stop-color=\"{ColourRamp.At(i / 10.0)}\"/>"));
            }

            svg.Append("</linearGradient></defs>\n");
            svg.Append(Invariant($"<rect x=\"{x}\" y=\"{y}\" width=\"{w}\" height=\"{h}\" fill=\"url(#ramp)\" stroke=\"#1f2a33\" stroke-width=\"0.5\"/>\n"));
            svg.Append(Invariant($"<text x=\"{x}\" y=\"{y + h + 14}\">{low:0.0}</text><text x=\"{x + w}\" y=\"{y + h + 14}\" text-anchor=\"end\">{high:0.0}</text>"));
            svg.Append(Invariant($"<text x=\"{x + (w / 2)}\" y=\"{y + h + 30}\" text-anchor=\"middle\">{Escape(map.ValueLegend)}</text>\n"));
        }

        double ax = map.Categories.Count > 0 ? x : x + w + 24, ay = map.Categories.Count > 0 ? y + h + 42 : y + 10;
        svg.Append(Invariant($"<text x=\"{ax}\" y=\"{ay}\" fill=\"{Escape(map.ArrowColour)}\" font-weight=\"bold\">→ {Escape(map.ArrowLegend)}</text>\n"));
        svg.Append(Invariant($"<text x=\"{ax}\" y=\"{ay + 18}\" fill=\"#6b6b6b\">● overhead lamp</text><text x=\"{ax + 126}\" y=\"{ay + 18}\" fill=\"#d9822b\">▲ side lamp</text>\n"));

        // A reference arrow gives the length scale: 10° (or 5° when 10° would be longer than the 120 px cap).
        double referenceDeg = pxPerDegree * 10 <= 120 ? 10 : 5;
        double rl = Math.Min(pxPerDegree * referenceDeg, 120), ry = ay + 34;
        string colour = Escape(map.ArrowColour);
        svg.Append(Invariant($"<g class=\"arrow-scale\"><line x1=\"{ax}\" y1=\"{ry}\" x2=\"{ax + rl:0.#}\" y2=\"{ry}\" stroke=\"{colour}\" stroke-width=\"3\"/><polygon points=\"{ax + rl + 8:0.#},{ry} {ax + rl:0.#},{ry - 5} {ax + rl:0.#},{ry + 5}\" fill=\"{colour}\"/>"));
        svg.Append(Invariant($"<text x=\"{ax + rl + 14:0.#}\" y=\"{ry + 4}\">arrow length of {referenceDeg:0}° lean</text></g>\n"));
    }

    private static void AppendLabel(StringBuilder svg, Frame frame, Vector3 at, string text, string colour) =>
        svg.Append(Invariant($"<text x=\"{frame.X(at):0.#}\" y=\"{frame.Y(at):0.#}\" text-anchor=\"middle\" fill=\"{colour}\" font-size=\"11\">{Escape(text)}</text>\n"));

    private static string Polygon(Frame frame, IEnumerable<Vector3> corners, string fill, string stroke, double strokeWidth, string? tooltip = null)
    {
        string points = string.Join(' ', corners.Select(c => Invariant($"{frame.X(c):0.##},{frame.Y(c):0.##}")));
        string title = tooltip is null ? string.Empty : $"<title>{Escape(tooltip)}</title>";
        return Invariant($"<polygon points=\"{points}\" fill=\"{fill}\" stroke=\"{stroke}\" stroke-width=\"{strokeWidth}\">{title}</polygon>");
    }

    private static Vector3[] Corners(Footprint f) =>
    [
        f.Corner,
        f.Corner + (f.AxisDirection * f.LengthM),
        f.Corner + (f.AxisDirection * f.LengthM) + (f.WidthDirection * f.WidthM),
        f.Corner + (f.WidthDirection * f.WidthM),
    ];

    private static Vector3 Centre(Footprint f) => f.Corner + (f.AxisDirection * (f.LengthM / 2)) + (f.WidthDirection * (f.WidthM / 2));

    private static IEnumerable<Vector3> Extent(Site site)
    {
        IEnumerable<Vector3> points = site.Benches.SelectMany(b => Corners(b.Footprint))
            .Concat(site.Obstructions.SelectMany(o => Corners(o.Footprint)))
            .Concat(site.Lamps.Select(l => l.Position));
        return site.Structure switch
        {
            Glasshouse g => points.Concat(Corners(g.Footprint)),
            IndoorRoom r => points.Concat(Corners(r.Footprint)),
            _ => points,
        };
    }

    private static double NiceLength(double metres)
    {
        double power = Math.Pow(10, Math.Floor(Math.Log10(metres)));
        double[] steps = [1, 2, 5, 10];
        return steps.Select(s => s * power).Last(s => s <= metres || s == power);
    }

    private static string Escape(string text) => Markup.Escape(text);

    private static string Invariant(FormattableString text) => Markup.Invariant(text);

    /// <summary>One drawing level: the benches at one height and the lamps between it and the next level up.</summary>
    private sealed record Level(string Title, int[] Benches, double FromHeightM, double ToHeightM)
    {
        public bool HoldsLampAt(double heightM) => heightM >= FromHeightM && heightM < ToHeightM;
    }

    /// <summary>Maps site metres (x east, y north) to SVG pixels (y down) in a panel whose top-left corner is (Left, Top).</summary>
    private sealed record Frame(double MinX, double MaxY, double PxPerM, double HeightPx, double Left, double Top)
    {
        public static Frame Fit(IEnumerable<Vector3> points, double widthPx, double left, double top)
        {
            List<Vector3> all = [.. points];
            double minX = all.Min(p => p.X) - 1, maxX = all.Max(p => p.X) + 1;
            double minY = all.Min(p => p.Y) - 1, maxY = all.Max(p => p.Y) + 1;
            double pxPerM = widthPx / Math.Max(maxX - minX, 1e-6);
            return new Frame(minX, maxY, pxPerM, (maxY - minY) * pxPerM, left, top);
        }

        public double X(Vector3 p) => Left + ((p.X - MinX) * PxPerM);

        public double Y(Vector3 p) => Top + ((MaxY - p.Y) * PxPerM);
    }
}

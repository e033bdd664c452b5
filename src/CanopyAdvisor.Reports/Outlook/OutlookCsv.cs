using System.Globalization;
using System.Text;
using CanopyAdvisor.Core.Forecast;
using NodaTime;

namespace CanopyAdvisor.Reports.Outlook;

/// <summary>Writes the outlook's ranking as CSV (RFC 4180): a header line, then one record per bench in rank order.</summary>
/// <remarks>
/// <para>Lines end in CRLF; a field holding a comma, a double quote, CR or LF is enclosed in double quotes with its
/// quotes doubled (RFC 4180 §2). Numbers use a decimal point and no grouping; angles in degrees, heights in mm, DLI in
/// mol m⁻² d⁻¹, instants as local ISO 8601 with offset. Empty fields mean "not known" or "none".</para>
/// <para>A text field (ids, words) that begins with <c>=</c>, <c>+</c>, <c>-</c>, <c>@</c>, tab or CR gets a leading
/// apostrophe so spreadsheets do not run it as a formula (common practice against CSV injection); numbers are not
/// touched.</para>
/// </remarks>
public static class OutlookCsv
{
    /// <summary>The header fields, in order.</summary>
    public static IReadOnlyList<string> Header { get; } =
    [
        "rank", "risk", "benchId", "lotId", "cropId", "cropName", "saleOn",
        "leanNowDeg", "leanNowAzimuthDeg", "leanNowDirection",
        "leanAtWeekEndDeg", "leanAtWeekEndAzimuthDeg", "leanAtWeekEndDirection", "bandLowDeg", "bandHighDeg",
        "gradeLimitDeg", "shareOfLimit", "leanRateDegPerDay", "leavesGradeAt",
        "heightNowMm", "heightAtSaleMm", "heightGradeLimitMm", "meanDli", "dliTarget",
        "stretchFlags", "leanFlags",
        "recommendation", "rotationsThisWeek", "labourHoursThisWeek",
        "leanAtWeekEndChangeDeg", "rankChange", "newFlags", "clearedFlags",
    ];

    /// <summary>The CSV text.</summary>
    public static string Write(OutlookReport report)
    {
        ArgumentNullException.ThrowIfNull(report);
        DateTimeZone zone = report.Site.Zone;
        var csv = new StringBuilder();
        AppendRecord(csv, Header);
        foreach (OutlookBench b in report.Benches)
        {
            BenchForecast f = b.Forecast;
            BenchChange? c = b.Change;
            AppendRecord(csv,
            [
                N(b.Rank), OutlookSnapshotJson.RiskName(b.Risk), T(b.BenchId), T(f.LotId), T(f.CropId), T(b.CropName), b.SaleOn.ToString("uuuu-MM-dd", CultureInfo.InvariantCulture),
                N(f.LeanNow.Tilt.Degrees, 2), N(f.LeanNow.Azimuth.Degrees, 1), f.LeanNow.CompassPoint,
                N(f.LeanAtHorizon.Tilt.Degrees, 2), N(f.LeanAtHorizon.Azimuth.Degrees, 1), f.LeanAtHorizon.CompassPoint,
                f.Uncertainty is LeanUncertainty u ? N(u.Low.Degrees, 2) : string.Empty,
                f.Uncertainty is LeanUncertainty v ? N(v.High.Degrees, 2) : string.Empty,
                N(f.LeanGradeLimit.Degrees, 2), N(b.ShareOfLimit, 3), N(f.LeanRateDegreesPerDay, 3),
                f.LeavesGradeAt is Instant at ? OutlookText.IsoLocal(at, zone) : string.Empty,
                N(f.HeightNowMm, 1), N(f.HeightAtSaleMm, 1), N(f.HeightGradeLimitMm, 1), N(f.MeanDliMolPerM2Day, 2), N(b.DliTargetMolPerM2Day, 2),
                T(string.Join("; ", b.StretchFlags.Select(OutlookText.Flag))),
                T(string.Join("; ", f.Flags.Where(x => x.Kind == ForecastFlagKind.Leaning).Select(OutlookText.Flag))),
                T(b.Advice?.Recommendation ?? string.Empty),
                b.Advice is BenchAdviceSummary a ? N(a.RotationsThisWeek) : string.Empty,
                b.Advice is BenchAdviceSummary h ? N(h.LabourHoursThisWeek, 2) : string.Empty,
                c?.LeanAtWeekEndChangeDeg is double d ? N(d, 2) : string.Empty,
                c?.RankChange is int r ? N(r) : string.Empty,
                T(string.Join("; ", c?.NewFlags ?? [])),
                T(string.Join("; ", c?.ClearedFlags ?? [])),
            ]);
        }

        return csv.ToString();
    }

    /// <summary>One field as RFC 4180 wants it: quoted (quotes doubled) when it holds a comma, quote, CR or LF.</summary>
    public static string Field(string value)
    {
        ArgumentNullException.ThrowIfNull(value);
        return value.AsSpan().IndexOfAny(",\"\r\n") >= 0 ? "\"" + value.Replace("\"", "\"\"", StringComparison.Ordinal) + "\"" : value;
    }

    private static void AppendRecord(StringBuilder csv, IEnumerable<string> fields) =>
        csv.Append(string.Join(',', fields.Select(Field))).Append("\r\n");

    private static string T(string text) =>
        text.Length > 0 && text[0] is '=' or '+' or '-' or '@' or '\t' or '\r' ? "'" + text : text;

    private static string N(int value) => value.ToString(CultureInfo.InvariantCulture);

    private static string N(double value, int decimals) =>
        double.IsFinite(value) ? Math.Round(value, decimals).ToString("0.##########", CultureInfo.InvariantCulture) : string.Empty;
}

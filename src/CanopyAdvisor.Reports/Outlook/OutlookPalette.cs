namespace CanopyAdvisor.Reports.Outlook;

/// <summary>The outlook's risk colours, patterns, shapes and words: our own palette, chosen so each class differs from
/// the others in lightness (readable in grey print) and is never told by colour alone.</summary>
/// <remarks>
/// Adjacent classes differ by a contrast ratio of at least 3:1 (the WCAG 2.1 success criterion 1.4.11 figure for
/// graphical objects), and every class also has a pattern on the map, a shape symbol in the table and its words.
/// </remarks>
public static class OutlookPalette
{
    /// <summary>Fill of a bench at low risk: pale sage.</summary>
    public const string LowFill = "#eef2e2";

    /// <summary>Fill of a bench on watch: ochre.</summary>
    public const string WatchFill = "#c7772a";

    /// <summary>Fill of a bench that leaves grade: deep plum.</summary>
    public const string LeavesGradeFill = "#4b1942";

    /// <summary>Dark ink for lines, text and arrows on light ground.</summary>
    public const string Ink = "#1a1a1a";

    /// <summary>The fill colour of a risk class.</summary>
    public static string Fill(OutlookRisk risk) => risk switch
    {
        OutlookRisk.LeavesGrade => LeavesGradeFill,
        OutlookRisk.Watch => WatchFill,
        _ => LowFill,
    };

    /// <summary>The colour of text and patterns drawn on a class's fill (white on plum, near-black otherwise).</summary>
    public static string InkOn(OutlookRisk risk) => risk == OutlookRisk.LeavesGrade ? "#ffffff" : Ink;

    /// <summary>The words of a risk class: "leaves grade", "watch", "low".</summary>
    public static string Label(OutlookRisk risk) => risk switch
    {
        OutlookRisk.LeavesGrade => "leaves grade",
        OutlookRisk.Watch => "watch",
        _ => "low",
    };

    /// <summary>The shape printed before the words in tables: ■ leaves grade, ◆ watch, ○ low.</summary>
    public static string Symbol(OutlookRisk risk) => risk switch
    {
        OutlookRisk.LeavesGrade => "■",
        OutlookRisk.Watch => "◆",
        _ => "○",
    };

    /// <summary>The map pattern of a risk class: cross-hatch, diagonal lines, plain.</summary>
    public static FloorMapPattern Pattern(OutlookRisk risk) => risk switch
    {
        OutlookRisk.LeavesGrade => FloorMapPattern.CrossHatch,
        OutlookRisk.Watch => FloorMapPattern.Diagonal,
        _ => FloorMapPattern.None,
    };

    /// <summary>The floor-map category of a risk class.</summary>
    public static FloorMapCategory Category(OutlookRisk risk) =>
        new(OutlookSnapshotJson.RiskName(risk), Label(risk), Fill(risk), InkOn(risk), Pattern(risk));

    /// <summary>The categories in legend order, most at risk first.</summary>
    public static IReadOnlyList<FloorMapCategory> Categories { get; } =
        [Category(OutlookRisk.LeavesGrade), Category(OutlookRisk.Watch), Category(OutlookRisk.Low)];
}

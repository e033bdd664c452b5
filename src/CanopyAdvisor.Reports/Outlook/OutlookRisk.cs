namespace CanopyAdvisor.Reports.Outlook;

/// <summary>A bench's lean risk class in the outlook (see <see cref="OutlookRanking"/> for the rule).</summary>
public enum OutlookRisk
{
    /// <summary>Lean stays under half the grade limit at week end and the band's upper end stays under the limit.</summary>
    Low,

    /// <summary>Lean at week end reaches half the grade limit, or the band's upper end reaches the limit.</summary>
    Watch,

    /// <summary>The bench leaves grade within the week (or already has).</summary>
    LeavesGrade,
}

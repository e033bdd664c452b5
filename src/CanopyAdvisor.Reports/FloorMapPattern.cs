namespace CanopyAdvisor.Reports;

/// <summary>A fill pattern laid over a bench's colour on a floor map, so categories stay apart in grey print and for
/// readers who do not tell the colours apart.</summary>
public enum FloorMapPattern
{
    /// <summary>Plain colour.</summary>
    None,

    /// <summary>Thin diagonal lines (lower left to upper right).</summary>
    Diagonal,

    /// <summary>Diagonal lines both ways (cross-hatch).</summary>
    CrossHatch,

    /// <summary>A grid of dots.</summary>
    Dots,
}

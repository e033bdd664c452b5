namespace CanopyAdvisor.Core.Plants.Growth;

/// <summary>Why a lot may turn leggy (MODEL.md §5, flags).</summary>
public enum LegginessCauseKind
{
    /// <summary>DLI below the crop's minimum (mol m⁻² d⁻¹).</summary>
    LowDli,

    /// <summary>Phytochrome photostationary state below the shade limit (low R:FR).</summary>
    LowPhytochromeState,

    /// <summary>DIF (day minus night mean temperature) above the limit (K).</summary>
    HighDif,

    /// <summary>Projected height at the sale date over the crop's height grade limit (mm).</summary>
    HeightOverGrade,
}

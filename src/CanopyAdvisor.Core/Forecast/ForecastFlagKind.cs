namespace CanopyAdvisor.Core.Forecast;

/// <summary>The two kinds of risk a bench forecast flags (MODEL.md §5, flags; GLOSSARY "flag").</summary>
public enum ForecastFlagKind
{
    /// <summary>Stretch risk: low DLI, low R:FR (phytochrome state), high DIF, or height over grade by the sale date.</summary>
    Leggy,

    /// <summary>Lean over the crop's grade limit before the sale date or the end of the horizon.</summary>
    Leaning,
}

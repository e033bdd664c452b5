using CanopyAdvisor.Core.Forecast;

namespace CanopyAdvisor.Core.Advice.SideLamps;

/// <summary>One bench before and after the proposed side lamps: lean forecast, light and limits.</summary>
/// <param name="BenchId">The bench.</param>
/// <param name="CropId">The crop of its lot.</param>
/// <param name="AtRisk">Whether the plan aimed to straighten this bench.</param>
/// <param name="ForecastBefore">The lean forecast with the site's lamps.</param>
/// <param name="ForecastAfter">The lean forecast with the proposed lamps added.</param>
/// <param name="LightBefore">Light over the planning period with the site's lamps.</param>
/// <param name="LightAfter">Light over the planning period with the proposed lamps added.</param>
/// <param name="PpfdCeiling">The bench's PPFD ceiling, µmol m⁻² s⁻¹, or null when none applies.</param>
/// <param name="Ceiling">Whether <see cref="BenchLightFigures.PeakPpfd"/> stays within the ceiling.</param>
/// <param name="Uniformity">Whether the DLI uniformity stays at or above the brief's floor.</param>
public sealed record SideLampBenchOutcome(
    string BenchId,
    string CropId,
    bool AtRisk,
    BenchForecast ForecastBefore,
    BenchForecast ForecastAfter,
    BenchLightFigures LightBefore,
    BenchLightFigures LightAfter,
    double? PpfdCeiling,
    LimitCheck Ceiling,
    LimitCheck Uniformity);

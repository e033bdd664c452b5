using System.Collections.Immutable;
using CanopyAdvisor.Core.Light;
using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Core.Plants.Growth;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using NodaTime;

namespace CanopyAdvisor.Core.Forecast;

/// <summary>What a bench lean forecast needs: the site with its lots, the crops, the weather sources and the start.</summary>
/// <param name="Site">The site; its <see cref="Site.Lots"/> say which crop stands on which bench (one lot per bench).</param>
/// <param name="Crops">The crops by id (the lots' <see cref="Lot.CropId"/>), resolved and validated by the caller's crop library.</param>
/// <param name="OutsideLight">Outside light (clear sky or a measured log; NaN gaps are counted and treated as dark outside).</param>
/// <param name="Temperature">Air temperature (setpoints or a measured log).</param>
/// <param name="Now">The forecast start (a caller's clock reading; Core never reads the clock).</param>
public sealed record ForecastRequest(
    Site Site,
    IReadOnlyDictionary<string, Crop> Crops,
    IOutsideLightSource OutsideLight,
    ITemperatureSource Temperature,
    Instant Now)
{
    /// <summary>The default horizon, 7 days.</summary>
    public static Duration DefaultHorizon { get; } = Duration.FromDays(7);

    /// <summary>The default spin-up, 14 days.</summary>
    public static Duration DefaultSpinUp { get; } = Duration.FromDays(14);

    /// <summary>The parameters rerun for the uncertainty band by default: B, γ, the photo coefficient a and Ė_ref.</summary>
    public static ImmutableArray<string> DefaultUncertaintyKeys { get; } =
        ["balanceNumber", "proprioceptiveSensitivity", "photoCoefficient", "referenceElongationMmPerDay"];

    /// <summary>The parameters the uncertainty band may rerun (they act on the stem or scale the elongation rate).</summary>
    public static ImmutableArray<string> SupportedUncertaintyKeys { get; } =
        ["balanceNumber", "proprioceptiveSensitivity", "photoCoefficient", "photoExponent", "referenceElongationMmPerDay",
         "gravitropicDelayHours", "nutationAmplitudeDeg"];

    /// <summary>How far ahead to forecast: 1 hour to 366 days, 7 days by default. A lot sold earlier is still
    /// simulated to the end, but its grade check stops at the sale.</summary>
    public Duration Horizon { get; init; } = DefaultHorizon;

    /// <summary>The time step, 1 to 60 minutes; null for the default of <see cref="BenchForecaster.DefaultStep"/>.</summary>
    public Duration? Step { get; init; }

    /// <summary>How long before now the stems are simulated (lean now is not measured): 0 to 60 days, 14 by default.
    /// A lot planted later starts at its planting date.</summary>
    public Duration SpinUp { get; init; } = DefaultSpinUp;

    /// <summary>The pot spacing at which the crops' leaf area density holds, m; 0.15 m by default (an estimate from
    /// memory of usual pot-to-pot spacing of 10–13 cm pots, not a measured value).</summary>
    public double ReferenceSpacingM { get; init; } = 0.15;

    /// <summary>Whether to compute the uncertainty band (<see cref="BenchForecast.Uncertainty"/>); true by default.</summary>
    public bool IncludeUncertainty { get; init; } = true;

    /// <summary>The crop-file keys rerun at their range ends for the band (each one of <see cref="SupportedUncertaintyKeys"/>).</summary>
    public ImmutableArray<string> UncertaintyKeys { get; init; } = DefaultUncertaintyKeys;

    /// <summary>Growth-zone segments of each sample-point stem (1 to 64; 4 by default, see <see cref="BenchForecaster"/>
    /// for the accuracy against 8 and 16).</summary>
    public int GrowthZoneSegments { get; init; } = 4;

    /// <summary>Light-field compile settings; <see cref="LightFieldOptions.Default"/> when null.</summary>
    public LightFieldOptions? LightOptions { get; init; }

    /// <summary>Pot rotations assumed from now on, by lot id, each list in time order within now … now + horizon
    /// (empty by default: the forecast then says what happens if nobody turns the pots). A rotation policy or a
    /// rotation calendar fills this to forecast its plan.</summary>
    public ImmutableDictionary<string, ImmutableArray<RotationRecord>> PlannedRotations { get; init; } =
        ImmutableDictionary<string, ImmutableArray<RotationRecord>>.Empty;

    /// <summary>Pot rotations already done that are recorded outside the site's lots (for example ticked off in the
    /// service), by lot id: each from the start of the lot's planting date up to now, in any order. They join the lots'
    /// own <see cref="Lot.Rotations"/>; unlike those, which a site file may list only up to the lot's measurement date,
    /// these are judged against the forecast start, so a turn done today counts today.</summary>
    public ImmutableDictionary<string, ImmutableArray<RotationRecord>> RotationsDone { get; init; } =
        ImmutableDictionary<string, ImmutableArray<RotationRecord>>.Empty;

    /// <summary>How errors name the parts of the site (the site file reader passes its own); <see cref="SitePaths.Default"/> when null.</summary>
    public SitePaths? Paths { get; init; }
}

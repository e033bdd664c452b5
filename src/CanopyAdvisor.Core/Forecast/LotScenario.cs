using System.Collections.Immutable;
using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Core.Sites;

namespace CanopyAdvisor.Core.Forecast;

/// <summary>What a single-lot run of a <see cref="ForecastSession"/> changes against its request.</summary>
/// <remarks>Used by the advice: rotation policies try planned rotations, calibration tries crop parameters.</remarks>
public sealed record LotScenario
{
    /// <summary>The request's own lot: its crop, the request's planned rotations, no uncertainty band.</summary>
    public static LotScenario AsRequested { get; } = new();

    /// <summary>Other crop parameters for the stems and the elongation (null: the lot's crop). The canopy the light
    /// passes through stays the one compiled from the lot's crop.</summary>
    public Crop? Crop { get; init; }

    /// <summary>Pot rotations assumed from now on, in time order (null: the request's planned rotations of the lot;
    /// empty: none). Rotations already done come from the lot.</summary>
    public ImmutableArray<RotationRecord>? PlannedRotations { get; init; }

    /// <summary>Whether to compute the uncertainty band (false by default: scenario runs are many).</summary>
    public bool IncludeUncertainty { get; init; }
}

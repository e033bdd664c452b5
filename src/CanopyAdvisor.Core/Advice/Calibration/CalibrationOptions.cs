using System.Collections.Immutable;

namespace CanopyAdvisor.Core.Advice.Calibration;

/// <summary>What <see cref="CropCalibrator.Fit"/> fits and how far it searches.</summary>
/// <remarks>The bounds are the crop's plausible ranges (<see cref="Plants.CropParameter.Minimum"/> …
/// <see cref="Plants.CropParameter.Maximum"/>); the warning thresholds are choices of this project.</remarks>
public sealed record CalibrationOptions
{
    /// <summary>M, γ and B by their crop-file keys, in this order: <c>photoCoefficient</c>,
    /// <c>proprioceptiveSensitivity</c>, <c>balanceNumber</c>.</summary>
    public static ImmutableArray<string> FittableKeys { get; } = ["photoCoefficient", "proprioceptiveSensitivity", "balanceNumber"];

    /// <summary>The defaults: M and γ, 25 iterations, tolerance 10⁻⁴.</summary>
    public static CalibrationOptions Default { get; } = new();

    /// <summary>The parameters to fit, each one of <see cref="FittableKeys"/>, no repeats (default M and γ; add
    /// <c>balanceNumber</c> when the data span a rotation or several days of change).</summary>
    public ImmutableArray<string> Parameters { get; init; } = ["photoCoefficient", "proprioceptiveSensitivity"];

    /// <summary>The most Jacobians to evaluate, 1 to 200 (25 by default). Each costs one simulator run per parameter
    /// and lot, each trial step one more per lot.</summary>
    public int MaxIterations { get; init; } = 25;

    /// <summary>Relative tolerance of the stopping tests, in (0, 0.1] (10⁻⁴ by default): the fit stops when a step
    /// lowers the weighted sum of squares by less than this fraction, or moves the parameters (in the search
    /// coordinates) by less than this.</summary>
    public double Tolerance { get; init; } = 1e-4;

    /// <summary>The forward-difference step of the Jacobian in the search coordinates, in (0, 0.1] (10⁻³ by default:
    /// a 0.1 % change of a parameter searched in log space). Much smaller steps meet the simulator's rounding; much larger
    /// ones bias the slopes.</summary>
    public double DifferenceStep { get; init; } = 1e-3;

    /// <summary>The absolute correlation of two estimates at or above which the result warns that the data cannot
    /// separate them, in (0, 1) (0.95 by default).</summary>
    public double CorrelationWarningLimit { get; init; } = 0.95;

    /// <summary>Fewer observations than this many per parameter raise a warning (4 by default).</summary>
    public int ObservationsPerParameterWarning { get; init; } = 4;

    /// <summary>The id of the variant made (a valid crop id); null for <c>&lt;crop&gt;-&lt;site id&gt;</c>.</summary>
    public string? VariantId { get; init; }
}

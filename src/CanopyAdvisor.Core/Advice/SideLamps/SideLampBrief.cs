using System.Collections.Immutable;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;

namespace CanopyAdvisor.Core.Advice.SideLamps;

/// <summary>What the lighting designer allows and asks for: where side lamps may go, which fixtures, how many, and the limits.</summary>
/// <remarks>
/// <para>Benches at risk: those named in <see cref="BenchIds"/>, or, when it is empty, every bench whose forecast lean at
/// the horizon reaches <see cref="RiskFraction"/> of the crop's grade limit or that leaves grade within the horizon.</para>
/// <para>PPFD ceiling of a bench: <see cref="PpfdCeilingByBench"/>, else <see cref="PpfdCeilingByCrop"/> for the crop of
/// its lot, else <see cref="DefaultPpfdCeiling"/>, else none. It bounds the highest horizontal PPFD at any of the bench's
/// sample points at any time step of the period (daylight and lamps).</para>
/// <para>Uniformity: min/avg of the period-mean DLI over a bench's sample points; a floor of 0.7 is common practice
/// for production lighting.</para>
/// </remarks>
/// <param name="Rails">Where lamps may be mounted (at least one).</param>
/// <param name="LampTypes">Fixture models to choose from (at least one).</param>
/// <param name="MaxLamps">Most lamps to add, 0 to <see cref="SideLampPlanner.MaximumLamps"/>.</param>
/// <param name="Schedule">When the added lamps are on (site local time).</param>
public sealed record SideLampBrief(
    ImmutableArray<MountingRail> Rails,
    ImmutableArray<SideLampType> LampTypes,
    int MaxLamps,
    LampSchedule Schedule)
{
    /// <summary>The benches to treat; empty = chosen from the forecast by <see cref="RiskFraction"/>.</summary>
    public ImmutableArray<string> BenchIds { get; init; } = [];

    /// <summary>Fraction of the grade limit from which a forecast lean puts a bench at risk, in (0, 1]; 0.5 by default.</summary>
    public double RiskFraction { get; init; } = 0.5;

    /// <summary>PPFD ceilings by crop id, µmol m⁻² s⁻¹.</summary>
    public ImmutableDictionary<string, double> PpfdCeilingByCrop { get; init; } = ImmutableDictionary<string, double>.Empty;

    /// <summary>PPFD ceilings by bench id, µmol m⁻² s⁻¹ (before crop ceilings).</summary>
    public ImmutableDictionary<string, double> PpfdCeilingByBench { get; init; } = ImmutableDictionary<string, double>.Empty;

    /// <summary>PPFD ceiling of benches with no bench or crop ceiling, µmol m⁻² s⁻¹; null = none.</summary>
    public double? DefaultPpfdCeiling { get; init; }

    /// <summary>Lowest acceptable DLI uniformity (min/avg) per bench, in [0, 1]; 0.7 by default (common practice).</summary>
    public double UniformityFloor { get; init; } = 0.7;

    /// <summary>Weight of added electrical power in the objective, per kW: the share of the at-risk benches' lateral
    /// blue light that one kilowatt of added lamps is worth (≥ 0; 0.05 by default, our choice).</summary>
    public double EnergyWeightPerKilowatt { get; init; } = 0.05;

    /// <summary>Least tilt of a lamp's axis from straight down; 0° by default.</summary>
    public Angle MinTilt { get; init; } = Angle.Zero;

    /// <summary>Most tilt of a lamp's axis from straight down; 90° (horizontal) by default, at most 180°.</summary>
    public Angle MaxTilt { get; init; } = Angle.RightAngle;

    /// <summary>Seed of the random starting points; the plan is the same for the same seed and inputs.</summary>
    public int Seed { get; init; } = 1;

    /// <summary>Random starts of the local search per rail and lamp type, 1 to 64 (one more start is always aimed at the
    /// benches at risk); 4 by default.</summary>
    public int Starts { get; init; } = 4;
}

using System.Collections.Immutable;
using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Light;
using CanopyAdvisor.Core.Sites;
using NodaTime;

namespace CanopyAdvisor.Core.Advice.SideLamps;

/// <summary>A side-lamp proposal: the lamps to add, and each bench before and after (see <see cref="SideLampPlanner"/>).</summary>
/// <param name="FirstDay">First local date of the planning period (the forecast's days).</param>
/// <param name="LastDay">Last local date of the planning period.</param>
/// <param name="BenchesAtRisk">The benches the plan aimed to straighten, in site order.</param>
/// <param name="Lamps">The lamps to add (none when nothing helps enough for its energy).</param>
/// <param name="Benches">Every bench with a lot, before and after, in site order.</param>
/// <param name="Energy">Power, weekly energy and cost of the added lamps.</param>
/// <param name="LateralBlueRemaining">The at-risk benches' summed squared lateral blue light after over before
/// (1 = unchanged, 0 = cancelled at every point).</param>
/// <param name="ObjectiveWithoutLamps">The planner's objective with no lamps added (lateral term 1, no penalties).</param>
/// <param name="Objective">The planner's objective for the proposal (never above <paramref name="ObjectiveWithoutLamps"/>).</param>
/// <param name="ProposedSite">The site with the proposed lamps added.</param>
/// <param name="ForecastBefore">The lean forecast of the site as it is.</param>
/// <param name="ForecastAfter">The lean forecast with the proposed lamps.</param>
/// <param name="LightBefore">Light per bench and day over the period, as it is (with the lots' canopies).</param>
/// <param name="LightAfter">Light per bench and day with the proposed lamps.</param>
/// <param name="Notes">Plain-language notes on the plan (what was considered, what could not be met).</param>
/// <param name="Cautions">Safety cautions (<see cref="SideLampCautions.All"/>).</param>
public sealed record SideLampPlan(
    LocalDate FirstDay,
    LocalDate LastDay,
    ImmutableArray<string> BenchesAtRisk,
    ImmutableArray<ProposedSideLamp> Lamps,
    ImmutableArray<SideLampBenchOutcome> Benches,
    SideLampEnergy Energy,
    double LateralBlueRemaining,
    double ObjectiveWithoutLamps,
    double Objective,
    Site ProposedSite,
    SiteForecast ForecastBefore,
    SiteForecast ForecastAfter,
    LightPeriodSummary LightBefore,
    LightPeriodSummary LightAfter,
    ImmutableArray<string> Notes,
    ImmutableArray<string> Cautions);

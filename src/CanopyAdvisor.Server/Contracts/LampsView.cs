using NodaTime;

namespace CanopyAdvisor.Server.Contracts;

/// <summary>A side-lamp proposal with before/after figures (what <c>canopy lamps --json</c> gives).</summary>
/// <param name="SiteId">The site's store id.</param>
/// <param name="TimeZone">The site's IANA zone.</param>
/// <param name="Now">Forecast start.</param>
/// <param name="HorizonEnd">Forecast end.</param>
/// <param name="FirstDay">First local day of the light figures.</param>
/// <param name="LastDay">Last local day of the light figures.</param>
/// <param name="Seed">The search's seed.</param>
/// <param name="BenchesAtRisk">Benches the lamps are for.</param>
/// <param name="Lamps">The proposed lamps.</param>
/// <param name="Benches">Every bench before and after.</param>
/// <param name="Energy">Energy and cost of the lamps.</param>
/// <param name="LateralBlueRemaining">The at-risk benches' lateral blue light left, as a fraction of now.</param>
/// <param name="Notes">Notes on reading the proposal.</param>
/// <param name="Cautions">Safety cautions (electrical work, work at height, eyes, heat).</param>
public sealed record LampsView(
    string SiteId,
    string TimeZone,
    OffsetDateTime Now,
    OffsetDateTime HorizonEnd,
    LocalDate FirstDay,
    LocalDate LastDay,
    int Seed,
    IReadOnlyList<string> BenchesAtRisk,
    IReadOnlyList<ProposedLampView> Lamps,
    IReadOnlyList<LampsBenchView> Benches,
    LampsEnergyView Energy,
    double LateralBlueRemaining,
    IReadOnlyList<string> Notes,
    IReadOnlyList<string> Cautions);

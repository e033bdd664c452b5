namespace CanopyAdvisor.Cli;

/// <summary>The JSON shape of <c>canopy lamps --json</c>. Angles in degrees, positions in metres, light in µmol m⁻² s⁻¹ and mol m⁻² d⁻¹.</summary>
internal sealed record LampsReport(
    string SiteId,
    string SiteName,
    string TimeZone,
    string Now,
    string HorizonEnd,
    string FirstDay,
    string LastDay,
    string Weather,
    int Seed,
    IReadOnlyList<string> BenchesAtRisk,
    IReadOnlyList<ProposedLampReport> Lamps,
    IReadOnlyList<LampsBenchReport> Benches,
    LampsEnergyReport Energy,
    double LateralBlueRemaining,
    IReadOnlyList<string> Notes,
    IReadOnlyList<string> Cautions);

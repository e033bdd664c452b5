using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Tests.Forecast;
using NodaTime;
using static CanopyAdvisor.Core.Tests.Forecast.ForecastTestKit;

namespace CanopyAdvisor.Core.Tests.Advice.Rotation;

/// <summary>A scene with steady one-sided light for the rotation-policy tests (invented test data, not demo data): an
/// indoor room, one isotropic lamp always on 2.5 m east of a small bench at 1.1 m, a constant 20 °C, and the test crop
/// made to approach the first-order limit of MODEL.md §4 (a lean relaxing toward a steady A_R with one time constant τ).</summary>
/// <remarks>
/// What keeps it near that limit: no circumnutation and no gravitropic delay (no oscillation); B = 2.5, under the 2.8
/// that overshoots the vertical (Bastien et al. 2018); no low-light or shade stretch, so the elongation rate is the same
/// from the first day (otherwise the first day uses the crop's DLI target); a long growth zone (100 mm, the whole
/// plant), strong proprioception (γ = 100) and slow elongation (0.6 mm/d), so the stem matured below the growth zone
/// over the run, which keeps its lean through a turn, stays a few per cent of the height (ε̇τ ≈ 2/(γ(B + 2)) of the
/// zone per τ); 16 growth-zone segments, so the straight new growth at the apex (up to a segment) is short.
/// </remarks>
internal static class RotationTestScene
{
    public static Instant Now => WinterNow;

    /// <summary>The test crop with B = 1 (well under the 2.8 that overshoots the vertical, Bastien et al. 2018), no
    /// circumnutation and no gravitropic delay.</summary>
    public static Crop SteadyCrop { get; } = TestCrop
        .WithParameter("balanceNumber", new CropParameter(2.5, "1", 0.5, 6, "estimate (from memory)"))
        .WithParameter("proprioceptiveSensitivity", new CropParameter(100, "1", 0.5, 100, "estimate (from memory)"))
        .WithParameter("growthZoneLengthMm", new CropParameter(100, "mm", 10, 200, "estimate (from memory)"))
        .WithParameter("referenceElongationMmPerDay", new CropParameter(0.6, "mm/d", 0.3, 10, "estimate (from memory)"))
        .WithParameter("photoCoefficient", new CropParameter(0.1, "(umol m-2 s-1)^-b", 0.05, 3, "estimate (from memory)"))
        .WithParameter("lowLightStretchPerMole", new CropParameter(0, "(mol m-2 d-1)-1", 0, 0.08, "estimate (from memory)"))
        .WithParameter("shadeAvoidanceSensitivity", new CropParameter(0, "1", 0, 3, "estimate (from memory)"))
        .WithParameter("nutationAmplitudeDeg", new CropParameter(0, "deg", 0, 15, "estimate (from memory)"))
        .WithParameter("gravitropicDelayHours", new CropParameter(0, "h", 0, 1.5, "estimate (from memory)"));

    public static Lamp SideLamp { get; } =
        new("side", new Vector3(7.5, 5, 1.1), LampAim.Down, IsotropicDistribution.Instance, 400, White, 1, 100, LampSchedule.AlwaysOn);

    /// <summary>A lot planted 60 days before now, sold <paramref name="saleInDays"/> days after now.</summary>
    public static Lot Lot(int saleInDays = 10, params RotationRecord[] done)
    {
        LocalDate today = Now.InZone(London).Date;
        return new Lot("lot-b", "b", SteadyCrop.Id, today.PlusDays(-60), today.PlusDays(saleInDays), 100, today, 0.15, 120, [.. done]);
    }

    /// <summary>A session over the scene: 6-day spin-up (stems upright at its start; about six time constants), horizon
    /// to the sale, no band.</summary>
    public static ForecastSession Session(Lot? lot = null, int horizonDays = 10)
    {
        Site site = Site(Room, [Bench("b", 4, 4, 2, 2, 2, 2)], [SideLamp], lot ?? Lot(horizonDays));
        return Prepare(site, horizonDays);
    }

    /// <summary>Two benches, one near the lamp and one farther west, each with a lot of the steady crop.</summary>
    public static ForecastSession TwoBenchSession(int horizonDays = 10)
    {
        LocalDate today = Now.InZone(London).Date;
        Lot far = new("lot-far", "far", SteadyCrop.Id, today.PlusDays(-60), today.PlusDays(horizonDays), 100, today, 0.15, 60, []);
        Site site = Site(Room, [Bench("b", 4, 4, 2, 2, 2, 2), Bench("far", 1, 4, 2, 2, 2, 2)], [SideLamp], Lot(horizonDays), far);
        return Prepare(site, horizonDays);
    }

    private static ForecastSession Prepare(Site site, int horizonDays)
    {
        ForecastRequest request = Request(site, temperature: new ConstantTemperature(20), crops: SteadyCrop) with
        {
            IncludeUncertainty = false,
            SpinUp = Duration.FromDays(6),
            GrowthZoneSegments = 16,
            Horizon = Duration.FromDays(horizonDays),
        };
        return ForecastSession.Prepare(request);
    }

    /// <summary>The steady lean A_R and time constant τ of the first-order limit, from the unturned lean track: the stems
    /// start upright at the spin-up start t₀; A_R is the lean now, at the end of the 6-day spin-up (about six τ, within
    /// e⁻⁶ ≈ 0.25 % of the steady value for a first-order lean), and τ the time from t₀ to reach (1 − 1/e) A_R, linearly
    /// interpolated between hourly samples (x(τ) = A_R (1 − e⁻¹) for x′ = (A_R − x)/τ from x(0) = 0).</summary>
    public static (Angle SteadyLean, Duration TimeConstant, BenchForecast Unturned) FirstOrderFit(ForecastSession session)
    {
        BenchForecast none = session.RunLot("lot-b", new LotScenario { PlannedRotations = [] });
        var track = none.LeanTrack;
        Instant t0 = track[0].At;
        double steady = none.LeanNow.Tilt.Radians;
        double level = steady * (1 - Math.Exp(-1));
        for (int i = 1; i < track.Length; i++)
        {
            double a = track[i - 1].Lean.Tilt.Radians, b = track[i].Lean.Tilt.Radians;
            if (b >= level)
            {
                double f = (level - a) / (b - a);
                Duration at = (track[i - 1].At - t0) + ((track[i].At - track[i - 1].At) * f);
                return (Angle.FromRadians(steady), at, none);
            }
        }

        throw new InvalidOperationException("the unturned lean never reached (1 − 1/e) of its steady value");
    }
}

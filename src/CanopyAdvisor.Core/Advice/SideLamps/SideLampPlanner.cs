using System.Collections.Immutable;
using System.Globalization;
using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Light;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Structures;
using CanopyAdvisor.Core.Validation;
using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.Optimization;
using NodaTime;

namespace CanopyAdvisor.Core.Advice.SideLamps;

/// <summary>
/// Side-lamp placement (MODEL.md §6): positions on the designer's rails, aim and dimming of added lamps that cancel the
/// sideways blue light driving the lean of the benches at risk, for the least energy, within PPFD ceilings and a
/// uniformity floor; with before/after lean forecasts, light, energy and cost.
/// </summary>
/// <remarks>
/// <para><b>Why the lateral blue vector.</b> Phototropism is driven by the net blue photon flux vector (MODEL.md §3–4:
/// the AC model bends the stem toward it; isotropic light has none). Its horizontal part is what tips a stem; a side
/// lamp cancels it by adding a horizontal component the other way.</para>
/// <para><b>Existing light.</b> The site is compiled once with the lots' canopies (<see cref="LotCanopies"/>, as the
/// forecast does) and stepped over the forecast's local days on the <see cref="LightSimulation"/> grid: per sample point
/// the period-mean blue vector L (daylight and the site's lamps), DLI, and the peak PPFD with the added lamps' schedule
/// on and off.</para>
/// <para><b>Added light.</b> Each candidate lamp's flux vector at each point comes from the compiler's own point-source
/// law (<see cref="LightFieldCompiler"/>: E = Φ·I(θ, φ)/d², the inverse-square law with the lamp's distribution about
/// its aim, times the canopy's Beer–Lambert transmission exp(−G·LAD·path) with G = 0.5 (Monsi &amp; Saeki 1953), zero
/// when a bench top or the enclosure blocks the segment). Its period-mean blue contribution is A = blue fraction ×
/// dimming × E·û × (share of the period the schedule is on); its horizontal PPFD while on is E·max(0, û·ẑ).</para>
/// <para><b>Objective</b> (dimensionless, 1 with no lamps):
/// J = [Σ_risk |L_xy + A_xy|² + Σ_other max(0, |L_xy + A_xy|² − |L_xy|²)] / Σ_risk |L_xy|²
/// + w·P/1 kW + K·Σ_points q(max(0, peak_on + H − max(C, peak_on))/C) + K·Σ_benches q(max(0, min(U_floor, U_before) − U_after)),
/// with q(v) = v + v²,
/// where w is <see cref="SideLampBrief.EnergyWeightPerKilowatt"/>, P the added power (watts × dimming), C a bench's PPFD
/// ceiling, H the added PPFD while on, U = min/avg of the points' period DLI (floor 0.7: common practice), and
/// K = 1000. Benches not at risk count only where the lamps make their sideways light worse. The penalties only stop
/// the lamps from making a limit worse: a ceiling already passed by daylight, or a uniformity already below the floor,
/// is reported as unmet before (<see cref="LimitCheck.UnmetBefore"/>) rather than blamed on the lamps.</para>
/// <para><b>Search.</b> Lamps are added greedily, one at a time, up to <see cref="SideLampBrief.MaxLamps"/>: for every
/// rail and lamp type, a local search from one start aimed at the at-risk benches' centre and
/// <see cref="SideLampBrief.Starts"/> random starts (System.Random seeded with <see cref="SideLampBrief.Seed"/>, drawn in
/// a fixed order); then all chosen lamps are polished together. A lamp is kept only if it lowers J, so the plan is never
/// worse than adding nothing. The local search is Nelder–Mead (MathNet.Numerics <see cref="NelderMeadSimplex"/>) over
/// the position fraction, yaw, tilt and dimming, each bounded by the transform x = lo + (hi − lo)(1 − cos u)/2, so every
/// point tried is within bounds; a search that reaches its iteration limit keeps the best point it saw. Starts run in
/// parallel but each is deterministic and the best is chosen by value then start order, so a seed gives one plan.</para>
/// <para><b>After.</b> The proposed site (the site's lamps plus the added ones) is forecast again
/// (<see cref="BenchForecaster"/>) and its light simulated (<see cref="LightSimulation"/>) for the before/after report;
/// energy per week is watts × dimming × on-hours / 1000 (<see cref="SideLampEnergy"/>) and cost uses
/// <see cref="Site.Tariff"/>.</para>
/// </remarks>
public static class SideLampPlanner
{
    /// <summary>Most lamps one plan may add.</summary>
    public const int MaximumLamps = 12;

    /// <summary>Most random starts per rail and lamp type.</summary>
    public const int MaximumStarts = 64;

    /// <summary>Spacing of the points along a rail checked to lie inside the structure, metres.</summary>
    private const double RailCheckSpacingM = 0.25;

    /// <summary>Nelder–Mead iterations allowed per variable.</summary>
    private const int IterationsPerVariable = 250;

    /// <summary>Variables per lamp: position fraction, yaw, tilt, dimming.</summary>
    private const int VariablesPerLamp = 4;

    /// <summary>Checks a brief against a site; every problem with its path in the brief file's names.</summary>
    /// <param name="brief">The brief.</param>
    /// <param name="site">The site the lamps would be added to.</param>
    public static IReadOnlyList<ValidationError> Validate(SideLampBrief brief, Site site)
    {
        ArgumentNullException.ThrowIfNull(brief);
        ArgumentNullException.ThrowIfNull(site);
        var errors = new List<ValidationError>();
        ImmutableArray<MountingRail> rails = brief.Rails.IsDefault ? [] : brief.Rails;
        if (rails.Length == 0)
        {
            errors.Add(new("rails", "at least one rail is required"));
        }

        var railIds = new HashSet<string>(StringComparer.Ordinal);
        ImmutableArray<Bench> canopies = WithLotHeights(site);
        for (int i = 0; i < rails.Length; i++)
        {
            ValidateRail(rails[i], Item("rails", i), site, canopies, railIds, errors);
        }

        ImmutableArray<SideLampType> types = brief.LampTypes.IsDefault ? [] : brief.LampTypes;
        if (types.Length == 0)
        {
            errors.Add(new("lampTypes", "at least one lamp type is required"));
        }

        var typeNames = new HashSet<string>(StringComparer.Ordinal);
        for (int i = 0; i < types.Length; i++)
        {
            string path = Item("lampTypes", i);
            SideLampType? type = types[i];
            if (type is null || type.Distribution is null || type.Bands is null)
            {
                errors.Add(new(path, "must name a lamp type with a beam and bands"));
                continue;
            }

            if (!typeNames.Add(type.Name ?? string.Empty))
            {
                errors.Add(new(path, $"lamp type '{type.Name}' is listed twice"));
            }

            errors.AddRange(SiteValidator.CheckLampOutput(type.PpfMicromolesPerSecond, type.Watts, type.Bands, path));
            if (!double.IsFinite(type.PpfMicromolesPerSecond) || !double.IsFinite(type.Watts))
            {
                errors.Add(new(path, "photon flux and watts must be finite"));
            }
        }

        if (brief.MaxLamps is < 0 or > MaximumLamps)
        {
            errors.Add(new("maxLamps", string.Create(CultureInfo.InvariantCulture, $"must be within [0, {MaximumLamps}], got {brief.MaxLamps}")));
        }

        if (brief.Schedule is null)
        {
            errors.Add(new("schedule", "is required"));
        }
        else if (brief.Schedule.OffAboveOutsidePpfd is double threshold && !(threshold >= 0 && double.IsFinite(threshold)))
        {
            errors.Add(new("schedule.offAboveOutsidePpfd", "must be a finite number ≥ 0"));
        }

        var lotBenches = new HashSet<string>(site.Lots.IsDefault ? [] : site.Lots.Select(l => l.BenchId), StringComparer.Ordinal);
        var benchIds = new HashSet<string>(site.Benches.IsDefault ? [] : site.Benches.Select(b => b.Id), StringComparer.Ordinal);
        ImmutableArray<string> named = brief.BenchIds.IsDefault ? [] : brief.BenchIds;
        for (int i = 0; i < named.Length; i++)
        {
            if (!benchIds.Contains(named[i] ?? string.Empty))
            {
                errors.Add(new(Item("benches", i), $"no bench '{named[i]}' in the site (benches: {string.Join(", ", benchIds.Order(StringComparer.Ordinal))})"));
            }
            else if (!lotBenches.Contains(named[i]))
            {
                errors.Add(new(Item("benches", i), $"bench '{named[i]}' has no lot: there is no lean to forecast or straighten"));
            }
        }

        if (!(brief.RiskFraction > 0 && brief.RiskFraction <= 1))
        {
            errors.Add(new("riskFraction", Got("must be within (0, 1]", brief.RiskFraction)));
        }

        if (brief.PpfdCeilingByBench is null || brief.PpfdCeilingByCrop is null)
        {
            errors.Add(new("ppfdCeilings", "the ceiling maps must not be null"));
            return errors;
        }

        foreach ((string bench, double ceiling) in brief.PpfdCeilingByBench.OrderBy(p => p.Key, StringComparer.Ordinal))
        {
            string path = $"ppfdCeilings.byBench.{bench}";
            if (!benchIds.Contains(bench))
            {
                errors.Add(new(path, $"no bench '{bench}' in the site"));
            }

            CheckCeiling(ceiling, path, errors);
        }

        foreach ((string crop, double ceiling) in brief.PpfdCeilingByCrop.OrderBy(p => p.Key, StringComparer.Ordinal))
        {
            CheckCeiling(ceiling, $"ppfdCeilings.byCrop.{crop}", errors);
        }

        if (brief.DefaultPpfdCeiling is double fallback)
        {
            CheckCeiling(fallback, "ppfdCeilings.default", errors);
        }

        if (!(brief.UniformityFloor >= 0 && brief.UniformityFloor <= 1))
        {
            errors.Add(new("uniformityFloor", Got("must be within [0, 1]", brief.UniformityFloor)));
        }

        if (!(brief.EnergyWeightPerKilowatt >= 0) || !double.IsFinite(brief.EnergyWeightPerKilowatt))
        {
            errors.Add(new("energyWeightPerKW", Got("must be a finite number ≥ 0", brief.EnergyWeightPerKilowatt)));
        }

        if (!(brief.MinTilt.Degrees >= 0 && brief.MinTilt.Degrees <= 180))
        {
            errors.Add(new("tiltDeg.min", Got("must be within [0, 180]", brief.MinTilt.Degrees)));
        }

        if (!(brief.MaxTilt.Degrees >= 0 && brief.MaxTilt.Degrees <= 180))
        {
            errors.Add(new("tiltDeg.max", Got("must be within [0, 180]", brief.MaxTilt.Degrees)));
        }
        else if (brief.MaxTilt < brief.MinTilt)
        {
            errors.Add(new("tiltDeg.max", Got("must not be below tiltDeg.min", brief.MaxTilt.Degrees)));
        }

        if (brief.Starts is < 1 or > MaximumStarts)
        {
            errors.Add(new("starts", string.Create(CultureInfo.InvariantCulture, $"must be within [1, {MaximumStarts}], got {brief.Starts}")));
        }

        return errors;
    }

    /// <summary>Proposes side lamps for a site and reports each bench before and after.</summary>
    /// <param name="brief">Rails, lamp types, limits and search settings.</param>
    /// <param name="forecast">The lean forecast request of the site as it is (site with lots, crops, outside light,
    /// temperature, now, horizon); the planning period is its local days.</param>
    /// <param name="progress">Receives the fraction done, in (0, 1] (from worker threads too).</param>
    /// <param name="cancellationToken">Stops the run.</param>
    /// <exception cref="InvalidInputException">The brief or the forecast request is not usable; every problem is listed.</exception>
    public static SideLampPlan Plan(
        SideLampBrief brief, ForecastRequest forecast, IProgress<double>? progress = null, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(brief);
        ArgumentNullException.ThrowIfNull(forecast);
        Site site = forecast.Site ?? throw new InvalidInputException("site", "is required");
        IReadOnlyList<ValidationError> errors = Validate(brief, site);
        if (errors.Count > 0)
        {
            throw new InvalidInputException(errors);
        }

        SiteForecast before = BenchForecaster.Run(forecast, new ScaledProgress(progress, 0, 0.3), cancellationToken);
        DateTimeZone zone = site.Zone;
        LocalDate firstDay = before.Now.InZone(zone).Date;
        LocalDate lastDay = (before.HorizonEnd - Duration.Epsilon).InZone(zone).Date;
        if (lastDay < firstDay)
        {
            lastDay = firstDay;
        }

        var benchIndex = new Dictionary<string, int>(StringComparer.Ordinal);
        for (int b = site.Benches.Length - 1; b >= 0; b--)
        {
            benchIndex[site.Benches[b].Id] = b;
        }

        ImmutableArray<BenchForecast> forecasts = before.Benches;
        var named = new HashSet<string>(brief.BenchIds.IsDefault ? [] : brief.BenchIds, StringComparer.Ordinal);
        bool[] riskOfSlot = [.. forecasts.Select(f => named.Count > 0 ? named.Contains(f.BenchId) : IsAtRisk(f, brief.RiskFraction))];

        // The light as it is, once, with the lots' canopies.
        Site planning = LotCanopies.Apply(forecast);
        CompiledLightField field = LightFieldCompiler.Compile(planning, EnclosureBuilder.Build(planning), forecast.LightOptions);
        ExistingLight existing = ExistingLight.Measure(field, forecast.OutsideLight, brief.Schedule, firstDay, lastDay, cancellationToken);
        LightPeriodSummary lightBefore = LightSimulation.Run(field, forecast.OutsideLight, firstDay, lastDay, null, null, cancellationToken);
        progress?.Report(0.35);

        var points = new List<int>();
        var slotOf = new List<int>();
        var riskOf = new List<bool>();
        double[] ceilingOfSlot = new double[forecasts.Length];
        Vector3 riskSum = Vector3.Zero;
        int riskCount = 0;
        for (int s = 0; s < forecasts.Length; s++)
        {
            (int start, int count) = field.PointsOfBench(benchIndex[forecasts[s].BenchId]);
            for (int p = start; p < start + count; p++)
            {
                points.Add(p);
                slotOf.Add(s);
                riskOf.Add(riskOfSlot[s]);
                if (riskOfSlot[s])
                {
                    riskSum += field.Points[p].Position;
                    riskCount++;
                }
            }

            ceilingOfSlot[s] = CeilingOf(brief, forecasts[s].BenchId, forecasts[s].CropId) ?? double.NaN;
        }

        var objective = new SideLampObjective(field, existing, brief, [.. points], [.. slotOf], [.. riskOf], ceilingOfSlot, forecasts.Length);
        List<Placement> chosen = riskCount == 0 || brief.MaxLamps == 0
            ? []
            : Search(objective, brief, riskSum / riskCount, new ScaledProgress(progress, 0.35, 0.7), cancellationToken);

        double[] added = new double[objective.Length];
        double watts = 0;
        foreach (Placement placement in chosen)
        {
            AddScaled(added, objective.Contribution(placement), placement.Dimming);
            watts += objective.Watts(placement);
        }

        ObjectiveTerms without = objective.Evaluate(new double[objective.Length], 0);
        ObjectiveTerms with = objective.Evaluate(added, watts);

        // The proposed site.
        var ids = new HashSet<string>(site.Lamps.Select(l => l.Id), StringComparer.Ordinal);
        var proposedLamps = ImmutableArray.CreateBuilder<ProposedSideLamp>(chosen.Count);
        foreach (Placement placement in chosen)
        {
            string id = UniqueId($"side-plan-{proposedLamps.Count + 1}", ids);
            MountingRail rail = brief.Rails[placement.Rail];
            proposedLamps.Add(new ProposedSideLamp(
                objective.MakeLamp(placement, id), rail.Id, brief.LampTypes[placement.Type].Name, placement.Fraction,
                placement.Fraction * rail.LengthM));
        }

        ImmutableArray<Lamp> newLamps = [.. proposedLamps.Select(p => p.Lamp)];
        Site proposed = site with { Lamps = site.Lamps.AddRange(newLamps) };
        SiteForecast after = newLamps.IsEmpty
            ? before
            : BenchForecaster.Run(forecast with { Site = proposed }, new ScaledProgress(progress, 0.7, 0.95), cancellationToken);
        LightPeriodSummary lightAfter = lightBefore;
        if (!newLamps.IsEmpty)
        {
            Site planningAfter = planning with { Lamps = planning.Lamps.AddRange(newLamps) };
            CompiledLightField fieldAfter = LightFieldCompiler.Compile(planningAfter, EnclosureBuilder.Build(planningAfter), forecast.LightOptions);
            lightAfter = LightSimulation.Run(fieldAfter, forecast.OutsideLight, firstDay, lastDay, null, null, cancellationToken);
        }

        // Bench by bench.
        var outcomes = ImmutableArray.CreateBuilder<SideLampBenchOutcome>(forecasts.Length);
        var notes = ImmutableArray.CreateBuilder<string>();
        double[] none = new double[objective.Length];
        double riskBefore = 0, riskAfter = 0;
        for (int s = 0; s < forecasts.Length; s++)
        {
            BenchForecast f = forecasts[s];
            int b = benchIndex[f.BenchId];
            int[] mine = [.. Enumerable.Range(0, points.Count).Where(i => slotOf[i] == s)];
            BenchLightFigures lb = Figures(lightBefore, b, objective, mine, none);
            BenchLightFigures la = Figures(lightAfter, b, objective, mine, added);
            if (riskOfSlot[s])
            {
                foreach (int i in mine)
                {
                    (double e0, double n0) = objective.LateralAfter(i, none);
                    (double e1, double n1) = objective.LateralAfter(i, added);
                    riskBefore += (e0 * e0) + (n0 * n0);
                    riskAfter += (e1 * e1) + (n1 * n1);
                }
            }

            double? ceiling = double.IsNaN(ceilingOfSlot[s]) ? null : ceilingOfSlot[s];
            LimitCheck ceilingCheck = ceiling is double c
                ? Check(la.PeakPpfd <= c * (1 + 1e-9), lb.PeakPpfd <= c * (1 + 1e-9), la.PeakPpfd <= lb.PeakPpfd + (1e-9 * Math.Max(1, lb.PeakPpfd)))
                : LimitCheck.NotSet;
            double floor = brief.UniformityFloor;
            LimitCheck uniformityCheck = floor > 0
                ? Check((la.Uniformity ?? 1) >= floor - 1e-9, (lb.Uniformity ?? 1) >= floor - 1e-9, (la.Uniformity ?? 1) >= (lb.Uniformity ?? 1) - 1e-6)
                : LimitCheck.NotSet;
            outcomes.Add(new SideLampBenchOutcome(
                f.BenchId, f.CropId, riskOfSlot[s], f, after.Benches[s], lb, la, ceiling, ceilingCheck, uniformityCheck));
            AddLimitNotes(notes, f.BenchId, ceiling, lb, la, ceilingCheck, floor, uniformityCheck);
        }

        double remaining = riskBefore > 0 ? riskAfter / riskBefore : 1;
        ImmutableArray<string> atRisk = [.. forecasts.Where((_, s) => riskOfSlot[s]).Select(f => f.BenchId)];
        AddPlanNotes(notes, brief, site, forecasts, atRisk, newLamps.Length, remaining, forecast.SpinUp);

        SideLampEnergy energy = SideLampEnergy.From(
            watts, existing.OnSecondsPerDay * 7 / ModelConstants.SecondsPerHour, site.Tariff);
        progress?.Report(1);
        return new SideLampPlan(
            firstDay, lastDay, atRisk, proposedLamps.MoveToImmutable(), outcomes.MoveToImmutable(), energy, remaining,
            without.Total, with.Total, proposed, before, after, lightBefore, lightAfter, notes.ToImmutable(), SideLampCautions.All);
    }

    /// <summary>Whether a bench's forecast puts it at risk: it leaves grade within the horizon, or its lean at the
    /// horizon reaches the given fraction of the grade limit.</summary>
    private static bool IsAtRisk(BenchForecast forecast, double fraction) =>
        forecast.LeavesGradeAt is not null || forecast.LeanAtHorizon.Tilt.Radians >= fraction * forecast.LeanGradeLimit.Radians;

    private static double? CeilingOf(SideLampBrief brief, string benchId, string cropId) =>
        brief.PpfdCeilingByBench.TryGetValue(benchId, out double byBench) ? byBench
        : brief.PpfdCeilingByCrop.TryGetValue(cropId, out double byCrop) ? byCrop
        : brief.DefaultPpfdCeiling;

    private static LimitCheck Check(bool metAfter, bool metBefore, bool notWorse) =>
        metAfter ? LimitCheck.Met : !metBefore && notWorse ? LimitCheck.UnmetBefore : LimitCheck.Unmet;

    private static BenchLightFigures Figures(LightPeriodSummary summary, int benchIndex, SideLampObjective objective, int[] mine, double[] added)
    {
        List<BenchDayLight> days = [.. summary.ForBench(benchIndex)];
        int count = days.Count > 0 ? days[0].Points.Length : 0;
        double min = double.PositiveInfinity, sum = 0;
        for (int k = 0; k < count; k++)
        {
            double dli = days.Average(d => d.Points[k].Dli);
            min = Math.Min(min, dli);
            sum += dli;
        }

        double mean = count > 0 ? sum / count : 0;
        double peak = 0, lateral = 0;
        foreach (int i in mine)
        {
            peak = Math.Max(peak, objective.PeakAfter(i, added));
            (double east, double north) = objective.LateralAfter(i, added);
            lateral += Math.Sqrt((east * east) + (north * north));
        }

        return new BenchLightFigures(
            days.Count > 0 ? days.Average(d => d.MeanHorizontalPpfd) : 0,
            peak,
            days.Count > 0 ? days.Average(d => d.Dli) : 0,
            mean > 0 ? min / mean : null,
            mine.Length > 0 ? lateral / mine.Length : 0);
    }

    private static void AddLimitNotes(
        ImmutableArray<string>.Builder notes, string benchId, double? ceiling, BenchLightFigures before, BenchLightFigures after,
        LimitCheck ceilingCheck, double floor, LimitCheck uniformityCheck)
    {
        var c = CultureInfo.InvariantCulture;
        if (ceilingCheck == LimitCheck.Unmet)
        {
            notes.Add(string.Create(c, $"{benchId}: the PPFD ceiling of {ceiling:0} µmol m⁻² s⁻¹ is not met with the proposed lamps (peak {after.PeakPpfd:0}, before {before.PeakPpfd:0})."));
        }
        else if (ceilingCheck == LimitCheck.UnmetBefore)
        {
            notes.Add(string.Create(c, $"{benchId}: the peak PPFD is already above the ceiling of {ceiling:0} µmol m⁻² s⁻¹ without added lamps (peak {before.PeakPpfd:0}); the proposed lamps do not raise it."));
        }

        if (uniformityCheck == LimitCheck.Unmet)
        {
            notes.Add(string.Create(c, $"{benchId}: DLI uniformity {after.Uniformity:0.00} with the proposed lamps is below the floor of {floor:0.00} (before {before.Uniformity:0.00})."));
        }
        else if (uniformityCheck == LimitCheck.UnmetBefore)
        {
            notes.Add(string.Create(c, $"{benchId}: DLI uniformity is already below the floor of {floor:0.00} without added lamps ({before.Uniformity:0.00}); the proposed lamps do not lower it ({after.Uniformity:0.00})."));
        }
    }

    private static void AddPlanNotes(
        ImmutableArray<string>.Builder notes, SideLampBrief brief, Site site, ImmutableArray<BenchForecast> forecasts,
        ImmutableArray<string> atRisk, int lampCount, double remaining, Duration spinUp)
    {
        var c = CultureInfo.InvariantCulture;
        if (atRisk.IsEmpty)
        {
            notes.Insert(0, string.Create(c, $"No bench's forecast lean reaches {brief.RiskFraction:0.##} of its grade limit within the horizon: no side lamps are proposed."));
        }
        else if (lampCount == 0)
        {
            notes.Insert(0, brief.MaxLamps == 0
                ? "The brief allows no lamps (maxLamps 0): the report shows the site as it is."
                : "No placement on the allowed rails lowered the lateral blue light enough for its energy and within the limits: no side lamps are proposed.");
        }
        else
        {
            string share = remaining < 0.001 ? "less than 0.1 %" : string.Create(c, $"{remaining * 100:0.#} %");
            notes.Insert(0, $"The {lampCount} proposed lamp(s) bring the at-risk benches' lateral blue light (sum of squares over their sample points) to {share} of what it is now.");
            notes.Insert(1, string.Create(c, $"The forecast with the lamps has them on through its {spinUp.TotalDays:0.#}-day spin-up too, as if installed then: read the lean at the horizon and the rate as their settled effect; on the day they go in, the lean now is the one without them."));
        }

        var withLots = new HashSet<string>(forecasts.Select(f => f.BenchId), StringComparer.Ordinal);
        string[] without = [.. site.Benches.Select(b => b.Id).Where(id => !withLots.Contains(id))];
        if (without.Length > 0)
        {
            notes.Add($"Benches without a lot are not considered: {string.Join(", ", without)}.");
        }
    }

    /// <summary>Greedy addition of lamps with multi-start local search, then a joint polish (see the class remarks).</summary>
    private static List<Placement> Search(
        SideLampObjective objective, SideLampBrief brief, Vector3 target, IProgress<double>? progress, CancellationToken cancellationToken)
    {
        var random = new Random(brief.Seed);
        var chosen = new List<Placement>();
        double[] fixedSum = new double[objective.Length];
        double fixedWatts = 0;
        double current = objective.Evaluate(fixedSum, 0).Total;
        for (int k = 0; k < brief.MaxLamps; k++)
        {
            // Starting points, drawn from the seeded generator in a fixed order.
            var starts = new List<double[]>();
            var kinds = new List<(int Rail, int Type)>();
            for (int r = 0; r < brief.Rails.Length; r++)
            {
                for (int t = 0; t < brief.LampTypes.Length; t++)
                {
                    kinds.Add((r, t));
                    starts.Add(AimedStart(brief, r, target));
                    for (int j = 0; j < brief.Starts; j++)
                    {
                        kinds.Add((r, t));
                        starts.Add(RandomStart(brief, r, random));
                    }
                }
            }

            var results = new (double Value, Placement Placement)[starts.Count];
            double[] baseSum = fixedSum;
            double baseWatts = fixedWatts;
            Parallel.For(0, starts.Count, new ParallelOptions { CancellationToken = cancellationToken }, i =>
            {
                (int rail, int type) = kinds[i];
                results[i] = LocalSearch(objective, brief, [(rail, type)], starts[i], baseSum, baseWatts);
            });

            int best = 0;
            for (int i = 1; i < results.Length; i++)
            {
                if (results[i].Value < results[best].Value)
                {
                    best = i;
                }
            }

            List<Placement> candidate = [.. chosen, results[best].Placement];
            double value = results[best].Value;
            if (candidate.Count > 1)
            {
                (double polished, List<Placement> together) = Polish(objective, brief, candidate);
                if (polished < value)
                {
                    value = polished;
                    candidate = together;
                }
            }

            progress?.Report((k + 1) / (double)brief.MaxLamps);
            if (!(value < current - (1e-9 * Math.Max(1, Math.Abs(current)))))
            {
                break;
            }

            chosen = candidate;
            current = value;
            fixedSum = new double[objective.Length];
            fixedWatts = 0;
            foreach (Placement placement in chosen)
            {
                AddScaled(fixedSum, objective.Contribution(placement), placement.Dimming);
                fixedWatts += objective.Watts(placement);
            }
        }

        progress?.Report(1);
        return chosen;
    }

    /// <summary>Polishes all chosen lamps together (their rails and types held) from where they are.</summary>
    private static (double Value, List<Placement> Placements) Polish(SideLampObjective objective, SideLampBrief brief, List<Placement> placements)
    {
        double[] start = new double[VariablesPerLamp * placements.Count];
        for (int i = 0; i < placements.Count; i++)
        {
            Placement p = placements[i];
            start[VariablesPerLamp * i] = p.Fraction;
            start[(VariablesPerLamp * i) + 1] = p.YawRadians;
            start[(VariablesPerLamp * i) + 2] = p.TiltRadians;
            start[(VariablesPerLamp * i) + 3] = p.Dimming;
        }

        (double value, List<Placement> result) = LocalSearchMany(
            objective, brief, [.. placements.Select(p => (p.Rail, p.Type))], start, new double[objective.Length], 0);
        return (value, result);
    }

    private static (double Value, Placement Placement) LocalSearch(
        SideLampObjective objective, SideLampBrief brief, (int Rail, int Type)[] kinds, double[] start, double[] baseSum, double baseWatts)
    {
        (double value, List<Placement> placements) = LocalSearchMany(objective, brief, kinds, start, baseSum, baseWatts);
        return (value, placements[0]);
    }

    /// <summary>Nelder–Mead over the bounded variables of some lamps (on top of fixed light), keeping the best point seen.</summary>
    private static (double Value, List<Placement> Placements) LocalSearchMany(
        SideLampObjective objective, SideLampBrief brief, (int Rail, int Type)[] kinds, double[] start, double[] baseSum, double baseWatts)
    {
        int lamps = kinds.Length;
        double[] u0 = new double[start.Length];
        for (int i = 0; i < lamps; i++)
        {
            for (int v = 0; v < VariablesPerLamp; v++)
            {
                int k = (VariablesPerLamp * i) + v;
                u0[k] = ToInternal(brief, kinds[i].Rail, v, start[k]);
            }
        }

        double bestValue = double.PositiveInfinity;
        List<Placement> best = [.. Decode(brief, kinds, u0)];
        double Evaluate(Vector<double> u)
        {
            List<Placement> placements = Decode(brief, kinds, [.. u]);
            double[] sum = (double[])baseSum.Clone();
            double watts = baseWatts;
            foreach (Placement p in placements)
            {
                AddScaled(sum, objective.Contribution(p), p.Dimming);
                watts += objective.Watts(p);
            }

            double value = objective.Evaluate(sum, watts).Total;
            if (value < bestValue)
            {
                bestValue = value;
                best = placements;
            }

            return value;
        }

        var simplex = new NelderMeadSimplex(1e-10, IterationsPerVariable * start.Length);
        try
        {
            simplex.FindMinimum(
                ObjectiveFunction.Value(Evaluate), Vector<double>.Build.DenseOfArray(u0), Vector<double>.Build.Dense(u0.Length, 0.5));
        }
        catch (MaximumIterationsException)
        {
            // The best point seen so far is kept.
        }

        return (bestValue, best);
    }

    private static List<Placement> Decode(SideLampBrief brief, (int Rail, int Type)[] kinds, double[] u)
    {
        var result = new List<Placement>(kinds.Length);
        for (int i = 0; i < kinds.Length; i++)
        {
            int k = VariablesPerLamp * i;
            int rail = kinds[i].Rail;
            result.Add(new Placement(
                rail,
                kinds[i].Type,
                ToNatural(brief, rail, 0, u[k]),
                ToNatural(brief, rail, 1, u[k + 1]),
                ToNatural(brief, rail, 2, u[k + 2]),
                ToNatural(brief, rail, 3, u[k + 3])));
        }

        return result;
    }

    /// <summary>Bounds of variable v (0 fraction, 1 yaw, 2 tilt, 3 dimming) of a lamp on a rail; null = unbounded (free yaw).</summary>
    private static (double Low, double High)? Bounds(SideLampBrief brief, int rail, int v)
    {
        MountingRail r = brief.Rails[rail];
        return v switch
        {
            0 => (0, r.LengthM > 0 ? 1 : 0),
            1 => r.Facing is Angle facing ? (facing.Radians - r.YawHalfRange.Radians, facing.Radians + r.YawHalfRange.Radians) : null,
            2 => (brief.MinTilt.Radians, brief.MaxTilt.Radians),
            _ => (0, 1),
        };
    }

    private static double ToNatural(SideLampBrief brief, int rail, int v, double u)
    {
        if (Bounds(brief, rail, v) is not (double low, double high))
        {
            return u;
        }

        return Math.Clamp(low + ((high - low) * (1 - Math.Cos(u)) / 2), low, high);
    }

    private static double ToInternal(SideLampBrief brief, int rail, int v, double x)
    {
        if (Bounds(brief, rail, v) is not (double low, double high))
        {
            return x;
        }

        return high > low ? Math.Acos(Math.Clamp(1 - (2 * (x - low) / (high - low)), -1, 1)) : 0;
    }

    /// <summary>A start aimed at the at-risk benches' centre from the nearest point of the rail, half dimmed.</summary>
    private static double[] AimedStart(SideLampBrief brief, int rail, Vector3 target)
    {
        MountingRail r = brief.Rails[rail];
        Vector3 along = r.End - r.Start;
        double fraction = along.LengthSquared > 0 ? Math.Clamp(Vector3.Dot(target - r.Start, along) / along.LengthSquared, 0, 1) : 0;
        Vector3 toward = target - r.At(fraction);
        double yaw = Math.Atan2(toward.X, toward.Y);
        if (r.Facing is Angle facing)
        {
            double offset = Math.IEEERemainder(yaw - facing.Radians, 2 * Math.PI);
            yaw = facing.Radians + Math.Clamp(offset, -r.YawHalfRange.Radians, r.YawHalfRange.Radians);
        }

        double tilt = Math.Atan2(Math.Sqrt((toward.X * toward.X) + (toward.Y * toward.Y)), -toward.Z);
        tilt = Math.Clamp(tilt, brief.MinTilt.Radians, brief.MaxTilt.Radians);
        return [fraction, yaw, tilt, 0.5];
    }

    private static double[] RandomStart(SideLampBrief brief, int rail, Random random)
    {
        double[] x = new double[VariablesPerLamp];
        for (int v = 0; v < VariablesPerLamp; v++)
        {
            double draw = random.NextDouble();
            x[v] = Bounds(brief, rail, v) is (double low, double high) ? low + ((high - low) * draw) : 2 * Math.PI * draw;
        }

        return x;
    }

    private static void AddScaled(double[] into, double[] values, double scale)
    {
        for (int i = 0; i < into.Length; i++)
        {
            into[i] += scale * values[i];
        }
    }

    private static string UniqueId(string wanted, HashSet<string> taken)
    {
        string id = wanted;
        for (int n = 2; taken.Contains(id); n++)
        {
            id = string.Create(CultureInfo.InvariantCulture, $"{wanted}-{n}");
        }

        taken.Add(id);
        return id;
    }

    /// <summary>The site's benches with each lot's measured height as the canopy height where it is taller (the forecast
    /// grows the canopy from the lot, <see cref="LotCanopies"/>), so a rail may not pass through the plants.</summary>
    private static ImmutableArray<Bench> WithLotHeights(Site site)
    {
        ImmutableArray<Bench> benches = site.Benches.IsDefault ? [] : site.Benches;
        if (site.Lots.IsDefaultOrEmpty)
        {
            return benches;
        }

        var builder = benches.ToBuilder();
        for (int b = 0; b < builder.Count; b++)
        {
            Bench? bench = builder[b];
            if (bench?.Canopy is null)
            {
                continue;
            }

            foreach (Lot lot in site.Lots.Where(l => l is not null && l.BenchId == bench.Id))
            {
                double heightM = lot.HeightMm / ModelConstants.MillimetresPerMetre;
                if (heightM > bench.Canopy.HeightM)
                {
                    builder[b] = bench with { Canopy = bench.Canopy with { HeightM = heightM } };
                }
            }
        }

        return builder.MoveToImmutable();
    }

    private static void ValidateRail(MountingRail? rail, string path, Site site, ImmutableArray<Bench> benches, HashSet<string> ids, List<ValidationError> errors)
    {
        if (rail is null)
        {
            errors.Add(new(path, "is required"));
            return;
        }

        if (string.IsNullOrWhiteSpace(rail.Id))
        {
            errors.Add(new($"{path}.id", "must not be empty"));
        }
        else if (!ids.Add(rail.Id))
        {
            errors.Add(new($"{path}.id", $"rail id '{rail.Id}' is used twice"));
        }

        bool finite = Finite(rail.Start) && Finite(rail.End);
        if (!finite)
        {
            errors.Add(new(path, "start and end must be finite"));
        }

        if (rail.Facing is Angle facing && !double.IsFinite(facing.Radians))
        {
            errors.Add(new($"{path}.facingDeg", "must be finite"));
        }

        if (!(rail.YawHalfRange.Degrees > 0 && rail.YawHalfRange.Degrees <= 180))
        {
            errors.Add(new($"{path}.yawRangeDeg", Got("must be within (0, 180]", rail.YawHalfRange.Degrees)));
        }

        if (!finite || site.Structure is null || benches.Any(b => b?.Canopy is null || b.Footprint is null))
        {
            return;
        }

        // The whole rail must be a place where a lamp may hang: inside the structure, out of the canopies.
        double length = rail.LengthM;
        int steps = Math.Min(10_000, Math.Max(1, (int)Math.Ceiling(length / RailCheckSpacingM)));
        for (int i = 0; i <= steps; i++)
        {
            double f = i / (double)steps;
            var probe = new Lamp(
                rail.Id, rail.At(f), Lamps.LampAim.Down, Lamps.IsotropicDistribution.Instance, 1, new Lamps.BandFractions(1, 0, 0, 0), 1, 0,
                Lamps.LampSchedule.AlwaysOn);
            ValidationError? problem = SiteValidator.CheckLampPlace(probe, path, site.Structure, benches).FirstOrDefault();
            if (problem is not null)
            {
                errors.Add(new(path, string.Create(CultureInfo.InvariantCulture, $"at {f * length:0.##} m from its start: {problem.Message}")));
                return;
            }
        }
    }

    private static void CheckCeiling(double ceiling, string path, List<ValidationError> errors)
    {
        if (!(ceiling > 0) || !double.IsFinite(ceiling))
        {
            errors.Add(new(path, Got("must be a finite number > 0 (µmol m⁻² s⁻¹)", ceiling)));
        }
    }

    private static bool Finite(Vector3 v) => double.IsFinite(v.X) && double.IsFinite(v.Y) && double.IsFinite(v.Z);

    private static string Item(string parent, int index) => string.Create(CultureInfo.InvariantCulture, $"{parent}[{index}]");

    private static string Got(string rule, double value) => string.Create(CultureInfo.InvariantCulture, $"{rule}, got {value}");

    /// <summary>Maps a sub-task's progress into a range of the whole.</summary>
    private sealed class ScaledProgress(IProgress<double>? inner, double from, double to) : IProgress<double>
    {
        public void Report(double value) => inner?.Report(from + ((to - from) * Math.Clamp(value, 0, 1)));
    }
}

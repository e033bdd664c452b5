using System.Collections.Immutable;
using System.Globalization;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Light;
using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Core.Plants.Growth;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Structures;
using CanopyAdvisor.Core.Validation;
using NodaTime;

namespace CanopyAdvisor.Core.Forecast;

/// <summary>
/// The bench lean forecast: for every bench with a lot, a stem per sample point (the AC model, <see cref="Stem"/>)
/// driven by the simulated light and temperature from a spin-up before now to the end of the horizon, with the lot's
/// height projected to its sale date and the leggy and leaning flags (MODEL.md §3–5, §7).
/// </summary>
/// <remarks>
/// <para><b>Canopy.</b> Each bench with a lot gets the canopy of that lot: height = the lot's measured height; leaf area
/// density = the crop's LAD × (reference spacing / lot spacing)², since the crop's LAD holds at the usual spacing
/// (<see cref="ForecastRequest.ReferenceSpacingM"/>) and leaf area per plant spread over a pot's square of side
/// spacing falls with its square; the sensing depth is half the crop's growth zone (the middle of the bending zone),
/// at most the canopy height. The light field is compiled once with these canopies, so the lamp distance and canopy
/// depth are held over the run: over a 7-day horizon a lot grows a few centimetres (Ė_ref ≈ 3–12 mm d⁻¹ in the crop
/// library), which changes the inverse-square distance to lamps 2–3 m above by about 2–5 % of PPFD, small against the
/// parameter uncertainty; for long horizons to a distant sale date the error grows.</para>
/// <para><b>Time.</b> One step grid passes through now; steps are <see cref="DefaultStep"/> unless given. Outside light,
/// local time (for lamp schedules), air temperature and the date's DIF are read once per step at its midpoint and
/// shared by all benches.</para>
/// <para><b>Spin-up.</b> Lean now is not measured, so the stems start upright (steps of <see cref="SpinUpStep"/>) at the later of the planting date's
/// start and now − spin-up (14 days by default, about five bending time constants 1/(ε̇γ) of the library's crops), with
/// the height carried back from the measured height by the elongation model (<see cref="HeightProjection"/>, hourly,
/// at least 5 mm and the growth-zone length). Rotations already done are applied to every stem (<see cref="Stem.RotatePot"/>)
/// at the start of the step in which they happened. After now no rotation is assumed: the forecast says what happens
/// if nobody turns the pots (the rotation advice builds on it).</para>
/// <para><b>Per step.</b> The light at every sample point (<see cref="CompiledLightField.Step(in Sky.OutsideLight, LocalTime, int, Span{PointLight})"/>);
/// each point's stem is bent by its own net blue flux vector. Elongation is per bench: <see cref="ElongationModel"/>'s
/// factors with the air temperature at the step, the date's DIF, the PSS of the bench's summed R:FR window fluxes
/// (<see cref="PhytochromeState"/>; held from the last lit step in the dark, full sun at the start) and the recent DLI
/// (the bench's mean DLI of the previous local day; the crop's DLI target before a whole day is known).</para>
/// <para><b>Lean.</b> Each stem's lean vector is the horizontal part of its unit base-to-apex direction; the bench lean
/// is the mean vector over the bench's points (tilt = asin of its length), and the worst point is the largest single
/// lean. All stems of a bench nutate in phase, so every reported lean is averaged over one nutation period (the last
/// period before now, before the horizon end, or trailing, for the grade check). The lean leaves grade when the trailing
/// bench-mean lean exceeds the crop's limit (the bench mean, not the worst point, because a bench is graded and
/// rotated as a whole; the worst point is reported beside it). The lean rate is <see cref="LeanRate"/> over the
/// bench-mean lean from now to the horizon end.</para>
/// <para><b>Height.</b> Heights now, at the horizon end and at the start of the sale date are the measured height plus
/// the elongation integrated hourly from the measurement (taken at noon of its date) with the light of the bench's
/// centre point and the same temperature source (<see cref="HeightProjection"/>). The stems use the bench-mean light,
/// so their own heights differ slightly from this projection.</para>
/// <para><b>Flags.</b> Leggy: <see cref="LegginessCauses"/> with the horizon's mean DLI, mean PSS (lit steps), mean DIF
/// and the height at sale. Leaning: the lean leaves grade before the sale date and within the horizon.</para>
/// <para><b>Uncertainty band.</b> For each key in <see cref="ForecastRequest.UncertaintyKeys"/>, the crop with that
/// parameter at its range minimum and maximum (<see cref="CropConversions.WithParameterAtMinimum"/>) is rerun over the
/// whole run (spin-up and horizon) on two representative points, the centre point and the point with the largest
/// lean at the horizon, with the main run's elongation per step (Ė_ref variants scale it) and the points' light
/// computed once per step for all reruns. The start height is not re-derived for a rerun. The bench lean of a rerun
/// is the main bench lean shifted by the mean change of the two points' leans (floored at zero). The band is the
/// range over the reruns and the main run; drivers are sorted by swing. The reruns step at <see cref="SpinUpStep"/>
/// over the horizon too (the band is a coarse estimate), with the main run's elongation averaged over each coarser
/// step and the light at its midpoint; the baseline of the shifts is then a rerun of the crop's own parameters on that
/// grid, so the step error largely cancels. Accuracy trade-off: on the first 60 benches of the forecast benchmark
/// scene the band's ends moved by at most 0.25° against reruns at the 10-minute forecast step (bands 15.5° wide on
/// average; see <see cref="SpinUpStep"/> for the figures), at about a sixth of their steps over the horizon. Cost: 2 points
/// × 2 ends × keys stems per bench beside the bench's own (16 more for 4 keys), plus 2 baseline stems on the coarser
/// grid.</para>
/// <para><b>Accuracy.</b> In the tests' winter glasshouse (bench by the south wall, 52° N, December) the step
/// matters little: 2, 10 and 30 minutes give a lean at the horizon of 21.18°, 21.22° and 21.30° (8 segments). The
/// growth-zone discretisation matters more: 4, 8 and 16 segments give a lean now of 20.39°, 20.87° and 20.96° and a lean
/// rate of −0.03, −0.09 and −0.11 °/d. The forecast uses 4 segments by default (<see cref="ForecastRequest.GrowthZoneSegments"/>):
/// within 3 % of 16 segments in lean, far inside the parameter band (7.5° to 36° there), at half the stem cost of 8.</para>
/// <para>Deterministic: benches run in parallel but each is self-contained, so the result does not depend on scheduling.</para>
/// </remarks>
public static class BenchForecaster
{
    /// <summary>The minutes that divide an hour, for the default step.</summary>
    private static readonly int[] HourDivisors = [1, 2, 3, 4, 5, 6, 10, 12, 15];

    /// <summary>The lowest start height of a stem, m (5 mm).</summary>
    private const double MinimumStartHeightM = 0.005;

    /// <summary>The default step for a set of crops: about a tenth of the shortest nutation period, rounded down to a
    /// divisor of an hour, 1 to 15 minutes (so circumnutation is resolved by about ten steps per period).</summary>
    /// <param name="crops">The crops present.</param>
    public static Duration DefaultStep(IEnumerable<Crop> crops)
    {
        ArgumentNullException.ThrowIfNull(crops);
        double shortest = double.PositiveInfinity;
        foreach (Crop crop in crops)
        {
            shortest = Math.Min(shortest, crop.NutationPeriodHours.Value);
        }

        double tenthMinutes = double.IsFinite(shortest) ? shortest * 60 / 10 : 15;
        int best = 1;
        foreach (int d in HourDivisors)
        {
            if (d <= tenthMinutes + 1e-9)
            {
                best = d;
            }
        }

        return Duration.FromMinutes(best);
    }

    /// <summary>The step of the spin-up before now and of the uncertainty band's reruns: the multiple of the forecast
    /// step nearest to 60 minutes (at least one step). Only the state at now matters from the spin-up, and the stem
    /// integrates each step exactly for held stimuli, so coarser steps there cost little accuracy (the sun moves 15° in
    /// an hour) and cut the stem and light steps of a 14-day spin-up and a 7-day horizon at 10-minute steps from 1,680
    /// to 1,344. Measured on the first 60 benches of the forecast benchmark scene (petunia, basil, poinsettia; 52° N,
    /// December) against a spin-up and band at the 10-minute forecast step: lean now within 0.11°, lean at the horizon
    /// within 0.072°, the band's ends within 0.25° (the band is 15.5° wide on average there), the lean rate within
    /// 0.028 °/d. (A 30-minute step gave 0.070°, 0.053°, 0.097° and 0.018 °/d: twice the steps for errors that stay
    /// far inside the parameter band.)</summary>
    public static Duration SpinUpStep(Duration step)
    {
        long multiple = Math.Max(1, (long)Math.Round(Duration.FromHours(1).TotalTicks / (double)step.TotalTicks));
        return step * multiple;
    }

    /// <summary>Forecasts every bench that carries a lot (<see cref="ForecastSession.Prepare"/> then
    /// <see cref="ForecastSession.Run"/>).</summary>
    /// <param name="request">The site, crops, sources and settings.</param>
    /// <param name="progress">Receives the fraction done, in (0, 1], as benches finish (from worker threads).</param>
    /// <param name="cancellationToken">Stops the run between benches.</param>
    /// <returns>One forecast per bench with a lot, in site bench order.</returns>
    /// <exception cref="InvalidInputException">The request, site, lots or crops are not usable; every problem is listed.</exception>
    public static SiteForecast Run(ForecastRequest request, IProgress<double>? progress = null, CancellationToken cancellationToken = default) =>
        ForecastSession.Prepare(request).Run(progress, cancellationToken);

    internal static BenchForecast ForecastBench(
        ForecastRequest request, LotPlan lot, CompiledLightField field, ForecastTimeline timeline, ForecastTimeline bandTimeline,
        ForecastTimeline hourly, ImmutableArray<RotationRecord> planned, bool includeUncertainty)
    {
        Crop crop = lot.Crop;
        StemParameters parameters = crop.ToStemParameters();
        var rate = new ElongationRate(crop);
        double dliFallback = crop.DliTarget.Value;
        (int first, int count) = field.PointsOfBench(lot.BenchIndex);
        int centre = CentrePoint(field, first, count);
        Instant now = request.Now;
        Instant end = timeline.Edges[^1];

        var projection = new HeightProjection(field, hourly, centre, rate, dliFallback);
        double measuredM = lot.Lot.HeightMm / ModelConstants.MillimetresPerMetre;
        double HeightAt(Instant t) => Math.Max(0, measuredM + projection.GrowthM(lot.MeasuredAt, t));
        int firstEdge = timeline.FirstEdgeAtOrAfter(lot.Start);
        double startHeightM = Math.Max(
            Math.Max(MinimumStartHeightM, parameters.GrowthZoneLengthM),
            HeightAt(timeline.Edges[firstEdge]));

        ImmutableArray<RotationRecord> done = [
            .. lot.Lot.Rotations.IsDefault ? [] : lot.Lot.Rotations,
            .. request.RotationsDone.TryGetValue(lot.Lot.Id, out ImmutableArray<RotationRecord> recorded) && !recorded.IsDefault ? recorded : []];
        ImmutableArray<RotationRecord> rotations =
            [.. done.Where(r => r.At < now).Concat(planned.IsDefault ? [] : planned.Where(r => r.At >= now)).OrderBy(r => r.At)];
        var run = new BenchRun(field, timeline, firstEdge, rotations, parameters.NutationPeriod);
        Angle gradeLimit = Angle.FromDegrees(crop.LeanGradeLimitDeg.Value);
        Instant gradeEnd = Min(end, lot.SaleAt);
        run.RunMain(first, count, parameters, startHeightM, request.GrowthZoneSegments, rate, dliFallback, gradeEnd, gradeLimit.Radians);

        LeanReading leanNow = MeanLean(run.NowEast, run.NowNorth);
        LeanReading leanEnd = MeanLean(run.EndEast, run.EndNorth);
        (LeanReading worstNow, _) = Worst(run.NowEast, run.NowNorth);
        (LeanReading worstEnd, int worstIndex) = Worst(run.EndEast, run.EndNorth);

        double rateDegPerDay = LeanRateOf(run, parameters.NutationPeriod, leanNow, leanEnd, now, end);
        double horizonDays = run.HorizonHours / 24;
        double meanDli = horizonDays > 0 ? run.HorizonPpfdSeconds / ModelConstants.MicromolesPerMole / horizonDays : 0;
        double meanPss = run.HorizonLitHours > 0 ? run.HorizonPssHours / run.HorizonLitHours : PhytochromeState.FullSun;
        double meanDif = run.HorizonHours > 0 ? run.HorizonDifHours / run.HorizonHours : 0;
        double heightNowMm = HeightAt(now) * ModelConstants.MillimetresPerMetre;
        double heightEndMm = HeightAt(end) * ModelConstants.MillimetresPerMetre;
        double heightSaleMm = HeightAt(lot.SaleAt) * ModelConstants.MillimetresPerMetre;

        var flags = ImmutableArray.CreateBuilder<ForecastFlag>();
        LegginessCauses causes = LegginessCauses.Evaluate(crop, meanDli, Math.Clamp(meanPss, 0, 1), meanDif, heightSaleMm);
        foreach (LegginessCause cause in causes.Active)
        {
            flags.Add(new ForecastFlag(ForecastFlagKind.Leggy, CauseName(cause.Kind), cause.Value, cause.Limit, cause.Unit));
        }

        if (run.LeavesGradeAt is not null)
        {
            flags.Add(new ForecastFlag(ForecastFlagKind.Leaning, "leanOverGrade", run.LeanAtLeaveDeg, gradeLimit.Degrees, "deg"));
        }

        LeanUncertainty? band = null;
        if (includeUncertainty && !request.UncertaintyKeys.IsDefaultOrEmpty)
        {
            int worstPoint = first + worstIndex;
            int[] points = worstPoint == centre ? [centre] : [centre, worstPoint];
            var bandRun = new BenchRun(field, bandTimeline, bandTimeline.FirstEdgeAtOrAfter(lot.Start), rotations, parameters.NutationPeriod);
            double[] elongation = ReGrid(run.ElongationPerStep, timeline, bandTimeline);
            band = Band(request, lot, run, bandRun, elongation, points, first, startHeightM, leanEnd);
        }

        return new BenchForecast(
            lot.Lot.BenchId,
            lot.Lot.Id,
            crop.Id,
            leanNow,
            worstNow,
            leanEnd,
            worstEnd,
            rateDegPerDay,
            gradeLimit,
            run.LeavesGradeAt,
            heightNowMm,
            heightEndMm,
            heightSaleMm,
            crop.HeightGradeLimitMm.Value,
            meanDli,
            meanPss,
            meanDif,
            band,
            flags.ToImmutable(),
            [.. run.EndEast.Select((e, i) => LeanReading.FromLeanVector(e, run.EndNorth[i]))])
        {
            LeanTrack = [.. run.Track],
        };
    }

    private static LeanUncertainty Band(
        ForecastRequest request, LotPlan lot, BenchRun run, BenchRun bandRun, double[] elongation, int[] points, int first,
        double startHeightM, LeanReading leanEnd)
    {
        Crop crop = lot.Crop;

        double low = leanEnd.Tilt.Radians, high = low;
        ImmutableArray<string> keys = request.UncertaintyKeys;
        var variants = new List<(StemParameters Parameters, double Scale)>(keys.Length * 2);
        foreach (string key in keys)
        {
            foreach (Crop variant in new[] { crop.WithParameterAtMinimum(key), crop.WithParameterAtMaximum(key) })
            {
                double scale = key == "referenceElongationMmPerDay"
                    ? variant.ReferenceElongationMmPerDay.Value / crop.ReferenceElongationMmPerDay.Value
                    : 1;
                variants.Add((variant.ToStemParameters(), scale));
            }
        }

        // The baseline of the shifts: the representative points' lean with the crop's own parameters on the band's grid
        // (rerun when the band's grid is coarser, so its step error cancels in the shifts; else the main run's).
        bool coarser = !ReferenceEquals(bandRun.Timeline, run.Timeline);
        if (coarser)
        {
            variants.Add((crop.ToStemParameters(), 1));
        }

        (double East, double North)[][] ends = bandRun.RunVariants(points, variants, startHeightM, request.GrowthZoneSegments, elongation);
        double baseMean = 0;
        if (coarser)
        {
            baseMean = ends[^1].Average(e => Tilt(e.East, e.North));
        }
        else
        {
            foreach (int p in points)
            {
                baseMean += Tilt(run.EndEast[p - first], run.EndNorth[p - first]);
            }

            baseMean /= points.Length;
        }

        Angle Shifted(int v) =>
            Angle.FromRadians(Math.Max(0, leanEnd.Tilt.Radians + ends[v].Average(e => Tilt(e.East, e.North)) - baseMean));
        var swings = new List<ParameterSwing>();
        for (int k = 0; k < keys.Length; k++)
        {
            Angle atMinimum = Shifted(2 * k);
            Angle atMaximum = Shifted((2 * k) + 1);
            low = Math.Min(low, Math.Min(atMinimum.Radians, atMaximum.Radians));
            high = Math.Max(high, Math.Max(atMinimum.Radians, atMaximum.Radians));
            swings.Add(new ParameterSwing(keys[k], atMinimum, atMaximum));
        }

        ImmutableArray<ParameterSwing> drivers = [.. swings.Select((s, i) => (s, i)).OrderByDescending(x => x.s.Swing.Radians).ThenBy(x => x.i).Select(x => x.s)];
        return new LeanUncertainty(Angle.FromRadians(low), Angle.FromRadians(high), drivers);
    }

    /// <summary>The main run's elongation per step carried to a coarser grid whose edges are all edges of the main grid:
    /// each coarse step gets the time-weighted mean rate of the main steps inside it (the same length grown).</summary>
    private static double[] ReGrid(double[] perStep, ForecastTimeline fine, ForecastTimeline coarse)
    {
        if (ReferenceEquals(fine, coarse))
        {
            return perStep;
        }

        var result = new double[coarse.Count];
        int s = 0;
        for (int c = 0; c < coarse.Count; c++)
        {
            Instant stop = coarse.Edges[c + 1];
            double grown = 0, hours = 0;
            while (s < fine.Count && fine.Edges[s + 1] <= stop)
            {
                grown += perStep[s] * fine.Hours[s];
                hours += fine.Hours[s];
                s++;
            }

            result[c] = hours > 0 ? grown / hours : 0;
        }

        return result;
    }

    private static double LeanRateOf(BenchRun run, Duration period, LeanReading now, LeanReading end, Instant from, Instant to)
    {
        double days = (to - from).TotalDays;
        if (run.RateTimes.Count >= 2 && run.RateTimes[^1] - run.RateTimes[0] > period)
        {
            return LeanRate.DegreesPerDay(run.RateTimes, run.RateVectors, period);
        }

        return days > 0 ? (end.Tilt.Degrees - now.Tilt.Degrees) / days : 0;
    }

    private static int CentrePoint(CompiledLightField field, int first, int count)
    {
        Bench bench = field.Benches[field.Points[first].BenchIndex];
        double midAlong = (bench.SamplesAlongLength - 1) / 2.0, midAcross = (bench.SamplesAcrossWidth - 1) / 2.0;
        int best = first;
        double bestDistance = double.PositiveInfinity;
        for (int p = first; p < first + count; p++)
        {
            SamplePoint sp = field.Points[p];
            double d = Math.Pow(sp.AlongIndex - midAlong, 2) + Math.Pow(sp.AcrossIndex - midAcross, 2);
            if (d < bestDistance - 1e-12)
            {
                bestDistance = d;
                best = p;
            }
        }

        return best;
    }

    private static LeanReading MeanLean(double[] east, double[] north)
    {
        double e = 0, n = 0;
        for (int i = 0; i < east.Length; i++)
        {
            e += east[i];
            n += north[i];
        }

        return LeanReading.FromLeanVector(e / east.Length, n / east.Length);
    }

    private static (LeanReading Lean, int Index) Worst(double[] east, double[] north)
    {
        int best = 0;
        double bestLength = -1;
        for (int i = 0; i < east.Length; i++)
        {
            double length = (east[i] * east[i]) + (north[i] * north[i]);
            if (length > bestLength)
            {
                bestLength = length;
                best = i;
            }
        }

        return (LeanReading.FromLeanVector(east[best], north[best]), best);
    }

    private static double Tilt(double east, double north) => Math.Asin(Math.Min(1, Math.Sqrt((east * east) + (north * north))));

    private static string CauseName(LegginessCauseKind kind) => kind switch
    {
        LegginessCauseKind.LowDli => "lowDli",
        LegginessCauseKind.LowPhytochromeState => "lowPhytochromeState",
        LegginessCauseKind.HighDif => "highDif",
        _ => "heightOverGrade",
    };

    private static Instant Min(Instant a, Instant b) => a < b ? a : b;

    private static Instant Max(Instant a, Instant b) => a > b ? a : b;

    internal static Plan Validate(ForecastRequest request)
    {
        var errors = new List<ValidationError>();
        Site site = request.Site;
        if (site is null)
        {
            throw new InvalidInputException("site", "is required");
        }

        SitePaths paths = request.Paths ?? SitePaths.Default;
        errors.AddRange(SiteValidator.Validate(site, paths));
        if (request.Crops is null)
        {
            errors.Add(new ValidationError("crops", "is required"));
        }

        if (request.OutsideLight is null)
        {
            errors.Add(new ValidationError("outsideLight", "is required"));
        }

        if (request.Temperature is null)
        {
            errors.Add(new ValidationError("temperature", "is required"));
        }

        if (request.Horizon < Duration.FromHours(1) || request.Horizon > Duration.FromDays(366))
        {
            errors.Add(new ValidationError("horizon", $"must be between 1 hour and 366 days, got {request.Horizon.TotalDays.ToString("0.###", CultureInfo.InvariantCulture)} days"));
        }

        if (request.Step is { } step && (step < Duration.FromMinutes(1) || step > Duration.FromHours(1)))
        {
            errors.Add(new ValidationError("step", "must be between 1 and 60 minutes"));
        }

        if (request.SpinUp < Duration.Zero || request.SpinUp > Duration.FromDays(60))
        {
            errors.Add(new ValidationError("spinUp", "must be between 0 and 60 days"));
        }

        if (!(request.ReferenceSpacingM > 0) || !double.IsFinite(request.ReferenceSpacingM))
        {
            errors.Add(new ValidationError("referenceSpacingM", "must be > 0"));
        }

        if (request.GrowthZoneSegments is < 1 or > 64)
        {
            errors.Add(new ValidationError("growthZoneSegments", "must be 1 to 64"));
        }

        ImmutableArray<string> keys = request.UncertaintyKeys.IsDefault ? [] : request.UncertaintyKeys;
        for (int k = 0; k < keys.Length; k++)
        {
            if (!SupportedUncertaintyKeysContains(keys[k]))
            {
                errors.Add(new ValidationError($"uncertaintyKeys[{k}]", $"'{keys[k]}' is not one of {string.Join(", ", ForecastRequest.SupportedUncertaintyKeys)}"));
            }
        }

        var lots = new List<LotPlan>();
        ImmutableArray<Lot> siteLots = site.Lots.IsDefault ? [] : site.Lots;
        ImmutableArray<Bench> benches = site.Benches.IsDefault ? [] : site.Benches;
        DateTimeZone? zone = site.Zone;
        LocalDate? today = zone is null ? null : request.Now.InZone(zone).Date;
        var checkedCrops = new HashSet<string>(StringComparer.Ordinal);
        for (int i = 0; i < siteLots.Length; i++)
        {
            Lot lot = siteLots[i];
            string path = SiteValidator.LotPath(i);
            if (lot is null || zone is null || today is not LocalDate date)
            {
                continue;
            }

            Crop? crop = null;
            if (request.Crops is not null && lot.CropId is not null && !request.Crops.TryGetValue(lot.CropId, out crop))
            {
                errors.Add(new ValidationError($"{path}.crop", $"unknown crop '{lot.CropId}'"));
            }
            else if (crop is not null && checkedCrops.Add(lot.CropId!))
            {
                foreach (ValidationError e in CropValidator.Validate(crop))
                {
                    errors.Add(new ValidationError($"crops.{lot.CropId}.{e.Path}", e.Message));
                }
            }

            if (lot.SaleOn < date)
            {
                errors.Add(new ValidationError($"{path}.saleOn", $"{Iso(lot.SaleOn)} is before today ({Iso(date)}): the lot is sold"));
            }

            if (lot.PlantedOn > date)
            {
                errors.Add(new ValidationError($"{path}.plantedOn", $"{Iso(lot.PlantedOn)} is after today ({Iso(date)}): nothing to forecast yet"));
            }

            if (lot.MeasuredOn > date)
            {
                errors.Add(new ValidationError($"{path}.measuredOn", $"{Iso(lot.MeasuredOn)} is after today ({Iso(date)})"));
            }

            int benchIndex = benches.IndexOf(benches.FirstOrDefault(b => b is not null && b.Id == lot.BenchId)!);
            if (crop is null || benchIndex < 0)
            {
                continue;
            }

            Instant planted = lot.PlantedOn.AtStartOfDayInZone(zone).ToInstant();
            Instant spinStart = request.Now - request.SpinUp;
            Instant start = planted > spinStart ? planted : spinStart;
            Instant measured = lot.MeasuredOn.At(new LocalTime(12, 0)).InZoneLeniently(zone).ToInstant();
            Instant sale = lot.SaleOn.AtStartOfDayInZone(zone).ToInstant();
            lots.Add(new LotPlan(lot, crop, benchIndex, Min(start, request.Now), measured, sale));
        }

        ImmutableDictionary<string, ImmutableArray<RotationRecord>> recordedDone = request.RotationsDone ?? ImmutableDictionary<string, ImmutableArray<RotationRecord>>.Empty;
        foreach ((string lotId, ImmutableArray<RotationRecord> rotations) in recordedDone.OrderBy(p => p.Key, StringComparer.Ordinal))
        {
            string path = $"rotationsDone.{lotId}";
            Lot? owner = siteLots.FirstOrDefault(l => l is not null && l.Id == lotId);
            if (owner is null || zone is null)
            {
                errors.Add(new ValidationError(path, $"no lot '{lotId}' on the site"));
                continue;
            }

            Instant planted = owner.PlantedOn.AtStartOfDayInZone(zone).ToInstant();
            for (int k = 0; k < (rotations.IsDefault ? 0 : rotations.Length); k++)
            {
                RotationRecord? r = rotations[k];
                if (r is null)
                {
                    errors.Add(new ValidationError($"{path}[{k}]", "is required"));
                    continue;
                }

                if (r.At < planted || r.At > request.Now)
                {
                    errors.Add(new ValidationError($"{path}[{k}].at", $"{r.At} is outside the lot's life so far ({planted} … now {request.Now})"));
                }

                double degrees = r.Angle.Degrees;
                if (!double.IsFinite(degrees) || degrees <= -360 || degrees >= 360 || degrees == 0)
                {
                    errors.Add(new ValidationError($"{path}[{k}].angleDeg", "must be within (−360, 360) and not 0"));
                }
            }
        }

        ImmutableDictionary<string, ImmutableArray<RotationRecord>> planned = request.PlannedRotations ?? ImmutableDictionary<string, ImmutableArray<RotationRecord>>.Empty;
        foreach ((string lotId, ImmutableArray<RotationRecord> rotations) in planned.OrderBy(p => p.Key, StringComparer.Ordinal))
        {
            string path = $"plannedRotations.{lotId}";
            if (!siteLots.Any(l => l is not null && l.Id == lotId))
            {
                errors.Add(new ValidationError(path, $"no lot '{lotId}' on the site"));
                continue;
            }

            errors.AddRange(ForecastSession.CheckPlanned(rotations, request.Now, request.Now + request.Horizon, path));
        }

        if (errors.Count > 0)
        {
            throw new InvalidInputException(errors);
        }

        lots.Sort((a, b) => a.BenchIndex.CompareTo(b.BenchIndex));
        return new Plan(lots);
    }

    private static bool SupportedUncertaintyKeysContains(string? key) =>
        key is not null && ForecastRequest.SupportedUncertaintyKeys.Contains(key);

    private static string Iso(LocalDate date) => date.ToString("uuuu-MM-dd", CultureInfo.InvariantCulture);

    /// <summary>The validated lots of a request, in bench order.</summary>
    internal sealed record Plan(List<LotPlan> Lots);

    /// <summary>One validated lot: its crop, bench index, simulation start, measurement time and sale time.</summary>
    internal sealed record LotPlan(Lot Lot, Crop Crop, int BenchIndex, Instant Start, Instant MeasuredAt, Instant SaleAt);
}

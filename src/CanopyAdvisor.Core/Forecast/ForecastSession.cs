using System.Collections.Immutable;
using CanopyAdvisor.Core.Light;
using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Structures;
using CanopyAdvisor.Core.Validation;
using NodaTime;

namespace CanopyAdvisor.Core.Forecast;

/// <summary>A validated forecast request with its light field compiled and its step grids built once, so the whole site
/// or single lots under other scenarios (planned rotations, other crop parameters) can be run many times cheaply.</summary>
/// <remarks>
/// <para>The method is <see cref="BenchForecaster"/>'s; this class only keeps what every run shares. The light field is
/// compiled with the canopies of the request's lots (height, leaf area density from the crop and spacing), so a
/// scenario's crop changes the stems and the elongation, not the canopy the light passes through.</para>
/// <para>Immutable after <see cref="Prepare"/>; runs may be made from several threads at once.</para>
/// </remarks>
public sealed class ForecastSession
{
    private readonly BenchForecaster.Plan _plan;
    private readonly ForecastTimeline _timeline;
    private readonly ForecastTimeline _bandTimeline;
    private readonly ForecastTimeline _hourly;

    private ForecastSession(
        ForecastRequest request, BenchForecaster.Plan plan, CompiledLightField field, Duration step, ForecastTimeline timeline,
        ForecastTimeline bandTimeline, ForecastTimeline hourly)
    {
        Request = request;
        _plan = plan;
        Field = field;
        Step = step;
        _timeline = timeline;
        _bandTimeline = bandTimeline;
        _hourly = hourly;
    }

    /// <summary>The request this session was prepared from.</summary>
    public ForecastRequest Request { get; }

    /// <summary>The light field compiled for the lots' canopies.</summary>
    public CompiledLightField Field { get; }

    /// <summary>The forecast step.</summary>
    public Duration Step { get; }

    /// <summary>The forecast start.</summary>
    public Instant Now => Request.Now;

    /// <summary>The forecast end (now + horizon).</summary>
    public Instant End => Request.Now + Request.Horizon;

    /// <summary>The lots forecast, in site bench order.</summary>
    public ImmutableArray<Lot> Lots => [.. _plan.Lots.Select(l => l.Lot)];

    /// <summary>The crop of each lot forecast, by lot id.</summary>
    public IReadOnlyDictionary<string, Crop> CropsByLot => _plan.Lots.ToDictionary(l => l.Lot.Id, l => l.Crop, StringComparer.Ordinal);

    /// <summary>Validates a request, compiles its light field and builds its step grids.</summary>
    /// <param name="request">The site, crops, sources and settings.</param>
    /// <exception cref="InvalidInputException">The request, site, lots or crops are not usable; every problem is listed.</exception>
    public static ForecastSession Prepare(ForecastRequest request)
    {
        ArgumentNullException.ThrowIfNull(request);
        BenchForecaster.Plan plan = BenchForecaster.Validate(request);
        Site site = request.Site;
        DateTimeZone zone = site.Zone;
        Instant now = request.Now;
        Instant end = now + request.Horizon;
        Duration dt = request.Step ?? BenchForecaster.DefaultStep(plan.Lots.Select(l => l.Crop));

        // Canopies from the lots, then one compile for every run.
        ImmutableArray<Bench> benches = site.Benches;
        var benchesWithCanopy = benches.ToBuilder();
        foreach (BenchForecaster.LotPlan lot in plan.Lots)
        {
            benchesWithCanopy[lot.BenchIndex] = benches[lot.BenchIndex] with { Canopy = LotCanopy.For(lot.Lot, lot.Crop, request.ReferenceSpacingM) };
        }

        Site compiledSite = site with { Benches = benchesWithCanopy.MoveToImmutable() };
        IEnclosure enclosure = EnclosureBuilder.Build(compiledSite);
        CompiledLightField field = LightFieldCompiler.Compile(compiledSite, enclosure, request.LightOptions);
        if (plan.Lots.Count == 0)
        {
            var empty = new ForecastTimeline(now, now, end, dt, dt, request.OutsideLight, request.Temperature, zone);
            return new ForecastSession(request, plan, field, dt, empty, empty, empty);
        }

        Instant earliest = plan.Lots.Min(l => l.Start);
        Duration spinUpStep = BenchForecaster.SpinUpStep(dt);
        var timeline = new ForecastTimeline(earliest, now, end, spinUpStep, dt, request.OutsideLight, request.Temperature, zone);
        Instant hourFrom = plan.Lots.Min(l => Min(l.Start, l.MeasuredAt));
        Instant hourTo = Max(end, plan.Lots.Max(l => Max(l.SaleAt, l.MeasuredAt)));
        var hourly = new ForecastTimeline(hourFrom, now, hourTo, Duration.FromHours(1), Duration.FromHours(1), request.OutsideLight, request.Temperature, zone);
        ForecastTimeline bandTimeline = spinUpStep != dt
            ? new ForecastTimeline(earliest, now, end, spinUpStep, spinUpStep, request.OutsideLight, request.Temperature, zone)
            : timeline;
        return new ForecastSession(request, plan, field, dt, timeline, bandTimeline, hourly);
    }

    /// <summary>Forecasts every bench that carries a lot, with the request's planned rotations.</summary>
    /// <param name="progress">Receives the fraction done, in (0, 1], as benches finish (from worker threads).</param>
    /// <param name="cancellationToken">Stops the run between benches.</param>
    /// <returns>One forecast per bench with a lot, in site bench order.</returns>
    public SiteForecast Run(IProgress<double>? progress = null, CancellationToken cancellationToken = default)
    {
        Instant now = Request.Now;
        Instant end = End;
        if (_plan.Lots.Count == 0)
        {
            progress?.Report(1);
            return new SiteForecast(now, end, Step, [], 0, 0);
        }

        bool withBand = Request.IncludeUncertainty && !Request.UncertaintyKeys.IsDefaultOrEmpty;
        var results = new BenchForecast[_plan.Lots.Count];
        int done = 0;
        var options = new ParallelOptions { CancellationToken = cancellationToken };
        Parallel.For(0, _plan.Lots.Count, options, i =>
        {
            BenchForecaster.LotPlan lot = _plan.Lots[i];
            results[i] = BenchForecaster.ForecastBench(Request, lot, Field, _timeline, _bandTimeline, _hourly, PlannedFor(lot.Lot.Id), withBand);
            int finished = Interlocked.Increment(ref done);
            progress?.Report(finished / (double)_plan.Lots.Count);
        });

        return new SiteForecast(now, end, Step, [.. results], _timeline.MissingLight, _timeline.MissingTemperature);
    }

    /// <summary>Forecasts one lot under a scenario: other planned rotations or other crop parameters.</summary>
    /// <param name="lotId">The lot (one of <see cref="Lots"/>).</param>
    /// <param name="scenario">What differs from the request.</param>
    /// <returns>The lot's bench forecast under the scenario.</returns>
    /// <exception cref="InvalidInputException">The lot is unknown, the scenario's crop is not valid, or a planned
    /// rotation is outside now … the end or not a usable angle.</exception>
    public BenchForecast RunLot(string lotId, LotScenario scenario)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        BenchForecaster.LotPlan lot = _plan.Lots.FirstOrDefault(l => l.Lot.Id == lotId)
            ?? throw new InvalidInputException("lotId", $"no lot '{lotId}' in this forecast");
        var errors = new List<ValidationError>();
        if (scenario.Crop is { } crop)
        {
            errors.AddRange(CropValidator.Validate(crop).Select(e => new ValidationError($"crop.{e.Path}", e.Message)));
            lot = lot with { Crop = crop };
        }

        ImmutableArray<RotationRecord> planned = scenario.PlannedRotations ?? PlannedFor(lotId);
        errors.AddRange(CheckPlanned(planned, Now, End, "plannedRotations"));
        if (errors.Count > 0)
        {
            throw new InvalidInputException(errors);
        }

        bool withBand = scenario.IncludeUncertainty && !Request.UncertaintyKeys.IsDefaultOrEmpty;
        return BenchForecaster.ForecastBench(Request, lot, Field, _timeline, _bandTimeline, _hourly, planned, withBand);
    }

    /// <summary>Planned rotations of a lot: each at or after now and at or before the end, in time order, with a finite
    /// angle within (−360°, 360°) and not 0.</summary>
    internal static IEnumerable<ValidationError> CheckPlanned(ImmutableArray<RotationRecord> planned, Instant now, Instant end, string path)
    {
        if (planned.IsDefault)
        {
            yield break;
        }

        for (int i = 0; i < planned.Length; i++)
        {
            string at = $"{path}[{i}]";
            RotationRecord? r = planned[i];
            if (r is null)
            {
                yield return new ValidationError(at, "is required");
                continue;
            }

            if (r.At < now || r.At > end)
            {
                yield return new ValidationError($"{at}.at", $"{r.At} is outside the forecast, {now} … {end}");
            }
            else if (i > 0 && planned[i - 1] is { } previous && r.At < previous.At)
            {
                yield return new ValidationError($"{at}.at", "list planned rotations in time order");
            }

            double degrees = r.Angle.Degrees;
            if (!double.IsFinite(degrees) || degrees <= -360 || degrees >= 360 || degrees == 0)
            {
                yield return new ValidationError($"{at}.angleDeg", "must be within (−360, 360) and not 0");
            }
        }
    }

    private ImmutableArray<RotationRecord> PlannedFor(string lotId) =>
        Request.PlannedRotations.TryGetValue(lotId, out ImmutableArray<RotationRecord> planned) ? planned : [];

    private static Instant Min(Instant a, Instant b) => a < b ? a : b;

    private static Instant Max(Instant a, Instant b) => a > b ? a : b;
}

using System.Collections.Immutable;
using System.Globalization;
using System.Text;
using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;
using MathNet.Numerics.LinearAlgebra;
using NodaTime;

namespace CanopyAdvisor.Core.Advice.Calibration;

/// <summary>Calibrates a crop's photograviceptive coefficient M, proprioceptive sensitivity γ and, where the data
/// allow, balance number B from measured lean, by Levenberg–Marquardt on the bench lean simulator (MODEL.md §6).</summary>
/// <remarks>
/// <para><b>Model.</b> Each observed lot is rerun by <see cref="ForecastSession.RunLot"/> with the trial parameters, from
/// its planting (or 60 days before now, the longest spin-up) to one hour after now, with the lot's recorded rotations
/// and the site's light and temperature. The request's own spin-up, horizon, uncertainty band and planned rotations are
/// replaced for this; the site keeps only the calibrated lots (other lots do not touch the light of these benches in
/// the model, and their dates need not suit the calibration's now). The lot's height in the site sets the start height
/// as in every forecast.</para>
/// <para><b>Interpolation.</b> The model's bench lean at an observation time is interpolated linearly between the two
/// hourly samples of the lean track around it, in the east and north components of the lean vector (not in tilt and
/// azimuth, which would wrap at north and be undefined when upright); before the first sample (within the first hour
/// of the run) the first sample is used. The track is averaged over a nutation period; the mean lean of several real
/// plants, which nutate out of phase, averages circumnutation out in the same way.</para>
/// <para><b>Residuals and weights.</b> Each observation gives two residuals, the modelled minus the observed east and
/// north components of the lean vector (sin tilt · sin azimuth, sin tilt · cos azimuth), each multiplied by √k for k
/// plants measured: the mean of k plants' leans has 1/k of one plant's variance, so weighting by k is the weighted
/// least-squares choice for independent plants. The two components are treated as independent with equal variance.</para>
/// <para><b>Search.</b> Parameters with a positive lower bound are searched in log space, others scaled by their range
/// width; the box is the crop's range (<see cref="CropParameter.Minimum"/> … <see cref="CropParameter.Maximum"/>). The
/// minimiser is Levenberg–Marquardt with Marquardt's diagonal scaling and projected steps (<see cref="LevenbergMarquardt"/>);
/// the Jacobian is by forward differences, one simulator run per parameter and lot, run in parallel (each run is
/// self-contained, so the result does not depend on scheduling).</para>
/// <para><b>Uncertainty.</b> Standard errors come from σ²(JᵀJ)⁻¹ at the optimum, σ² = weighted sum of squares /
/// (2n − p), converted to the crop file's units by the delta method (× the value for log-space parameters). They
/// describe the measurement scatter under the model, not errors of the model itself. Pairs whose estimates correlate at
/// or above <see cref="CalibrationOptions.CorrelationWarningLimit"/> are named in a warning: the data cannot separate them.</para>
/// <para><b>Variant.</b> The result's variant has the fitted values, each range narrowed to the estimate ± 2 standard
/// errors (in the search coordinates, so within the crop's range), and the provenance
/// <c>calibrated: &lt;site id&gt;, &lt;first date&gt; to &lt;last date&gt;, n = &lt;observations&gt;</c> (dates local to the site,
/// the form of crops/README.md) followed by the standard error and the value it replaced.</para>
/// </remarks>
public static class CropCalibrator
{
    /// <summary>The longest simulation before now, 60 days (the forecast's limit on spin-up).</summary>
    public static Duration MaximumSpinUp { get; } = Duration.FromDays(60);

    /// <summary>How far past now each calibration run goes: 1 hour, the shortest forecast horizon, so the last
    /// observation has a track sample after it.</summary>
    public static Duration RunPastNow { get; } = Duration.FromHours(1);

    private static readonly Dictionary<string, string> Symbols = new Dictionary<string, string>(StringComparer.Ordinal)
    {
        ["photoCoefficient"] = "M",
        ["proprioceptiveSensitivity"] = "γ",
        ["balanceNumber"] = "B",
    };

    /// <summary>The model symbol of a fittable parameter (M, γ or B).</summary>
    /// <param name="key">One of <see cref="CalibrationOptions.FittableKeys"/>.</param>
    /// <returns>The symbol, or the key itself for another key.</returns>
    public static string SymbolOf(string key) => Symbols.TryGetValue(key, out string? s) ? s : key;

    /// <summary>Fits the crop's parameters to measured lean.</summary>
    /// <param name="request">The site with its lots (with their planting dates, heights and rotations done), the crops,
    /// the light and temperature sources, and now (at or after the last observation).</param>
    /// <param name="cropId">The crop to calibrate; null for the one crop of the observed benches' lots.</param>
    /// <param name="observations">The measured leans; each bench must carry a lot of the crop.</param>
    /// <param name="options">What to fit; <see cref="CalibrationOptions.Default"/> when null.</param>
    /// <param name="progress">Receives the fraction of the iteration budget used, and 1 at the end.</param>
    /// <param name="cancellationToken">Stops the fit between simulator runs.</param>
    /// <returns>Estimates, residuals, warnings and the calibrated variant.</returns>
    /// <exception cref="InvalidInputException">The options, the crop or the observations are not usable (every problem
    /// is listed, observations by <see cref="LeanObservation.Where"/> or index), or the request is not (as for a forecast).</exception>
    public static CalibrationResult Fit(
        ForecastRequest request,
        string? cropId,
        IReadOnlyList<LeanObservation> observations,
        CalibrationOptions? options = null,
        IProgress<double>? progress = null,
        CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(request);
        ArgumentNullException.ThrowIfNull(observations);
        options ??= CalibrationOptions.Default;
        Site site = request.Site ?? throw new InvalidInputException("site", "is required");
        DateTimeZone zone = site.Zone ?? throw new InvalidInputException("site.timeZone", "is required");
        var errors = new List<ValidationError>();
        errors.AddRange(CheckOptions(options));

        ImmutableArray<Lot> siteLots = site.Lots.IsDefault ? [] : site.Lots;
        var benchIds = new HashSet<string>((site.Benches.IsDefault ? [] : site.Benches).Where(b => b is not null).Select(b => b.Id), StringComparer.Ordinal);
        var lotByBench = new Dictionary<string, Lot>(StringComparer.Ordinal);
        foreach (Lot lot in siteLots.Where(l => l is not null))
        {
            lotByBench.TryAdd(lot.BenchId, lot);
        }

        cropId ??= InferCrop(observations, lotByBench, errors);
        Crop? crop = null;
        if (cropId is not null && (request.Crops is null || !request.Crops.TryGetValue(cropId, out crop)))
        {
            errors.Add(new ValidationError("crop", $"unknown crop '{cropId}'"));
        }

        if (observations.Count == 0)
        {
            errors.Add(new ValidationError("observations", "none given: at least one measured lean is needed"));
        }

        int parameterCount = options.Parameters.IsDefault ? 0 : options.Parameters.Length;
        if (observations.Count > 0 && 2 * observations.Count <= parameterCount)
        {
            errors.Add(new ValidationError(
                "observations",
                $"{observations.Count} observation(s) give {2 * observations.Count} lean components, not more than the {parameterCount} parameters fitted: measure more"));
        }

        Instant now = request.Now;
        var used = new List<Lot>();
        for (int i = 0; i < observations.Count; i++)
        {
            errors.AddRange(CheckObservation(observations[i], i, cropId, now, zone, benchIds, lotByBench, used));
        }

        string variantId = options.VariantId ?? $"{cropId}-{Slug(site.Id)}";
        if (errors.Count == 0 && (!CropValidator.IsValidId(variantId) || variantId == cropId))
        {
            errors.Add(new ValidationError("variantId", $"'{variantId}' must be a crop id (lower-case letters and digits joined by hyphens) other than the crop's own"));
        }

        if (crop is not null && !options.Parameters.IsDefault)
        {
            foreach (string key in options.Parameters.Where(CalibrationOptions.FittableKeys.Contains))
            {
                CropParameter p = crop.GetParameter(key);
                if (!(p.Maximum > p.Minimum))
                {
                    errors.Add(new ValidationError($"crops.{cropId}.{key}.range", $"[{p.Minimum}, {p.Maximum}] leaves nothing to fit: give the parameter a range"));
                }
            }
        }

        if (errors.Count > 0)
        {
            throw new InvalidInputException(errors);
        }

        return new Fitter(request, site, zone, crop!, used, observations, options, variantId, progress, cancellationToken).Run();
    }

    private static string? InferCrop(IReadOnlyList<LeanObservation> observations, Dictionary<string, Lot> lotByBench, List<ValidationError> errors)
    {
        string[] crops = [.. observations
            .Where(o => o?.BenchId is not null && lotByBench.ContainsKey(o.BenchId))
            .Select(o => lotByBench[o.BenchId].CropId)
            .Distinct(StringComparer.Ordinal)
            .Order(StringComparer.Ordinal)];
        if (crops.Length > 1)
        {
            errors.Add(new ValidationError("crop", $"the observations cover benches of several crops ({string.Join(", ", crops)}): name the crop to calibrate"));
        }

        return crops.Length == 1 ? crops[0] : null;
    }

    private static IEnumerable<ValidationError> CheckOptions(CalibrationOptions options)
    {
        ImmutableArray<string> keys = options.Parameters.IsDefault ? [] : options.Parameters;
        if (keys.Length == 0)
        {
            yield return new ValidationError("parameters", $"name at least one of {string.Join(", ", CalibrationOptions.FittableKeys)}");
        }

        for (int k = 0; k < keys.Length; k++)
        {
            if (!CalibrationOptions.FittableKeys.Contains(keys[k]))
            {
                yield return new ValidationError($"parameters[{k}]", $"'{keys[k]}' cannot be calibrated; choose from {string.Join(", ", CalibrationOptions.FittableKeys)}");
            }
            else if (keys.IndexOf(keys[k]) < k)
            {
                yield return new ValidationError($"parameters[{k}]", $"'{keys[k]}' is named twice");
            }
        }

        if (options.MaxIterations is < 1 or > 200)
        {
            yield return new ValidationError("maxIterations", "must be 1 to 200");
        }

        if (!(options.Tolerance > 0 && options.Tolerance <= 0.1))
        {
            yield return new ValidationError("tolerance", "must be more than 0 and at most 0.1");
        }

        if (!(options.DifferenceStep > 0 && options.DifferenceStep <= 0.1))
        {
            yield return new ValidationError("differenceStep", "must be more than 0 and at most 0.1");
        }

        if (!(options.CorrelationWarningLimit > 0 && options.CorrelationWarningLimit < 1))
        {
            yield return new ValidationError("correlationWarningLimit", "must be between 0 and 1");
        }

        if (options.ObservationsPerParameterWarning < 0)
        {
            yield return new ValidationError("observationsPerParameterWarning", "must be 0 or more");
        }
    }

    private static List<ValidationError> CheckObservation(
        LeanObservation? o, int index, string? cropId, Instant now, DateTimeZone zone, HashSet<string> benchIds,
        Dictionary<string, Lot> lotByBench, List<Lot> used)
    {
        var errors = new List<ValidationError>();
        if (o is null)
        {
            errors.Add(new ValidationError($"observations[{index}]", "is required"));
            return errors;
        }

        string where = o.Where ?? $"observations[{index}]";
        void Add(string field, string message) =>
            errors.Add(o.Where is null ? new ValidationError($"{where}.{field}", message) : new ValidationError(where, $"{field}: {message}"));

        Lot? lot = null;
        if (string.IsNullOrEmpty(o.BenchId))
        {
            Add("benchId", "is required");
        }
        else if (!benchIds.Contains(o.BenchId))
        {
            Add("benchId", $"no bench '{o.BenchId}' on the site");
        }
        else if (!lotByBench.TryGetValue(o.BenchId, out lot))
        {
            Add("benchId", $"bench '{o.BenchId}' carries no lot");
        }
        else if (cropId is not null && lot.CropId != cropId)
        {
            Add("benchId", $"bench '{o.BenchId}' carries lot '{lot.Id}' of crop '{lot.CropId}', not of '{cropId}' (the crop calibrated)");
            lot = null;
        }

        if (o.At > now)
        {
            Add("at", $"{Iso(o.At, zone)} is after now ({Iso(now, zone)}): calibrate with now at or after the last observation");
        }
        else if (lot is not null)
        {
            Instant planted = lot.PlantedOn.AtStartOfDayInZone(zone).ToInstant();
            if (o.At < planted)
            {
                Add("at", $"{Iso(o.At, zone)} is before lot '{lot.Id}' was planted ({lot.PlantedOn.ToString("uuuu-MM-dd", CultureInfo.InvariantCulture)})");
            }
            else if (o.At < now - MaximumSpinUp)
            {
                Add("at", $"{Iso(o.At, zone)} is more than {MaximumSpinUp.Days} days before now ({Iso(now, zone)}), further back than the simulation reaches");
            }
        }

        double tilt = o.Tilt.Degrees;
        if (!double.IsFinite(tilt) || tilt < 0 || tilt > 90)
        {
            Add("tiltDeg", $"{Format(tilt)} must be 0 to 90");
        }

        if (!double.IsFinite(o.Azimuth.Radians))
        {
            Add("azimuthDeg", $"{Format(o.Azimuth.Degrees)} is not a finite number");
        }

        if (o.HeightMm is double h && !(h > 0 && double.IsFinite(h)))
        {
            Add("heightMm", $"{Format(h)} must be more than 0");
        }

        if (o.PlantsMeasured < 1)
        {
            Add("plants", $"{o.PlantsMeasured} must be at least 1");
        }

        if (errors.Count == 0 && lot is not null && !used.Contains(lot))
        {
            used.Add(lot);
        }

        return errors;
    }

    private static string Slug(string? text)
    {
        var b = new StringBuilder();
        foreach (char c in (text ?? string.Empty).ToLowerInvariant())
        {
            if (c is (>= 'a' and <= 'z') or (>= '0' and <= '9'))
            {
                b.Append(c);
            }
            else if (b.Length > 0 && b[^1] != '-')
            {
                b.Append('-');
            }
        }

        string slug = b.ToString().Trim('-');
        return slug.Length == 0 ? "site" : slug;
    }

    private static string Iso(Instant t, DateTimeZone zone) =>
        t.InZone(zone).ToOffsetDateTime().ToString("uuuu'-'MM'-'dd'T'HH':'mmo<+HH:mm>", CultureInfo.InvariantCulture);

    private static string Format(double x) => x.ToString("0.###", CultureInfo.InvariantCulture);

    /// <summary>One fit: the prepared session, the search coordinates and the bookkeeping of runs.</summary>
    private sealed class Fitter
    {
        private readonly Site _site;
        private readonly DateTimeZone _zone;
        private readonly Crop _crop;
        private readonly List<Lot> _lots;
        private readonly IReadOnlyList<LeanObservation> _observations;
        private readonly CalibrationOptions _options;
        private readonly string _variantId;
        private readonly IProgress<double>? _progress;
        private readonly CancellationToken _cancellationToken;
        private readonly string[] _keys;
        private readonly CropParameter[] _start;
        private readonly bool[] _logSpace;
        private readonly ForecastSession _session;
        private readonly int[][] _observationsOfLot;
        private readonly double[] _observed;
        private readonly double[] _sqrtWeights;
        private int _runs;

        public Fitter(
            ForecastRequest request, Site site, DateTimeZone zone, Crop crop, List<Lot> lots, IReadOnlyList<LeanObservation> observations,
            CalibrationOptions options, string variantId, IProgress<double>? progress, CancellationToken cancellationToken)
        {
            _site = site;
            _zone = zone;
            _crop = crop;
            _lots = lots;
            _observations = observations;
            _options = options;
            _variantId = variantId;
            _progress = progress;
            _cancellationToken = cancellationToken;
            _keys = [.. options.Parameters];
            _start = [.. _keys.Select(crop.GetParameter)];
            _logSpace = [.. _start.Select(p => p.Minimum > 0)];

            Instant earliest = lots.Min(l => l.PlantedOn.AtStartOfDayInZone(zone).ToInstant());
            Duration reach = request.Now - earliest;
            Duration spinUp = reach > MaximumSpinUp ? MaximumSpinUp : reach < Duration.Zero ? Duration.Zero : reach;
            ForecastRequest runs = request with
            {
                Site = site with { Lots = [.. lots] },
                SpinUp = spinUp,
                Horizon = RunPastNow,
                IncludeUncertainty = false,
                PlannedRotations = ImmutableDictionary<string, ImmutableArray<RotationRecord>>.Empty,
            };
            _session = ForecastSession.Prepare(runs);

            _observationsOfLot = [.. lots.Select(l => Enumerable.Range(0, observations.Count).Where(i => observations[i].BenchId == l.BenchId).ToArray())];
            _observed = new double[2 * observations.Count];
            _sqrtWeights = new double[observations.Count];
            for (int i = 0; i < observations.Count; i++)
            {
                LeanObservation o = observations[i];
                _observed[2 * i] = o.Tilt.Sin() * o.Azimuth.Sin();
                _observed[(2 * i) + 1] = o.Tilt.Sin() * o.Azimuth.Cos();
                _sqrtWeights[i] = Math.Sqrt(o.PlantsMeasured);
            }
        }

        public CalibrationResult Run()
        {
            int n = _keys.Length;
            double[] lower = new double[n];
            double[] upper = new double[n];
            double[] start = new double[n];
            double[] steps = new double[n];
            for (int k = 0; k < n; k++)
            {
                lower[k] = ToSearch(k, _start[k].Minimum);
                upper[k] = ToSearch(k, _start[k].Maximum);
                start[k] = ToSearch(k, Math.Clamp(_start[k].Value, _start[k].Minimum, _start[k].Maximum));
                steps[k] = _options.DifferenceStep;
            }

            int max = _options.MaxIterations;
            LevenbergMarquardtResult fit = LevenbergMarquardt.Minimize(
                u => Residuals([u])[0],
                (u, r) => Jacobian(u, r, steps, upper),
                start,
                lower,
                upper,
                max,
                _options.Tolerance,
                iteration => _progress?.Report(Math.Min(0.99, iteration / (double)max)),
                _cancellationToken);

            CalibrationResult result = Summarise(fit, lower, upper);
            _progress?.Report(1);
            return result;
        }

        private double ToSearch(int k, double value) =>
            _logSpace[k] ? Math.Log(value) : value / (_start[k].Maximum - _start[k].Minimum);

        private double ToValue(int k, double u)
        {
            double v = _logSpace[k] ? Math.Exp(u) : u * (_start[k].Maximum - _start[k].Minimum);
            return Math.Clamp(v, _start[k].Minimum, _start[k].Maximum);
        }

        /// <summary>d value / d u at u, for the delta method.</summary>
        private double Slope(int k, double u) => _logSpace[k] ? ToValue(k, u) : _start[k].Maximum - _start[k].Minimum;

        private Crop CropAt(double[] u)
        {
            Crop c = _crop;
            for (int k = 0; k < u.Length; k++)
            {
                c = c.WithParameter(_keys[k], ToValue(k, u[k]));
            }

            return c;
        }

        private double[,] Jacobian(double[] u, double[] r, double[] steps, double[] upper)
        {
            int n = u.Length;
            var points = new double[n][];
            var h = new double[n];
            for (int k = 0; k < n; k++)
            {
                h[k] = u[k] + steps[k] > upper[k] ? -steps[k] : steps[k];
                points[k] = (double[])u.Clone();
                points[k][k] += h[k];
            }

            return LevenbergMarquardt.Assemble(Residuals(points), r, h);
        }

        /// <summary>The weighted residuals at each point: one simulator run per point and lot, in parallel.</summary>
        private double[][] Residuals(double[][] points)
        {
            int lots = _lots.Count;
            var modelled = new double[points.Length][];
            for (int p = 0; p < points.Length; p++)
            {
                modelled[p] = new double[_observed.Length];
            }

            Crop[] crops = [.. points.Select(CropAt)];
            var parallel = new ParallelOptions { CancellationToken = _cancellationToken };
            Parallel.For(0, points.Length * lots, parallel, task =>
            {
                int p = task / lots;
                int l = task % lots;
                BenchForecast forecast = _session.RunLot(_lots[l].Id, new LotScenario { Crop = crops[p] });
                foreach (int i in _observationsOfLot[l])
                {
                    (double east, double north) = Interpolate(forecast.LeanTrack, _observations[i].At);
                    modelled[p][2 * i] = east;
                    modelled[p][(2 * i) + 1] = north;
                }
            });
            Interlocked.Add(ref _runs, points.Length * lots);

            var residuals = new double[points.Length][];
            for (int p = 0; p < points.Length; p++)
            {
                residuals[p] = new double[_observed.Length];
                for (int j = 0; j < _observed.Length; j++)
                {
                    residuals[p][j] = _sqrtWeights[j / 2] * (modelled[p][j] - _observed[j]);
                }
            }

            return residuals;
        }

        private CalibrationResult Summarise(LevenbergMarquardtResult fit, double[] lower, double[] upper)
        {
            int n = _keys.Length;
            Matrix<double>? covariance = fit.Covariance();
            bool noFreedom = fit.DegreesOfFreedom <= 0;
            var estimates = ImmutableArray.CreateBuilder<ParameterEstimate>(n);
            var searchErrors = new double[n];
            for (int k = 0; k < n; k++)
            {
                double u = fit.Point[k];
                searchErrors[k] = noFreedom ? double.NaN : covariance is null ? double.PositiveInfinity : Math.Sqrt(covariance[k, k]);
                bool atBound = Math.Abs(u - lower[k]) <= 1e-9 * Math.Max(1, Math.Abs(lower[k])) || Math.Abs(u - upper[k]) <= 1e-9 * Math.Max(1, Math.Abs(upper[k]));
                CropParameter p = _start[k];
                estimates.Add(new ParameterEstimate(
                    _keys[k], SymbolOf(_keys[k]), ToValue(k, u), Slope(k, u) * searchErrors[k], p.Value, p.Minimum, p.Maximum, p.Unit, atBound));
            }

            var correlation = ImmutableArray.CreateBuilder<ImmutableArray<double>>(n);
            for (int a = 0; a < n; a++)
            {
                var row = new double[n];
                for (int b = 0; b < n; b++)
                {
                    row[b] = a == b ? 1 : covariance is null || noFreedom ? double.NaN : covariance[a, b] / Math.Sqrt(covariance[a, a] * covariance[b, b]);
                }

                correlation.Add([.. row]);
            }

            var residuals = ImmutableArray.CreateBuilder<ObservationResidual>(_observations.Count);
            double weightSum = 0;
            for (int i = 0; i < _observations.Count; i++)
            {
                LeanObservation o = _observations[i];
                double w = o.PlantsMeasured;
                weightSum += w;
                double east = fit.Residuals[2 * i] / _sqrtWeights[i];
                double north = fit.Residuals[(2 * i) + 1] / _sqrtWeights[i];
                residuals.Add(new ObservationResidual(
                    i, o.Where, o.BenchId, o.At, LeanReading.FromLeanVector(_observed[2 * i], _observed[(2 * i) + 1]),
                    LeanReading.FromLeanVector(_observed[2 * i] + east, _observed[(2 * i) + 1] + north), east, north, w, o.HeightMm));
            }

            Instant first = _observations.Min(o => o.At);
            Instant last = _observations.Max(o => o.At);
            ImmutableArray<ParameterEstimate> done = estimates.MoveToImmutable();
            ImmutableArray<ImmutableArray<double>> correlations = correlation.MoveToImmutable();
            return new CalibrationResult(
                _crop.Id,
                done,
                correlations,
                residuals.MoveToImmutable(),
                Degrees(Math.Sqrt(fit.SumOfSquares / weightSum)),
                Degrees(Math.Sqrt(fit.InitialSumOfSquares / weightSum)),
                Math.Sqrt(fit.ResidualVariance),
                fit.Iterations,
                _runs,
                fit.Converged,
                Warnings(fit, done, correlations, covariance),
                Variant(done, fit.Point, searchErrors, first, last),
                first,
                last)
            {
                Identified = covariance is not null && fit.DegreesOfFreedom > 0
                    && correlations.SelectMany((row, a) => row.Skip(a + 1)).All(r => Math.Abs(r) < _options.CorrelationWarningLimit),
            };
        }

        private ImmutableArray<string> Warnings(
            LevenbergMarquardtResult fit, ImmutableArray<ParameterEstimate> estimates, ImmutableArray<ImmutableArray<double>> correlation,
            Matrix<double>? covariance)
        {
            var c = CultureInfo.InvariantCulture;
            var warnings = ImmutableArray.CreateBuilder<string>();
            int n = estimates.Length;
            int count = _observations.Count;
            if (!fit.Converged)
            {
                warnings.Add($"the fit stopped after {fit.Iterations} iterations without meeting its tolerance, so the estimates may still move: allow more iterations or check the observations");
            }

            int advised = _options.ObservationsPerParameterWarning * n;
            if (count < advised)
            {
                warnings.Add($"only {count} observation(s) for {n} parameter(s): the standard errors rest on few measurements; {advised} or more are advised");
            }

            if (fit.DegreesOfFreedom <= 0)
            {
                warnings.Add("as many lean components as parameters: the fit passes through the data and no standard error can be estimated; measure more");
            }

            var days = _observations.Select(o => o.At.InZone(_zone).Date).Distinct().ToList();
            if (n >= 2 && days.Count == 1)
            {
                warnings.Add($"all observations are from one day ({days[0].ToString("uuuu-MM-dd", c)}): a lean seen at one time cannot tell how strongly the crop bends from how fast it bends; measure on more days or after a rotation");
            }

            if (covariance is null && fit.DegreesOfFreedom > 0)
            {
                warnings.Add($"the data do not determine {string.Join(" and ", estimates.Select(e => e.Symbol))} apart: changing them changes the modelled lean at the observations too little or only together, so their standard errors are unbounded; measure on more days or after a rotation");
            }

            for (int a = 0; a < n; a++)
            {
                for (int b = a + 1; b < n; b++)
                {
                    double r = correlation[a][b];
                    if (Math.Abs(r) >= _options.CorrelationWarningLimit)
                    {
                        warnings.Add(string.Create(c, $"the data cannot separate {estimates[a].Symbol} and {estimates[b].Symbol}: their estimates correlate at {r:0.00}; measure on more days or after a rotation"));
                    }
                }
            }

            foreach (ParameterEstimate e in estimates)
            {
                if (e.AtBound)
                {
                    bool low = Math.Abs(e.Value - e.Minimum) <= Math.Abs(e.Value - e.Maximum);
                    warnings.Add(string.Create(c, $"{e.Symbol} ({e.Key}) stopped at the {(low ? "lower" : "upper")} end of the crop's range ({(low ? e.Minimum : e.Maximum):G4}): the data ask for a value outside it; check the observations, or widen the range in a crop file if you trust them"));
                }
                else if (double.IsFinite(e.StandardError) && e.StandardError > 0.5 * Math.Abs(e.Value))
                {
                    warnings.Add(string.Create(c, $"{e.Symbol} ({e.Key}) is poorly determined: its standard error is {100 * e.StandardError / Math.Abs(e.Value):0}% of the estimate"));
                }
            }

            return warnings.ToImmutable();
        }

        private Crop Variant(ImmutableArray<ParameterEstimate> estimates, double[] point, double[] searchErrors, Instant first, Instant last)
        {
            var c = CultureInfo.InvariantCulture;
            string siteLabel = (_site.Id ?? "site").Replace(',', ' ').Trim();
            string dates = $"{first.InZone(_zone).Date.ToString("uuuu-MM-dd", c)} to {last.InZone(_zone).Date.ToString("uuuu-MM-dd", c)}";
            Crop variant = _crop with
            {
                Id = _variantId,
                Name = $"{_crop.Name}, calibrated for {_site.Name}",
                BaseId = _crop.Id,
            };
            for (int k = 0; k < estimates.Length; k++)
            {
                ParameterEstimate e = estimates[k];
                CropParameter before = _start[k];
                double min = before.Minimum;
                double max = before.Maximum;
                if (double.IsFinite(searchErrors[k]))
                {
                    min = ToValue(k, point[k] - (2 * searchErrors[k]));
                    max = ToValue(k, point[k] + (2 * searchErrors[k]));
                }

                string previous = before.Provenance.Split(';')[0].Trim();
                string se = double.IsFinite(e.StandardError) ? e.StandardError.ToString("G3", c) : "not determined";
                string provenance = string.Create(c, $"calibrated: {siteLabel}, {dates}, n = {_observations.Count}; standard error {se}; replaces {before.Value:G4} ({previous})");
                variant = variant.WithParameter(e.Key, new CropParameter(e.Value, before.Unit, Math.Min(min, e.Value), Math.Max(max, e.Value), provenance));
            }

            return CropValidator.EnsureValid(variant);
        }

        private static double Degrees(double leanVectorLength) => Math.Asin(Math.Min(1, leanVectorLength)) * Angle.DegreesPerRadian;
    }

    /// <summary>The bench-mean lean vector (east, north) at a time, linear between the track's samples.</summary>
    internal static (double East, double North) Interpolate(ImmutableArray<LeanSample> track, Instant at)
    {
        if (track.IsDefaultOrEmpty)
        {
            return (0, 0);
        }

        if (at <= track[0].At)
        {
            return Vector(track[0]);
        }

        if (at >= track[^1].At)
        {
            return Vector(track[^1]);
        }

        int lo = 0;
        int hi = track.Length - 1;
        while (hi - lo > 1)
        {
            int mid = (lo + hi) / 2;
            if (track[mid].At <= at)
            {
                lo = mid;
            }
            else
            {
                hi = mid;
            }
        }

        (double e0, double n0) = Vector(track[lo]);
        (double e1, double n1) = Vector(track[hi]);
        double f = (at - track[lo].At).TotalTicks / (track[hi].At - track[lo].At).TotalTicks;
        return (e0 + (f * (e1 - e0)), n0 + (f * (n1 - n0)));
    }

    private static (double East, double North) Vector(LeanSample lean) =>
        (lean.Tilt.Sin() * lean.Azimuth.Sin(), lean.Tilt.Sin() * lean.Azimuth.Cos());
}

using System.Collections.Immutable;
using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;
using NodaTime;

namespace CanopyAdvisor.Core.Advice.Rotation;

/// <summary>
/// Chooses a rotation policy per bench by simulation: the least labour (fewest turns to the sale) that keeps the bench
/// lean within the crop's grade limit with a margin (MODEL.md §6).
/// </summary>
/// <remarks>
/// <para><b>Peak lean.</b> The largest bench lean (bench-mean, averaged over the nutation period before each hourly
/// sample: <see cref="BenchForecast.LeanTrack"/>) from now to the sale, or to the forecast end if the sale is later.
/// A plan holds when that peak is at or below the target (1 − margin) × the grade limit. Turning does not shrink a
/// lean at once (a 180° turn points the same tilt the other way; the stem then straightens), so a bench already over
/// the target now is graded from the moment it is first back within the target after the first turn (and one nutation
/// period, so the averaging across the turn does not count as a recovery); it fails if it never gets back. Its
/// lean now is reported beside the peak.</para>
/// <para>A lot sold at or before now needs no rotation (its peaks are its lean now).</para>
/// <para><b>Turn times.</b> The first turn is at the later of <see cref="RotationPolicyOptions.FirstTurnNotBefore"/>
/// (now by default) and the last turn already done plus the interval (keeping the bench's rhythm); then one every
/// interval while before the sale (and within the forecast). 90° turns are always clockwise, cycling the four sides
/// (<see cref="RotationPolicy"/>). Rotations already done (<see cref="Lot.Rotations"/>) are part of the forecast.</para>
/// <para><b>Search.</b> No rotation is simulated first; if it holds, nothing more is run. Otherwise the intervals are
/// tried from the longest down, each with every angle: the number of turns to the sale never falls as the interval
/// shortens (the first turn is at a fixed time or moves earlier, and the spacing shrinks), so the first interval at
/// which a policy holds has the least labour of all that hold, and the search stops there. This does not assume the
/// peak lean rises with the interval (it need not under a daily sun, where an interval near a whole number of days
/// keeps turning at the same sun position), so no interval is skipped on that ground. Of the angles that hold at that
/// interval (equal labour), the lower on-time peak wins, then the order of <see cref="RotationPolicyOptions.Angles"/>.
/// Plans with the same turns as one already simulated (e.g. a single turn before a near sale) are not run twice.</para>
/// <para><b>Timing.</b> Each turn gets a window of ± <see cref="RotationPolicyOptions.WindowFraction"/> × the interval
/// about its nominal time, clipped to the first allowed time and the sale. A policy is only accepted when the plan also
/// holds with every turn at the latest end of its window and with turns alternately at the earliest and the latest end
/// (gaps of the interval ± twice the half-width: the longest a schedule inside the windows can make; delaying every turn
/// alike mostly shifts the phase of a periodic lean and is a weak test on its own). If not, the window is halved and
/// checked again; if that fails too, the next shorter interval is tried. If no policy holds
/// late but some hold on time, the least labour of those is taken with a zero-width window (turn on time). If none
/// holds at all, the verdict is <see cref="RotationVerdict.RotationCannotHold"/>: the policy with the lowest peak is
/// given with <see cref="SideLampRemedy"/>.</para>
/// <para><b>Cost.</b> One single-lot run for a bench that needs no rotation; at most 1 + (intervals × angles) on-time
/// runs and 4 timing runs per policy that holds on time. Lots run in parallel, each search sequential and self-contained, so the result does not
/// depend on scheduling.</para>
/// </remarks>
public static class RotationPolicyPlanner
{
    /// <summary>The pointer given when rotation alone cannot hold the grade.</summary>
    public const string SideLampRemedy =
        "rotation alone cannot hold the grade: balance the light with side lamps (see the side-lamp advice)";

    /// <summary>Chooses a rotation policy for every lot of a session.</summary>
    /// <param name="session">A prepared forecast whose horizon reaches the sales to plan for (up to 366 days); prepare it
    /// without the uncertainty band, as the search runs many scenarios.</param>
    /// <param name="options">The intervals, angles, margin and windows.</param>
    /// <param name="progress">Receives the fraction of lots done, in (0, 1], as lots finish (from worker threads).</param>
    /// <param name="cancellationToken">Stops the search between runs.</param>
    /// <returns>The advice for every lot, in the session's lot order.</returns>
    /// <exception cref="InvalidInputException">The options are not usable; every problem is listed.</exception>
    public static RotationPlan Plan(
        ForecastSession session, RotationPolicyOptions options, IProgress<double>? progress = null, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(session);
        ArgumentNullException.ThrowIfNull(options);
        var errors = options.Validate().ToList();
        if (options.FirstTurnNotBefore is Instant notBefore && notBefore < session.Now)
        {
            errors.Add(new ValidationError("options.firstTurnNotBefore", $"{notBefore} is before the forecast start {session.Now}"));
        }

        if (errors.Count > 0)
        {
            throw new InvalidInputException(errors);
        }

        ImmutableArray<Lot> lots = session.Lots;
        IReadOnlyDictionary<string, Crop> crops = session.CropsByLot;
        var results = new BenchRotationAdvice[lots.Length];
        int done = 0;
        object gate = new();
        Parallel.For(0, lots.Length, new ParallelOptions { CancellationToken = cancellationToken }, i =>
        {
            results[i] = PlanLot(session, lots[i], crops[lots[i].Id], options, cancellationToken);
            lock (gate)
            {
                done++;
                progress?.Report(done / (double)lots.Length);
            }
        });

        if (lots.Length == 0)
        {
            progress?.Report(1);
        }

        return new RotationPlan(session.Now, session.End, options, [.. results]);
    }

    private static BenchRotationAdvice PlanLot(ForecastSession session, Lot lot, Crop crop, RotationPolicyOptions options, CancellationToken token)
    {
        var search = new LotSearch(session, lot, crop, options, token);
        return search.Run();
    }

    /// <summary>The search for one lot: sequential, with its own cache of runs.</summary>
    private sealed class LotSearch
    {
        private readonly ForecastSession _session;
        private readonly Lot _lot;
        private readonly RotationPolicyOptions _options;
        private readonly CancellationToken _token;
        private readonly Instant _now;
        private readonly Instant _sale;
        private readonly Instant _until;
        private readonly Instant _notBefore;
        private readonly Instant? _lastDone;
        private readonly Duration _nutationPeriod;
        private readonly Angle _limit;
        private readonly double _target;
        private readonly Dictionary<string, double> _peaks = new(StringComparer.Ordinal);
        private Angle _leanNow;

        public LotSearch(ForecastSession session, Lot lot, Crop crop, RotationPolicyOptions options, CancellationToken token)
        {
            _session = session;
            _lot = lot;
            _options = options;
            _token = token;
            _now = session.Now;
            _sale = lot.SaleOn.AtStartOfDayInZone(session.Request.Site.Zone).ToInstant();
            _until = _sale < session.End ? _sale : session.End;
            _notBefore = options.FirstTurnNotBefore ?? _now;
            ImmutableArray<RotationRecord> history = lot.Rotations.IsDefault ? [] : lot.Rotations;
            _lastDone = history.Where(r => r.At < _now).Select(r => (Instant?)r.At).DefaultIfEmpty(null).Max();
            _nutationPeriod = Duration.FromHours(crop.NutationPeriodHours.Value);
            _limit = Angle.FromDegrees(crop.LeanGradeLimitDeg.Value);
            _target = (1 - options.Margin) * _limit.Radians;
            CropId = crop.Id;
        }

        private string CropId { get; }

        public BenchRotationAdvice Run()
        {
            BenchForecast none = _session.RunLot(_lot.Id, new LotScenario { PlannedRotations = [] });
            _leanNow = none.LeanNow.Tilt;
            if (_until <= _now)
            {
                // Sold at or before now: nothing left to grade or turn; the lean now stands for both peaks.
                double now = _leanNow.Radians;
                return Advice(RotationVerdict.NoRotationNeeded, RotationPolicy.None, now, now, null, [], [new(RotationPolicy.None, 0, _leanNow, null, 0, true)], null);
            }

            double nonePeak = Peak(none.LeanTrack, null);
            var candidates = new List<RotationCandidate> { new(RotationPolicy.None, 0, Angle.FromRadians(nonePeak), null, 0, nonePeak <= _target) };
            if (nonePeak <= _target)
            {
                return Advice(RotationVerdict.NoRotationNeeded, RotationPolicy.None, nonePeak, nonePeak, null, [], candidates, null);
            }

            // Longest interval first; stop at the first interval where some angle holds (least labour, see remarks).
            Duration[] intervals = [.. _options.Intervals.OrderByDescending(d => d)];
            (RotationCandidate Candidate, ImmutableArray<PlannedRotation> Plan)? chosen = null;
            foreach (Duration interval in intervals)
            {
                (RotationCandidate Candidate, ImmutableArray<PlannedRotation> Plan)? best = null;
                foreach (Angle angle in _options.Angles)
                {
                    _token.ThrowIfCancellationRequested();
                    RotationPolicy policy = RotationPolicy.Every(angle, interval);
                    (RotationCandidate candidate, ImmutableArray<PlannedRotation> plan) = Try(policy);
                    candidates.Add(candidate);
                    if (candidate.Holds && (best is null || candidate.PeakLean < best.Value.Candidate.PeakLean))
                    {
                        best = (candidate, plan);
                    }
                }

                if (best is not null)
                {
                    chosen = best;
                    break;
                }
            }

            if (chosen is null)
            {
                // No policy holds with its window. On time only: the least labour of those, with turns on the nominal time.
                RotationCandidate? onTime = candidates
                    .Where(c => !c.Policy.IsNone && c.PeakLean.Radians <= _target)
                    .OrderBy(c => c.Rotations).ThenBy(c => c.PeakLean).FirstOrDefault();
                if (onTime is not null)
                {
                    // With a zero-width window the late plan is the on-time plan, so the candidate holds as shown.
                    candidates[candidates.IndexOf(onTime)] = onTime with { LatePeakLean = onTime.PeakLean, WindowFraction = 0, Holds = true };
                    ImmutableArray<PlannedRotation> plan = Windows(onTime.Policy, 0);
                    return Advice(RotationVerdict.Rotate, onTime.Policy, nonePeak, onTime.PeakLean.Radians, onTime.PeakLean.Radians, plan, candidates, null);
                }
            }

            if (chosen is { } found)
            {
                return Advice(
                    RotationVerdict.Rotate, found.Candidate.Policy, nonePeak, found.Candidate.PeakLean.Radians,
                    found.Candidate.LatePeakLean?.Radians, found.Plan, candidates, null);
            }

            // Nothing holds: the lowest peak (fewer turns on a tie); no rotation if turning does not help at all.
            RotationCandidate lowest = candidates.OrderBy(c => c.PeakLean).ThenBy(c => c.Rotations).First();
            ImmutableArray<PlannedRotation> lowestPlan = lowest.Policy.IsNone ? [] : Windows(lowest.Policy, 0);
            return Advice(
                RotationVerdict.RotationCannotHold, lowest.Policy, nonePeak, lowest.PeakLean.Radians,
                lowest.Policy.IsNone ? null : lowest.PeakLean.Radians, lowestPlan, candidates, SideLampRemedy);
        }

        private (RotationCandidate Candidate, ImmutableArray<PlannedRotation> Plan) Try(RotationPolicy policy)
        {
            ImmutableArray<PlannedRotation> nominal = Windows(policy, 0);
            double peak = PeakOf(nominal.Select(r => r.At), policy.Angle);
            if (peak > _target || nominal.IsEmpty)
            {
                return (new RotationCandidate(policy, nominal.Length, Angle.FromRadians(peak), null, 0, peak <= _target), nominal);
            }

            double late = peak;
            foreach (double fraction in Fractions())
            {
                ImmutableArray<PlannedRotation> plan = Windows(policy, fraction);
                late = fraction == 0 ? peak : LatePeak(plan, policy.Angle);
                if (late <= _target)
                {
                    return (new RotationCandidate(policy, plan.Length, Angle.FromRadians(peak), Angle.FromRadians(late), fraction, true), plan);
                }
            }

            return (new RotationCandidate(policy, nominal.Length, Angle.FromRadians(peak), Angle.FromRadians(late), 0, false), nominal);
        }

        /// <summary>The worse of two timings inside the windows: every turn at the latest end, and turns alternately at
        /// the earliest and the latest end (gaps of the interval ± twice the half-width, the longest a schedule inside
        /// the windows can make).</summary>
        private double LatePeak(ImmutableArray<PlannedRotation> plan, Angle angle)
        {
            double allLate = PeakOf(plan.Select(r => r.Latest), angle);
            if (allLate > _target || plan.Length < 2)
            {
                return allLate;
            }

            double alternating = PeakOf(plan.Select((r, i) => i % 2 == 0 ? r.Earliest : r.Latest), angle);
            return Math.Max(allLate, alternating);
        }

        private IEnumerable<double> Fractions()
        {
            double f = _options.WindowFraction;
            if (f == 0)
            {
                yield return 0;
                yield break;
            }

            yield return f;
            yield return f / 2;
        }

        /// <summary>The planned turns of a policy with windows of ± fraction × interval, clipped to the first allowed
        /// time and the end of the check.</summary>
        private ImmutableArray<PlannedRotation> Windows(RotationPolicy policy, double fraction)
        {
            if (policy.IsNone)
            {
                return [];
            }

            Instant first = policy.FirstTurn(_notBefore, _lastDone);

            Duration half = Duration.FromTicks((long)Math.Round(policy.Interval.TotalTicks * fraction));
            return [.. policy.Times(first, _until).Select(t => new PlannedRotation(
                _lot.Id, _lot.BenchId, _lot.Pots, policy.Angle, t, Max(t - half, _notBefore), Min(t + half, _until)))];
        }

        /// <summary>The peak lean of the lot turned at the given times (cached by the turn list).</summary>
        private double PeakOf(IEnumerable<Instant> times, Angle angle)
        {
            ImmutableArray<RotationRecord> planned = [.. times.Select(t => new RotationRecord(t, angle))];
            string key = string.Join(';', planned.Select(r => FormattableString.Invariant($"{r.At.ToUnixTimeTicks()}:{r.Angle.Radians:R}")));
            if (_peaks.TryGetValue(key, out double cached))
            {
                return cached;
            }

            _token.ThrowIfCancellationRequested();
            BenchForecast run = _session.RunLot(_lot.Id, new LotScenario { PlannedRotations = planned });
            double peak = Peak(run.LeanTrack, planned.IsEmpty ? null : planned[0].At);
            _peaks[key] = peak;
            return peak;
        }

        /// <summary>The graded peak of a lean track, radians: from now to the end of the check; if the lean now is over
        /// the target, from the first sample back within it (no earlier than the first turn plus a nutation period),
        /// or the peak of the whole span if it never gets back.</summary>
        private double Peak(ImmutableArray<LeanSample> track, Instant? firstTurn)
        {
            double peak = 0, whole = 0;
            bool graded = true, started = false;
            Instant recoverFrom = firstTurn is Instant f ? f + _nutationPeriod : _now;
            foreach (LeanSample s in track)
            {
                if (s.At < _now || s.At > _until)
                {
                    continue;
                }

                double tilt = s.Lean.Tilt.Radians;
                whole = Math.Max(whole, tilt);
                if (!started)
                {
                    started = true;
                    graded = tilt <= _target;
                }

                if (!graded)
                {
                    if (s.At >= recoverFrom && tilt <= _target)
                    {
                        graded = true;
                        peak = tilt;
                    }

                    continue;
                }

                peak = Math.Max(peak, tilt);
            }

            return graded ? peak : whole;
        }

        private BenchRotationAdvice Advice(
            RotationVerdict verdict, RotationPolicy policy, double nonePeak, double planPeak, double? latePeak,
            ImmutableArray<PlannedRotation> plan, List<RotationCandidate> candidates, string? remedy) =>
            new(
                _lot.Id,
                _lot.BenchId,
                CropId,
                _lot.Pots,
                _sale,
                _until,
                verdict,
                policy,
                _limit,
                Angle.FromRadians(_target),
                _leanNow,
                Angle.FromRadians(nonePeak),
                Angle.FromRadians(planPeak),
                latePeak is double l ? Angle.FromRadians(l) : null,
                plan,
                [.. candidates],
                remedy);
    }

    private static Instant Min(Instant a, Instant b) => a < b ? a : b;

    private static Instant Max(Instant a, Instant b) => a > b ? a : b;
}

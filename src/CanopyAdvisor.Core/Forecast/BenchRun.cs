using System.Collections.Immutable;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Light;
using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Core.Plants.Growth;
using CanopyAdvisor.Core.Sites;
using NodaTime;

namespace CanopyAdvisor.Core.Forecast;

/// <summary>The stems of one bench stepped over a <see cref="ForecastTimeline"/>: the main run (every sample point, the
/// bench's light sums and elongation rate) or a rerun of a few points with other stem parameters.</summary>
/// <remarks>Single-threaded and self-contained, so benches can run in parallel with results that do not depend on
/// scheduling.</remarks>
internal sealed class BenchRun
{
    private readonly CompiledLightField _field;
    private readonly ForecastTimeline _timeline;
    private readonly int _firstEdge;
    private readonly ImmutableArray<RotationRecord> _rotations;
    private readonly double _windowHours;

    public BenchRun(CompiledLightField field, ForecastTimeline timeline, int firstEdge, ImmutableArray<RotationRecord> rotations, Duration nutationPeriod)
    {
        _field = field;
        _timeline = timeline;
        _firstEdge = firstEdge;
        _rotations = rotations;
        _windowHours = nutationPeriod.TotalHours;
    }

    /// <summary>The step grid this run steps over.</summary>
    public ForecastTimeline Timeline => _timeline;

    // Outputs of the main run.
    public double[] NowEast = [], NowNorth = [], EndEast = [], EndNorth = [];
    public double[] ElongationPerStep = [];
    public Instant? LeavesGradeAt;
    public double LeanAtLeaveDeg;
    public List<Instant> RateTimes = [];
    public List<Vector3> RateVectors = [];
    public List<LeanSample> Track = [];
    public double HorizonPpfdSeconds, HorizonPssHours, HorizonLitHours, HorizonDifHours, HorizonHours;

    /// <summary>The main run over all points of a bench.</summary>
    public void RunMain(
        int firstPoint, int count, StemParameters parameters, double startHeightM, int segments, ElongationRate rate,
        double dliFallback, Instant gradeEnd, double gradeLimitRadians)
    {
        ForecastTimeline tl = _timeline;
        // All points of the bench share parameters, steps, elongation and rotations: one bundle steps them together.
        StemBundle stems = StemBundle.Upright(parameters, startHeightM, count, segments);
        var light = new PointLight[count];
        var blue = new Vector3[count];
        ElongationPerStep = new double[tl.Count];
        var sampler = new Sampler(count, tl, parameters.NutationPeriod);
        // The bench-mean lean vectors of the last nutation period (edges t − period < tₖ ≤ t): as many as the finest
        // step fits in a period, fewer in the coarser spin-up.
        int ringSize = Math.Max(1, (int)Math.Round(_windowHours / tl.Hours[Math.Min(tl.Count - 1, tl.AnchorEdge)])) + 1;
        var ringE = new double[ringSize];
        var ringN = new double[ringSize];
        var ringT = new long[ringSize];
        int ringCount = 0, ringNext = 0;
        long windowTicks = Duration.FromHours(_windowHours).BclCompatibleTicks;
        double rateFirstEnd = (tl.Edges[tl.AnchorEdge] + Duration.FromHours(_windowHours)).ToUnixTimeTicks();
        double rateLastStart = (tl.Edges[^1] - Duration.FromHours(_windowHours)).ToUnixTimeTicks();

        var days = new DailyLight(tl.Day[Math.Min(_firstEdge, tl.Count - 1)], dliFallback);
        double pss = PhytochromeState.FullSun;
        int rotation = SkipRotationsBefore(tl.Edges[_firstEdge]);
        var east = new double[count];
        var north = new double[count];
        // Track samples on the hours of now (now − whole hours), from the first edge on.
        Instant trackNext = tl.Edges[tl.AnchorEdge] - Duration.FromHours(Math.Floor((tl.Edges[tl.AnchorEdge] - tl.Edges[_firstEdge]).TotalHours));

        Measure(stems, east, north, out double meanE, out double meanN);
        Record(_firstEdge, east, north, meanE, meanN);
        for (int s = _firstEdge; s < tl.Count; s++)
        {
            rotation = ApplyRotations(stems, rotation, tl.Edges[s + 1]);
            _field.Step(tl.Outside[s], tl.LocalTimes[s], firstPoint, light);
            double ppfd = 0, red = 0, farRed = 0;
            for (int i = 0; i < count; i++)
            {
                ppfd += light[i].HorizontalPpfd;
                red += light[i].Red660;
                farRed += light[i].FarRed730;
                blue[i] = light[i].BlueVector;
            }

            ppfd /= count;
            double seconds = tl.Hours[s] * ModelConstants.SecondsPerHour;
            double recentDli = days.Add(tl.Day[s], ppfd * seconds);
            bool lit = farRed > 0;
            if (lit)
            {
                pss = PhytochromeState.Evaluate(red / farRed);
            }

            double e = rate.MetresPerHour(tl.AirC[s], tl.DifK[s], pss, recentDli);
            ElongationPerStep[s] = e;
            stems.Step(tl.Steps[s], e, blue);

            if (s >= tl.AnchorEdge)
            {
                HorizonHours += tl.Hours[s];
                HorizonPpfdSeconds += ppfd * seconds;
                HorizonDifHours += tl.DifK[s] * tl.Hours[s];
                if (lit)
                {
                    HorizonPssHours += pss * tl.Hours[s];
                    HorizonLitHours += tl.Hours[s];
                }
            }

            Measure(stems, east, north, out meanE, out meanN);
            Record(s + 1, east, north, meanE, meanN);
        }

        sampler.Finish();
        NowEast = sampler.NowEast;
        NowNorth = sampler.NowNorth;
        EndEast = sampler.EndEast;
        EndNorth = sampler.EndNorth;

        void Record(int edge, double[] e, double[] n, double mE, double mN)
        {
            sampler.Add(edge, e, n);
            Instant t = tl.Edges[edge];
            ringE[ringNext] = mE;
            ringN[ringNext] = mN;
            ringT[ringNext] = t.ToUnixTimeTicks();
            ringNext = (ringNext + 1) % ringSize;
            ringCount = Math.Min(ringCount + 1, ringSize);
            bool tracked = t >= trackNext || edge == tl.Count;
            bool graded = edge >= tl.AnchorEdge && LeavesGradeAt is null && t <= gradeEnd;
            if (tracked || graded)
            {
                double ae = 0, an = 0;
                int inWindow = 0;
                long from = t.ToUnixTimeTicks() - windowTicks;
                for (int k = 0; k < ringCount; k++)
                {
                    if (ringT[k] > from)
                    {
                        ae += ringE[k];
                        an += ringN[k];
                        inWindow++;
                    }
                }

                ae /= inWindow; // the newest entry, at t, is always in the window
                an /= inWindow;
                if (tracked)
                {
                    Track.Add(LeanSample.FromLeanVector(t, ae, an));
                    while (trackNext <= t)
                    {
                        trackNext += Duration.FromHours(1);
                    }
                }

                double tilt = Math.Asin(Math.Min(1, Math.Sqrt((ae * ae) + (an * an))));
                if (graded && tilt > gradeLimitRadians)
                {
                    LeavesGradeAt = t;
                    LeanAtLeaveDeg = tilt * Angle.DegreesPerRadian;
                }
            }

            if (edge < tl.AnchorEdge)
            {
                return;
            }

            double ticks = t.ToUnixTimeTicks();
            double stepTicks = tl.Steps[Math.Min(edge, tl.Count - 1)].TotalTicks;
            if (ticks <= rateFirstEnd + stepTicks || ticks >= rateLastStart - stepTicks)
            {
                double h2 = Math.Min(1, (mE * mE) + (mN * mN));
                RateTimes.Add(t);
                RateVectors.Add(new Vector3(mE, mN, Math.Sqrt(1 - h2)));
            }
        }
    }

    /// <summary>Reruns of single points with other parameters and the main run's elongation scaled, all on the same light
    /// (computed once per point and step); returns per variant each point's lean vector at the horizon end (averaged
    /// over the variant's last nutation period).</summary>
    public (double East, double North)[][] RunVariants(
        int[] points, IReadOnlyList<(StemParameters Parameters, double Scale)> variants, double startHeightM, int segments, double[] elongation)
    {
        ForecastTimeline tl = _timeline;
        int count = points.Length, v = variants.Count;
        var stems = new StemBundle[v];
        var samplers = new Sampler[v];
        var east = new double[count];
        var north = new double[count];
        int rotation = SkipRotationsBefore(tl.Edges[_firstEdge]);
        for (int k = 0; k < v; k++)
        {
            StemParameters parameters = variants[k].Parameters;
            stems[k] = StemBundle.Upright(parameters, Math.Max(startHeightM, parameters.GrowthZoneLengthM), count, segments);

            samplers[k] = new Sampler(count, tl, parameters.NutationPeriod);
            Measure(stems[k], east, north, out _, out _);
            samplers[k].Add(_firstEdge, east, north);
        }

        var light = new PointLight[1];
        var blue = new Vector3[count];
        for (int s = _firstEdge; s < tl.Count; s++)
        {
            for (int k = 0; k < v; k++)
            {
                ApplyRotations(stems[k], rotation, tl.Edges[s + 1]);
            }

            rotation = SkipRotationsBefore(tl.Edges[s + 1]);
            for (int i = 0; i < count; i++)
            {
                _field.Step(tl.Outside[s], tl.LocalTimes[s], points[i], light);
                blue[i] = light[0].BlueVector;
            }

            Duration dt = tl.Steps[s];
            for (int k = 0; k < v; k++)
            {
                stems[k].Step(dt, elongation[s] * variants[k].Scale, blue);

                Measure(stems[k], east, north, out _, out _);
                samplers[k].Add(s + 1, east, north);
            }
        }

        var result = new (double, double)[v][];
        for (int k = 0; k < v; k++)
        {
            samplers[k].Finish();
            result[k] = new (double, double)[count];
            for (int i = 0; i < count; i++)
            {
                result[k][i] = (samplers[k].EndEast[i], samplers[k].EndNorth[i]);
            }
        }

        return result;
    }

    private static void Measure(StemBundle stems, double[] east, double[] north, out double meanEast, out double meanNorth)
    {
        stems.HorizontalLean(east, north);
        double se = 0, sn = 0;
        for (int i = 0; i < stems.Count; i++)
        {
            se += east[i];
            sn += north[i];
        }

        meanEast = se / stems.Count;
        meanNorth = sn / stems.Count;
    }

    private int SkipRotationsBefore(Instant start)
    {
        int r = 0;
        while (r < _rotations.Length && _rotations[r].At < start)
        {
            r++;
        }

        return r;
    }

    // Rotations done before the end of a step are applied at its start (the step grid resolves their time to one step).
    private int ApplyRotations(StemBundle stems, int next, Instant stepEnd)
    {
        while (next < _rotations.Length && _rotations[next].At < stepEnd)
        {
            stems.RotatePot(_rotations[next].Angle);
            next++;
        }

        return next;
    }

    /// <summary>Averages per-point lean vectors over the nutation period before now and before the horizon end.</summary>
    private sealed class Sampler
    {
        private readonly ForecastTimeline _tl;
        private readonly Instant _nowFrom, _now, _endFrom, _end;
        private readonly double[] _nowE, _nowN, _endE, _endN;
        private int _nowCount, _endCount;

        public Sampler(int count, ForecastTimeline tl, Duration period)
        {
            _tl = tl;
            _now = tl.Edges[tl.AnchorEdge];
            _nowFrom = _now - period;
            _end = tl.Edges[^1];
            _endFrom = _end - period;
            _nowE = new double[count];
            _nowN = new double[count];
            _endE = new double[count];
            _endN = new double[count];
        }

        public double[] NowEast => _nowE;

        public double[] NowNorth => _nowN;

        public double[] EndEast => _endE;

        public double[] EndNorth => _endN;

        public void Add(int edge, double[] east, double[] north)
        {
            Instant t = _tl.Edges[edge];
            if (t > _nowFrom && t <= _now)
            {
                Accumulate(_nowE, _nowN, east, north);
                _nowCount++;
            }

            if (t > _endFrom && t <= _end)
            {
                Accumulate(_endE, _endN, east, north);
                _endCount++;
            }
        }

        public void Finish()
        {
            Scale(_nowE, _nowN, _nowCount);
            Scale(_endE, _endN, _endCount);
        }

        private static void Accumulate(double[] sumE, double[] sumN, double[] east, double[] north)
        {
            for (int i = 0; i < sumE.Length; i++)
            {
                sumE[i] += east[i];
                sumN[i] += north[i];
            }
        }

        private static void Scale(double[] e, double[] n, int count)
        {
            if (count == 0)
            {
                return;
            }

            for (int i = 0; i < e.Length; i++)
            {
                e[i] /= count;
                n[i] /= count;
            }
        }
    }
}

using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Validation;
using NodaTime;

namespace CanopyAdvisor.Core.Plants;

/// <summary>
/// One stem bending under gravity, blue light, its own curvature and circumnutation: the AC model family
/// (graviception plus proprioception, Bastien et al. 2013, PNAS 110:755; phototropism with the photograviceptive
/// ratio M, Bastien, Douady &amp; Moulia 2015, PLoS Comput Biol 11:e1004037; the sine law of Chauvet et al. 2016,
/// Sci Rep 6:35431), with the gravitropic response delayed by τ_g (the gravitropic-overshoot theory of
/// circumnutation, Israelsson &amp; Johnsson 1967, Physiologia Plantarum) (MODEL.md §4).
/// </summary>
/// <remarks>
/// <para>
/// Geometry: the stem runs from the pot (the origin of the plant's own frame, z up) to the apex. Below the apical
/// growth zone it is matured and keeps its shape: it is kept compactly as the position and orientation of the
/// growth zone's base plus a short polyline (for the crook). The growth zone of length L_gz is a chain of
/// <c>growthZoneSegments</c> circular arcs of length ds = L_gz/N, each with a curvature vector κ (perpendicular to
/// its tangent, pointing where it bends). Curvature is stored in a rotation-minimising frame (u, v, t̂) carried from
/// the growth zone's base, so it is material-like: it rotates with the pot.
/// </para>
/// <para>
/// Bending: in every growth-zone segment, with ε̇ = Ė/L_gz,
/// dκ/dt = ε̇ [ (β/L_gz) g⊥(t − τ_g) + (ν/L_gz) ℓ⊥ − γ κ ] + nutation, with g⊥ = ẑ − (ẑ·t̂)t̂ (sine law),
/// ℓ⊥ = l̂ − (l̂·t̂)t̂, l̂ the direction of the net blue flux vector (toward the light), ν = β·M(I),
/// M(I) = a·I^b, β = B·γ. The stimuli are sensed at each segment's midpoint tangent, on the shape drawn at the end
/// of the previous step (all segments at once), which makes the steady shape the implicit-midpoint discretisation of
/// the continuous one. Over a
/// step the stimuli are held and the linear equation is solved exactly (exp(−ε̇γ dt) relaxation toward the forced
/// state, and the rotating nutation drive integrated exactly), so steps with ε̇γ dt ≥ 1 stay stable.
/// </para>
/// <para>
/// Delay: the gravitropic stimulus is read τ_g earlier from a short history per segment (samples at least τ_g/20
/// apart, linear interpolation), at the step's midpoint time. The history is stored in each segment's own frame, so
/// it turns with the pot. Before the stem's start the history is taken as constant (the state at creation).
/// </para>
/// <para>
/// Circumnutation: a curvature drive of constant magnitude D rotating about t̂ with angular speed
/// ω = σ·2π/P (σ = +1 counter-clockwise seen from above), relaxed by proprioception like any curvature:
/// dκ_n/dt = −ε̇γ κ_n + D e^{iωt}. The model is linear in κ, so this part is kept apart from the tropic curvature
/// (one value, uniform over the growth zone, in the segments' own frames) and the growth zone is drawn and sensed with
/// the sum. D = (α/L_gz)·√((ε̇γ)² + ω²) makes |κ_n| = α/L_gz in the periodic state, a uniform arc whose apex tangent
/// tilts by α (an arc turns its tangent by κL): with nothing else acting the apex circles with tilt α (between
/// α(1 − 1/N) and α while growing, because the maturing basal segment fades out of it). Gravitropism sensing that tilt
/// (with its delay) adds to or reduces it. Circumnutation is differential growth: it stops, like all bending, when
/// Ė = 0, and its phase advances only while the stem grows. At the first growing step κ_n starts in its periodic state
/// (see <c>StartNutation</c>). Matured segments keep only the tropic curvature: the helix circumnutation leaves in
/// real stems has a pitch of a few millimetres and a negligible radius, while freezing whole segments at one phase
/// of it would build a false lean whenever the freeze interval is a multiple of the period.
/// </para>
/// <para>
/// Lengthening: length Ė·dt is added at the apex; it grows straight along the apex tangent until a whole ds has
/// been added, then the basal growth-zone segment matures (freezes) and a new straight segment starts at the apex,
/// so the growth zone slides toward the apex and the geometry stays continuous. The basal segment is drawn, and
/// frozen, with the growth-weighted mean of its curvature since it became basal (material passes out of the growth
/// zone continuously), which keeps circumnutation from being locked into the matured stem as a false lean.
/// </para>
/// <para>Not thread-safe; deterministic; <see cref="Clone"/> is a deep copy. <see cref="Step"/> allocates nothing.</para>
/// </remarks>
public sealed class Stem
{
    // Delay history: capacity and the smallest spacing between samples as a fraction of τ_g (24 samples at
    // ≥ τ_g/20 always cover τ_g).
    // (Internal: StemBundle, the same model arranged for speed, shares them.)
    internal const int HistoryCapacity = 24;
    internal const double HistorySpacingFraction = 1.0 / 20.0;
    /// <summary>Below this x² (x = θ/2, i.e. x &lt; 0.6) the arc functions are summed from their Taylor series (error
    /// below 1e-12); above it the library's sine and cosine are used. Shared with <see cref="StemBundle"/>.</summary>
    internal const double ArcSeriesLimit = 0.36;

    private const int PolylineCapacity = 24;

    private readonly int _n;
    private readonly double _ds;
    private readonly double _gz;
    private readonly double _invGz; // 1/L_gz, 1/ds and β/L_gz: multiplications instead of divisions every step
    private readonly double _invDs;
    private readonly double _betaOverGz;
    private readonly double _gamma;
    private readonly double _beta;
    private readonly double _photoA;
    private readonly double _photoB;
    private readonly double _delayH;
    private readonly double _omega; // signed angular speed of nutation, rad/h
    private readonly double _nutationAmplitude; // rad

    // Per-segment state, interleaved (SegmentStride doubles = two cache lines per segment, so a step touches few lines):
    // [0..8] the segment's start frame (t̂, u, v) at the last walk; Ku, Kv the tropic curvature; Hs = sinc(θ/2),
    // Omc = (1 − cos(θ/2))/(θ/2)², Ch = cos(θ/2) of the drawn curvature at the last transport; DrawnU, DrawnV the
    // curvature each segment was drawn with at the last walk (tropic + nutation).
    private const int SegmentStride = 16;
    private const int Ku = 9;
    private const int Kv = 10;
    private const int Hs = 11;
    private const int Omc = 12;
    private const int Ch = 13;
    private const int DrawnU = 14;
    private const int DrawnV = 15;
    private double[] _seg;
    private Vector3[] _nodes; // growth-zone node positions, logical order, node 0 = growth-zone base
    private double[] _historyTimes;
    private double[] _history; // [(slot * n + storage) * 2 + 0/1]
    private Vector3[] _polyline;

    private int _head;
    private Vector3 _base;
    private Vector3 _tb;
    private Vector3 _ub;
    private Vector3 _vb;
    private double _maturedLength;
    private double _extra;
    private Vector3 _apex;
    private Vector3 _apexTangent;
    private double _timeH;
    private double _phaseCos = 1;
    private double _phaseSin;
    private double _rotorDtH = double.NaN;
    private double _rotorCos = 1;
    private double _rotorSin;
    private int _historyCount;
    private int _historyNewest = -1;
    private int _polylineCount;
    private bool _nutating;
    private double _nutationU; // the nutation's curvature, uniform over the growth zone, in the segments' own frames
    private double _nutationV;
    private double _basalSumU; // growth-weighted sums of the maturing basal segment's curvature
    private double _basalSumV;
    private double _basalWeight; // metres grown since it became basal
    private double _lastLambda = double.NaN;
    private double _lastH = double.NaN;
    private double _lastDecay;
    private double _lastGain;
    private Duration _lastDt; // the last step and its length in hours (Duration.Zero ↔ 0 h initially)
    private double _lastDtHours;
    private double _lastDrive; // nutation drive D and its step coefficients (e^{iωh} − e^{−λh})/(λ + iω), kept with λ, dt
    private double _lastNutRe;
    private double _lastNutIm;
    private double _lastIntensity = double.NaN;
    private double _lastRatio;

    private Stem(StemParameters parameters, double lengthM, Vector3 direction, int growthZoneSegments)
    {
        Parameters = parameters;
        _n = growthZoneSegments;
        _gz = parameters.GrowthZoneLengthM;
        _ds = _gz / _n;
        _invGz = 1 / _gz;
        _invDs = 1 / _ds;
        _gamma = parameters.ProprioceptiveSensitivity;
        _beta = parameters.BalanceNumber * parameters.ProprioceptiveSensitivity;
        _betaOverGz = _beta / _gz;
        _photoA = parameters.PhotoCoefficient;
        _photoB = parameters.PhotoExponent;
        _delayH = parameters.GravitropicDelay.TotalHours;
        _nutationAmplitude = parameters.NutationAmplitude.Radians;
        _omega = parameters.NutationAmplitude.Radians != 0
            ? parameters.NutationSense * 2 * Math.PI / parameters.NutationPeriod.TotalHours
            : 0;

        _seg = new double[_n * SegmentStride];
        for (int s = 0; s < _n; s++)
        {
            _seg[(s * SegmentStride) + Hs] = 1.0;
            _seg[(s * SegmentStride) + Omc] = 0.5;
            _seg[(s * SegmentStride) + Ch] = 1.0;
        }
        _nodes = new Vector3[_n + 1];
        _historyTimes = new double[HistoryCapacity];
        _history = new double[HistoryCapacity * _n * 2];
        _polyline = new Vector3[PolylineCapacity];

        _tb = direction;
        (_ub, _vb) = PerpendicularFrame(direction);
        _maturedLength = lengthM - _gz;
        _base = direction * _maturedLength;
        _polyline[0] = Vector3.Zero;
        _polyline[1] = _base;
        _polylineCount = 2;

        // Draw the stem, then record the initial stimulus as the whole past (h = 0 leaves the curvature unchanged).
        Walk(bend: false, 0, 0, Vector3.Zero, 0, 0);
        Walk(bend: true, 0, 0, Vector3.Zero, 0, 0);
    }

    /// <summary>The parameters this stem was created with.</summary>
    public StemParameters Parameters { get; }

    /// <summary>Number of segments in the growth zone.</summary>
    public int GrowthZoneSegments => _n;

    /// <summary>Simulated time since creation (sum of the steps).</summary>
    public Duration Elapsed => Duration.FromHours(_timeH);

    /// <summary>Apex position relative to the base (the pot), m, in the site frame.</summary>
    public Vector3 ApexOffset => _apex;

    /// <summary>Unit tangent at the apex (the direction the tip grows), site frame.</summary>
    public Vector3 ApexTangent => _apexTangent;

    /// <summary>Length of the stem along its axis, m.</summary>
    public double LengthM => _maturedLength + _gz + _extra;

    /// <summary>What a grower sees now: height, length, lean, apex angle and crook (computed on demand).</summary>
    public StemShape Shape
    {
        get
        {
            return new StemShape(
                _apex.Z,
                LengthM,
                Direction.Zenith(_apex),
                Direction.Azimuth(_apex),
                Direction.Zenith(_apexTangent),
                Crook());
        }
    }

    /// <summary>A straight, upright stem of the given height whose top <see cref="StemParameters.GrowthZoneLengthM"/> is the growth zone.</summary>
    /// <param name="parameters">Model parameters.</param>
    /// <param name="heightM">Height (= length) of the stem, m; at least the growth-zone length.</param>
    /// <param name="growthZoneSegments">Segments in the growth zone (1 to 64; 8 by default).</param>
    /// <exception cref="InvalidInputException">Any parameter is out of range (every problem is listed).</exception>
    public static Stem Upright(StemParameters parameters, double heightM, int growthZoneSegments = 8) =>
        Leaning(parameters, heightM, Angle.Zero, Angle.Zero, growthZoneSegments);

    /// <summary>A straight stem tilted as a whole from the vertical (like a pot laid over), for tests and calibration.</summary>
    /// <param name="parameters">Model parameters.</param>
    /// <param name="heightM">Length of the stem (its height before it was tilted), m; at least the growth-zone length.</param>
    /// <param name="lean">Tilt from the vertical, 0 to 180°.</param>
    /// <param name="azimuth">Compass direction the apex points to.</param>
    /// <param name="growthZoneSegments">Segments in the growth zone (1 to 64; 8 by default).</param>
    /// <exception cref="InvalidInputException">Any parameter is out of range (every problem is listed).</exception>
    public static Stem Leaning(StemParameters parameters, double heightM, Angle lean, Angle azimuth, int growthZoneSegments = 8)
    {
        List<ValidationError> errors = CheckStart(parameters, heightM, lean, azimuth, growthZoneSegments);
        if (errors.Count > 0)
        {
            throw new InvalidInputException(errors);
        }

        return new Stem(parameters, heightM, Direction.FromAzimuthZenith(azimuth, lean), growthZoneSegments);
    }

    /// <summary>Every problem with the parameters and start shape of a stem (also used by StemBundle).</summary>
    internal static List<ValidationError> CheckStart(StemParameters parameters, double heightM, Angle lean, Angle azimuth, int growthZoneSegments)
    {
        ArgumentNullException.ThrowIfNull(parameters);
        var errors = new List<ValidationError>();
        Validate(parameters, errors);
        if (!(heightM >= parameters.GrowthZoneLengthM) || double.IsInfinity(heightM))
        {
            errors.Add(new ValidationError("heightM", $"must be finite and at least the growth-zone length ({parameters.GrowthZoneLengthM} m)"));
        }

        if (growthZoneSegments is < 1 or > 64)
        {
            errors.Add(new ValidationError("growthZoneSegments", "must be 1 to 64"));
        }

        if (!double.IsFinite(lean.Radians) || lean.Radians < 0 || lean.Radians > Math.PI)
        {
            errors.Add(new ValidationError("lean", "must be 0 to 180°"));
        }

        if (!double.IsFinite(azimuth.Radians))
        {
            errors.Add(new ValidationError("azimuth", "must be finite"));
        }

        return errors;
    }

    /// <summary>Advances the stem by one time step: bending in the growth zone and new length at the apex.</summary>
    /// <param name="dt">Time step (5–15 min is typical; longer steps stay stable).</param>
    /// <param name="elongationMetresPerHour">Stem elongation rate Ė over the step, m/h (0 = no growth, no bending).</param>
    /// <param name="blueFluxVector">Net blue photon flux vector, µmol m⁻² s⁻¹, in the site frame (z up), pointing toward
    /// the light; its magnitude sets M(I); the zero vector means no phototropic stimulus.</param>
    /// <exception cref="InvalidInputException">A negative or non-finite step, rate or vector.</exception>
    public void Step(Duration dt, double elongationMetresPerHour, Vector3 blueFluxVector) =>
        Advance(dt, elongationMetresPerHour, blueFluxVector, lengthen: true);

    /// <summary>
    /// Advances the bending as <see cref="Step"/> does but adds no length: the growth zone stays where it is.
    /// This is the AC model without elongation (Bastien et al. 2013), whose steady shapes have closed forms; it is
    /// used for checks and calibration.
    /// </summary>
    /// <param name="dt">Time step.</param>
    /// <param name="elongationMetresPerHour">Elongation rate Ė that sets the bending rate ε̇ = Ė/L_gz, m/h.</param>
    /// <param name="blueFluxVector">Net blue photon flux vector, µmol m⁻² s⁻¹, site frame, toward the light.</param>
    /// <exception cref="InvalidInputException">A negative or non-finite step, rate or vector.</exception>
    public void BendInPlace(Duration dt, double elongationMetresPerHour, Vector3 blueFluxVector) =>
        Advance(dt, elongationMetresPerHour, blueFluxVector, lengthen: false);

    /// <summary>
    /// Turns the pot about its vertical axis: every segment, curvature and the delayed gravitropic state turn with it.
    /// </summary>
    /// <param name="angle">Rotation, positive clockwise seen from above (like compass azimuth).</param>
    public void RotatePot(Angle angle)
    {
        double c = angle.Cos(), s = angle.Sin();
        _base = RotateAboutVertical(_base, c, s);
        _tb = RotateAboutVertical(_tb, c, s);
        _ub = RotateAboutVertical(_ub, c, s);
        _vb = RotateAboutVertical(_vb, c, s);
        _apex = RotateAboutVertical(_apex, c, s);
        _apexTangent = RotateAboutVertical(_apexTangent, c, s);
        for (int i = 0; i < _nodes.Length; i++)
        {
            _nodes[i] = RotateAboutVertical(_nodes[i], c, s);
        }

        for (int i = 0; i < _polylineCount; i++)
        {
            _polyline[i] = RotateAboutVertical(_polyline[i], c, s);
        }

        // Curvature and the delayed stimulus are stored in the segments' own frames, which turned with the base
        // frame above; re-orthonormalise to keep rounding from accumulating over many rotations.
        Orthonormalise();
        for (int g = 0; g < _seg.Length; g += SegmentStride)
        {
            for (int f = g; f < g + 9; f += 3)
            {
                double x = _seg[f], y = _seg[f + 1];
                _seg[f] = (x * c) + (y * s);
                _seg[f + 1] = (-x * s) + (y * c);
            }
        }
    }

    /// <summary>A deep copy that evolves independently.</summary>
    public Stem Clone()
    {
        var copy = (Stem)MemberwiseClone();
        copy._seg = (double[])_seg.Clone();
        copy._nodes = (Vector3[])_nodes.Clone();
        copy._historyTimes = (double[])_historyTimes.Clone();
        copy._history = (double[])_history.Clone();
        copy._polyline = (Vector3[])_polyline.Clone();
        return copy;
    }

    private void Advance(Duration dt, double elongation, Vector3 blue, bool lengthen)
    {
        if (dt != _lastDt)
        {
            // Steps usually repeat with the same dt: Duration.TotalHours costs a division.
            _lastDt = dt;
            _lastDtHours = dt.TotalHours;
        }

        double h = _lastDtHours;
        if (!(h >= 0) || double.IsInfinity(h) || !(elongation >= 0) || double.IsInfinity(elongation)
            || !double.IsFinite(blue.X) || !double.IsFinite(blue.Y) || !double.IsFinite(blue.Z))
        {
            throw new InvalidInputException(BadStepErrors(h, elongation, blue));
        }

        if (h == 0)
        {
            return;
        }

        double epsDot = elongation * _invGz;
        if (epsDot > 0)
        {
            double intensity = blue.Length;
            double nu = 0;
            Vector3 lightDir = Vector3.Zero;
            if (intensity > 0)
            {
                if (intensity != _lastIntensity)
                {
                    _lastIntensity = intensity;
                    _lastRatio = _photoB == 0 ? _photoA : _photoA * Math.Pow(intensity, _photoB);
                }

                nu = _beta * _lastRatio;
                lightDir = blue * (1 / intensity);
            }

            Walk(bend: true, h, epsDot, lightDir, nu, lengthen ? elongation * h : 0);
        }

        _timeH += h;
        if (lengthen && elongation > 0)
        {
            _extra += elongation * h;
            if (_extra >= _ds)
            {
                while (_extra >= _ds)
                {
                    Freeze();
                    _extra -= _ds;
                }

                Orthonormalise();
                Walk(bend: false, 0, 0, Vector3.Zero, 0, 0);
            }
            else
            {
                _apex += _apexTangent * (elongation * h);
            }
        }
    }

    /// <summary>
    /// One pass from the growth-zone base to the apex: senses, bends (when asked), carries the frame and sums the
    /// positions. Allocation-free; about 60 flops per segment.
    /// </summary>
    private void Walk(bool bend, double h, double epsDot, Vector3 lightDir, double nu, double grownM)
    {
        double decay = 1, gain = 0, nutU = 0, nutV = 0, cGravity = 0, cLight = 0;
        int pushSlot = -1, read0 = -1, read1 = -1;
        double readWeight = 0;
        if (bend)
        {
            double lambda = epsDot * _gamma;
            if (lambda != _lastLambda || h != _lastH)
            {
                // Steps usually repeat with the same ε̇ and dt: the exponential is worth keeping.
                _lastLambda = lambda;
                _lastH = h;
                _lastDecay = Math.Exp(-lambda * h);
                _lastGain = lambda * h > 1e-9 ? (1 - _lastDecay) / lambda : h;
                if (_nutationAmplitude != 0 && h > 0)
                {
                    // The nutation drive's coefficients depend only on λ and dt too (a square root and two divisions).
                    SetRotor(h);
                    _lastDrive = (_nutationAmplitude / _gz) * Math.Sqrt((lambda * lambda) + (_omega * _omega));
                    double numRe = _rotorCos - _lastDecay, numIm = _rotorSin;
                    double den = (lambda * lambda) + (_omega * _omega);
                    _lastNutRe = ((numRe * lambda) + (numIm * _omega)) / den;
                    _lastNutIm = ((numIm * lambda) - (numRe * _omega)) / den;
                }
            }

            decay = _lastDecay;
            gain = _lastGain;
            cGravity = epsDot * _betaOverGz;
            cLight = epsDot * nu * _invGz;
            if (_nutationAmplitude != 0 && h > 0)
            {
                // Exact integral of D e^{i(φ0 + ωt)} against e^{−λ(h−t)}: D e^{iφ0} (e^{iωh} − e^{−λh}) / (λ + iω).
                double drive = _lastDrive, cRe = _lastNutRe, cIm = _lastNutIm;
                nutU = drive * ((_phaseCos * cRe) - (_phaseSin * cIm));
                nutV = drive * ((_phaseCos * cIm) + (_phaseSin * cRe));
                if (!_nutating)
                {
                    StartNutation(drive, lambda);
                }

                _nutationU = (_nutationU * decay) + nutU;
                _nutationV = (_nutationV * decay) + nutV;

                AdvancePhase(h);
            }

            if (_delayH > 0)
            {
                PrepareHistory(h, out pushSlot, out read0, out read1, out readWeight);
            }
        }

        // Two passes. Pass 1 senses with each segment's frame from the last walk (stored), updates the curvature and
        // evaluates the arc functions: no dependency between segments, so the work overlaps. Pass 2 carries the frame
        // from base to apex, a short dependent chain per segment. (One fused pass was twice as slow: every segment
        // waited for the one below.)
        double ds = _ds, halfDs = 0.5 * _ds, halfDs2 = halfDs * halfDs, quarterDs2 = 0.25 * ds * ds;
        // The nutation bends the basal segment only over its part not yet matured, so it fades out continuously.
        double basalNutationWeight = Math.Max(0, 1 - (_extra * _invDs));
        double lx = lightDir.X, ly = lightDir.Y, lz = lightDir.Z;
        double nutNewU = _nutationU, nutNewV = _nutationV;
        ref double history0 = ref MemoryMarshal.GetArrayDataReference(_history);
        ref double seg0 = ref MemoryMarshal.GetArrayDataReference(_seg); // _seg holds n segments: no bounds checks below
        int n = _n, head = _head;
        for (int s = 0; s < n; s++)
        {
            bool basal = s == head;
            ref double g = ref Unsafe.Add(ref seg0, s * SegmentStride);
            double ku = Unsafe.Add(ref g, Ku), kv = Unsafe.Add(ref g, Kv);
            double gku = ku, gkv = kv; // the tropic curvature drawn (differs from the state only in the maturing basal segment)
            double nutWeight = 1;
            if (basal)
            {
                nutWeight = basalNutationWeight;
                if (_basalWeight > 0 && !(bend && grownM > 0)) // when bending with growth the mean is taken below
                {
                    gku = _basalSumU / _basalWeight;
                    gkv = _basalSumV / _basalWeight;
                }
            }

            if (bend)
            {
                double tx = g, ty = Unsafe.Add(ref g, 1), tz = Unsafe.Add(ref g, 2);
                double ux = Unsafe.Add(ref g, 3), uy = Unsafe.Add(ref g, 4), uz = Unsafe.Add(ref g, 5);
                double vx = Unsafe.Add(ref g, 6), vy = Unsafe.Add(ref g, 7), vz = Unsafe.Add(ref g, 8);
                double sku = Unsafe.Add(ref g, DrawnU), skv = Unsafe.Add(ref g, DrawnV); // the curvature as drawn at the last walk

                // Stimuli at the segment's midpoint tangent: turn the start-frame components by x = θ/2 in the bending
                // plane, g += adj·κ with adj·|κ| = (cos x − 1)(g·κ̂) − sin x (g·t̂), without dividing by |κ|. The
                // arc functions of the drawn κ were kept from the last walk.
                double sinOverKm = Unsafe.Add(ref g, Hs) * halfDs; // sin(x)/|κ|
                double cosMinusOneOverKm2 = -Unsafe.Add(ref g, Omc) * halfDs2; // (cos x − 1)/|κ|²
                double gu = uz, gv = vz, lu = 0, lv = 0;
                double adj = (cosMinusOneOverKm2 * ((gu * sku) + (gv * skv))) - (sinOverKm * tz);
                gu += adj * sku;
                gv += adj * skv;
                if (cLight != 0)
                {
                    lu = (lx * ux) + (ly * uy) + (lz * uz);
                    lv = (lx * vx) + (ly * vy) + (lz * vz);
                    double lt = (lx * tx) + (ly * ty) + (lz * tz);
                    double adjLight = (cosMinusOneOverKm2 * ((lu * sku) + (lv * skv))) - (sinOverKm * lt);
                    lu += adjLight * sku;
                    lv += adjLight * skv;
                }

                if (read0 >= 0)
                {
                    // Slots and segments are in range by construction (HistoryCapacity × n pairs).
                    if (pushSlot >= 0)
                    {
                        ref double w = ref Unsafe.Add(ref history0, ((pushSlot * n) + s) * 2);
                        w = gu;
                        Unsafe.Add(ref w, 1) = gv;
                    }

                    ref double h0 = ref Unsafe.Add(ref history0, ((read0 * n) + s) * 2);
                    ref double h1 = ref Unsafe.Add(ref history0, ((read1 * n) + s) * 2);
                    gu = h0 + (readWeight * (h1 - h0));
                    gv = Unsafe.Add(ref h0, 1) + (readWeight * (Unsafe.Add(ref h1, 1) - Unsafe.Add(ref h0, 1)));
                }

                ku = (ku * decay) + (((cGravity * gu) + (cLight * lu)) * gain);
                kv = (kv * decay) + (((cGravity * gv) + (cLight * lv)) * gain);
                Unsafe.Add(ref g, Ku) = ku;
                Unsafe.Add(ref g, Kv) = kv;
                if (!basal)
                {
                    gku = ku;
                    gkv = kv;
                }
                else if (grownM > 0)
                {
                    // The basal segment matures bit by bit as it is passed by growth: its drawn (and finally frozen)
                    // curvature is the growth-weighted mean since it became basal. Freezing the instantaneous value
                    // instead would lock the state of one moment into every matured segment.
                    _basalSumU += ku * grownM;
                    _basalSumV += kv * grownM;
                    _basalWeight += grownM;
                    double inverseWeight = 1 / _basalWeight;
                    gku = _basalSumU * inverseWeight;
                    gkv = _basalSumV * inverseWeight;
                }
                else if (_basalWeight == 0)
                {
                    gku = ku;
                    gkv = kv;
                }
            }

            // The arc functions of the new drawn curvature, for the transport below and the next step's sensing.
            double dku = gku + (nutWeight * nutNewU), dkv = gkv + (nutWeight * nutNewV);
            Unsafe.Add(ref g, DrawnU) = dku;
            Unsafe.Add(ref g, DrawnV) = dkv;
            ArcFunctions(((dku * dku) + (dkv * dkv)) * quarterDs2, out Unsafe.Add(ref g, Ch), out Unsafe.Add(ref g, Hs), out Unsafe.Add(ref g, Omc));
        }

        double cx = _tb.X, cy = _tb.Y, cz = _tb.Z, ax = _ub.X, ay = _ub.Y, az = _ub.Z, bx = _vb.X, by = _vb.Y, bz = _vb.Z;
        double px = _base.X, py = _base.Y, pz = _base.Z;
        double halfDsSq2 = 0.5 * ds * ds;
        ref Vector3 node0 = ref MemoryMarshal.GetArrayDataReference(_nodes); // n + 1 nodes
        node0 = _base;
        for (int i = 0; i < n; i++)
        {
            int s = head + i;
            if (s >= n)
            {
                s -= n;
            }

            ref double g = ref Unsafe.Add(ref seg0, s * SegmentStride);
            g = cx;
            Unsafe.Add(ref g, 1) = cy;
            Unsafe.Add(ref g, 2) = cz;
            Unsafe.Add(ref g, 3) = ax;
            Unsafe.Add(ref g, 4) = ay;
            Unsafe.Add(ref g, 5) = az;
            Unsafe.Add(ref g, 6) = bx;
            Unsafe.Add(ref g, 7) = by;
            Unsafe.Add(ref g, 8) = bz;

            // Carry the frame through the arc: rotation by θ = |κ|ds about t̂ × κ̂, division-free (κ may be zero).
            // With x = θ/2: sin θ/|κ| = ds·sinc(x)·cos x, (1 − cos θ)/|κ|² = ds²·sinc²(x)/2.
            double ku = Unsafe.Add(ref g, DrawnU), kv = Unsafe.Add(ref g, DrawnV), hs = Unsafe.Add(ref g, Hs);
            double km2 = (ku * ku) + (kv * kv);
            double sinOverKmFull = ds * hs * Unsafe.Add(ref g, Ch);
            double omc2 = halfDsSq2 * hs * hs;
            double kx = (ku * ax) + (kv * bx), ky = (ku * ay) + (kv * by), kz = (ku * az) + (kv * bz);
            px += (cx * sinOverKmFull) + (kx * omc2);
            py += (cy * sinOverKmFull) + (ky * omc2);
            pz += (cz * sinOverKmFull) + (kz * omc2);
            double ct = 1 - (omc2 * km2);
            double au = omc2 * ku, bu = sinOverKmFull * ku, av = omc2 * kv, bv = sinOverKmFull * kv;
            ax -= (kx * au) + (cx * bu);
            ay -= (ky * au) + (cy * bu);
            az -= (kz * au) + (cz * bu);
            bx -= (kx * av) + (cx * bv);
            by -= (ky * av) + (cy * bv);
            bz -= (kz * av) + (cz * bv);
            cx = (cx * ct) + (kx * sinOverKmFull);
            cy = (cy * ct) + (ky * sinOverKmFull);
            cz = (cz * ct) + (kz * sinOverKmFull);
            Unsafe.Add(ref node0, i + 1) = new Vector3(px, py, pz);
        }

        _apexTangent = new Vector3(cx, cy, cz);
        _apex = new Vector3(px + (cx * _extra), py + (cy * _extra), pz + (cz * _extra));
    }

    /// <summary>Carries position and frame (t̂, u, v) through one arc of length ds and curvature κ = ku·u + kv·v.</summary>
    internal static void Transport(ref Vector3 t, ref Vector3 u, ref Vector3 v, ref Vector3 p, double ku, double kv, double ds)
    {
        double km2 = (ku * ku) + (kv * kv);
        if (km2 == 0)
        {
            p += t * ds;
            return;
        }

        double x = 0.5 * Math.Sqrt(km2) * ds; // θ/2
        HalfAngle(x, out double ch, out double hs, out _);
        // With x = θ/2, sh = sin x = x·hs: sin θ / θ = hs·ch, (1 − cos θ) = 2 sh², sin θ/|κ| = ds·hs·ch.
        double sinOverKm = ds * hs * ch;
        double oneMinusCosOverKm2 = 0.5 * ds * ds * hs * hs;
        Vector3 kappa = (u * ku) + (v * kv);
        p += (t * (ds * hs * ch)) + (kappa * oneMinusCosOverKm2);
        Vector3 tNew = (t * (1 - (oneMinusCosOverKm2 * km2))) + (kappa * sinOverKm);
        // R w = w − (1 − cos θ)(w·κ̂)κ̂ − sin θ (w·κ̂) t̂ for w ⊥ t̂, with w·κ̂ = ku/|κ| (u) or kv/|κ| (v).
        u = u - (kappa * (oneMinusCosOverKm2 * ku)) - (t * (sinOverKm * ku));
        v = v - (kappa * (oneMinusCosOverKm2 * kv)) - (t * (sinOverKm * kv));
        t = tNew;
    }

    /// <summary>cos x, sin(x)/x and (1 − cos x)/x² from x²: Taylor series below x = 0.6 (no square root; error below 1e-12), the library above.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static void ArcFunctions(double x2, out double cos, out double sinc, out double oneMinusCosOverX2)
    {
        if (x2 < ArcSeriesLimit)
        {
            // The same Taylor terms as HalfAngle, summed in pairs (Estrin's scheme): a shorter dependent chain than
            // nested multiplication, and this chain lies on every segment's path from sensing to transport.
            double x4 = x2 * x2;
            oneMinusCosOverX2 = (0.5 - (x2 * (1.0 / 24)))
                + (x4 * (((1.0 / 720) - (x2 * (1.0 / 40320))) + (x4 * (1.0 / 3628800))));
            cos = 1 - (x2 * oneMinusCosOverX2);
            sinc = (1 - (x2 * (1.0 / 6)))
                + (x4 * (((1.0 / 120) - (x2 * (1.0 / 5040))) + (x4 * ((1.0 / 362880) - (x2 * (1.0 / 39916800))))));
            return;
        }

        HalfAngle(Math.Sqrt(x2), out cos, out sinc, out oneMinusCosOverX2);
    }

    internal static void HalfAngle(double x, out double cos, out double sinc, out double oneMinusCosOverX2)
    {
        if (x < 0.6)
        {
            double x2 = x * x;
            // Multiplications by reciprocals, not divisions: this runs once per segment per step.
            oneMinusCosOverX2 = 0.5 * (1 - (x2 * (1.0 / 12) * (1 - (x2 * (1.0 / 30) * (1 - (x2 * (1.0 / 56) * (1 - (x2 * (1.0 / 90)))))))));
            cos = 1 - (x2 * oneMinusCosOverX2);
            sinc = 1 - (x2 * (1.0 / 6) * (1 - (x2 * (1.0 / 20) * (1 - (x2 * (1.0 / 42) * (1 - (x2 * (1.0 / 72) * (1 - (x2 * (1.0 / 110))))))))));
            return;
        }

        (double sin, cos) = Math.SinCos(x);
        sinc = sin / x;
        oneMinusCosOverX2 = (1 - cos) / (x * x);
    }

    /// <summary>
    /// Puts the nutation curvature into the periodic state of its drive, D e^{iφ}/(λ + iω) (magnitude α/L_gz), as if the stem had been circumnutating before it was created. Starting from rest
    /// instead would leave a non-rotating transient decaying over 1/(ε̇γ) (often days), which the maturing segments
    /// would freeze into a spurious permanent lean.
    /// </summary>
    private void StartNutation(double drive, double lambda)
    {
        _nutating = true;
        double den = (lambda * lambda) + (_omega * _omega);
        _nutationU = drive * ((_phaseCos * lambda) + (_phaseSin * _omega)) / den;
        _nutationV = drive * ((_phaseSin * lambda) - (_phaseCos * _omega)) / den;
    }

    private void SetRotor(double h)
    {
        if (h != _rotorDtH)
        {
            (_rotorSin, _rotorCos) = Math.SinCos(_omega * h);
            _rotorDtH = h;
        }
    }

    private void AdvancePhase(double h)
    {
        if (_omega == 0)
        {
            return;
        }

        SetRotor(h);
        double c = (_phaseCos * _rotorCos) - (_phaseSin * _rotorSin);
        double s = (_phaseSin * _rotorCos) + (_phaseCos * _rotorSin);
        double renorm = 1.5 - (0.5 * ((c * c) + (s * s))); // one Newton step toward |phase| = 1
        _phaseCos = c * renorm;
        _phaseSin = s * renorm;
    }

    /// <summary>Chooses the slot for this step's sample (or none) and the two samples around t + h/2 − τ_g.</summary>
    private void PrepareHistory(double h, out int pushSlot, out int read0, out int read1, out double weight)
    {
        pushSlot = -1;
        if (_historyCount == 0 || _timeH - _historyTimes[_historyNewest] >= _delayH * HistorySpacingFraction)
        {
            pushSlot = _historyNewest + 1 == HistoryCapacity ? 0 : _historyNewest + 1;
            _historyTimes[pushSlot] = _timeH;
            _historyNewest = pushSlot;
            if (_historyCount < HistoryCapacity)
            {
                _historyCount++;
            }
        }

        double query = _timeH + (0.5 * h) - _delayH;
        int newer = _historyNewest;
        if (query >= _historyTimes[newer])
        {
            read0 = read1 = newer;
            weight = 0;
            return;
        }

        for (int k = 1; k < _historyCount; k++)
        {
            int older = newer == 0 ? HistoryCapacity - 1 : newer - 1;
            double tOld = _historyTimes[older];
            if (query >= tOld)
            {
                read0 = older;
                read1 = newer;
                weight = (query - tOld) / (_historyTimes[newer] - tOld);
                return;
            }

            newer = older;
        }

        // Older than every sample: the history before the first sample is constant.
        read0 = read1 = newer;
        weight = 0;
    }

    /// <summary>The basal growth-zone segment matures; a new straight segment starts at the apex.</summary>
    private void Freeze()
    {
        int s = _head;
        Vector3 t = _tb, u = _ub, v = _vb, p = _base;
        int g = s * SegmentStride;
        double ku = _basalWeight > 0 ? _basalSumU / _basalWeight : _seg[g + Ku];
        double kv = _basalWeight > 0 ? _basalSumV / _basalWeight : _seg[g + Kv];
        _basalSumU = _basalSumV = _basalWeight = 0;
        Transport(ref t, ref u, ref v, ref p, ku, kv, _ds);
        _tb = t;
        _ub = u;
        _vb = v;
        _base = p;
        _maturedLength += _ds;
        AppendPolyline(p);

        _head = s + 1 == _n ? 0 : s + 1;
        _seg[g + Ku] = 0;
        _seg[g + Kv] = 0;
        _seg[g + Hs] = 1;
        _seg[g + Omc] = 0.5;
        if (_n > 1)
        {
            // The new apical segment (storage s) inherits the sensing history of the segment below it.
            int below = s == 0 ? _n - 1 : s - 1;
            for (int k = 0; k < HistoryCapacity; k++)
            {
                int to = ((k * _n) + s) * 2, from = ((k * _n) + below) * 2;
                _history[to] = _history[from];
                _history[to + 1] = _history[from + 1];
            }
        }
    }

    private void AppendPolyline(Vector3 point)
    {
        if (_polylineCount == PolylineCapacity)
        {
            // Keep every other point (the pot's point stays first); the crook is sampled more coarsely lower down.
            int kept = 0;
            for (int i = 0; i < _polylineCount; i += 2)
            {
                _polyline[kept++] = _polyline[i];
            }

            _polylineCount = kept;
        }

        _polyline[_polylineCount++] = point;
    }

    private double Crook()
    {
        double length = _apex.Length;
        if (length == 0)
        {
            return 0;
        }

        Vector3 axis = _apex / length;
        double worst = 0;
        for (int i = 0; i < _polylineCount; i++)
        {
            worst = Math.Max(worst, DistanceFromAxis(_polyline[i], axis));
        }

        for (int i = 0; i < _nodes.Length; i++)
        {
            worst = Math.Max(worst, DistanceFromAxis(_nodes[i], axis));
        }

        return worst;
    }

    private static double DistanceFromAxis(Vector3 point, Vector3 axis) => Vector3.Cross(point, axis).Length;

    private void Orthonormalise() => Orthonormalise(ref _tb, ref _ub, out _vb);

    /// <summary>Makes the frame (t̂, u, v) orthonormal again: t̂ and u normalised, u made perpendicular to t̂, v = t̂ × u.</summary>
    internal static void Orthonormalise(ref Vector3 t, ref Vector3 u, out Vector3 v)
    {
        t = t.Normalized();
        u = (u - (t * Vector3.Dot(u, t))).Normalized();
        v = Vector3.Cross(t, u);
    }

    internal static (Vector3 U, Vector3 V) PerpendicularFrame(Vector3 t)
    {
        Vector3 reference = Math.Abs(t.Z) < 0.9 ? Vector3.UnitZ : Vector3.UnitY;
        Vector3 u = (reference - (t * Vector3.Dot(reference, t))).Normalized();
        return (u, Vector3.Cross(t, u));
    }

    /// <summary>Clockwise (seen from above) rotation about the vertical: azimuth a becomes a + φ.</summary>
    private static Vector3 RotateAboutVertical(Vector3 a, double cos, double sin) =>
        new((a.X * cos) + (a.Y * sin), (-a.X * sin) + (a.Y * cos), a.Z);

    private static void Validate(StemParameters p, List<ValidationError> errors)
    {
        if (!(p.BalanceNumber >= 0) || double.IsInfinity(p.BalanceNumber))
        {
            errors.Add(new ValidationError("balanceNumber", "must be finite and ≥ 0"));
        }

        if (!(p.ProprioceptiveSensitivity >= 0) || double.IsInfinity(p.ProprioceptiveSensitivity))
        {
            errors.Add(new ValidationError("proprioceptiveSensitivity", "must be finite and ≥ 0"));
        }

        if (!(p.PhotoCoefficient >= 0) || double.IsInfinity(p.PhotoCoefficient))
        {
            errors.Add(new ValidationError("photoCoefficient", "must be finite and ≥ 0"));
        }

        if (!double.IsFinite(p.PhotoExponent))
        {
            errors.Add(new ValidationError("photoExponent", "must be finite"));
        }

        if (!(p.GrowthZoneLengthM > 0) || double.IsInfinity(p.GrowthZoneLengthM))
        {
            errors.Add(new ValidationError("growthZoneLengthM", "must be finite and > 0"));
        }

        if (!double.IsFinite(p.NutationAmplitude.Radians) || p.NutationAmplitude.Radians < 0)
        {
            errors.Add(new ValidationError("nutationAmplitude", "must be finite and ≥ 0"));
        }

        if (p.NutationAmplitude.Radians > 0 && !(p.NutationPeriod > Duration.Zero))
        {
            errors.Add(new ValidationError("nutationPeriod", "must be > 0 when the amplitude is > 0"));
        }

        if (p.NutationSense is not (1 or -1))
        {
            errors.Add(new ValidationError("nutationSense", "must be +1 (counter-clockwise from above) or −1"));
        }

        if (p.GravitropicDelay < Duration.Zero)
        {
            errors.Add(new ValidationError("gravitropicDelay", "must be ≥ 0"));
        }
    }

    private static List<ValidationError> BadStepErrors(double h, double elongation, Vector3 blue)
    {
        var errors = new List<ValidationError>();
        if (!(h >= 0) || double.IsInfinity(h))
        {
            errors.Add(new ValidationError("dt", "must be finite and ≥ 0"));
        }

        if (!(elongation >= 0) || double.IsInfinity(elongation))
        {
            errors.Add(new ValidationError("elongationMetresPerHour", "must be finite and ≥ 0"));
        }

        if (!double.IsFinite(blue.X) || !double.IsFinite(blue.Y) || !double.IsFinite(blue.Z))
        {
            errors.Add(new ValidationError("blueFluxVector", "must be finite"));
        }

        return errors;
    }
}

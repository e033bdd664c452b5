using System.Numerics;
using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Validation;
using NodaTime;
using Vector3 = CanopyAdvisor.Core.Geometry.Vector3;

namespace CanopyAdvisor.Core.Plants;

/// <summary>
/// Several stems with the same parameters, start shape and growth-zone segments, stepped together under the same
/// elongation but each under its own blue light: the model of <see cref="Stem"/> (the AC model family, Bastien et al.
/// 2013, PNAS 110:755, and Bastien, Douady &amp; Moulia 2015, PLoS Comput Biol 11:e1004037, with the delayed
/// gravitropic response and circumnutation; MODEL.md §4) arranged for speed.
/// </summary>
/// <remarks>
/// <para>
/// <see cref="Stem"/> is the reference and documents the model; this type computes the same numbers in the same
/// order. Stems that share parameters, steps, elongation rates and pot rotations share all their control flow: the
/// time, the nutation phase and its curvature, the delay history's timing, when segments freeze and how far the
/// basal segment has matured. Only the light, and so the curvature, frames and positions, differ per stem. The
/// shared part is computed once per step; the per-stem part is held in structure-of-arrays layout, one
/// <see cref="Vector{T}"/> of stems (4 with AVX2) per quantity, and the walk along the growth zone runs on whole
/// vectors. Vector addition, subtraction, multiplication, division and square root round like their scalar forms
/// and no multiply–add is fused (neither here nor in <see cref="Stem"/>), so every stem follows its
/// <see cref="Stem"/> twin bit for bit; the transcendental functions (the power law M(I), the arc functions of rare
/// large curvatures, the pot rotation's sine and cosine) are the same scalar calls, per stem or once where the value
/// is shared. Checked by StemBundleTests (tests/CanopyAdvisor.Core.Tests/Plants) against <see cref="Stem"/> over
/// thousands of steps with growth, freezes, delay, nutation and rotations.
/// </para>
/// <para>
/// Without hardware vector support the bundle holds one <see cref="Stem"/> per stem and steps them one by one.
/// Stem counts that are not a multiple of the vector width are padded with dark stems whose results are not read.
/// The crook (<see cref="StemShape.CrookM"/>) is not tracked here. Not thread-safe; deterministic; <see cref="Step"/>
/// allocates nothing.
/// </para>
/// </remarks>
internal sealed class StemBundle
{
    // Per-segment quantities per vector of stems: the start frame (t̂, u, v) at the last walk, the tropic curvature,
    // the arc functions of the drawn curvature and the drawn curvature (the same fields as Stem's segments).
    private const int SegmentStride = 16;
    private const int Ku = 9;
    private const int Kv = 10;
    private const int Hs = 11;
    private const int Omc = 12;
    private const int Ch = 13;
    private const int DrawnU = 14;
    private const int DrawnV = 15;

    // Per-stem vectors outside the growth zone: base position and frame, apex and apex tangent (x, y, z each), the
    // basal segment's growth-weighted curvature sums, and this step's light (direction and coefficient).
    private const int FrameStride = 20;
    private const int Base = 0;
    private const int Tb = 3;
    private const int Ub = 6;
    private const int Vb = 9;
    private const int Apex = 12;
    private const int ApexTan = 15;
    private const int BasalSumU = 18;
    private const int BasalSumV = 19;
    private const int LightStride = 4;


    private static readonly int Width = Vector<double>.Count;

    private readonly Stem[]? _scalar; // the fallback without hardware vectors
    private readonly int _count;
    private readonly int _blocks; // vectors of stems
    private readonly int _n;
    private readonly double _ds;
    private readonly double _gz;
    private readonly double _invGz;
    private readonly double _invDs;
    private readonly double _betaOverGz;
    private readonly double _gamma;
    private readonly double _beta;
    private readonly double _photoA;
    private readonly double _photoB;
    private readonly double _delayH;
    private readonly double _omega;
    private readonly double _nutationAmplitude;

    private readonly Vector<double>[] _seg = []; // [(block * n + segment) * SegmentStride + field]
    private readonly Vector<double>[] _history = []; // [((block * HistoryCapacity + slot) * n + segment) * 2 + 0/1]
    private readonly Vector<double>[] _frame = []; // [block * FrameStride + field]
    private readonly Vector<double>[] _light = []; // [block * LightStride + 0..2 direction, 3 coefficient]
    private readonly bool[] _blockLit = [];
    private readonly Vector<double>[] _lastIntensity = []; // per stem: the last intensity and its M(I)
    private readonly Vector<double>[] _lastRatio = [];
    private readonly double[] _historyTimes = new double[Stem.HistoryCapacity];

    // The state all stems share (see Stem for the meaning of each).
    private int _head;
    private double _maturedLength;
    private double _extra;
    private double _timeH;
    private double _phaseCos = 1;
    private double _phaseSin;
    private double _rotorDtH = double.NaN;
    private double _rotorCos = 1;
    private double _rotorSin;
    private int _historyCount;
    private int _historyNewest = -1;
    private bool _nutating;
    private double _nutationU;
    private double _nutationV;
    private double _basalWeight;
    private double _lastLambda = double.NaN;
    private double _lastH = double.NaN;
    private double _lastDecay;
    private double _lastGain;
    private Duration _lastDt;
    private double _lastDtHours;
    private double _lastDrive;
    private double _lastNutRe;
    private double _lastNutIm;

    private StemBundle(StemParameters parameters, double lengthM, Angle lean, Angle azimuth, int count, int growthZoneSegments, bool vectorised)
    {
        Parameters = parameters;
        _count = count;
        _n = growthZoneSegments;
        if (!vectorised)
        {
            _scalar = new Stem[count];
            Stem prototype = Stem.Leaning(parameters, lengthM, lean, azimuth, growthZoneSegments);
            for (int i = 0; i < count; i++)
            {
                _scalar[i] = i == 0 ? prototype : prototype.Clone();
            }

            return;
        }

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

        _blocks = (count + Width - 1) / Width;
        _seg = new Vector<double>[_blocks * _n * SegmentStride];
        for (int g = 0; g < _seg.Length; g += SegmentStride)
        {
            _seg[g + Hs] = Vector<double>.One;
            _seg[g + Omc] = new Vector<double>(0.5);
            _seg[g + Ch] = Vector<double>.One;
        }

        _history = new Vector<double>[_blocks * Stem.HistoryCapacity * _n * 2];
        _frame = new Vector<double>[_blocks * FrameStride];
        _light = new Vector<double>[_blocks * LightStride];
        _blockLit = new bool[_blocks];
        _lastIntensity = new Vector<double>[_blocks];
        _lastRatio = new Vector<double>[_blocks];
        _lastIntensity.AsSpan().Fill(new Vector<double>(double.NaN));

        Vector3 direction = Direction.FromAzimuthZenith(azimuth, lean);
        (Vector3 u, Vector3 v) = Stem.PerpendicularFrame(direction);
        _maturedLength = lengthM - _gz;
        Vector3 basePoint = direction * _maturedLength;
        for (int b = 0; b < _blocks; b++)
        {
            SetBlock(b, Tb, direction);
            SetBlock(b, Ub, u);
            SetBlock(b, Vb, v);
            SetBlock(b, Base, basePoint);
        }

        // Draw the stems, then record the initial stimulus as the whole past (as Stem's constructor does).
        Walk(bend: false, 0, 0, 0);
        Walk(bend: true, 0, 0, 0);
    }

    /// <summary>Whether bundles step their stems on hardware vectors (else one <see cref="Stem"/> at a time).</summary>
    public static bool IsVectorised => Vector.IsHardwareAccelerated;

    /// <summary>The parameters every stem was created with.</summary>
    public StemParameters Parameters { get; }

    /// <summary>Number of stems.</summary>
    public int Count => _count;

    /// <summary>Number of segments in each growth zone.</summary>
    public int GrowthZoneSegments => _n;

    /// <summary>Simulated time since creation (sum of the steps).</summary>
    public Duration Elapsed => _scalar is null ? Duration.FromHours(_timeH) : _scalar[0].Elapsed;

    /// <summary>Length of each stem along its axis, m (the same for all).</summary>
    public double LengthM => _scalar is null ? _maturedLength + _gz + _extra : _scalar[0].LengthM;

    /// <summary><paramref name="count"/> straight, upright stems (as <see cref="Stem.Upright"/>).</summary>
    /// <param name="parameters">Model parameters, shared by all stems.</param>
    /// <param name="heightM">Height (= length) of each stem, m; at least the growth-zone length.</param>
    /// <param name="count">Number of stems, 1 to 4,096.</param>
    /// <param name="growthZoneSegments">Segments in each growth zone (1 to 64).</param>
    /// <exception cref="InvalidInputException">Any parameter is out of range (every problem is listed).</exception>
    public static StemBundle Upright(StemParameters parameters, double heightM, int count, int growthZoneSegments = 8) =>
        Leaning(parameters, heightM, Angle.Zero, Angle.Zero, count, growthZoneSegments);

    /// <summary><paramref name="count"/> straight stems tilted alike from the vertical (as <see cref="Stem.Leaning"/>).</summary>
    /// <param name="parameters">Model parameters, shared by all stems.</param>
    /// <param name="heightM">Length of each stem, m; at least the growth-zone length.</param>
    /// <param name="lean">Tilt from the vertical, 0 to 180°.</param>
    /// <param name="azimuth">Compass direction the apexes point to.</param>
    /// <param name="count">Number of stems, 1 to 4,096.</param>
    /// <param name="growthZoneSegments">Segments in each growth zone (1 to 64).</param>
    /// <exception cref="InvalidInputException">Any parameter is out of range (every problem is listed).</exception>
    public static StemBundle Leaning(
        StemParameters parameters, double heightM, Angle lean, Angle azimuth, int count, int growthZoneSegments = 8) =>
        Create(parameters, heightM, lean, azimuth, count, growthZoneSegments, IsVectorised);

    /// <summary>As <see cref="Leaning"/>, choosing the vector or the one-stem-at-a-time path (for tests).</summary>
    internal static StemBundle Create(
        StemParameters parameters, double heightM, Angle lean, Angle azimuth, int count, int growthZoneSegments, bool vectorised)
    {
        // The parameters, height, segments and angles are checked exactly as for a single stem.
        List<ValidationError> errors = Stem.CheckStart(parameters, heightM, lean, azimuth, growthZoneSegments);
        if (count is < 1 or > 4096)
        {
            errors.Add(new ValidationError("count", "must be 1 to 4,096"));
        }

        if (errors.Count > 0)
        {
            throw new InvalidInputException(errors);
        }

        return new StemBundle(parameters, heightM, lean, azimuth, count, growthZoneSegments, vectorised);
    }

    /// <summary>Apex position of one stem relative to its pot, m, site frame.</summary>
    /// <param name="stem">Stem index, 0 to <see cref="Count"/> − 1.</param>
    public Vector3 ApexOffset(int stem) => _scalar is null ? GetStem(stem, Apex) : _scalar[stem].ApexOffset;

    /// <summary>Unit tangent at one stem's apex, site frame.</summary>
    /// <param name="stem">Stem index, 0 to <see cref="Count"/> − 1.</param>
    public Vector3 ApexTangent(int stem) => _scalar is null ? GetStem(stem, ApexTan) : _scalar[stem].ApexTangent;

    /// <summary>
    /// The east and north components of each stem's apex direction seen from its pot (the unit vector of
    /// <see cref="ApexOffset"/>), the horizontal lean vector whose length is the sine of the lean.
    /// </summary>
    /// <param name="east">Receives one value per stem.</param>
    /// <param name="north">Receives one value per stem.</param>
    public void HorizontalLean(Span<double> east, Span<double> north)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(east.Length, _count, nameof(east));
        ArgumentOutOfRangeException.ThrowIfLessThan(north.Length, _count, nameof(north));
        if (_scalar is not null)
        {
            for (int i = 0; i < _count; i++)
            {
                Vector3 a = _scalar[i].ApexOffset;
                double inverse = 1 / a.Length;
                east[i] = a.X * inverse;
                north[i] = a.Y * inverse;
            }

            return;
        }

        // As a.X * (1 / a.Length) per stem, on whole vectors.
        for (int b = 0; b < _blocks; b++)
        {
            ref Vector<double> apex = ref _frame[(b * FrameStride) + Apex];
            Vector<double> x = apex, y = Unsafe.Add(ref apex, 1), z = Unsafe.Add(ref apex, 2);
            Vector<double> inverse = Vector<double>.One / Vector.SquareRoot((x * x) + (y * y) + (z * z));
            Vector<double> e = x * inverse, n = y * inverse;
            for (int lane = 0, i = b * Width; lane < Width && i < _count; lane++, i++)
            {
                east[i] = e[lane];
                north[i] = n[lane];
            }
        }
    }

    /// <summary>Advances every stem by one time step under its own blue light (as <see cref="Stem.Step"/> for each).</summary>
    /// <param name="dt">Time step.</param>
    /// <param name="elongationMetresPerHour">Elongation rate Ė shared by all stems, m/h.</param>
    /// <param name="blueFluxVectors">Net blue photon flux vector per stem, µmol m⁻² s⁻¹, site frame, toward the light.</param>
    /// <exception cref="InvalidInputException">A negative or non-finite step, rate or vector, or not one vector per stem.</exception>
    public void Step(Duration dt, double elongationMetresPerHour, ReadOnlySpan<Vector3> blueFluxVectors)
    {
        if (dt != _lastDt)
        {
            _lastDt = dt;
            _lastDtHours = dt.TotalHours;
        }

        double h = _lastDtHours;
        double elongation = elongationMetresPerHour;
        bool finite = blueFluxVectors.Length == _count;
        for (int i = 0; finite && i < blueFluxVectors.Length; i++)
        {
            Vector3 b = blueFluxVectors[i];
            finite = double.IsFinite(b.X) && double.IsFinite(b.Y) && double.IsFinite(b.Z);
        }

        if (!(h >= 0) || double.IsInfinity(h) || !(elongation >= 0) || double.IsInfinity(elongation) || !finite)
        {
            throw new InvalidInputException(BadStepErrors(h, elongation, blueFluxVectors));
        }

        if (_scalar is not null)
        {
            for (int i = 0; i < _scalar.Length; i++)
            {
                _scalar[i].Step(dt, elongation, blueFluxVectors[i]);
            }

            return;
        }

        if (h == 0)
        {
            return;
        }

        double epsDot = elongation * _invGz;
        if (epsDot > 0)
        {
            SetLight(epsDot, blueFluxVectors);
            Walk(bend: true, h, epsDot, elongation * h);
        }

        _timeH += h;
        if (elongation > 0)
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
                Walk(bend: false, 0, 0, 0);
            }
            else
            {
                var grown = new Vector<double>(elongation * h);
                for (int b = 0; b < _blocks; b++)
                {
                    int f = b * FrameStride;
                    for (int k = 0; k < 3; k++)
                    {
                        _frame[f + Apex + k] += _frame[f + ApexTan + k] * grown;
                    }
                }
            }
        }
    }

    /// <summary>Turns every pot about its vertical axis (as <see cref="Stem.RotatePot"/> for each).</summary>
    /// <param name="angle">Rotation, positive clockwise seen from above (like compass azimuth).</param>
    public void RotatePot(Angle angle)
    {
        if (_scalar is not null)
        {
            foreach (Stem stem in _scalar)
            {
                stem.RotatePot(angle);
            }

            return;
        }

        double c = angle.Cos(), s = angle.Sin();
        var cv = new Vector<double>(c);
        var sv = new Vector<double>(s);
        for (int b = 0; b < _blocks; b++)
        {
            foreach (int field in (ReadOnlySpan<int>)[Base, Tb, Ub, Vb, Apex, ApexTan])
            {
                RotateAboutVertical(ref _frame[(b * FrameStride) + field], cv, sv);
            }
        }

        Orthonormalise();
        for (int g = 0; g < _seg.Length; g += SegmentStride)
        {
            for (int f = g; f < g + 9; f += 3)
            {
                RotateAboutVertical(ref _seg[f], cv, sv);
            }
        }
    }

    // Stem.RotateAboutVertical on x, y of a vector of stems: (x cos + y sin, −x sin + y cos).
    private static void RotateAboutVertical(ref Vector<double> x, Vector<double> c, Vector<double> s)
    {
        ref Vector<double> y = ref Unsafe.Add(ref x, 1);
        Vector<double> x0 = x, y0 = y;
        x = (x0 * c) + (y0 * s);
        y = (-x0 * s) + (y0 * c);
    }

    /// <summary>The light of each stem for this step: direction, M(I) and the light's bending coefficient ε̇ν/L_gz.</summary>
    private void SetLight(double epsDot, ReadOnlySpan<Vector3> blue)
    {
        // The flux vectors into the lanes (padding lanes stay dark), then intensity and direction on whole vectors:
        // the same operations as Stem's blue.Length and blue * (1 / intensity).
        Span<double> light = MemoryMarshal.Cast<Vector<double>, double>(_light.AsSpan());
        for (int i = 0; i < blue.Length; i++)
        {
            int block = i / Width;
            int at = (block * (LightStride - 1) * Width) + i;
            light[at] = blue[i].X;
            light[at + Width] = blue[i].Y;
            light[at + (2 * Width)] = blue[i].Z;
        }

        Span<double> lastIntensity = MemoryMarshal.Cast<Vector<double>, double>(_lastIntensity.AsSpan());
        Span<double> lastRatio = MemoryMarshal.Cast<Vector<double>, double>(_lastRatio.AsSpan());
        var beta = new Vector<double>(_beta);
        var epsDotVector = new Vector<double>(epsDot);
        var invGz = new Vector<double>(_invGz);
        for (int b = 0; b < _blocks; b++)
        {
            ref Vector<double> l = ref _light[b * LightStride];
            Vector<double> x = l, y = Unsafe.Add(ref l, 1), z = Unsafe.Add(ref l, 2);
            Vector<double> intensity = Vector.SquareRoot((x * x) + (y * y) + (z * z));
            Vector<long> litLanes = Vector.GreaterThan(intensity, Vector<double>.Zero);
            Vector<double> ratio;
            if (_photoB == 0)
            {
                ratio = new Vector<double>(_photoA);
            }
            else
            {
                // M(I) = a·I^b, per stem; kept while the intensity repeats (as Stem does).
                for (int lane = 0, i = b * Width; lane < Width; lane++, i++)
                {
                    double lanesIntensity = intensity[lane];
                    if (lanesIntensity > 0 && lanesIntensity != lastIntensity[i])
                    {
                        lastIntensity[i] = lanesIntensity;
                        lastRatio[i] = _photoA * Math.Pow(lanesIntensity, _photoB);
                    }
                }

                ratio = _lastRatio[b];
            }

            Vector<double> inverse = Vector<double>.One / intensity;
            Vector<double> nu = Vector.ConditionalSelect(litLanes, beta * ratio, Vector<double>.Zero);
            l = Vector.ConditionalSelect(litLanes, x * inverse, Vector<double>.Zero);
            Unsafe.Add(ref l, 1) = Vector.ConditionalSelect(litLanes, y * inverse, Vector<double>.Zero);
            Unsafe.Add(ref l, 2) = Vector.ConditionalSelect(litLanes, z * inverse, Vector<double>.Zero);
            Vector<double> cLight = epsDotVector * nu * invGz;
            Unsafe.Add(ref l, 3) = cLight;
            _blockLit[b] = !Vector.EqualsAll(cLight, Vector<double>.Zero);
        }
    }

    /// <summary>Stem.Walk for all stems: the shared coefficients once, then the growth zone of each vector of stems.</summary>
    private void Walk(bool bend, double h, double epsDot, double grownM)
    {
        double decay = 1, gain = 0, cGravity = 0;
        int pushSlot = -1, read0 = -1, read1 = -1;
        double readWeight = 0;
        if (bend)
        {
            double lambda = epsDot * _gamma;
            if (lambda != _lastLambda || h != _lastH)
            {
                _lastLambda = lambda;
                _lastH = h;
                _lastDecay = Math.Exp(-lambda * h);
                _lastGain = lambda * h > 1e-9 ? (1 - _lastDecay) / lambda : h;
                if (_nutationAmplitude != 0 && h > 0)
                {
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
            if (_nutationAmplitude != 0 && h > 0)
            {
                double drive = _lastDrive, cRe = _lastNutRe, cIm = _lastNutIm;
                double nutU = drive * ((_phaseCos * cRe) - (_phaseSin * cIm));
                double nutV = drive * ((_phaseCos * cIm) + (_phaseSin * cRe));
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

        // The maturing basal segment's weight is shared: Stem reads it before and updates it in the basal segment.
        double oldWeight = _basalWeight;
        bool accumulate = bend && grownM > 0;
        double inverseWeight = 0;
        if (accumulate)
        {
            _basalWeight += grownM;
            inverseWeight = 1 / _basalWeight;
        }

        var shared = new StemBundleWalkTerms
        {
            Bend = bend,
            Decay = decay,
            Gain = gain,
            CGravity = cGravity,
            PushSlot = pushSlot,
            Read0 = read0,
            Read1 = read1,
            ReadWeight = readWeight,
            NutationWeight = Math.Max(0, 1 - (_extra * _invDs)),
            NutationU = _nutationU,
            NutationV = _nutationV,
            BasalFromSums = oldWeight > 0 && !accumulate,
            OldWeight = oldWeight,
            Accumulate = accumulate,
            GrownM = grownM,
            InverseWeight = inverseWeight,
            BasalTakesState = bend && !accumulate && oldWeight == 0,
        };
        // Stem.Walk's two passes, each over all vectors of stems: the carrying pass is a dependent chain per vector,
        // and running the chains of consecutive vectors back to back lets them overlap.
        for (int b = 0; b < _blocks; b++)
        {
            SenseAndBend(b, in shared);
        }

        for (int b = 0; b < _blocks; b++)
        {
            Carry(b);
        }
    }

    /// <summary>Stem.Walk's first pass for one vector of stems: sensing and bending per segment, and the arc functions
    /// of the curvature drawn.</summary>
    private void SenseAndBend(int block, in StemBundleWalkTerms w)
    {
        int n = _n, head = _head;
        double halfDsScalar = 0.5 * _ds;
        var halfDs = new Vector<double>(halfDsScalar);
        var halfDs2 = new Vector<double>(halfDsScalar * halfDsScalar);
        var quarterDs2 = new Vector<double>(0.25 * _ds * _ds);
        var decay = new Vector<double>(w.Decay);
        var gain = new Vector<double>(w.Gain);
        var cGravity = new Vector<double>(w.CGravity);
        var readWeight = new Vector<double>(w.ReadWeight);

        ref Vector<double> frame = ref _frame[block * FrameStride];
        ref Vector<double> lightRef = ref _light[block * LightStride];
        Vector<double> lx = lightRef, ly = Unsafe.Add(ref lightRef, 1), lz = Unsafe.Add(ref lightRef, 2);
        Vector<double> cLight = Unsafe.Add(ref lightRef, 3);
        bool lit = _blockLit[block];
        Vector<double> litMask = Vector.AsVectorDouble(~Vector.Equals(cLight, Vector<double>.Zero));
        ref Vector<double> sumU = ref Unsafe.Add(ref frame, BasalSumU);
        ref Vector<double> sumV = ref Unsafe.Add(ref frame, BasalSumV);
        ref Vector<double> seg0 = ref _seg[block * n * SegmentStride];
        ref Vector<double> history0 = ref MemoryMarshal.GetArrayDataReference(_history);
        int historyBlock = block * Stem.HistoryCapacity * n;

        for (int s = 0; s < n; s++)
        {
            bool basal = s == head;
            ref Vector<double> g = ref Unsafe.Add(ref seg0, s * SegmentStride);
            Vector<double> ku = Unsafe.Add(ref g, Ku), kv = Unsafe.Add(ref g, Kv);
            Vector<double> gku = ku, gkv = kv;
            double nutWeight = 1;
            if (basal)
            {
                nutWeight = w.NutationWeight;
                if (w.BasalFromSums)
                {
                    var weight = new Vector<double>(w.OldWeight);
                    gku = sumU / weight;
                    gkv = sumV / weight;
                }
            }

            if (w.Bend)
            {
                Vector<double> tx = g, ty = Unsafe.Add(ref g, 1), tz = Unsafe.Add(ref g, 2);
                Vector<double> ux = Unsafe.Add(ref g, 3), uy = Unsafe.Add(ref g, 4), uz = Unsafe.Add(ref g, 5);
                Vector<double> vx = Unsafe.Add(ref g, 6), vy = Unsafe.Add(ref g, 7), vz = Unsafe.Add(ref g, 8);
                Vector<double> sku = Unsafe.Add(ref g, DrawnU), skv = Unsafe.Add(ref g, DrawnV);

                Vector<double> sinOverKm = Unsafe.Add(ref g, Hs) * halfDs;
                Vector<double> cosMinusOneOverKm2 = -Unsafe.Add(ref g, Omc) * halfDs2;
                Vector<double> gu = uz, gv = vz, lu = Vector<double>.Zero, lv = Vector<double>.Zero;
                Vector<double> adj = (cosMinusOneOverKm2 * ((gu * sku) + (gv * skv))) - (sinOverKm * tz);
                gu += adj * sku;
                gv += adj * skv;
                if (lit)
                {
                    lu = (lx * ux) + (ly * uy) + (lz * uz);
                    lv = (lx * vx) + (ly * vy) + (lz * vz);
                    Vector<double> lt = (lx * tx) + (ly * ty) + (lz * tz);
                    Vector<double> adjLight = (cosMinusOneOverKm2 * ((lu * sku) + (lv * skv))) - (sinOverKm * lt);
                    lu += adjLight * sku;
                    lv += adjLight * skv;
                    // Stems without a light coefficient take ℓ⊥ = 0, as Stem does.
                    lu &= litMask;
                    lv &= litMask;
                }

                if (w.Read0 >= 0)
                {
                    if (w.PushSlot >= 0)
                    {
                        ref Vector<double> pushed = ref Unsafe.Add(ref history0, (((historyBlock + (w.PushSlot * n)) + s) * 2));
                        pushed = gu;
                        Unsafe.Add(ref pushed, 1) = gv;
                    }

                    ref Vector<double> h0 = ref Unsafe.Add(ref history0, ((historyBlock + (w.Read0 * n)) + s) * 2);
                    ref Vector<double> h1 = ref Unsafe.Add(ref history0, ((historyBlock + (w.Read1 * n)) + s) * 2);
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
                else if (w.Accumulate)
                {
                    var grown = new Vector<double>(w.GrownM);
                    var inverseWeight = new Vector<double>(w.InverseWeight);
                    sumU += ku * grown;
                    sumV += kv * grown;
                    gku = sumU * inverseWeight;
                    gkv = sumV * inverseWeight;
                }
                else if (w.BasalTakesState)
                {
                    gku = ku;
                    gkv = kv;
                }
            }

            Vector<double> dku = gku + new Vector<double>(nutWeight * w.NutationU);
            Vector<double> dkv = gkv + new Vector<double>(nutWeight * w.NutationV);
            Unsafe.Add(ref g, DrawnU) = dku;
            Unsafe.Add(ref g, DrawnV) = dkv;
            Vector<double> x2 = ((dku * dku) + (dkv * dkv)) * quarterDs2;
            ArcFunctions(x2, out Unsafe.Add(ref g, Ch), out Unsafe.Add(ref g, Hs), out Unsafe.Add(ref g, Omc));
            if (!Vector.LessThanAll(x2, new Vector<double>(Stem.ArcSeriesLimit)))
            {
                LargeArcs(x2, ref g);
            }
        }

    }

    /// <summary>Stem.Walk's second pass for one vector of stems: the frame carried from the growth zone's base to the
    /// apex through each segment's arc.</summary>
    private void Carry(int block)
    {
        int n = _n, head = _head;
        var ds = new Vector<double>(_ds);
        var one = Vector<double>.One;
        ref Vector<double> frame = ref _frame[block * FrameStride];
        ref Vector<double> seg0 = ref _seg[block * n * SegmentStride];
        Vector<double> cx = Unsafe.Add(ref frame, Tb), cy = Unsafe.Add(ref frame, Tb + 1), cz = Unsafe.Add(ref frame, Tb + 2);
        Vector<double> ax = Unsafe.Add(ref frame, Ub), ay = Unsafe.Add(ref frame, Ub + 1), az = Unsafe.Add(ref frame, Ub + 2);
        Vector<double> bx = Unsafe.Add(ref frame, Vb), by = Unsafe.Add(ref frame, Vb + 1), bz = Unsafe.Add(ref frame, Vb + 2);
        Vector<double> px = Unsafe.Add(ref frame, Base), py = Unsafe.Add(ref frame, Base + 1), pz = Unsafe.Add(ref frame, Base + 2);
        var halfDsSq2 = new Vector<double>(0.5 * _ds * _ds);
        for (int i = 0; i < n; i++)
        {
            int s = head + i;
            if (s >= n)
            {
                s -= n;
            }

            ref Vector<double> g = ref Unsafe.Add(ref seg0, s * SegmentStride);
            g = cx;
            Unsafe.Add(ref g, 1) = cy;
            Unsafe.Add(ref g, 2) = cz;
            Unsafe.Add(ref g, 3) = ax;
            Unsafe.Add(ref g, 4) = ay;
            Unsafe.Add(ref g, 5) = az;
            Unsafe.Add(ref g, 6) = bx;
            Unsafe.Add(ref g, 7) = by;
            Unsafe.Add(ref g, 8) = bz;

            Vector<double> ku = Unsafe.Add(ref g, DrawnU), kv = Unsafe.Add(ref g, DrawnV), hs = Unsafe.Add(ref g, Hs);
            Vector<double> km2 = (ku * ku) + (kv * kv);
            Vector<double> sinOverKmFull = ds * hs * Unsafe.Add(ref g, Ch);
            Vector<double> omc2 = halfDsSq2 * hs * hs;
            Vector<double> kx = (ku * ax) + (kv * bx), ky = (ku * ay) + (kv * by), kz = (ku * az) + (kv * bz);
            px += (cx * sinOverKmFull) + (kx * omc2);
            py += (cy * sinOverKmFull) + (ky * omc2);
            pz += (cz * sinOverKmFull) + (kz * omc2);
            Vector<double> ct = one - (omc2 * km2);
            Vector<double> au = omc2 * ku, bu = sinOverKmFull * ku, av = omc2 * kv, bv = sinOverKmFull * kv;
            ax -= (kx * au) + (cx * bu);
            ay -= (ky * au) + (cy * bu);
            az -= (kz * au) + (cz * bu);
            bx -= (kx * av) + (cx * bv);
            by -= (ky * av) + (cy * bv);
            bz -= (kz * av) + (cz * bv);
            cx = (cx * ct) + (kx * sinOverKmFull);
            cy = (cy * ct) + (ky * sinOverKmFull);
            cz = (cz * ct) + (kz * sinOverKmFull);
        }

        var extra = new Vector<double>(_extra);
        Unsafe.Add(ref frame, ApexTan) = cx;
        Unsafe.Add(ref frame, ApexTan + 1) = cy;
        Unsafe.Add(ref frame, ApexTan + 2) = cz;
        Unsafe.Add(ref frame, Apex) = px + (cx * extra);
        Unsafe.Add(ref frame, Apex + 1) = py + (cy * extra);
        Unsafe.Add(ref frame, Apex + 2) = pz + (cz * extra);
    }

    /// <summary>Stem.ArcFunctions' series branch (x² below 0.36) on a vector: the same terms in the same order.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static void ArcFunctions(Vector<double> x2, out Vector<double> cos, out Vector<double> sinc, out Vector<double> oneMinusCosOverX2)
    {
        Vector<double> one = Vector<double>.One;
        Vector<double> x4 = x2 * x2;
        oneMinusCosOverX2 = (new Vector<double>(0.5) - (x2 * new Vector<double>(1.0 / 24)))
            + (x4 * ((new Vector<double>(1.0 / 720) - (x2 * new Vector<double>(1.0 / 40320))) + (x4 * new Vector<double>(1.0 / 3628800))));
        cos = one - (x2 * oneMinusCosOverX2);
        sinc = (one - (x2 * new Vector<double>(1.0 / 6)))
            + (x4 * ((new Vector<double>(1.0 / 120) - (x2 * new Vector<double>(1.0 / 5040)))
                + (x4 * (new Vector<double>(1.0 / 362880) - (x2 * new Vector<double>(1.0 / 39916800))))));
    }

    /// <summary>Stems whose segment turns by θ ≥ 1.2 rad (rare): Stem.ArcFunctions' library branch, one stem at a time.</summary>
    [MethodImpl(MethodImplOptions.NoInlining)]
    private static void LargeArcs(Vector<double> x2, ref Vector<double> g)
    {
        ref double ch = ref Unsafe.As<Vector<double>, double>(ref Unsafe.Add(ref g, Ch));
        ref double hs = ref Unsafe.As<Vector<double>, double>(ref Unsafe.Add(ref g, Hs));
        ref double omc = ref Unsafe.As<Vector<double>, double>(ref Unsafe.Add(ref g, Omc));
        for (int lane = 0; lane < Width; lane++)
        {
            double x2Lane = x2[lane];
            if (!(x2Lane < Stem.ArcSeriesLimit))
            {
                Stem.HalfAngle(Math.Sqrt(x2Lane), out Unsafe.Add(ref ch, lane), out Unsafe.Add(ref hs, lane), out Unsafe.Add(ref omc, lane));
            }
        }
    }

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
        double renorm = 1.5 - (0.5 * ((c * c) + (s * s)));
        _phaseCos = c * renorm;
        _phaseSin = s * renorm;
    }

    /// <summary>Stem.PrepareHistory: the history's timing is shared by all stems.</summary>
    private void PrepareHistory(double h, out int pushSlot, out int read0, out int read1, out double weight)
    {
        pushSlot = -1;
        if (_historyCount == 0 || _timeH - _historyTimes[_historyNewest] >= _delayH * Stem.HistorySpacingFraction)
        {
            pushSlot = _historyNewest + 1 == Stem.HistoryCapacity ? 0 : _historyNewest + 1;
            _historyTimes[pushSlot] = _timeH;
            _historyNewest = pushSlot;
            if (_historyCount < Stem.HistoryCapacity)
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
            int older = newer == 0 ? Stem.HistoryCapacity - 1 : newer - 1;
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

        read0 = read1 = newer;
        weight = 0;
    }

    /// <summary>Stem.Freeze for every stem: the basal segment matures (one stem at a time: this is rare).</summary>
    private void Freeze()
    {
        int s = _head, n = _n;
        double weight = _basalWeight;
        for (int b = 0; b < _blocks; b++)
        {
            int g = ((b * n) + s) * SegmentStride;
            for (int lane = 0; lane < Width; lane++)
            {
                Vector3 t = GetLane(b, Tb, lane), u = GetLane(b, Ub, lane), v = GetLane(b, Vb, lane), p = GetLane(b, Base, lane);
                double ku = weight > 0 ? Lane(_frame, (b * FrameStride) + BasalSumU, lane) / weight : Lane(_seg, g + Ku, lane);
                double kv = weight > 0 ? Lane(_frame, (b * FrameStride) + BasalSumV, lane) / weight : Lane(_seg, g + Kv, lane);
                Stem.Transport(ref t, ref u, ref v, ref p, ku, kv, _ds);
                SetLane(b, Tb, lane, t);
                SetLane(b, Ub, lane, u);
                SetLane(b, Vb, lane, v);
                SetLane(b, Base, lane, p);
            }

            _frame[(b * FrameStride) + BasalSumU] = Vector<double>.Zero;
            _frame[(b * FrameStride) + BasalSumV] = Vector<double>.Zero;
            _seg[g + Ku] = Vector<double>.Zero;
            _seg[g + Kv] = Vector<double>.Zero;
            _seg[g + Hs] = Vector<double>.One;
            _seg[g + Omc] = new Vector<double>(0.5);
            if (n > 1)
            {
                // The new apical segment (storage s) inherits the sensing history of the segment below it.
                int below = s == 0 ? n - 1 : s - 1;
                for (int k = 0; k < Stem.HistoryCapacity; k++)
                {
                    int slot = ((b * Stem.HistoryCapacity) + k) * n;
                    int to = (slot + s) * 2, from = (slot + below) * 2;
                    _history[to] = _history[from];
                    _history[to + 1] = _history[from + 1];
                }
            }
        }

        _basalWeight = 0;
        _maturedLength += _ds;
        _head = s + 1 == n ? 0 : s + 1;
    }

    private void Orthonormalise()
    {
        for (int b = 0; b < _blocks; b++)
        {
            for (int lane = 0; lane < Width; lane++)
            {
                Vector3 t = GetLane(b, Tb, lane), u = GetLane(b, Ub, lane);
                Stem.Orthonormalise(ref t, ref u, out Vector3 v);
                SetLane(b, Tb, lane, t);
                SetLane(b, Ub, lane, u);
                SetLane(b, Vb, lane, v);
            }
        }
    }

    private static ref double Lane(Vector<double>[] array, int index, int lane) =>
        ref Unsafe.Add(ref Unsafe.As<Vector<double>, double>(ref array[index]), lane);

    private Vector3 GetLane(int block, int field, int lane)
    {
        int f = (block * FrameStride) + field;
        return new Vector3(Lane(_frame, f, lane), Lane(_frame, f + 1, lane), Lane(_frame, f + 2, lane));
    }

    private void SetLane(int block, int field, int lane, Vector3 value)
    {
        int f = (block * FrameStride) + field;
        Lane(_frame, f, lane) = value.X;
        Lane(_frame, f + 1, lane) = value.Y;
        Lane(_frame, f + 2, lane) = value.Z;
    }

    private Vector3 GetStem(int stem, int field)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(stem);
        ArgumentOutOfRangeException.ThrowIfGreaterThanOrEqual(stem, _count);
        int block = stem / Width;
        return GetLane(block, field, stem - (block * Width));
    }

    private void SetBlock(int block, int field, Vector3 value)
    {
        int f = (block * FrameStride) + field;
        _frame[f] = new Vector<double>(value.X);
        _frame[f + 1] = new Vector<double>(value.Y);
        _frame[f + 2] = new Vector<double>(value.Z);
    }

    private List<ValidationError> BadStepErrors(double h, double elongation, ReadOnlySpan<Vector3> blue)
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

        if (blue.Length != _count)
        {
            errors.Add(new ValidationError("blueFluxVectors", $"must hold one vector per stem ({_count}), not {blue.Length}"));
        }

        for (int i = 0; i < blue.Length; i++)
        {
            if (!double.IsFinite(blue[i].X) || !double.IsFinite(blue[i].Y) || !double.IsFinite(blue[i].Z))
            {
                errors.Add(new ValidationError($"blueFluxVectors[{i}]", "must be finite"));
            }
        }

        return errors;
    }
}

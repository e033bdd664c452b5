using System.Collections.Immutable;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Structures;
using CanopyAdvisor.Core.Validation;

namespace CanopyAdvisor.Core.Light;

/// <summary>Precomputes the time-invariant light at every sample point of a site (done once per site and lamp state).</summary>
/// <remarks>
/// <para>
/// Lamps: a lamp of photon flux Φ (PPF × dimming) and intensity distribution I(θ, φ) per unit flux gives at a point at
/// distance d the normal irradiance E = Φ·I/d² (inverse-square law; MODEL.md §3 with E = I cos(incidence)/d² on a
/// surface facing the lamp), attenuated by the canopy (<see cref="CanopyAttenuation"/>) and zero when the enclosure
/// has an opaque surface on the segment. It is stored as the vector E·û toward the lamp, the horizontal part
/// E·max(0, û·ẑ) and the scalar E, summed over the lamps of each <see cref="LampGroup"/>.
/// </para>
/// <para>
/// Sky: per point, the view factor f, sky vector v and scalar factor s of the sky seen through the enclosure and the
/// canopy, with weight w(ω) = enclosure.SkyTransmittance(point, ω) × canopy transmission(ω). Indoor rooms have no sky.
/// </para>
/// <para>
/// Points are computed in parallel; the inner loop over lamps allocates nothing and makes two calls per point–lamp
/// pair that cannot be hoisted: the distribution's intensity (virtual) and the enclosure's <c>IsBlocked</c> (interface,
/// only when the lamp shines on the point). A lamp within 1 µm of a sample point is skipped there (the point-source
/// law has no value at the source).
/// </para>
/// <para>
/// Memory: per point and group five doubles (vector x, y, z, horizontal, scalar), contiguous per point so a time step
/// reads each point's groups in one run; 6,400 points × 4 groups take 1 MB, but 6,400 points × 800 separately
/// scheduled or dimmed lamps would take 205 MB, so give lamps that switch together the same schedule record.
/// </para>
/// </remarks>
public static class LightFieldCompiler
{
    /// <summary>Compiles the light field of a site.</summary>
    /// <param name="site">The site: benches (sample grids, canopies) and lamps.</param>
    /// <param name="enclosure">The site's enclosure (covers, walls, obstructions), built for the same site.</param>
    /// <param name="options">Compile settings; <see cref="LightFieldOptions.Default"/> when null.</param>
    /// <exception cref="InvalidInputException">The site has bad benches or lamps; every problem is listed.</exception>
    public static CompiledLightField Compile(Site site, IEnclosure enclosure, LightFieldOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(site);
        ArgumentNullException.ThrowIfNull(enclosure);
        options ??= LightFieldOptions.Default;
        Validate(site, options);

        ImmutableArray<Bench> benches = site.Benches.IsDefault ? [] : site.Benches;
        ImmutableArray<Lamp> lamps = site.Lamps.IsDefault ? [] : site.Lamps;

        // Sample points, bench by bench.
        int[] benchStart = new int[benches.Length + 1];
        var pointsBuilder = ImmutableArray.CreateBuilder<SamplePoint>();
        for (int b = 0; b < benches.Length; b++)
        {
            benchStart[b] = pointsBuilder.Count;
            pointsBuilder.AddRange(SampleGrid.ForBench(benches[b], b));
        }

        benchStart[benches.Length] = pointsBuilder.Count;
        ImmutableArray<SamplePoint> points = pointsBuilder.ToImmutable();

        // Lamp groups: equal schedule, dimming and bands.
        var groupIndex = new Dictionary<(LampSchedule, double, BandFractions), int>();
        var groupMembers = new List<List<string>>();
        var groupKeys = new List<(LampSchedule Schedule, double Dimming, BandFractions Bands)>();
        var lampData = new LampData[lamps.Length];
        for (int l = 0; l < lamps.Length; l++)
        {
            Lamp lamp = lamps[l];
            var key = (lamp.Schedule, lamp.Dimming, lamp.Bands);
            if (!groupIndex.TryGetValue(key, out int g))
            {
                g = groupKeys.Count;
                groupIndex.Add(key, g);
                groupKeys.Add(key);
                groupMembers.Add([]);
            }

            groupMembers[g].Add(lamp.Id);
            lampData[l] = new LampData(lamp, g);
        }

        var groups = ImmutableArray.CreateBuilder<LampGroup>(groupKeys.Count);
        for (int g = 0; g < groupKeys.Count; g++)
        {
            groups.Add(new LampGroup(groupKeys[g].Schedule, groupKeys[g].Dimming, groupKeys[g].Bands, [.. groupMembers[g]]));
        }

        int n = points.Length;
        int groupCount = groupKeys.Count;
        double[] contributions = new double[n * groupCount * CompiledLightField.Stride];
        double[] skyF = new double[n], skyX = new double[n], skyY = new double[n], skyZ = new double[n], skyS = new double[n];
        bool hasSky = site.Structure is not IndoorRoom;
        var benchTops = new BenchTops(benches);
        HemisphereQuadrature? skyGrid = hasSky ? HemisphereQuadrature.Create(options.SkyZenithBands) : null;

        // A glasshouse's per-direction cover terms are the same at every point: work them out once per direction.
        var glasshouse = enclosure as GlasshouseEnclosure;
        SkyRay[]? rays = glasshouse is not null && skyGrid is not null
            ? [.. skyGrid.Directions.Select(glasshouse.Prepare)]
            : null;

        Parallel.For(0, n, p =>
        {
            SamplePoint point = points[p];
            Bench bench = benches[point.BenchIndex];
            var canopy = new PointCanopy(bench, point);
            AccumulateLamps(point.Position, canopy, lampData, enclosure, benchTops, contributions.AsSpan(p * groupCount * CompiledLightField.Stride, groupCount * CompiledLightField.Stride));
            if (skyGrid is not null)
            {
                SkyView view = rays is not null
                    ? SkyViewIntegrator.IntegrateIndexed(skyGrid, new PreparedSkyWeight(glasshouse!, rays, benchTops, point.Position, canopy))
                    : SkyViewIntegrator.Integrate(skyGrid, new PointSkyWeight(enclosure, benchTops, point.Position, canopy));
                skyF[p] = view.ViewFactor;
                skyX[p] = view.SkyVector.X;
                skyY[p] = view.SkyVector.Y;
                skyZ[p] = view.SkyVector.Z;
                skyS[p] = view.ScalarFactor;
            }
        });

        return new CompiledLightField(
            site.Zone, benches, points, benchStart, groups.MoveToImmutable(), enclosure, benchTops, hasSky,
            skyF, skyX, skyY, skyZ, skyS, contributions);
    }

    /// <summary>Adds every lamp's contribution at one point into that point's group accumulators.</summary>
    private static void AccumulateLamps(Vector3 point, PointCanopy canopy, LampData[] lamps, IEnclosure enclosure, BenchTops benchTops, Span<double> into)
    {
        for (int l = 0; l < lamps.Length; l++)
        {
            ref readonly LampData lamp = ref lamps[l];
            double e = Irradiance(in lamp, point, in canopy, enclosure, benchTops, out double ux, out double uy, out double uz);
            if (!(e > 0))
            {
                continue;
            }

            int k = lamp.Group * CompiledLightField.Stride;
            into[k] += e * ux;
            into[k + 1] += e * uy;
            into[k + 2] += e * uz;
            if (uz > 0)
            {
                into[k + 3] += e * uz;
            }

            into[k + 4] += e;
        }
    }

    /// <summary>
    /// The photon flux vector of one lamp at some of a compiled field's sample points, by the same law as the compile
    /// (inverse square, the lamp's distribution, the canopy's Beer–Lambert attenuation, bench tops and the enclosure).
    /// </summary>
    /// <remarks>For planners that try lamps not in the site (side-lamp placement): one lamp against the field's points,
    /// without compiling the site again. Writes per point the vector E·û (x, y, z) and the horizontal E·max(0, û·ẑ),
    /// four doubles per point, at the lamp's PPF × dimming.</remarks>
    /// <param name="lamp">The lamp (it need not belong to the field's site).</param>
    /// <param name="field">The compiled field whose points, canopies, bench tops and enclosure are used.</param>
    /// <param name="points">Indices of the points in <see cref="CompiledLightField.Points"/>.</param>
    /// <param name="into">Receives 4 × points.Length values.</param>
    internal static void LampAtPoints(Lamp lamp, CompiledLightField field, ReadOnlySpan<int> points, Span<double> into)
    {
        var data = new LampData(lamp, 0);
        for (int i = 0; i < points.Length; i++)
        {
            SamplePoint point = field.Points[points[i]];
            var canopy = new PointCanopy(field.Benches[point.BenchIndex], point);
            double e = Irradiance(in data, point.Position, in canopy, field.Enclosure, field.BenchTops, out double ux, out double uy, out double uz);
            int k = 4 * i;
            if (e > 0)
            {
                into[k] = e * ux;
                into[k + 1] = e * uy;
                into[k + 2] = e * uz;
                into[k + 3] = uz > 0 ? e * uz : 0;
            }
            else
            {
                into.Slice(k, 4).Clear();
            }
        }
    }

    /// <summary>Normal irradiance of one lamp at one point (0 when it does not reach it) and the unit vector û toward the lamp.</summary>
    [System.Runtime.CompilerServices.MethodImpl(System.Runtime.CompilerServices.MethodImplOptions.AggressiveInlining)]
    private static double Irradiance(
        in LampData lamp, Vector3 point, in PointCanopy canopy, IEnclosure enclosure, BenchTops benchTops,
        out double ux, out double uy, out double uz)
    {
        ux = uy = uz = 0;
        if (lamp.Flux <= 0)
        {
            return 0;
        }

        // û: unit vector from the point toward the lamp.
        double dx = lamp.X - point.X, dy = lamp.Y - point.Y, dz = lamp.Z - point.Z;
        double d2 = (dx * dx) + (dy * dy) + (dz * dz);
        if (d2 < 1e-12)
        {
            return 0;
        }

        double d = Math.Sqrt(d2);
        double inverse = 1 / d;
        ux = dx * inverse;
        uy = dy * inverse;
        uz = dz * inverse;

        // Direction leaving the lamp toward the point is −û; in the lamp frame: polar from the axis, around from C = 0°.
        double cosPolar = -((ux * lamp.AxisX) + (uy * lamp.AxisY) + (uz * lamp.AxisZ));
        cosPolar = Math.Clamp(cosPolar, -1.0, 1.0);
        double around = 0;
        if (!lamp.Symmetric)
        {
            around = Math.Atan2(
                -((ux * lamp.ThirdX) + (uy * lamp.ThirdY) + (uz * lamp.ThirdZ)),
                -((ux * lamp.RefX) + (uy * lamp.RefY) + (uz * lamp.RefZ)));
            if (around < 0)
            {
                around += 2 * Math.PI;
            }
        }

        double intensity = lamp.Distribution.IntensityPerUnitFluxAtCosine(cosPolar, around);
        if (!(intensity > 0))
        {
            return 0;
        }

        double e = lamp.Flux * intensity / d2;
        e *= canopy.Transmission(ux, uy, uz, d);
        if (!(e > 0) || benchTops.BlocksSegment(point, lamp.Position) || enclosure.IsBlocked(point, lamp.Position))
        {
            return 0;
        }

        return e;
    }

    private static void Validate(Site site, LightFieldOptions options)
    {
        var errors = new List<ValidationError>();
        if (options.SkyZenithBands is < 1 or > HemisphereQuadrature.MaximumZenithBands)
        {
            errors.Add(new ValidationError("options.skyZenithBands", $"must be between 1 and {HemisphereQuadrature.MaximumZenithBands}"));
        }

        if (site.Zone is null)
        {
            errors.Add(new ValidationError("zone", "is required"));
        }

        if (site.Structure is null)
        {
            errors.Add(new ValidationError("structure", "is required"));
        }

        ImmutableArray<Bench> benches = site.Benches.IsDefault ? [] : site.Benches;
        for (int b = 0; b < benches.Length; b++)
        {
            ValidateBench(benches[b], $"benches[{b}]", errors);
        }

        ImmutableArray<Lamp> lamps = site.Lamps.IsDefault ? [] : site.Lamps;
        for (int l = 0; l < lamps.Length; l++)
        {
            ValidateLamp(lamps[l], $"lamps[{l}]", errors);
        }

        if (errors.Count > 0)
        {
            throw new InvalidInputException(errors);
        }
    }

    private static void ValidateBench(Bench? bench, string path, List<ValidationError> errors)
    {
        if (bench is null)
        {
            errors.Add(new ValidationError(path, "is required"));
            return;
        }

        if (bench.SamplesAlongLength < 1)
        {
            errors.Add(new ValidationError($"{path}.samplesAlongLength", "must be ≥ 1"));
        }

        if (bench.SamplesAcrossWidth < 1)
        {
            errors.Add(new ValidationError($"{path}.samplesAcrossWidth", "must be ≥ 1"));
        }

        if ((long)bench.SamplesAlongLength * bench.SamplesAcrossWidth > 1_000_000)
        {
            errors.Add(new ValidationError(path, "must have at most 1,000,000 sample points"));
        }

        if (!double.IsFinite(bench.SurfaceHeightM))
        {
            errors.Add(new ValidationError($"{path}.surfaceHeightM", "must be a finite number"));
        }

        Footprint? footprint = bench.Footprint;
        if (footprint is null)
        {
            errors.Add(new ValidationError($"{path}.footprint", "is required"));
        }
        else
        {
            if (!(footprint.LengthM > 0) || !double.IsFinite(footprint.LengthM))
            {
                errors.Add(new ValidationError($"{path}.footprint.lengthM", "must be > 0"));
            }

            if (!(footprint.WidthM > 0) || !double.IsFinite(footprint.WidthM))
            {
                errors.Add(new ValidationError($"{path}.footprint.widthM", "must be > 0"));
            }

            if (!double.IsFinite(footprint.CornerXM) || !double.IsFinite(footprint.CornerYM) || !double.IsFinite(footprint.AxisAzimuth.Radians))
            {
                errors.Add(new ValidationError($"{path}.footprint", "corner and axis azimuth must be finite"));
            }
        }

        Canopy? canopy = bench.Canopy;
        if (canopy is null)
        {
            errors.Add(new ValidationError($"{path}.canopy", "is required"));
            return;
        }

        if (!(canopy.HeightM >= 0) || !double.IsFinite(canopy.HeightM))
        {
            errors.Add(new ValidationError($"{path}.canopy.heightM", "must be ≥ 0"));
        }

        if (!(canopy.SensingDepthM >= 0) || !(canopy.SensingDepthM <= canopy.HeightM))
        {
            errors.Add(new ValidationError($"{path}.canopy.sensingDepthM", "must be between 0 and the canopy height"));
        }

        if (!(canopy.LeafAreaDensityM2PerM3 >= 0) || !double.IsFinite(canopy.LeafAreaDensityM2PerM3))
        {
            errors.Add(new ValidationError($"{path}.canopy.leafAreaDensityM2PerM3", "must be ≥ 0"));
        }
    }

    private static void ValidateLamp(Lamp? lamp, string path, List<ValidationError> errors)
    {
        if (lamp is null)
        {
            errors.Add(new ValidationError(path, "is required"));
            return;
        }

        if (!double.IsFinite(lamp.Position.X) || !double.IsFinite(lamp.Position.Y) || !double.IsFinite(lamp.Position.Z))
        {
            errors.Add(new ValidationError($"{path}.position", "must be finite"));
        }

        if (lamp.Aim is null)
        {
            errors.Add(new ValidationError($"{path}.aim", "is required"));
        }
        else if (!double.IsFinite(lamp.Aim.Yaw.Radians) || !double.IsFinite(lamp.Aim.Tilt.Radians) || !double.IsFinite(lamp.Aim.Spin.Radians))
        {
            errors.Add(new ValidationError($"{path}.aim", "angles must be finite"));
        }

        if (lamp.Distribution is null)
        {
            errors.Add(new ValidationError($"{path}.distribution", "is required"));
        }

        if (!(lamp.PpfMicromolesPerSecond >= 0) || !double.IsFinite(lamp.PpfMicromolesPerSecond))
        {
            errors.Add(new ValidationError($"{path}.ppfMicromolesPerSecond", "must be ≥ 0"));
        }

        if (!(lamp.Dimming >= 0) || !(lamp.Dimming <= 1))
        {
            errors.Add(new ValidationError($"{path}.dimming", "must be between 0 and 1"));
        }

        if (lamp.Schedule is null)
        {
            errors.Add(new ValidationError($"{path}.schedule", "is required"));
        }

        BandFractions? bands = lamp.Bands;
        if (bands is null)
        {
            errors.Add(new ValidationError($"{path}.bands", "is required"));
        }
        else if (!(bands.Blue >= 0) || !(bands.Green >= 0) || !(bands.Red >= 0) || !(bands.FarRed >= 0) ||
                 !double.IsFinite(bands.FarRed) || Math.Abs(bands.Blue + bands.Green + bands.Red - 1) > 1e-3)
        {
            errors.Add(new ValidationError($"{path}.bands", "blue, green and red must be ≥ 0 and add up to 1; far-red ≥ 0"));
        }
    }

    /// <summary>A lamp flattened for the inner loop: position, frame, flux and group.</summary>
    private readonly struct LampData
    {
        public LampData(Lamp lamp, int group)
        {
            var frame = new LampFrame(lamp.Aim);
            Position = lamp.Position;
            X = lamp.Position.X;
            Y = lamp.Position.Y;
            Z = lamp.Position.Z;
            AxisX = frame.Axis.X;
            AxisY = frame.Axis.Y;
            AxisZ = frame.Axis.Z;
            RefX = frame.Reference.X;
            RefY = frame.Reference.Y;
            RefZ = frame.Reference.Z;
            ThirdX = frame.Lateral.X;
            ThirdY = frame.Lateral.Y;
            ThirdZ = frame.Lateral.Z;
            Flux = lamp.PpfMicromolesPerSecond * lamp.Dimming;
            Distribution = lamp.Distribution;
            Symmetric = lamp.Distribution.IsAxiallySymmetric;
            Group = group;
        }

        public Vector3 Position { get; }

        public double X { get; }

        public double Y { get; }

        public double Z { get; }

        public double AxisX { get; }

        public double AxisY { get; }

        public double AxisZ { get; }

        public double RefX { get; }

        public double RefY { get; }

        public double RefZ { get; }

        public double ThirdX { get; }

        public double ThirdY { get; }

        public double ThirdZ { get; }

        public double Flux { get; }

        public BeamDistribution Distribution { get; }

        public bool Symmetric { get; }

        public int Group { get; }
    }

    /// <summary>The sky weight of one point: transmittance of the envelope times the canopy's, per direction.</summary>
    private readonly struct PointSkyWeight(IEnclosure enclosure, BenchTops benchTops, Vector3 position, PointCanopy canopy) : ISkyViewWeight
    {
        public double Weight(Vector3 towardSky) =>
            benchTops.BlocksRay(position, towardSky)
                ? 0
                : enclosure.SkyTransmittance(position, towardSky) * canopy.Transmission(towardSky, double.PositiveInfinity);
    }

    /// <summary>The same weight as <see cref="PointSkyWeight"/> through a glasshouse whose per-direction terms were
    /// prepared once (<see cref="GlasshouseEnclosure.Prepare"/>; the same values, bit for bit).</summary>
    private readonly struct PreparedSkyWeight(GlasshouseEnclosure enclosure, SkyRay[] rays, BenchTops benchTops, Vector3 position, PointCanopy canopy) : IIndexedSkyWeight
    {
        public double Weight(int index, Vector3 towardSky) =>
            benchTops.BlocksRay(position, towardSky)
                ? 0
                : enclosure.SkyTransmittance(position, in rays[index]) * canopy.Transmission(towardSky, double.PositiveInfinity);
    }

    /// <summary>One point's canopy geometry, for the transmission of many directions.</summary>
    private readonly struct PointCanopy
    {
        private readonly double _toFront, _toBack, _toLeft, _toRight, _axisX, _axisY, _acrossX, _acrossY, _depth, _extinction;

        public PointCanopy(Bench bench, SamplePoint point)
        {
            _toFront = point.ToFrontEdgeM;
            _toBack = point.ToBackEdgeM;
            _toLeft = point.ToLeftEdgeM;
            _toRight = point.ToRightEdgeM;
            _axisX = bench.Footprint.AxisDirection.X;
            _axisY = bench.Footprint.AxisDirection.Y;
            _acrossX = bench.Footprint.WidthDirection.X;
            _acrossY = bench.Footprint.WidthDirection.Y;
            _depth = bench.Canopy.SensingDepthM;
            _extinction = CanopyAttenuation.ExtinctionPerM(bench.Canopy);
        }

        public double Transmission(double ux, double uy, double uz, double maxPathM)
        {
            if (_extinction <= 0)
            {
                return 1.0;
            }

            double path = CanopyAttenuation.PathLengthM(
                _toFront, _toBack, _toLeft, _toRight, _axisX, _axisY, _acrossX, _acrossY, _depth, ux, uy, uz, maxPathM);
            return Math.Exp(-_extinction * path);
        }

        public double Transmission(Vector3 u, double maxPathM) => Transmission(u.X, u.Y, u.Z, maxPathM);
    }
}

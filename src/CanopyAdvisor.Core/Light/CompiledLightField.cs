using System.Buffers;
using System.Collections.Immutable;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using CanopyAdvisor.Core.Structures;
using NodaTime;

namespace CanopyAdvisor.Core.Light;

/// <summary>
/// The time-invariant part of the light at every sample point of a site, precomputed once by
/// <see cref="LightFieldCompiler"/>, and the cheap per-time-step evaluation on top of it.
/// </summary>
/// <remarks>
/// <para>
/// Per point it holds the sky view (f, v, s) through the enclosure and the canopy, and per point and lamp group the
/// summed lamp photon flux vector, horizontal PPFD and scalar flux at full schedule. A time step (<see cref="Step(in OutsideLight, LocalTime, int, Span{PointLight})"/>) then adds
/// the diffuse sky (DHI × v, f, s), the sun beam (DNI × enclosure transmittance × canopy transmission toward the sun:
/// the only geometry done per step) and the groups that are on.
/// </para>
/// <para>
/// Spectrum: daylight (sky and sun) carries <see cref="ModelConstants.DaylightBlueFraction"/> of its PAR photons as
/// blue and <see cref="ModelConstants.DaylightRedFraction"/> as red; lamps carry their band fractions. The R:FR window
/// fluxes are estimated assuming a flat photon spectrum within each band (a documented approximation; MODEL.md §0):
/// the 655–665 nm window holds 10/100 of the red photons and the 725–735 nm window 10/50 of the far-red photons, so
/// R:FR ≈ red / (2 · far-red) for a single lamp. Daylight's 730 nm flux is set so that daylight alone gives
/// <see cref="ModelConstants.SunlightRedToFarRed"/>. Mixed sources are combined by summing the window fluxes
/// before taking the ratio.
/// </para>
/// <para>Thread safety: immutable after compile; <c>Step</c> may be called from several threads on disjoint point ranges.</para>
/// </remarks>
public sealed class CompiledLightField
{
    /// <summary>Values stored per point and group: vector x, y, z, horizontal PPFD, scalar flux.</summary>
    internal const int Stride = 5;

    private readonly IEnclosure _enclosure;
    private readonly BenchTops _benchTops;
    private readonly bool _hasSky;
    private readonly int[] _benchStart;
    private readonly double[] _x, _y, _z;
    private readonly double[] _toFront, _toBack, _toLeft, _toRight;
    private readonly int[] _benchOf;
    private readonly double[] _axisX, _axisY, _acrossX, _acrossY, _depth, _extinction;
    private readonly double[] _skyF, _skyX, _skyY, _skyZ, _skyS;
    private readonly double[] _groups;
    private readonly double[] _groupBlue, _groupRed660, _groupFarRed730;
    private readonly LampGroup[] _groupList;

    internal CompiledLightField(
        DateTimeZone zone,
        ImmutableArray<Bench> benches,
        ImmutableArray<SamplePoint> points,
        int[] benchStart,
        ImmutableArray<LampGroup> groups,
        IEnclosure enclosure,
        BenchTops benchTops,
        bool hasSky,
        double[] skyF,
        double[] skyX,
        double[] skyY,
        double[] skyZ,
        double[] skyS,
        double[] groupContributions)
    {
        Zone = zone;
        Benches = benches;
        Points = points;
        Groups = groups;
        _benchStart = benchStart;
        _enclosure = enclosure;
        _benchTops = benchTops;
        _hasSky = hasSky;
        _skyF = skyF;
        _skyX = skyX;
        _skyY = skyY;
        _skyZ = skyZ;
        _skyS = skyS;
        _groups = groupContributions;

        int n = points.Length;
        _x = new double[n];
        _y = new double[n];
        _z = new double[n];
        _toFront = new double[n];
        _toBack = new double[n];
        _toLeft = new double[n];
        _toRight = new double[n];
        _benchOf = new int[n];
        for (int p = 0; p < n; p++)
        {
            SamplePoint sp = points[p];
            _x[p] = sp.Position.X;
            _y[p] = sp.Position.Y;
            _z[p] = sp.Position.Z;
            _toFront[p] = sp.ToFrontEdgeM;
            _toBack[p] = sp.ToBackEdgeM;
            _toLeft[p] = sp.ToLeftEdgeM;
            _toRight[p] = sp.ToRightEdgeM;
            _benchOf[p] = sp.BenchIndex;
        }

        int b = benches.Length;
        _axisX = new double[b];
        _axisY = new double[b];
        _acrossX = new double[b];
        _acrossY = new double[b];
        _depth = new double[b];
        _extinction = new double[b];
        for (int i = 0; i < b; i++)
        {
            Bench bench = benches[i];
            _axisX[i] = bench.Footprint.AxisDirection.X;
            _axisY[i] = bench.Footprint.AxisDirection.Y;
            _acrossX[i] = bench.Footprint.WidthDirection.X;
            _acrossY[i] = bench.Footprint.WidthDirection.Y;
            _depth[i] = bench.Canopy.SensingDepthM;
            _extinction[i] = CanopyAttenuation.ExtinctionPerM(bench.Canopy);
        }

        _groupList = [.. groups];
        _groupBlue = new double[_groupList.Length];
        _groupRed660 = new double[_groupList.Length];
        _groupFarRed730 = new double[_groupList.Length];
        for (int g = 0; g < _groupList.Length; g++)
        {
            _groupBlue[g] = _groupList[g].Bands.Blue;
            _groupRed660[g] = _groupList[g].Bands.Red * RedWindowShare;
            _groupFarRed730[g] = _groupList[g].Bands.FarRed * FarRedWindowShare;
        }
    }

    /// <summary>Share of red-band photons in the 655–665 nm window under a flat in-band spectrum (10/100).</summary>
    internal const double RedWindowShare = ModelConstants.RedToFarRedWindowNm / ModelConstants.RedBandWidthNm;

    /// <summary>Share of far-red-band photons in the 725–735 nm window under a flat in-band spectrum (10/50).</summary>
    internal const double FarRedWindowShare = ModelConstants.RedToFarRedWindowNm / ModelConstants.FarRedBandWidthNm;

    /// <summary>The site's time zone, in which lamp schedules and days are local.</summary>
    public DateTimeZone Zone { get; }

    /// <summary>The site's benches, in site order.</summary>
    public ImmutableArray<Bench> Benches { get; }

    /// <summary>All sample points, bench by bench in site order, each bench along its length first.</summary>
    public ImmutableArray<SamplePoint> Points { get; }

    /// <summary>The lamp groups, in order of their first lamp in the site.</summary>
    public ImmutableArray<LampGroup> Groups { get; }

    /// <summary>The enclosure the field was compiled against (for lamps tried against the same points).</summary>
    internal IEnclosure Enclosure => _enclosure;

    /// <summary>The bench tops of the field's site (for lamps tried against the same points).</summary>
    internal BenchTops BenchTops => _benchTops;

    /// <summary>The index of a bench's first point in <see cref="Points"/> and its number of points.</summary>
    public (int Start, int Count) PointsOfBench(int benchIndex)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(benchIndex);
        ArgumentOutOfRangeException.ThrowIfGreaterThanOrEqual(benchIndex, Benches.Length);
        return (_benchStart[benchIndex], _benchStart[benchIndex + 1] - _benchStart[benchIndex]);
    }

    /// <summary>Whether an outside-light record can be used: every number finite (a gap in a measured log gives NaN).</summary>
    public static bool IsUsable(in OutsideLight outside) =>
        double.IsFinite(outside.DirectNormalPpfd) && double.IsFinite(outside.DiffuseHorizontalPpfd) &&
        double.IsFinite(outside.GlobalHorizontalPpfd) && double.IsFinite(outside.SunDirection.X) &&
        double.IsFinite(outside.SunDirection.Y) && double.IsFinite(outside.SunDirection.Z);

    /// <summary>The light at every point at one instant.</summary>
    /// <param name="outside">Outside light at the instant (see <see cref="IsUsable"/>; NaN input gives NaN output).</param>
    /// <param name="localTime">The site's local time of day at the instant, for lamp schedules.</param>
    /// <param name="into">Receives one value per point; its length must equal the number of points.</param>
    public void Step(in OutsideLight outside, LocalTime localTime, Span<PointLight> into)
    {
        if (into.Length != Points.Length)
        {
            throw new ArgumentException("the span must hold one value per point", nameof(into));
        }

        Step(outside, localTime, 0, into);
    }

    /// <summary>The light at a contiguous range of points at one instant; allocation-free for up to 256 lamp groups.</summary>
    /// <param name="outside">Outside light at the instant (NaN input gives NaN output).</param>
    /// <param name="localTime">The site's local time of day at the instant, for lamp schedules.</param>
    /// <param name="firstPoint">Index of the first point to compute.</param>
    /// <param name="into">Receives the points firstPoint … firstPoint + into.Length − 1.</param>
    public void Step(in OutsideLight outside, LocalTime localTime, int firstPoint, Span<PointLight> into)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(firstPoint);
        ArgumentOutOfRangeException.ThrowIfGreaterThan(firstPoint + into.Length, Points.Length, nameof(into));

        int groupCount = _groupList.Length;
        int[]? rented = null;
        Span<int> on = groupCount <= 256
            ? stackalloc int[groupCount]
            : (rented = ArrayPool<int>.Shared.Rent(groupCount)).AsSpan(0, groupCount);
        int onCount = 0;
        for (int g = 0; g < groupCount; g++)
        {
            if (_groupList[g].Schedule.IsOn(localTime, outside.GlobalHorizontalPpfd))
            {
                on[onCount++] = g;
            }
        }

        on = on[..onCount];
        double dhi = _hasSky ? outside.DiffuseHorizontalPpfd : 0;
        double dni = _hasSky ? outside.DirectNormalPpfd : 0;
        Vector3 sun = outside.SunDirection.Normalized();
        bool beam = _hasSky && !(dni <= 0) && sun.Z > 0;
        var glasshouse = beam ? _enclosure as GlasshouseEnclosure : null;
        SkyRay sunRay = glasshouse is not null ? glasshouse.Prepare(sun) : default; // the sun's cover terms, once per step
        const double DaylightBlue = ModelConstants.DaylightBlueFraction;
        const double DaylightRed660 = ModelConstants.DaylightRedFraction * RedWindowShare;
        const double DaylightFarRed730 = DaylightRed660 / ModelConstants.SunlightRedToFarRed;

        for (int i = 0; i < into.Length; i++)
        {
            int p = firstPoint + i;
            double vx = dhi * _skyX[p], vy = dhi * _skyY[p], vz = dhi * _skyZ[p];
            double h = dhi * _skyF[p], s = dhi * _skyS[p];
            if (beam)
            {
                var position = new Vector3(_x[p], _y[p], _z[p]);
                double e = _benchTops.BlocksRay(position, sun)
                    ? 0
                    : dni * (glasshouse is not null ? glasshouse.SkyTransmittance(position, in sunRay) : _enclosure.SkyTransmittance(position, sun));
                if (e > 0)
                {
                    e *= CanopyTransmission(p, sun.X, sun.Y, sun.Z, double.PositiveInfinity);
                    vx += e * sun.X;
                    vy += e * sun.Y;
                    vz += e * sun.Z;
                    h += e * sun.Z;
                    s += e;
                }
            }

            double bx = DaylightBlue * vx, by = DaylightBlue * vy, bz = DaylightBlue * vz;
            double red = DaylightRed660 * s, farRed = DaylightFarRed730 * s;
            int row = p * groupCount;
            foreach (int g in on)
            {
                int k = (row + g) * Stride;
                double gx = _groups[k], gy = _groups[k + 1], gz = _groups[k + 2], gs = _groups[k + 4];
                vx += gx;
                vy += gy;
                vz += gz;
                h += _groups[k + 3];
                double blue = _groupBlue[g];
                bx += blue * gx;
                by += blue * gy;
                bz += blue * gz;
                red += _groupRed660[g] * gs;
                farRed += _groupFarRed730[g] * gs;
            }

            into[i] = new PointLight(h, new Vector3(vx, vy, vz), new Vector3(bx, by, bz), red, farRed);
        }

        if (rented is not null)
        {
            ArrayPool<int>.Shared.Return(rented);
        }
    }

    /// <summary>Sky view of a point through the enclosure and canopy: f, v, s (for tests and maps).</summary>
    internal (double ViewFactor, Vector3 SkyVector, double ScalarFactor) SkyViewAt(int point) =>
        (_skyF[point], new Vector3(_skyX[point], _skyY[point], _skyZ[point]), _skyS[point]);

    /// <summary>Canopy transmission of a point toward a unit direction, capped at a path of <paramref name="maxPathM"/>.</summary>
    private double CanopyTransmission(int p, double ux, double uy, double uz, double maxPathM)
    {
        int b = _benchOf[p];
        double extinction = _extinction[b];
        if (extinction <= 0)
        {
            return 1.0;
        }

        double path = CanopyAttenuation.PathLengthM(
            _toFront[p], _toBack[p], _toLeft[p], _toRight[p],
            _axisX[b], _axisY[b], _acrossX[b], _acrossY[b], _depth[b], ux, uy, uz, maxPathM);
        return Math.Exp(-extinction * path);
    }
}

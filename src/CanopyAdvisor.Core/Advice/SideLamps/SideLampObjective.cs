using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Light;
using CanopyAdvisor.Core.Sites;

namespace CanopyAdvisor.Core.Advice.SideLamps;

/// <summary>The planner's objective over the sample points of the benches with lots (method: <see cref="SideLampPlanner"/>).</summary>
/// <remarks>Immutable after construction; <see cref="Contribution"/> and <see cref="Evaluate"/> are thread-safe.</remarks>
internal sealed class SideLampObjective
{
    /// <summary>Weight of the PPFD-ceiling and uniformity-floor penalties against the lateral term (which is 1 without lamps).</summary>
    /// <remarks>Each penalty is K·(v + v²) of the relative violation v: the linear part makes it exact (a violation of 0.1 %
    /// already costs as much as all the lateral light), the square keeps it growing.</remarks>
    public const double PenaltyWeight = 1000.0;

    private readonly CompiledLightField _field;
    private readonly SideLampBrief _brief;
    private readonly int[] _points;
    private readonly int[] _slot;
    private readonly bool[] _atRisk;
    private readonly double[] _lx, _ly, _dli, _peakOn, _peakOff, _ceilingTarget, _ceiling;
    private readonly double[] _uniformityTarget;
    private readonly int _slots;
    private readonly double _onFraction, _onSecondsPerDay, _normaliser;

    public SideLampObjective(
        CompiledLightField field, ExistingLight existing, SideLampBrief brief, int[] points, int[] slotOfPoint, bool[] atRisk,
        double[] ceilingOfSlot, int slots)
    {
        _field = field;
        _brief = brief;
        _points = points;
        _slot = slotOfPoint;
        _atRisk = atRisk;
        _slots = slots;
        _onFraction = existing.OnFraction;
        _onSecondsPerDay = existing.OnSecondsPerDay;
        int n = points.Length;
        _lx = new double[n];
        _ly = new double[n];
        _dli = new double[n];
        _peakOn = new double[n];
        _peakOff = new double[n];
        _ceiling = new double[n];
        _ceilingTarget = new double[n];
        double normaliser = 0;
        for (int i = 0; i < n; i++)
        {
            int p = points[i];
            _lx[i] = existing.BlueX[p];
            _ly[i] = existing.BlueY[p];
            _dli[i] = existing.Dli[p];
            _peakOn[i] = existing.PeakOn[p];
            _peakOff[i] = existing.PeakOff[p];
            _ceiling[i] = ceilingOfSlot[slotOfPoint[i]];

            // The lamps may not push the on-time peak above the ceiling, nor above the peak already there.
            _ceilingTarget[i] = double.IsNaN(_ceiling[i]) ? double.NaN : Math.Max(_ceiling[i], _peakOn[i]);
            if (atRisk[i])
            {
                normaliser += (_lx[i] * _lx[i]) + (_ly[i] * _ly[i]);
            }
        }

        // With no lateral light at all there is nothing to cancel; any lamp then only adds to the objective.
        _normaliser = normaliser > 1e-12 ? normaliser : 1e-12;
        UniformityBefore = Uniformities(new double[3 * n]);
        _uniformityTarget = [.. UniformityBefore.Select(u => Math.Min(brief.UniformityFloor, u ?? 1))];
    }

    /// <summary>The points' indices in the field, in objective order.</summary>
    public IReadOnlyList<int> Points => _points;

    /// <summary>Uniformity (min/avg DLI) of each bench slot before lamps are added, or null without light.</summary>
    public double?[] UniformityBefore { get; }

    /// <summary>Number of values per point in a contribution: lateral blue east, north (period mean) and PPFD while on.</summary>
    public const int Stride = 3;

    /// <summary>Length of a contribution array.</summary>
    public int Length => Stride * _points.Length;

    /// <summary>The lamp a placement stands for.</summary>
    public Lamp MakeLamp(Placement placement, string id)
    {
        MountingRail rail = _brief.Rails[placement.Rail];
        SideLampType type = _brief.LampTypes[placement.Type];
        var aim = new LampAim(Angle.FromRadians(placement.YawRadians).Normalized(), Angle.FromRadians(placement.TiltRadians), Angle.Zero);
        return new Lamp(
            id, rail.At(placement.Fraction), aim, type.Distribution, type.PpfMicromolesPerSecond, type.Bands,
            placement.Dimming, type.Watts, _brief.Schedule);
    }

    /// <summary>Electrical power of a placement while on, W (watts × dimming).</summary>
    public double Watts(Placement placement) => _brief.LampTypes[placement.Type].Watts * placement.Dimming;

    /// <summary>A placement's light at full output (dimming 1) per point: lateral blue (period mean) and PPFD while on.</summary>
    public double[] Contribution(Placement placement)
    {
        Lamp lamp = MakeLamp(placement with { Dimming = 1 }, "candidate");
        int n = _points.Length;
        double[] vectors = new double[4 * n];
        LightFieldCompiler.LampAtPoints(lamp, _field, _points, vectors);
        double blue = lamp.Bands.Blue * _onFraction;
        double[] result = new double[Stride * n];
        for (int i = 0; i < n; i++)
        {
            result[Stride * i] = blue * vectors[4 * i];
            result[(Stride * i) + 1] = blue * vectors[(4 * i) + 1];
            result[(Stride * i) + 2] = vectors[(4 * i) + 3];
        }

        return result;
    }

    /// <summary>The objective for added light <paramref name="added"/> (summed contributions × dimming) drawing <paramref name="watts"/>.</summary>
    public ObjectiveTerms Evaluate(double[] added, double watts)
    {
        double lateral = 0, ceiling = 0;
        for (int i = 0; i < _points.Length; i++)
        {
            double ax = _lx[i] + added[Stride * i], ay = _ly[i] + added[(Stride * i) + 1];
            double after = (ax * ax) + (ay * ay);
            if (_atRisk[i])
            {
                lateral += after;
            }
            else
            {
                // Benches not at risk count only where the lamps make their sideways light worse.
                double before = (_lx[i] * _lx[i]) + (_ly[i] * _ly[i]);
                lateral += Math.Max(0, after - before);
            }

            if (!double.IsNaN(_ceilingTarget[i]))
            {
                double over = Math.Max(0, _peakOn[i] + added[(Stride * i) + 2] - _ceilingTarget[i]) / _ceiling[i];
                ceiling += over + (over * over);
            }
        }

        double uniformity = 0;
        double?[] after2 = Uniformities(added);
        for (int s = 0; s < _slots; s++)
        {
            double shortfall = Math.Max(0, _uniformityTarget[s] - (after2[s] ?? 1));
            uniformity += shortfall + (shortfall * shortfall);
        }

        return new ObjectiveTerms(
            lateral / _normaliser,
            _brief.EnergyWeightPerKilowatt * watts / ModelConstants.WattHoursPerKilowattHour,
            PenaltyWeight * ceiling,
            PenaltyWeight * uniformity);
    }

    /// <summary>Per point: the period-mean lateral blue (east, north) after adding <paramref name="added"/>.</summary>
    public (double East, double North) LateralAfter(int i, double[] added) =>
        (_lx[i] + added[Stride * i], _ly[i] + added[(Stride * i) + 1]);

    /// <summary>Per point: the highest horizontal PPFD of the period after adding <paramref name="added"/>.</summary>
    public double PeakAfter(int i, double[] added) =>
        Math.Max(_peakOff[i], _peakOn[i] + (_onFraction > 0 ? added[(Stride * i) + 2] : 0));

    /// <summary>The bench slot of an objective point.</summary>
    public int SlotOf(int i) => _slot[i];

    private double?[] Uniformities(double[] added)
    {
        double[] min = new double[_slots], sum = new double[_slots];
        int[] count = new int[_slots];
        Array.Fill(min, double.PositiveInfinity);
        double addedDliPerPpfd = _onSecondsPerDay / ModelConstants.MicromolesPerMole;
        for (int i = 0; i < _points.Length; i++)
        {
            int s = _slot[i];
            double dli = _dli[i] + (added[(Stride * i) + 2] * addedDliPerPpfd);
            min[s] = Math.Min(min[s], dli);
            sum[s] += dli;
            count[s]++;
        }

        var result = new double?[_slots];
        for (int s = 0; s < _slots; s++)
        {
            double mean = count[s] > 0 ? sum[s] / count[s] : 0;
            result[s] = mean > 0 ? min[s] / mean : null;
        }

        return result;
    }
}

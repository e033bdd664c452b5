using CanopyAdvisor.Core.Lamps;

namespace CanopyAdvisor.Benchmarks;

/// <summary>Stand-in tabulated beam: 25 C-planes (0–360° by 15°) × 37 polar angles (0–90° by 2.5°), bilinear.</summary>
public sealed class TabulatedBeam : BeamDistribution
{
    private const int Planes = 25;
    private const int Polars = 37;
    private const double PlaneStep = 2 * Math.PI / (Planes - 1);
    private const double PolarStep = Math.PI / 2 / (Polars - 1);
    private readonly double[] _table = new double[Planes * Polars];

    /// <summary>Fills the table with an elongated cosine-power beam (wider along C = 0° than across), roughly normalised.</summary>
    public TabulatedBeam()
    {
        for (int c = 0; c < Planes; c++)
        {
            double around = c * PlaneStep;
            double n = 1.5 + Math.Abs(Math.Sin(around));
            for (int p = 0; p < Polars; p++)
            {
                _table[(c * Polars) + p] = (n + 1) / (2 * Math.PI) * Math.Pow(Math.Cos(p * PolarStep), n);
            }
        }
    }

    /// <inheritdoc />
    public override bool IsAxiallySymmetric => false;

    /// <inheritdoc />
    public override double IntensityPerUnitFlux(double polarRadians, double aroundRadians)
    {
        if (polarRadians >= Math.PI / 2)
        {
            return 0;
        }

        double pc = aroundRadians / PlaneStep;
        double pp = polarRadians / PolarStep;
        int c = Math.Min((int)pc, Planes - 2);
        int p = Math.Min((int)pp, Polars - 2);
        double fc = pc - c, fp = pp - p;
        int k = (c * Polars) + p;
        double low = (_table[k] * (1 - fp)) + (_table[k + 1] * fp);
        double high = (_table[k + Polars] * (1 - fp)) + (_table[k + Polars + 1] * fp);
        return (low * (1 - fc)) + (high * fc);
    }
}

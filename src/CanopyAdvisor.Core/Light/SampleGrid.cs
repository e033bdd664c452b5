using System.Collections.Immutable;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;

namespace CanopyAdvisor.Core.Light;

/// <summary>Lays out the sample points of a bench: the centres of a regular grid of cells on its footprint.</summary>
/// <remarks>
/// A bench with <c>SamplesAlongLength</c> = n and <c>SamplesAcrossWidth</c> = m is cut into n × m equal cells; each
/// point sits at a cell centre (so each represents the same area, and the bench mean is the plain mean of its points),
/// at the sensing height <c>SurfaceHeightM + Canopy.HeightM − Canopy.SensingDepthM</c>.
/// Points are ordered along the length first: index = along × m + across.
/// </remarks>
public static class SampleGrid
{
    /// <summary>The sensing height of a bench above ground, metres.</summary>
    public static double SensingHeightM(Bench bench)
    {
        ArgumentNullException.ThrowIfNull(bench);
        return bench.SurfaceHeightM + bench.Canopy.HeightM - bench.Canopy.SensingDepthM;
    }

    /// <summary>The sample points of one bench, along the length first.</summary>
    /// <param name="bench">The bench (its sample counts must be ≥ 1 and its footprint non-empty).</param>
    /// <param name="benchIndex">The bench's index in the site, stored in each point.</param>
    public static ImmutableArray<SamplePoint> ForBench(Bench bench, int benchIndex)
    {
        ArgumentNullException.ThrowIfNull(bench);
        int n = bench.SamplesAlongLength;
        int m = bench.SamplesAcrossWidth;
        if (n < 1 || m < 1)
        {
            throw new ArgumentOutOfRangeException(nameof(bench), "a bench needs at least one sample along and across");
        }

        Footprint footprint = bench.Footprint;
        Vector3 axis = footprint.AxisDirection;
        Vector3 across = footprint.WidthDirection;
        double length = footprint.LengthM;
        double width = footprint.WidthM;
        double z = SensingHeightM(bench);
        var builder = ImmutableArray.CreateBuilder<SamplePoint>(n * m);
        for (int i = 0; i < n; i++)
        {
            double a = (i + 0.5) * length / n;
            for (int j = 0; j < m; j++)
            {
                double c = (j + 0.5) * width / m;
                Vector3 ground = footprint.Corner + (axis * a) + (across * c);
                builder.Add(new SamplePoint(benchIndex, i, j, new Vector3(ground.X, ground.Y, z), a, length - a, c, width - c));
            }
        }

        return builder.MoveToImmutable();
    }
}

using CanopyAdvisor.Core.Geometry;

namespace CanopyAdvisor.Core.Light;

/// <summary>
/// Interim hemisphere quadrature for the per-point sky view, until the shared <c>HemisphereQuadrature</c> and
/// <c>SkyViewIntegrator</c> are merged (the only caller is <see cref="LightFieldCompiler"/>.ComputeSkyView).
/// </summary>
/// <remarks>
/// The upper hemisphere is cut into n zenith rings of equal angle and 4n azimuth cells per ring. The weight is sampled
/// at each cell's centre and multiplied by the exact integral of each kernel over the cell (product midpoint rule), so
/// an open sky (weight 1) gives exactly f = 1, v = ẑ, s = 2:
/// f = (1/π)∫w cos θ dω, v = (1/π)∫w ω̂ dω, s = (1/π)∫w dω (MODEL.md §3).
/// </remarks>
internal sealed class InterimSkyGrid
{
    private readonly Vector3[] _directions;
    private readonly double[] _kernelX;
    private readonly double[] _kernelY;
    private readonly double[] _kernelZ;
    private readonly double[] _kernelScalar;

    /// <summary>Builds the grid with the given number of zenith rings (≥ 1).</summary>
    public InterimSkyGrid(int rings)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(rings, 1);
        int cells = 4 * rings;
        int count = rings * cells;
        _directions = new Vector3[count];
        _kernelX = new double[count];
        _kernelY = new double[count];
        _kernelZ = new double[count];
        _kernelScalar = new double[count];
        double dTheta = Math.PI / 2 / rings;
        double dPhi = 2 * Math.PI / cells;
        int index = 0;
        for (int i = 0; i < rings; i++)
        {
            double t0 = i * dTheta, t1 = (i + 1) * dTheta;
            double solid = Math.Cos(t0) - Math.Cos(t1);                         // ∫ sin θ dθ
            double cosine = ((Math.Sin(t1) * Math.Sin(t1)) - (Math.Sin(t0) * Math.Sin(t0))) / 2; // ∫ cos θ sin θ dθ
            double sine = ((t1 - t0) / 2) - ((Math.Sin(2 * t1) - Math.Sin(2 * t0)) / 4);      // ∫ sin² θ dθ
            for (int j = 0; j < cells; j++)
            {
                double p0 = j * dPhi, p1 = (j + 1) * dPhi;
                _directions[index] = Direction.FromAzimuthZenith(
                    Angle.FromRadians((p0 + p1) / 2), Angle.FromRadians((t0 + t1) / 2));

                // Azimuth φ clockwise from north: x = sin θ sin φ, y = sin θ cos φ.
                _kernelX[index] = sine * (Math.Cos(p0) - Math.Cos(p1)) / Math.PI;
                _kernelY[index] = sine * (Math.Sin(p1) - Math.Sin(p0)) / Math.PI;
                _kernelZ[index] = cosine * dPhi / Math.PI;
                _kernelScalar[index] = solid * dPhi / Math.PI;
                index++;
            }
        }
    }

    /// <summary>Number of directions.</summary>
    public int Count => _directions.Length;

    /// <summary>Integrates a weight over the hemisphere: view factor f, sky vector v and scalar factor s.</summary>
    public (double ViewFactor, Vector3 SkyVector, double ScalarFactor) Integrate(Func<Vector3, double> weight)
    {
        double x = 0, y = 0, z = 0, s = 0;
        for (int k = 0; k < _directions.Length; k++)
        {
            double w = weight(_directions[k]);
            if (w == 0)
            {
                continue;
            }

            x += w * _kernelX[k];
            y += w * _kernelY[k];
            z += w * _kernelZ[k];
            s += w * _kernelScalar[k];
        }

        return (z, new Vector3(x, y, z), s);
    }
}

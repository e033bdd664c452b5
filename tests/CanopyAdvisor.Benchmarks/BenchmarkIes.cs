using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Files.Photometry;

namespace CanopyAdvisor.Benchmarks;

/// <summary>
/// An invented elongated beam written as an IES LM-63 type C text in memory and read back with the real reader, so the
/// benchmark lamps carry the same <see cref="TabulatedDistribution"/> (and lookup cost) a real IES file would give.
/// </summary>
/// <remarks>
/// Grid: vertical angles 0–90° by 2.5° (37), horizontal angles 0–360° by 5° (73), values in µmol s⁻¹ sr⁻¹. The shape is
/// a cosⁿ beam whose exponent grows from n = 1.5 along the C = 0°/180° plane to n = 6 across it (C = 90°/270°): a
/// beam wide along the lamp's length and narrow across, like a linear LED bar. The table is sampled from a coarse
/// <see cref="TabulatedDistribution"/> of that shape with <see cref="IesWriter.SampleTypeC"/>, written with
/// <see cref="IesWriter.WriteTypeC"/> and parsed with <see cref="IesReader.Read(string, string, IesReadOptions)"/>.
/// Invented for benchmarking; not the data of any product.
/// </remarks>
public static class BenchmarkIes
{
    /// <summary>Total photon flux the table is scaled to, µmol s⁻¹.</summary>
    public const double FluxMicromolesPerSecond = 300;

    /// <summary>The IES text (built once).</summary>
    public static string Text { get; } = BuildText();

    /// <summary>Reads <see cref="Text"/> with the real IES reader (photon units).</summary>
    public static IesPhotometry Read() => IesReader.Read(Text, "bench.ies", IesReadOptions.Photon);

    private static string BuildText()
    {
        // The shape on a 1° × 5° grid; sampled onto the file's grid below.
        int polarCount = 91, aroundCount = 73;
        var polar = new Angle[polarCount];
        var around = new Angle[aroundCount - 1];
        for (int v = 0; v < polarCount; v++)
        {
            polar[v] = Angle.FromDegrees(v);
        }

        for (int h = 0; h < around.Length; h++)
        {
            around[h] = Angle.FromDegrees(h * 5.0);
        }

        var values = new double[around.Length, polarCount];
        for (int h = 0; h < around.Length; h++)
        {
            double exponent = 1.5 + (4.5 * Math.Pow(Math.Sin(around[h].Radians), 2));
            for (int v = 0; v < polarCount; v++)
            {
                values[h, v] = Math.Pow(Math.Cos(polar[v].Radians), exponent);
            }
        }

        var shape = new TabulatedDistribution(polar, around, values);
        IesGrid grid = IesWriter.SampleTypeC(
            shape, FluxMicromolesPerSecond, IesWriter.Range(0, 90, 2.5), IesWriter.Range(0, 360, 5));
        return IesWriter.WriteTypeC(grid, new IesWriteSettings
        {
            Keywords = [new IesKeyword("TEST", "invented elongated beam for benchmarks", 2), new IesKeyword("MANUFAC", "none (benchmark data)", 3)],
            Width = 0.1,
            Length = 1.2,
            InputWatts = 650,
        });
    }
}

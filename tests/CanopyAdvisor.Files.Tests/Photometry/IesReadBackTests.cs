using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Files.Photometry;

namespace CanopyAdvisor.Files.Tests.Photometry;

// Files written by IesWriter for known distributions and read back. Analytic check values:
// Lambertian I = I₀ cos θ: Φ = ∫ I dω over the front hemisphere = π I₀; cosⁿ: Φ = 2π I₀/(n + 1)
// (∫₀^{π/2} cosⁿθ sin θ dθ = 1/(n + 1), elementary integral). Tolerances: the reader interpolates linearly between
// 5° samples, whose error is at most h²/8 × max|I''| (standard linear-interpolation bound), about 0.4 % of the peak for cos⁴.
public class IesReadBackTests
{
    private const double I0 = 250.0;

    private static IReadOnlyList<double> Vertical90 => IesWriter.Range(0, 90, 5);

    private static IesPhotometry WriteAndRead(IesGrid grid, IesWriteSettings? settings = null, IesReadOptions? options = null) =>
        IesReader.Read(IesWriter.WriteTypeC(grid, settings ?? new IesWriteSettings()), "test.ies", options ?? IesReadOptions.Photon);

    [Theory]
    [InlineData(1.0)]
    [InlineData(4.0)]
    public void Cosine_power_file_reads_back_with_analytic_flux(double n)
    {
        var beam = new CosinePowerDistribution(n);
        double flux = 2 * Math.PI * I0 / (n + 1);
        IesGrid grid = IesWriter.SampleTypeC(beam, flux, Vertical90, [0]);
        Assert.Equal(I0, grid.Values[0][0], 9);

        IesPhotometry read = WriteAndRead(grid);
        Assert.Equal(flux, read.TotalPhotonFluxMicromolesPerSecond, flux * 0.003);
        Assert.True(read.Distribution.IsAxiallySymmetric);

        double peak = beam.IntensityPerUnitFlux(0, 0);
        for (double t = 0; t <= Math.PI; t += 0.0123)
        {
            Assert.Equal(beam.IntensityPerUnitFlux(t, 0), read.Distribution.IntensityPerUnitFlux(t, 1.234), peak * 0.01);
        }
    }

    [Fact]
    public void Lambertian_file_flux_is_pi_times_axial_intensity()
    {
        IesGrid grid = IesWriter.SampleTypeC(LambertianDistribution.Instance, Math.PI * I0, Vertical90, [0]);
        IesPhotometry read = WriteAndRead(grid);
        Assert.Equal(Math.PI * I0, read.TotalPhotonFluxMicromolesPerSecond, Math.PI * I0 * 0.002);
    }

    // Multiplier, ballast factor and the caller's photon-per-lumen factor all scale the absolute intensity (LM-63 field
    // definitions); the factor 0.015 is arbitrary here: only the scaling is checked.
    [Fact]
    public void Multiplier_ballast_factor_and_lumen_conversion_scale_the_flux()
    {
        IesGrid grid = IesWriter.SampleTypeC(LambertianDistribution.Instance, 1000, Vertical90, [0]);
        double plain = WriteAndRead(grid).TotalPhotonFluxMicromolesPerSecond;
        var settings = new IesWriteSettings { CandelaMultiplier = 2.5, BallastFactor = 0.9 };
        Assert.Equal(plain * 2.25, WriteAndRead(grid, settings).TotalPhotonFluxMicromolesPerSecond, 1e-9 * plain);
        Assert.Equal(plain * 0.015, WriteAndRead(grid, null, IesReadOptions.Lumen(0.015)).TotalPhotonFluxMicromolesPerSecond, 1e-9 * plain);
    }

    private static double QuadrantPattern(double t, double p) => Math.Max(0, Math.Cos(t)) * (1 + (0.5 * Math.Sin(t) * Math.Cos(2 * p)));

    private static double Bilateral0To180(double t, double p) => Math.Max(0, Math.Cos(t)) * (1 + (0.5 * Math.Sin(t) * Math.Cos(p)));

    private static double Bilateral90To270(double t, double p) => Math.Max(0, Math.Cos(t)) * (1 + (0.5 * Math.Sin(t) * Math.Sin(p)));

    private static IesGrid Sample(Func<double, double, double> f, IReadOnlyList<double> horizontal)
    {
        var values = horizontal.Select(h => (IReadOnlyList<double>)[.. Vertical90.Select(v => I0 * f(v * Math.PI / 180, h * Math.PI / 180))]).ToArray();
        return new IesGrid(Vertical90, horizontal, values);
    }

    // LM-63 symmetry rules (LM-63-2002 §5, LM-63-19): a 0–90° file is symmetric in each quadrant, 0–180° about the
    // 0–180° plane, 90–270° about the 90–270° plane. Each must expand to exactly what the full 0–360° file gives.
    [Theory]
    [InlineData("quadrant", 0, 90)]
    [InlineData("bilateral 0-180", 0, 180)]
    [InlineData("bilateral 90-270", 90, 270)]
    public void Symmetric_files_expand_to_the_full_file(string kind, double firstH, double lastH)
    {
        Func<double, double, double> f = kind switch
        {
            "quadrant" => QuadrantPattern,
            "bilateral 0-180" => Bilateral0To180,
            _ => Bilateral90To270,
        };
        IesPhotometry full = WriteAndRead(Sample(f, IesWriter.Range(0, 360, 15)));
        IesPhotometry half = WriteAndRead(Sample(f, IesWriter.Range(firstH, lastH, 15)));
        Assert.False(half.Distribution.IsAxiallySymmetric);
        Assert.Equal(full.TotalPhotonFluxMicromolesPerSecond, half.TotalPhotonFluxMicromolesPerSecond, 1e-9 * full.TotalPhotonFluxMicromolesPerSecond);
        var random = new Random(11);
        for (int i = 0; i < 3000; i++)
        {
            double t = random.NextDouble() * Math.PI;
            double p = random.NextDouble() * 2 * Math.PI;
            Assert.Equal(full.Distribution.IntensityPerUnitFlux(t, p), half.Distribution.IntensityPerUnitFlux(t, p), 12);
        }
    }

    // A file measured 90–180° (upward only) sends nothing below the horizontal (LM-63 vertical-angle ranges).
    [Fact]
    public void Upper_hemisphere_file_emits_nothing_downward()
    {
        var vertical = IesWriter.Range(90, 180, 10);
        var grid = new IesGrid(vertical, [0], [[.. vertical.Select(v => Math.Max(0, 100 * -Math.Cos(v * Math.PI / 180)))]]);
        IesPhotometry read = WriteAndRead(grid);
        Assert.Equal(0, read.Distribution.IntensityPerUnitFlux(0.3, 0));
        Assert.True(read.Distribution.IntensityPerUnitFlux(Math.PI - 0.3, 0) > 0);
    }

    [Fact]
    public void Tilt_include_table_and_keywords_are_kept()
    {
        var settings = new IesWriteSettings
        {
            FormatLine = "IESNA:LM-63-2002",
            Keywords = [new("TEST", "demo data 1", 0), new("MANUFAC", "demo data\nsecond line", 0)],
            Tilt = new IesTilt(2, [0, 15, 30, 45], [1, 0.95, 0.9, 0.85]),
            UnitsType = 1,
            Width = 1,
            Length = 2,
            Height = -0.5,
            InputWatts = 630,
        };
        IesGrid grid = IesWriter.SampleTypeC(LambertianDistribution.Instance, 1000, Vertical90, [0]);
        IesPhotometry read = WriteAndRead(grid, settings);
        Assert.Equal("LM-63-2002", read.Edition);
        Assert.NotNull(read.Tilt);
        Assert.Equal(2, read.Tilt.LampToLuminaireGeometry);
        Assert.Equal([0.0, 15, 30, 45], read.Tilt.AnglesDeg);
        Assert.Equal([1, 0.95, 0.9, 0.85], read.Tilt.MultiplyingFactors);
        Assert.Equal("second line", read.Keywords[1].Value.Split('\n')[1]);
        Assert.Equal("MANUFAC", read.Keywords[1].Name);
        Assert.Equal(630, read.InputWatts);

        // 1 ft = 0.3048 m exactly (international foot, 1959).
        Assert.Equal(0.3048, read.LuminousWidthM, 12);
        Assert.Equal(-0.1524, read.LuminousHeightM, 12);
    }

    // The same numbers in the layouts the editions allow: no format line (1986), IESNA91, 1995, 2019; commas and line
    // breaks anywhere between numbers (LM-63 delimiters: comma, spaces, line breaks).
    [Theory]
    [InlineData("", "LM-63-1986")]
    [InlineData("IESNA91\n", "LM-63-1991")]
    [InlineData("IESNA:LM-63-1995\n", "LM-63-1995")]
    [InlineData("IES:LM-63-2019\n", "LM-63-2019")]
    public void Editions_and_delimiters(string formatLine, string edition)
    {
        string text = formatLine + "[TEST] demo data\nTILT=NONE\n1,-1,1,3\n1 1 2 0 0 0\n1.0 1 50\n0 45\n90\n0\n100, 70.7\n 0\n";
        IesPhotometry read = IesReader.Read(text, "demo.ies", IesReadOptions.Photon);
        Assert.Equal(edition, read.Edition);
        Assert.Equal([0.0, 45, 90], read.Grid.VerticalAnglesDeg);
        Assert.Equal([100, 70.7, 0], read.Grid.Values[0]);
        Assert.Equal(50, read.InputWatts);
    }

    // Type B (LM-63: planes share a horizontal axis; photometric zero H = V = 0 is the lamp axis A, photometric
    // horizontal H = 0, V = 90° is the C = 0° reference R). In the documented mapping d·A = cos H cos V,
    // d·R = cos H sin V, d·L = −sin H, so a file holding I₀ cos H cos V (1 + 0.3 cos H sin V − 0.2 sin H) is the
    // pattern I₀ (d·A)(1 + 0.3 d·R + 0.2 d·L), whose flux is π I₀ (the odd terms integrate to zero over the hemisphere).
    [Fact]
    public void Type_b_file_maps_onto_the_lamp_frame()
    {
        var angles = IesWriter.Range(-90, 90, 5);
        string text = AbFile(2, angles, angles, (h, v) => I0 * Math.Cos(h) * Math.Cos(v) * (1 + (0.3 * Math.Cos(h) * Math.Sin(v)) - (0.2 * Math.Sin(h))));
        IesPhotometry read = IesReader.Read(text, "b.ies", IesReadOptions.Photon);
        CheckPattern(read, d => Math.Max(0, d.Z) * (1 + (0.3 * d.X) + (0.2 * d.Y)), Math.PI * I0);
    }

    // Type A (LM-63: vertical planes about the lamp axis; photometric zero at V = −90° is the axis A, photometric
    // horizontal H = V = 0 is R). Mapping: d·A = −sin V, d·R = cos V cos H, d·L = −cos V sin H. A file holding
    // I₀ cos V cos H (1 − 0.3 sin V − 0.2 cos V sin H) is I₀ (d·R)(1 + 0.3 d·A + 0.2 d·L): flux π I₀ as above.
    [Fact]
    public void Type_a_file_maps_onto_the_lamp_frame()
    {
        var angles = IesWriter.Range(-90, 90, 5);
        string text = AbFile(3, angles, angles, (h, v) => I0 * Math.Cos(v) * Math.Cos(h) * (1 - (0.3 * Math.Sin(v)) - (0.2 * Math.Cos(v) * Math.Sin(h))));
        IesPhotometry read = IesReader.Read(text, "a.ies", IesReadOptions.Photon);
        CheckPattern(read, d => Math.Max(0, d.X) * (1 + (0.3 * d.Z) + (0.2 * d.Y)), Math.PI * I0);
    }

    // A type B file giving only H = 0–90° is laterally symmetric (LM-63): it must equal the full −90–90° file.
    [Fact]
    public void Half_type_b_file_mirrors()
    {
        var full = IesWriter.Range(-90, 90, 5);
        var half = IesWriter.Range(0, 90, 5);
        double F(double h, double v) => I0 * Math.Cos(h) * Math.Cos(v) * (1 + (0.3 * Math.Cos(h) * Math.Sin(v)));
        IesPhotometry a = IesReader.Read(AbFile(2, full, full, F), "b.ies", IesReadOptions.Photon);
        IesPhotometry b = IesReader.Read(AbFile(2, half, full, F), "b.ies", IesReadOptions.Photon);
        Assert.Equal(a.TotalPhotonFluxMicromolesPerSecond, b.TotalPhotonFluxMicromolesPerSecond, 1e-9 * a.TotalPhotonFluxMicromolesPerSecond);
    }

    private static void CheckPattern(IesPhotometry read, Func<(double X, double Y, double Z), double> pattern, double flux)
    {
        Assert.Equal(flux, read.TotalPhotonFluxMicromolesPerSecond, flux * 0.01);
        var random = new Random(5);
        for (int i = 0; i < 2000; i++)
        {
            double t = random.NextDouble() * Math.PI;
            double p = random.NextDouble() * 2 * Math.PI;
            var d = (X: Math.Sin(t) * Math.Cos(p), Y: Math.Sin(t) * Math.Sin(p), Z: Math.Cos(t));
            double expected = I0 * pattern(d) / flux;
            Assert.Equal(expected, read.Distribution.IntensityPerUnitFlux(t, p), 0.02 * 1.5 * I0 / flux);
        }
    }

    private static string AbFile(int type, IReadOnlyList<double> horizontal, IReadOnlyList<double> vertical, Func<double, double, double> f)
    {
        var text = new System.Text.StringBuilder("IES:LM-63-2019\n[TEST] demo data\nTILT=NONE\n");
        text.Append(System.FormattableString.Invariant($"1 -1 1 {vertical.Count} {horizontal.Count} {type} 2 0 0 0\n1 1 0\n"));
        text.AppendLine(string.Join(' ', vertical.Select(x => x.ToString(System.Globalization.CultureInfo.InvariantCulture))));
        text.AppendLine(string.Join(' ', horizontal.Select(x => x.ToString(System.Globalization.CultureInfo.InvariantCulture))));
        foreach (double h in horizontal)
        {
            text.AppendLine(string.Join(' ', vertical.Select(v => Math.Max(0, f(h * Math.PI / 180, v * Math.PI / 180)).ToString("R", System.Globalization.CultureInfo.InvariantCulture))));
        }

        return text.ToString();
    }

    [Fact]
    public void Reads_from_disk_and_names_the_file_in_errors()
    {
        string folder = Path.Combine(Path.GetTempPath(), "canopy-ies-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(folder);
        try
        {
            string good = Path.Combine(folder, "good.ies");
            IesGrid grid = IesWriter.SampleTypeC(LambertianDistribution.Instance, 1000, Vertical90, [0]);
            File.WriteAllText(good, IesWriter.WriteTypeC(grid, new IesWriteSettings()));
            Assert.Equal("good.ies", IesReader.ReadFile(good, IesReadOptions.Photon).FileName);

            string bad = Path.Combine(folder, "bad.ies");
            File.WriteAllText(bad, "IES:LM-63-2019\nTILT=NONE\n1 -1 1\n");
            var e = Assert.Throws<Core.Validation.InvalidInputException>(() => IesReader.ReadFile(bad, IesReadOptions.Photon));
            Assert.StartsWith("bad.ies:3", e.Errors[0].Path, StringComparison.Ordinal);

            var missing = Assert.Throws<Core.Validation.InvalidInputException>(() => IesReader.ReadFile(Path.Combine(folder, "none.ies"), IesReadOptions.Photon));
            Assert.Equal("none.ies", missing.Errors[0].Path);
        }
        finally
        {
            Directory.Delete(folder, recursive: true);
        }
    }

    // Isotropic source: Φ = 4π I (solid angle of the sphere); a constant is interpolated exactly, so only rounding remains.
    [Fact]
    public void Isotropic_full_sphere_file_has_four_pi_flux()
    {
        var vertical = IesWriter.Range(0, 180, 10);
        var grid = new IesGrid(vertical, [0], [[.. vertical.Select(_ => 100.0)]]);
        IesPhotometry read = WriteAndRead(grid);
        Assert.Equal(400 * Math.PI, read.TotalPhotonFluxMicromolesPerSecond, 1e-9);
        Assert.Equal(1 / (4 * Math.PI), read.Distribution.IntensityPerUnitFlux(2.5, 4), 12);
    }
}

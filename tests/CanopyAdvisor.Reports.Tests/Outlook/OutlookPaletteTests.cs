using CanopyAdvisor.Reports.Outlook;

namespace CanopyAdvisor.Reports.Tests.Outlook;

/// <summary>The risk palette in grey print and for deuteranopes.</summary>
/// <remarks>
/// Relative luminance and contrast ratio: WCAG 2.1 definitions (W3C Recommendation, "relative luminance" and
/// "contrast ratio"; sRGB linearisation with the 0.03928 threshold as WCAG writes it). The 3:1 floor is WCAG 2.1
/// success criterion 1.4.11 (non-text contrast); 4.5:1 for text is criterion 1.4.3. Deuteranopia: the severity-1.0
/// matrix of Machado, Oliveira &amp; Fernandes 2009 (IEEE TVCG 15(6):1291), applied to linear RGB — the numbers are
/// from memory, not checked against the paper. Colour difference: CIE 1976 L*a*b* (D65 white) and ΔE*ab; the floor of
/// 20 is our own choice (far above the ≈ 2.3 just-noticeable difference commonly quoted).
/// </remarks>
public class OutlookPaletteTests
{
    private static readonly OutlookRisk[] Risks = [OutlookRisk.Low, OutlookRisk.Watch, OutlookRisk.LeavesGrade];

    // Machado et al. 2009, deuteranopia, severity 1.0 (from memory).
    private static readonly double[,] Deuteranopia =
    {
        { 0.367322, 0.860646, -0.227968 },
        { 0.280085, 0.672501, 0.047413 },
        { -0.011820, 0.042940, 0.968881 },
    };

    private static double Channel(int c)
    {
        double s = c / 255.0;
        return s <= 0.03928 ? s / 12.92 : Math.Pow((s + 0.055) / 1.055, 2.4);
    }

    private static double[] Linear(string hex) =>
        [Channel(Convert.ToInt32(hex[1..3], 16)), Channel(Convert.ToInt32(hex[3..5], 16)), Channel(Convert.ToInt32(hex[5..7], 16))];

    private static double Luminance(double[] rgb) => (0.2126 * rgb[0]) + (0.7152 * rgb[1]) + (0.0722 * rgb[2]);

    private static double Contrast(double l1, double l2) => (Math.Max(l1, l2) + 0.05) / (Math.Min(l1, l2) + 0.05);

    private static double[] Simulate(double[] rgb)
    {
        var o = new double[3];
        for (int i = 0; i < 3; i++)
        {
            o[i] = Math.Clamp((Deuteranopia[i, 0] * rgb[0]) + (Deuteranopia[i, 1] * rgb[1]) + (Deuteranopia[i, 2] * rgb[2]), 0, 1);
        }

        return o;
    }

    private static double[] Lab(double[] rgb)
    {
        // sRGB (IEC 61966-2-1) linear RGB → XYZ (D65) → CIE L*a*b*.
        double x = (0.4124 * rgb[0]) + (0.3576 * rgb[1]) + (0.1805 * rgb[2]);
        double y = (0.2126 * rgb[0]) + (0.7152 * rgb[1]) + (0.0722 * rgb[2]);
        double z = (0.0193 * rgb[0]) + (0.1192 * rgb[1]) + (0.9505 * rgb[2]);
        static double F(double t) => t > 216.0 / 24389 ? Math.Cbrt(t) : ((24389.0 / 27 * t) + 16) / 116;
        double fx = F(x / 0.95047), fy = F(y), fz = F(z / 1.08883);
        return [(116 * fy) - 16, 500 * (fx - fy), 200 * (fy - fz)];
    }

    private static double DeltaE(double[] a, double[] b) => Math.Sqrt(a.Zip(b).Sum(p => (p.First - p.Second) * (p.First - p.Second)));

    [Theory]
    // WCAG 2.1's own end points: white on black is 21:1, a colour on itself 1:1.
    [InlineData("#ffffff", "#000000", 21)]
    [InlineData("#777777", "#777777", 1)]
    public void Contrast_formula_gives_the_wcag_end_points(string a, string b, double expected) =>
        Assert.Equal(expected, Contrast(Luminance(Linear(a)), Luminance(Linear(b))), 6);

    [Fact]
    public void Every_pair_of_risk_fills_has_at_least_3_to_1_contrast_so_grey_print_keeps_them_apart()
    {
        foreach (OutlookRisk a in Risks)
        {
            foreach (OutlookRisk b in Risks.Where(r => r > a))
            {
                double ratio = Contrast(Luminance(Linear(OutlookPalette.Fill(a))), Luminance(Linear(OutlookPalette.Fill(b))));
                Assert.True(ratio >= 3, $"{a} vs {b}: {ratio:0.00}:1");
            }
        }
    }

    [Fact]
    public void Ink_on_each_fill_reads_as_text()
    {
        foreach (OutlookRisk r in Risks)
        {
            double ratio = Contrast(Luminance(Linear(OutlookPalette.Fill(r))), Luminance(Linear(OutlookPalette.InkOn(r))));
            Assert.True(ratio >= 4.5, $"{r}: {ratio:0.00}:1");
        }
    }

    [Fact]
    public void Fills_stay_apart_under_simulated_deuteranopia()
    {
        foreach (OutlookRisk a in Risks)
        {
            foreach (OutlookRisk b in Risks.Where(r => r > a))
            {
                double d = DeltaE(Lab(Simulate(Linear(OutlookPalette.Fill(a)))), Lab(Simulate(Linear(OutlookPalette.Fill(b)))));
                Assert.True(d >= 20, $"{a} vs {b}: ΔE*ab {d:0.0}");
            }
        }
    }

    [Fact]
    public void Classes_differ_in_pattern_shape_and_words_too()
    {
        Assert.Equal(3, Risks.Select(OutlookPalette.Pattern).Distinct().Count());
        Assert.Equal(3, Risks.Select(OutlookPalette.Symbol).Distinct().Count());
        Assert.Equal(3, Risks.Select(OutlookPalette.Label).Distinct().Count());
    }
}

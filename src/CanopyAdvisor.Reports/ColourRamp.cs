using System.Globalization;

namespace CanopyAdvisor.Reports;

/// <summary>The product's sequential colour ramp for light maps: deep indigo (least) through teal to straw (most).</summary>
/// <remarks>Our own palette; chosen to stay readable when printed in grey (lightness rises monotonically).</remarks>
public static class ColourRamp
{
    private static readonly (double At, int R, int G, int B)[] Stops =
    [
        (0.0, 0x2B, 0x1D, 0x52),
        (0.5, 0x2F, 0x8F, 0x83),
        (1.0, 0xF2, 0xD4, 0x5C),
    ];

    /// <summary>The colour at a fraction in [0, 1] (clamped; NaN gives the lowest colour), as <c>#rrggbb</c>.</summary>
    public static string At(double fraction)
    {
        double f = double.IsNaN(fraction) ? 0 : Math.Clamp(fraction, 0, 1);
        for (int i = 1; i < Stops.Length; i++)
        {
            if (f <= Stops[i].At)
            {
                var (a, r0, g0, b0) = Stops[i - 1];
                var (b, r1, g1, b1) = Stops[i];
                double t = (f - a) / (b - a);
                return Hex(Mix(r0, r1, t), Mix(g0, g1, t), Mix(b0, b1, t));
            }
        }

        return Hex(Stops[^1].R, Stops[^1].G, Stops[^1].B);
    }

    private static int Mix(int a, int b, double t) => (int)Math.Round(a + ((b - a) * t));

    private static string Hex(int r, int g, int b) => string.Create(CultureInfo.InvariantCulture, $"#{r:x2}{g:x2}{b:x2}");
}

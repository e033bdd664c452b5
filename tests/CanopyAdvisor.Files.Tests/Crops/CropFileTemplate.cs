using System.Globalization;
using CanopyAdvisor.Files.Crops;

namespace CanopyAdvisor.Files.Tests.Crops;

/// <summary>A valid crop file with a fixed layout, so tests can break one line and know its number.</summary>
/// <remarks>
/// Line 1 <c>name</c>, line 2 <c>group</c>, then for parameter i (0-based, in <see cref="Keys"/> order) a blank line
/// and the table: header at 4 + 6i, value 5 + 6i, unit 6 + 6i, range 7 + 6i, source 8 + 6i.
/// The values are invented test values (a plausible bedding plant), not crop data.
/// </remarks>
internal static class CropFileTemplate
{
    public const string Path = "crops/test.toml";

    public static readonly (string Key, double Value, string Unit, double Min, double Max)[] Keys =
    [
        ("balanceNumber", 3, "1", 2, 6),
        ("proprioceptiveSensitivity", 1.5, "1", 0.5, 4),
        ("photoCoefficient", 0.8, "(umol m-2 s-1)^-b", 0.2, 3),
        ("photoExponent", 0.3, "1", 0.1, 0.6),
        ("growthZoneLengthMm", 20, "mm", 10, 40),
        ("referenceElongationMmPerDay", 5, "mm/d", 2, 10),
        ("baseTemperatureC", 4, "°C", 1, 7),
        ("optimumTemperatureC", 24, "°C", 21, 27),
        ("maximumTemperatureC", 35, "°C", 32, 39),
        ("difSensitivityPerKelvin", 0.03, "K-1", 0, 0.08),
        ("shadeAvoidanceSensitivity", 1.5, "1", 0.5, 3),
        ("dliMinimum", 10, "mol m-2 d-1", 8, 11),
        ("dliTarget", 12, "mol m-2 d-1", 11, 16),
        ("lowLightStretchPerMole", 0.03, "(mol m-2 d-1)-1", 0.01, 0.08),
        ("nutationPeriodHours", 2, "h", 1, 3),
        ("nutationAmplitudeDeg", 5, "deg", 1, 15),
        ("nutationSense", 1, "1", -1, 1),
        ("gravitropicDelayHours", 0.5, "h", 0.25, 1.5),
        ("leafAreaDensityM2PerM3", 10, "m2 m-3", 5, 20),
        ("leanGradeLimitDeg", 15, "deg", 10, 20),
        ("heightGradeLimitMm", 150, "mm", 120, 200),
    ];

    /// <summary>The template's lines (index 0 is line 1).</summary>
    public static List<string> Lines()
    {
        var lines = new List<string> { "name = \"Test crop\"", "group = \"beddingPlant\"" };
        foreach (var (key, value, unit, min, max) in Keys)
        {
            lines.Add(string.Empty);
            lines.Add($"[{key}]");
            lines.Add($"value = {F(value)}");
            lines.Add($"unit = \"{unit}\"");
            lines.Add($"range = [{F(min)}, {F(max)}]");
            lines.Add("source = \"estimate (from memory)\"");
        }

        return lines;
    }

    /// <summary>The 1-based line of a parameter's table header.</summary>
    public static int TableLine(string key) => 4 + (6 * Array.FindIndex(Keys, k => k.Key == key));

    public static string Text(List<string> lines) => string.Join('\n', lines) + "\n";

    public static string Text() => Text(Lines());

    public static CropSourceFile File(string path, string text) => new(path, text);

    private static string F(double x) => x.ToString("0.0###", CultureInfo.InvariantCulture);
}

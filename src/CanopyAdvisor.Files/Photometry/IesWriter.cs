using System.Globalization;
using System.Text;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Validation;

namespace CanopyAdvisor.Files.Photometry;

/// <summary>Writes type C IES LM-63 files (ANSI/IES LM-63-19 layout) and samples distributions onto type C grids.</summary>
/// <remarks>
/// Lines end in CR LF and are at most 132 characters (the line limit of LM-63-2002 and earlier); every angle list and
/// every block of values per horizontal angle starts on a new line. Numbers use the invariant culture, shortest
/// round-trip form.
/// </remarks>
public static class IesWriter
{
    private const int MaximumLineLength = 132;

    /// <summary>Writes a type C file for the grid (horizontal angles as given: 0 alone, 0–90, 0–180, 90–270 or 0–360°).</summary>
    /// <param name="grid">Angles in degrees and values per horizontal angle.</param>
    /// <param name="settings">Header fields.</param>
    /// <exception cref="InvalidInputException">When the grid's value blocks do not match its angle counts or a number is not finite.</exception>
    public static string WriteTypeC(IesGrid grid, IesWriteSettings settings)
    {
        ArgumentNullException.ThrowIfNull(grid);
        ArgumentNullException.ThrowIfNull(settings);
        Validate(grid);

        var text = new StringBuilder();
        if (settings.FormatLine.Length > 0)
        {
            Line(text, settings.FormatLine);
        }

        foreach (IesKeyword k in settings.Keywords)
        {
            string[] parts = k.Value.Split('\n');
            Line(text, $"[{k.Name}] {parts[0]}".TrimEnd());
            foreach (string more in parts.Skip(1))
            {
                Line(text, $"[MORE] {more}".TrimEnd());
            }
        }

        if (settings.Tilt is IesTilt tilt)
        {
            Line(text, "TILT=INCLUDE");
            Line(text, Number(tilt.LampToLuminaireGeometry));
            Line(text, Number(tilt.AnglesDeg.Count));
            Numbers(text, tilt.AnglesDeg);
            Numbers(text, tilt.MultiplyingFactors);
        }
        else
        {
            Line(text, "TILT=NONE");
        }

        Numbers(
            text,
            [settings.LampCount, settings.LumensPerLamp, settings.CandelaMultiplier, grid.VerticalAnglesDeg.Count,
             grid.HorizontalAnglesDeg.Count, 1, settings.UnitsType, settings.Width, settings.Length, settings.Height]);
        Numbers(text, [settings.BallastFactor, settings.FutureUse, settings.InputWatts]);
        Numbers(text, grid.VerticalAnglesDeg);
        Numbers(text, grid.HorizontalAnglesDeg);
        foreach (IReadOnlyList<double> block in grid.Values)
        {
            Numbers(text, block);
        }

        return text.ToString();
    }

    /// <summary>
    /// Samples a distribution scaled by a flux onto a type C grid: value = flux × I(polar = V, around = H), the
    /// convention <see cref="IesReader"/> uses to read type C files back.
    /// </summary>
    /// <param name="distribution">The distribution (per unit flux).</param>
    /// <param name="photonFluxMicromolesPerSecond">Flux to scale by, so values are µmol s⁻¹ sr⁻¹.</param>
    /// <param name="verticalAnglesDeg">Vertical angles to sample, degrees.</param>
    /// <param name="horizontalAnglesDeg">Horizontal angles to sample, degrees.</param>
    public static IesGrid SampleTypeC(
        BeamDistribution distribution,
        double photonFluxMicromolesPerSecond,
        IReadOnlyList<double> verticalAnglesDeg,
        IReadOnlyList<double> horizontalAnglesDeg)
    {
        ArgumentNullException.ThrowIfNull(distribution);
        ArgumentNullException.ThrowIfNull(verticalAnglesDeg);
        ArgumentNullException.ThrowIfNull(horizontalAnglesDeg);
        var values = new IReadOnlyList<double>[horizontalAnglesDeg.Count];
        for (int h = 0; h < values.Length; h++)
        {
            double around = horizontalAnglesDeg[h] * Angle.RadiansPerDegree;
            values[h] = [.. verticalAnglesDeg.Select(v => photonFluxMicromolesPerSecond * distribution.IntensityPerUnitFlux(v * Angle.RadiansPerDegree, around))];
        }

        return new IesGrid([.. verticalAnglesDeg], [.. horizontalAnglesDeg], values);
    }

    /// <summary>Evenly spaced angles from first to last inclusive, degrees (a helper for building grids).</summary>
    public static IReadOnlyList<double> Range(double firstDeg, double lastDeg, double stepDeg)
    {
        if (!(stepDeg > 0) || !(lastDeg >= firstDeg) || !double.IsFinite(lastDeg - firstDeg))
        {
            throw new InvalidInputException("stepDeg", "needs a step > 0 and last ≥ first");
        }

        int n = (int)Math.Round((lastDeg - firstDeg) / stepDeg) + 1;
        return [.. Enumerable.Range(0, n).Select(i => Math.Min(lastDeg, firstDeg + (i * stepDeg)))];
    }

    private static void Validate(IesGrid grid)
    {
        var errors = new List<ValidationError>();
        if (grid.Values.Count != grid.HorizontalAnglesDeg.Count)
        {
            errors.Add(new("grid.values", $"has {grid.Values.Count} blocks for {grid.HorizontalAnglesDeg.Count} horizontal angles"));
        }

        for (int h = 0; h < grid.Values.Count; h++)
        {
            if (grid.Values[h].Count != grid.VerticalAnglesDeg.Count)
            {
                errors.Add(new($"grid.values[{h}]", $"has {grid.Values[h].Count} values for {grid.VerticalAnglesDeg.Count} vertical angles"));
            }

            if (grid.Values[h].Any(x => !double.IsFinite(x)))
            {
                errors.Add(new($"grid.values[{h}]", "holds a value that is not a finite number"));
            }
        }

        if (grid.VerticalAnglesDeg.Concat(grid.HorizontalAnglesDeg).Any(x => !double.IsFinite(x)))
        {
            errors.Add(new("grid", "holds an angle that is not a finite number"));
        }

        if (errors.Count > 0)
        {
            throw new InvalidInputException(errors);
        }
    }

    private static string Number(double x) => x.ToString("R", CultureInfo.InvariantCulture);

    private static void Line(StringBuilder text, string line) => text.Append(line).Append("\r\n");

    private static void Numbers(StringBuilder text, IEnumerable<double> numbers)
    {
        var line = new StringBuilder();
        foreach (double x in numbers)
        {
            string s = Number(x);
            if (line.Length > 0 && line.Length + 1 + s.Length > MaximumLineLength)
            {
                Line(text, line.ToString());
                line.Clear();
            }

            if (line.Length > 0)
            {
                line.Append(' ');
            }

            line.Append(s);
        }

        Line(text, line.ToString());
    }
}

using System.Globalization;
using System.Text.RegularExpressions;
using CanopyAdvisor.Core;
using CanopyAdvisor.Core.Validation;

namespace CanopyAdvisor.Files.Photometry;

/// <summary>One pass over one IES LM-63 file (see <see cref="IesReader"/> for the format and rules).</summary>
internal sealed partial class IesParser
{
    private const int MaximumErrors = 20;
    private const double AngleTolerance = 1e-6;

    private readonly string fileName;
    private readonly IesReadOptions options;
    private readonly string[] lines;
    private readonly List<IesToken> tokens = [];
    private readonly List<ValidationError> errors = [];
    private int next;

    public IesParser(string text, string fileName, IesReadOptions options)
    {
        if (text.Length > 0 && text[0] == '\uFEFF')
        {
            text = text[1..];
        }

        this.fileName = fileName;
        this.options = options;
        lines = text.Split(["\r\n", "\r", "\n"], StringSplitOptions.None);
    }

    private int LastLine
    {
        get
        {
            for (int i = lines.Length - 1; i >= 0; i--)
            {
                if (lines[i].Trim().Length > 0)
                {
                    return i + 1;
                }
            }

            return 1;
        }
    }

    public IesPhotometry Parse()
    {
        double unitFactor = CheckOptions();

        // Format line (LM-63-1991 and later); LM-63-1986 files start directly with their labels.
        int i = 0;
        string edition = "LM-63-1986";
        if (lines.Length > 0)
        {
            string first = lines[0].Trim();
            Match m = FormatLinePattern().Match(first);
            if (m.Success)
            {
                edition = "LM-63-" + m.Groups[2].Value;
                i = 1;
            }
            else if (first.Equals("IESNA91", StringComparison.OrdinalIgnoreCase))
            {
                edition = "LM-63-1991";
                i = 1;
            }
        }

        var keywords = new List<IesKeyword>();
        var otherLines = new List<string>();
        int tiltIndex = -1;
        string tiltValue = string.Empty;
        for (; i < lines.Length; i++)
        {
            string t = lines[i].Trim();
            if (TryTiltValue(t, out tiltValue))
            {
                tiltIndex = i;
                break;
            }

            int close = t.IndexOf(']', StringComparison.Ordinal);
            if (t.Length > 0 && t[0] == '[' && close > 1)
            {
                string name = t[1..close].Trim();
                string value = t[(close + 1)..].Trim();
                if (name.Equals("MORE", StringComparison.OrdinalIgnoreCase) && keywords.Count > 0)
                {
                    keywords[^1] = keywords[^1] with { Value = keywords[^1].Value + "\n" + value };
                }
                else
                {
                    keywords.Add(new IesKeyword(name, value, i + 1));
                }
            }
            else if (t.Length > 0)
            {
                otherLines.Add(t);
            }
        }

        if (tiltIndex < 0)
        {
            throw Fail(LastLine, "no TILT= line: after its keyword lines an LM-63 file has TILT=NONE or TILT=INCLUDE");
        }

        Tokenize(tiltIndex + 1);
        int tiltLine = tiltIndex + 1;
        IesTilt? tilt = null;
        if (tiltValue.Equals("NONE", StringComparison.OrdinalIgnoreCase))
        {
            tilt = null;
        }
        else if (tiltValue.Equals("INCLUDE", StringComparison.OrdinalIgnoreCase))
        {
            tilt = ParseTilt();
        }
        else if (tiltValue.Length == 0)
        {
            throw Fail(tiltLine, "TILT= has no value: expected NONE, INCLUDE or a file name");
        }
        else
        {
            throw Fail(
                tiltLine,
                $"TILT={Shorten(tiltValue)} refers to a separate tilt file, which is not supported: put the table in this file (TILT=INCLUDE) or use TILT=NONE");
        }

        // The photometric header: ten numbers, then three.
        int countLine = next < tokens.Count ? tokens[next].Line : LastLine;
        int lampCount = ReadCount("number of lamps", 1, 1_000_000);
        double lumensPerLamp = ReadNumber("lumens per lamp", out IesToken lumensToken);
        if (lumensPerLamp != -1 && !(lumensPerLamp > 0))
        {
            AddError(lumensToken.Line, $"lumens per lamp must be > 0, or −1 for absolute photometry, got {lumensToken.Text}");
        }

        double multiplier = ReadNumber("candela multiplier", out IesToken multiplierToken);
        if (!(multiplier > 0))
        {
            AddError(multiplierToken.Line, $"candela multiplier must be > 0, got {multiplierToken.Text}");
        }

        int verticalCount = ReadCount("number of vertical angles", 2, IesReader.MaximumAngleCount);
        int horizontalCount = ReadCount("number of horizontal angles", 1, IesReader.MaximumAngleCount);
        int typeCode = ReadCount("photometric type (1 = C, 2 = B, 3 = A)", 1, 3);
        int unitsType = ReadCount("units type (1 = feet, 2 = metres)", 1, 2);
        double width = ReadNumber("luminous width", out _);
        double length = ReadNumber("luminous length", out _);
        double height = ReadNumber("luminous height", out _);
        double ballastFactor = ReadNumber("ballast factor", out IesToken ballastToken);
        if (!(ballastFactor > 0))
        {
            AddError(ballastToken.Line, $"ballast factor must be > 0, got {ballastToken.Text}");
        }

        double futureUse = ReadNumber("future use (ballast-lamp factor / file generation type)", out _);
        double inputWatts = ReadNumber("input watts", out IesToken wattsToken);
        if (!(inputWatts >= 0))
        {
            AddError(wattsToken.Line, $"input watts must be ≥ 0, got {wattsToken.Text}");
        }

        if (errors.Count == 0 && (long)verticalCount * horizontalCount > IesReader.MaximumValueCount)
        {
            AddError(
                countLine,
                $"{verticalCount} × {horizontalCount} values is more than the {IesReader.MaximumValueCount:N0} accepted");
        }

        ThrowIfErrors();

        var type = (IesPhotometricType)typeCode;
        double[] data = ReadData(verticalCount, horizontalCount, countLine);
        double[] vertical = data[..verticalCount];
        double[] horizontal = data[verticalCount..(verticalCount + horizontalCount)];
        int valuesStart = next - (int)((long)verticalCount * horizontalCount);

        CheckAngles(type, vertical, horizontal, next - data.Length, countLine);
        CheckValues(data, verticalCount + horizontalCount, valuesStart);
        ThrowIfErrors();

        var values = new IReadOnlyList<double>[horizontalCount];
        for (int h = 0; h < horizontalCount; h++)
        {
            values[h] = data[(verticalCount + horizontalCount + (h * verticalCount))..(verticalCount + horizontalCount + ((h + 1) * verticalCount))];
        }

        var grid = new IesGrid(vertical, horizontal, values);
        double scale = multiplier * ballastFactor * unitFactor;
        double peak = 0;
        for (int k = verticalCount + horizontalCount; k < data.Length; k++)
        {
            peak = Math.Max(peak, data[k]);
        }

        if (peak == 0)
        {
            throw Fail(tokens[valuesStart].Line, "every intensity is zero: the file describes no light");
        }

        if (!double.IsFinite(peak * scale * 4 * Math.PI) || !(scale > 0))
        {
            throw Fail(countLine, "the intensities overflow once multiplied by the candela multiplier and ballast factor");
        }

        var distribution = IesDistributionBuilder.Build(type, grid, scale, out double flux);
        if (!(flux > 0) || !double.IsFinite(flux))
        {
            throw Fail(valuesStart < tokens.Count ? tokens[valuesStart].Line : LastLine, "every intensity is zero: the file describes no light");
        }

        double feetOrMetres = unitsType == 1 ? ModelConstants.MetresPerFoot : 1.0;
        return new IesPhotometry
        {
            FileName = fileName,
            Edition = edition,
            Keywords = keywords,
            OtherHeaderLines = otherLines,
            Tilt = tilt,
            LampCount = lampCount,
            LumensPerLamp = lumensPerLamp,
            CandelaMultiplier = multiplier,
            PhotometricType = type,
            UnitsType = unitsType,
            LuminousWidthM = width * feetOrMetres,
            LuminousLengthM = length * feetOrMetres,
            LuminousHeightM = height * feetOrMetres,
            BallastFactor = ballastFactor,
            FutureUse = futureUse,
            InputWatts = inputWatts,
            Grid = grid,
            Units = options.Units,
            Distribution = distribution,
            TotalPhotonFluxMicromolesPerSecond = flux,
        };
    }

    [GeneratedRegex(@"^IES(NA)?\s*:\s*LM-63-(\d{4})\b", RegexOptions.IgnoreCase | RegexOptions.CultureInvariant)]
    private static partial Regex FormatLinePattern();

    private static bool TryTiltValue(string line, out string value)
    {
        value = string.Empty;
        if (!line.StartsWith("TILT", StringComparison.OrdinalIgnoreCase))
        {
            return false;
        }

        string rest = line[4..].TrimStart();
        if (rest.Length == 0 || rest[0] != '=')
        {
            return false;
        }

        value = rest[1..].Trim();
        return true;
    }

    private static string Shorten(string text) => text.Length <= 24 ? text : text[..24] + "…";

    private double CheckOptions()
    {
        switch (options.Units)
        {
            case IesValueUnits.Photon:
                if (options.MicromolesPerLumen is not null)
                {
                    throw new InvalidInputException(
                        "options.micromolesPerLumen",
                        "applies only to lumen (candela) values; photon values take no conversion factor");
                }

                return 1.0;
            case IesValueUnits.Lumen:
                if (options.MicromolesPerLumen is not double f || !double.IsFinite(f) || !(f > 0))
                {
                    throw new InvalidInputException(
                        "options.micromolesPerLumen",
                        "is required for lumen (candela) values and must be a finite number > 0 (µmol s⁻¹ per lumen of this lamp's spectrum)");
                }

                return f;
            default:
                throw new InvalidInputException(
                    "options.units",
                    "must say whether the values are photon intensities (µmol s⁻¹ sr⁻¹) or candelas; it is never guessed");
        }
    }

    private void Tokenize(int firstLineIndex)
    {
        for (int li = firstLineIndex; li < lines.Length; li++)
        {
            string line = lines[li];
            int start = -1;
            for (int c = 0; c <= line.Length; c++)
            {
                bool separator = c == line.Length || char.IsWhiteSpace(line[c]) || line[c] == ',';
                if (separator)
                {
                    if (start >= 0)
                    {
                        tokens.Add(new IesToken(line[start..c], li + 1));
                        start = -1;
                    }
                }
                else if (start < 0)
                {
                    start = c;
                }
            }
        }
    }

    private IesTilt ParseTilt()
    {
        int geometry = ReadCount("lamp-to-luminaire geometry of the TILT=INCLUDE table (1, 2 or 3)", 1, 3);
        int pairCount = ReadCount("number of tilt angles", 1, IesReader.MaximumAngleCount);
        ThrowIfErrors();
        int countLine = tokens[next - 1].Line;
        double[] angles = ReadTiltList(pairCount, "tilt angles", countLine);
        double[] factors = ReadTiltList(pairCount, "tilt multiplying factors", countLine);
        int anglesStart = next - (2 * pairCount);
        for (int k = 0; k < pairCount; k++)
        {
            IesToken t = tokens[anglesStart + k];
            if (angles[k] < 0 || angles[k] > 180)
            {
                AddError(t.Line, $"tilt angle {t.Text} is outside 0–180°");
            }
            else if (k > 0 && !(angles[k] > angles[k - 1]))
            {
                AddError(t.Line, $"tilt angles must increase: {t.Text} follows {tokens[anglesStart + k - 1].Text}");
            }

            if (factors[k] < 0)
            {
                AddError(tokens[anglesStart + pairCount + k].Line, $"tilt multiplying factor must be ≥ 0, got {tokens[anglesStart + pairCount + k].Text}");
            }
        }

        ThrowIfErrors();
        return new IesTilt(geometry, angles, factors);
    }

    // A tilt list must end at the end of a line (LM-63 writes each list on its own line(s)); otherwise the count is wrong.
    private double[] ReadTiltList(int count, string what, int countLine)
    {
        int start = next;
        double[] result = new double[count];
        for (int k = 0; k < count; k++)
        {
            result[k] = ReadNumber(what, out _);
        }

        ThrowIfErrors();
        int lastLine = tokens[next - 1].Line;
        if (next < tokens.Count && tokens[next].Line == lastLine)
        {
            int firstLine = tokens[start].Line;
            int found = 0;
            if (firstLine == lastLine)
            {
                for (int k = start; k < tokens.Count && tokens[k].Line == lastLine; k++)
                {
                    found++;
                }
            }
            else
            {
                for (int k = start; k < tokens.Count && tokens[k].Line < lastLine; k++)
                {
                    found++;
                }
            }

            throw Fail(firstLine, $"expected {count} {what} (declared on line {countLine}), found {found}");
        }

        return result;
    }

    private double[] ReadData(int verticalCount, int horizontalCount, int countLine)
    {
        long expected = verticalCount + (long)horizontalCount + ((long)verticalCount * horizontalCount);
        int start = next;
        long available = tokens.Count - start;
        int toParse = (int)Math.Min(available, expected);
        double[] data = new double[toParse];
        for (int k = 0; k < toParse; k++)
        {
            IesToken t = tokens[start + k];
            if (!TryParse(t.Text, out data[k]))
            {
                AddError(t.Line, $"'{Shorten(t.Text)}' is not a finite number");
            }
        }

        next = start + toParse;
        if (available != expected)
        {
            DiagnoseCount(verticalCount, horizontalCount, countLine, start, available, expected);
        }

        ThrowIfErrors();
        return data;
    }

    private void DiagnoseCount(int verticalCount, int horizontalCount, int countLine, int start, long available, long expected)
    {
        string where = $"declared on line {countLine}";

        // If only the vertical count is wrong, available = v + h + v·h has an integer solution v ≠ declared; confirm it by
        // the angle list ending there (the next number does not increase).
        if ((available - horizontalCount) % (1 + horizontalCount) == 0)
        {
            long v = (available - horizontalCount) / (1 + horizontalCount);
            if (v >= 1 && v != verticalCount && v <= IesReader.MaximumAngleCount && IncreasingRun(start, (int)v, mustEnd: true))
            {
                AddError(tokens[start].Line, $"expected {verticalCount} vertical angles ({where}), found {v}");
                return;
            }
        }

        if ((available - verticalCount) % (1 + verticalCount) == 0)
        {
            long h = (available - verticalCount) / (1 + verticalCount);
            int hStart = start + verticalCount;
            if (h >= 1 && h != horizontalCount && h <= IesReader.MaximumAngleCount && hStart < tokens.Count && IncreasingRun(hStart, (int)h, mustEnd: false))
            {
                AddError(tokens[hStart].Line, $"expected {horizontalCount} horizontal angles ({where}), found {h}");
                return;
            }
        }

        if (available < expected)
        {
            AddError(
                LastLine,
                $"the file ends early: expected {expected} numbers after the header ({verticalCount} vertical angles, {horizontalCount} horizontal angles and {verticalCount}×{horizontalCount} values, {where}), found {available}");
        }
        else
        {
            AddError(
                tokens[(int)(start + expected)].Line,
                $"{available - expected} more numbers than declared ({verticalCount} vertical angles, {horizontalCount} horizontal angles and {verticalCount}×{horizontalCount} values, {where}); the first extra one is here");
        }
    }

    // True when tokens[start..start+count) parse and strictly increase and, if mustEnd, the token after them (if any) does not.
    private bool IncreasingRun(int start, int count, bool mustEnd)
    {
        if (start + count > tokens.Count)
        {
            return false;
        }

        double previous = double.NegativeInfinity;
        for (int k = start; k < start + count; k++)
        {
            if (!TryParse(tokens[k].Text, out double x) || !(x > previous))
            {
                return false;
            }

            previous = x;
        }

        return !mustEnd || start + count >= tokens.Count || !TryParse(tokens[start + count].Text, out double after) || !(after > previous);
    }

    private void CheckAngles(IesPhotometricType type, double[] vertical, double[] horizontal, int start, int countLine)
    {
        int hStart = start + vertical.Length;
        bool increasing = CheckIncreasing(vertical, start, "vertical") & CheckIncreasing(horizontal, hStart, "horizontal");
        if (!increasing)
        {
            return;
        }

        int vLine = tokens[start].Line;
        int hLine = tokens[hStart].Line;
        double v0 = vertical[0];
        double v1 = vertical[^1];
        double h0 = horizontal[0];
        double h1 = horizontal[^1];
        if (type == IesPhotometricType.TypeC)
        {
            if (!(Is(v0, 0) || Is(v0, 90)) || !(Is(v1, 90) || Is(v1, 180)))
            {
                AddError(vLine, $"type C vertical angles must run from 0° or 90° to 90° or 180°, found {Fmt(v0)}° to {Fmt(v1)}°");
            }

            if (horizontal.Length == 1)
            {
                if (!Is(h0, 0))
                {
                    AddError(hLine, $"a single horizontal angle (axially symmetric file) must be 0°, found {Fmt(h0)}°");
                }
            }
            else if (!((Is(h0, 0) && (Is(h1, 90) || Is(h1, 180) || Is(h1, 360))) || (Is(h0, 90) && Is(h1, 270))))
            {
                AddError(
                    hLine,
                    $"type C horizontal angles must be 0 alone, 0–90°, 0–180°, 90–270° or 0–360°, found {Fmt(h0)}° to {Fmt(h1)}° (declared count on line {countLine})");
            }
        }
        else
        {
            string name = type == IesPhotometricType.TypeA ? "A" : "B";
            if (!(Is(v0, -90) || Is(v0, 0)) || !Is(v1, 90))
            {
                AddError(vLine, $"type {name} vertical angles must run from −90° or 0° to 90°, found {Fmt(v0)}° to {Fmt(v1)}°");
            }

            if (horizontal.Length < 2 || !(Is(h0, -90) || Is(h0, 0)) || !Is(h1, 90))
            {
                AddError(hLine, $"type {name} horizontal angles must run from −90° or 0° to 90°, found {Fmt(h0)}° to {Fmt(h1)}°");
            }
        }
    }

    private bool CheckIncreasing(double[] angles, int start, string what)
    {
        for (int k = 1; k < angles.Length; k++)
        {
            if (!(angles[k] - angles[k - 1] >= AngleTolerance))
            {
                AddError(tokens[start + k].Line, $"{what} angles must increase (by at least {AngleTolerance}°): {Fmt(angles[k])} follows {Fmt(angles[k - 1])}");
                return false;
            }
        }

        return true;
    }

    private void CheckValues(double[] data, int first, int tokenStart)
    {
        for (int k = first; k < data.Length; k++)
        {
            if (data[k] < 0)
            {
                AddError(tokens[tokenStart + (k - first)].Line, $"intensities must be ≥ 0, found {Fmt(data[k])}");
                if (errors.Count >= MaximumErrors)
                {
                    return;
                }
            }
        }
    }

    private static bool Is(double angle, double target) => Math.Abs(angle - target) <= AngleTolerance;

    private static string Fmt(double x) => x.ToString("0.######", CultureInfo.InvariantCulture);

    private static bool TryParse(string text, out double value) =>
        double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out value) && double.IsFinite(value);

    private double ReadNumber(string what, out IesToken token)
    {
        if (next >= tokens.Count)
        {
            ThrowIfErrors();
            throw Fail(LastLine, $"the file ends early: expected the {what}");
        }

        token = tokens[next++];
        if (!TryParse(token.Text, out double value))
        {
            AddError(token.Line, $"{what}: '{Shorten(token.Text)}' is not a finite number");
            return double.NaN;
        }

        return value;
    }

    private int ReadCount(string what, int min, int max)
    {
        double value = ReadNumber(what, out IesToken token);
        if (double.IsNaN(value))
        {
            return min;
        }

        if (value != Math.Floor(value) || value < min || value > max)
        {
            AddError(token.Line, $"{what} must be a whole number from {min} to {max:N0}, got {Shorten(token.Text)}");
            return min;
        }

        return (int)value;
    }

    private void AddError(int line, string message)
    {
        if (errors.Count < MaximumErrors)
        {
            errors.Add(new ValidationError($"{fileName}:{line}", message));
        }
    }

    private void ThrowIfErrors()
    {
        if (errors.Count > 0)
        {
            throw new InvalidInputException([.. errors]);
        }
    }

    private InvalidInputException Fail(int line, string message)
    {
        AddError(line, message);
        return new InvalidInputException([.. errors]);
    }
}

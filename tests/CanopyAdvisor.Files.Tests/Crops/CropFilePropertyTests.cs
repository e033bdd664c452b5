using System.Globalization;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Files.Crops;
using CsCheck;

namespace CanopyAdvisor.Files.Tests.Crops;

/// <summary>Bad input never crashes (DEVELOPERS.md, "Rules of the code"): any single mutation of a valid crop file
/// either loads or is rejected with <see cref="InvalidInputException"/>, never another exception.</summary>
public class CropFilePropertyTests
{
    private static readonly Gen<string> Junk = Gen.OneOf<string>(
        Gen.Double.Select(d => d.ToString("R", CultureInfo.InvariantCulture)),
        Gen.Int.Select(i => i.ToString(CultureInfo.InvariantCulture)),
        Gen.OneOf<string>("nan", "-nan", "inf", "-inf", "1e309", "-0.0", "\"\"", "\"x\"", "[]", "[1]", "[1, 2, 3]", "[nan, inf]", "{}", "true",
            "1979-05-27", "[", "]", "=", "\"", "'''", "0x1F", "1_000", "[[x]]", "[value]", "[balanceNumber]", "name = \"y\"", "base = \"test\"", "base = \"nothing\"",
            "group = \"herb\"", "value = 1", "unit = \"1\"", "range = [0, 1]", "source = \"demo\""),
        Gen.String[Gen.Char.AlphaNumeric, 0, 12],
        Gen.String);

    [Fact]
    public void Any_single_value_mutation_loads_or_is_rejected_cleanly()
    {
        // Replace the right-hand side of one line (a value, unit, range, source or header field).
        Gen.Select(Gen.Int[0, CropFileTemplate.Lines().Count - 1], Junk).Sample((line, value) =>
        {
            List<string> lines = CropFileTemplate.Lines();
            int eq = lines[line].IndexOf('=', StringComparison.Ordinal);
            lines[line] = eq < 0 ? value : lines[line][..(eq + 1)] + " " + value;
            LoadsOrIsRejected(lines);
        }, iter: 2000);
    }

    [Fact]
    public void Any_single_line_mutation_loads_or_is_rejected_cleanly()
    {
        Gen.Select(Gen.Int[0, CropFileTemplate.Lines().Count - 1], Junk).Sample((line, text) =>
        {
            List<string> lines = CropFileTemplate.Lines();
            lines[line] = text;
            LoadsOrIsRejected(lines);
        }, iter: 2000);
    }

    [Fact]
    public void Any_numeric_value_mutation_loads_or_is_rejected_cleanly()
    {
        var valueLines = Enumerable.Range(0, CropFileTemplate.Keys.Length).Select(i => 4 + (6 * i)).ToArray(); // 0-based index of each "value =" line
        Gen.Select(Gen.Int[0, valueLines.Length - 1], Gen.Double).Sample((i, d) =>
        {
            List<string> lines = CropFileTemplate.Lines();
            string text = double.IsNaN(d) ? "nan" : double.IsPositiveInfinity(d) ? "inf" : double.IsNegativeInfinity(d) ? "-inf" : d.ToString("R", CultureInfo.InvariantCulture);
            if (!text.Contains('.', StringComparison.Ordinal) && !text.Contains('E', StringComparison.Ordinal) && !text.Contains('n', StringComparison.Ordinal))
            {
                text += ".0";
            }

            lines[valueLines[i]] = "value = " + text.Replace("E", "e", StringComparison.Ordinal);
            LoadsOrIsRejected(lines);
        }, iter: 2000);
    }

    private static void LoadsOrIsRejected(List<string> lines)
    {
        CropSourceFile file = CropFileTemplate.File(CropFileTemplate.Path, CropFileTemplate.Text(lines));
        try
        {
            CropLibrary library = CropLibrary.Build([file, CropFileTemplate.File("crops/test-variant.toml", "name = \"v\"\nbase = \"test\"\n")], []);
            Assert.Equal(2, library.All.Count);
        }
        catch (InvalidInputException ex)
        {
            Assert.NotEmpty(ex.Errors);
        }
    }
}

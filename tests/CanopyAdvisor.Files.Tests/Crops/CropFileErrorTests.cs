using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Files.Crops;

namespace CanopyAdvisor.Files.Tests.Crops;

/// <summary>One bad file per rule of the crop-file schema (crops/README.md): each error names the file, line and field.
/// The expected messages are the schema's own rules, so the source of each case is the README section named.</summary>
public class CropFileErrorTests
{
    private static InvalidInputException LoadFails(params CropSourceFile[] files) =>
        Assert.Throws<InvalidInputException>(() => CropLibrary.Build(files, []));

    private static InvalidInputException LoadFailsWithLine(int line, string replacement)
    {
        List<string> lines = CropFileTemplate.Lines();
        lines[line - 1] = replacement;
        return LoadFails(CropFileTemplate.File(CropFileTemplate.Path, CropFileTemplate.Text(lines)));
    }

    [Fact]
    public void The_template_itself_loads()
    {
        CropLibrary library = CropLibrary.Build([CropFileTemplate.File(CropFileTemplate.Path, CropFileTemplate.Text())], []);
        Assert.Equal(3, library.Get("test").BalanceNumber.Value);
        Assert.Equal(5, CropFileTemplate.TableLine("balanceNumber") + 1);
    }

    [Theory]
    // README "Rules": value inside its range (the brief's own example message).
    [InlineData(5, "value = 15", "crops/test.toml:5", "balanceNumber.value: 15 is outside its range [2, 6]")]
    // README "Rules": range as [minimum, maximum] with minimum ≤ maximum.
    [InlineData(7, "range = [6, 2]", "crops/test.toml:7", "balanceNumber.range: minimum 6 is above maximum 2")]
    [InlineData(7, "range = [2]", "crops/test.toml:7", "balanceNumber.range: expected [minimum, maximum], found an array of 1")]
    [InlineData(7, "range = [2, \"6\"]", "crops/test.toml:7", "balanceNumber.range maximum: expected a number, found the string \"6\"")]
    // README "Rules": numbers, finite.
    [InlineData(5, "value = \"3.5\"", "crops/test.toml:5", "balanceNumber.value: expected a number, found the string \"3.5\"")]
    [InlineData(5, "value = nan", "crops/test.toml:5", "balanceNumber.value: NaN is not a finite number")]
    [InlineData(5, "value = inf", "crops/test.toml:5", "balanceNumber.value: Infinity is not a finite number")]
    // README "Units": fixed unit string per key.
    [InlineData(30, "unit = \"cm\"", "crops/test.toml:30", "growthZoneLengthMm.unit: 'cm' is not the unit of growthZoneLengthMm; write \"mm\"")]
    // README "Provenance": one of five forms.
    [InlineData(8, "source = \"a guess\"", "crops/test.toml:8", "balanceNumber.source: 'a guess' must start with")]
    [InlineData(8, "source = \"calibrated: site A\"", "crops/test.toml:8", "balanceNumber.source: 'calibrated: site A' must start with")]
    // README "Keys": unknown keys with a hint.
    [InlineData(5, "vaule = 3", "crops/test.toml:5", "balanceNumber: unknown field 'vaule'; did you mean 'value'?")]
    [InlineData(5, "vaule = 3", "crops/test.toml:4", "balanceNumber.value: missing")]
    [InlineData(4, "[balanceNumbr]", "crops/test.toml:4", "unknown parameter [balanceNumbr]; did you mean 'balanceNumber'?")]
    [InlineData(1, "nmae = \"Test crop\"", "crops/test.toml:1", "unknown key 'nmae'; did you mean 'name'?")]
    // README "Header": group is one of five.
    [InlineData(2, "group = \"shrub\"", "crops/test.toml:2", "group: 'shrub' is not a crop group")]
    [InlineData(2, "group = \"herbs\"", "crops/test.toml:2", "group: 'herbs' is not a crop group (one of beddingPlant, potPlant, herb, vegetableTransplant, microgreen); did you mean 'herb'?")]
    [InlineData(1, "name = \"\"", "crops/test.toml:1", "name: must not be empty")]
    [InlineData(1, "# no name", "crops/test.toml:1", "name: missing")]
    // README "Rules": malformed TOML with its line.
    [InlineData(5, "value = ", "crops/test.toml:5", "malformed TOML:")]
    [InlineData(4, "[balanceNumber", "crops/test.toml:4", "malformed TOML:")]
    // README "Rules", cross-field: base < optimum < maximum temperature.
    [InlineData(47, "value = 3", "crops/test.toml:47", "optimumTemperatureC.value: 3 is outside its range [21, 27]")]
    [InlineData(41, "value = 30", "crops/test.toml:41", "baseTemperatureC.value: 30 is outside its range [1, 7]")]
    [InlineData(43, "range = [1, 22]", "crops/test.toml:43", "baseTemperatureC.range: maximum 22 must be below the minimum of optimumTemperatureC.range (21)")]
    [InlineData(55, "range = [26, 39]", "crops/test.toml:49", "optimumTemperatureC.range: maximum 27 must be below the minimum of maximumTemperatureC.range (26)")]
    // README "Rules", cross-field: dliMinimum ≤ dliTarget (range ends against the other's value too).
    [InlineData(73, "range = [8, 12]", "crops/test.toml:73", "dliMinimum.range: maximum 12 must be at most the minimum of dliTarget.range (11)")]
    // README "Rules": nutationSense ±1.
    [InlineData(101, "value = 0.5", "crops/test.toml:101", "nutationSense.value: 0.5 must be 1 (counter-clockwise seen from above) or -1 (clockwise)")]
    [InlineData(103, "range = [0, 1]", "crops/test.toml:103", "nutationSense.range: must be [-1, 1], [1, 1] or [-1, -1]")]
    // README "Rules": physical limits (growth zone > 0, lean limit below 90°).
    [InlineData(31, "range = [0, 40]", "crops/test.toml:31", "growthZoneLengthMm.range: [0, 40] must lie within > 0 and ≤ 1000")]
    [InlineData(121, "range = [10, 95]", "crops/test.toml:121", "leanGradeLimitDeg.range: [10, 95] must lie within > 0 and < 90")]
    public void One_rule_broken_gives_its_file_line_and_field(int line, string replacement, string path, string messageStart)
    {
        InvalidInputException ex = LoadFailsWithLine(line, replacement);
        Assert.Contains(ex.Errors, e => e.Path == path && e.Message.StartsWith(messageStart, StringComparison.Ordinal));
    }

    [Fact]
    public void Cross_field_temperature_order_is_checked_when_ranges_allow_it()
    {
        // Both values inside their own ranges, but optimum below base (README "Rules", cross-field).
        List<string> lines = CropFileTemplate.Lines();
        lines[40] = "value = 20";            // line 41: baseTemperatureC.value
        lines[42] = "range = [1, 22]";       // line 43
        lines[46] = "value = 18";            // line 47: optimumTemperatureC.value
        lines[48] = "range = [15, 27]";      // line 49
        InvalidInputException ex = LoadFails(CropFileTemplate.File(CropFileTemplate.Path, CropFileTemplate.Text(lines)));
        ValidationError e = Assert.Single(ex.Errors);
        Assert.Equal("crops/test.toml:47", e.Path);
        Assert.StartsWith("optimumTemperatureC.value: 18 must be above baseTemperatureC (20)", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Dli_minimum_above_target_is_an_error()
    {
        List<string> lines = CropFileTemplate.Lines();
        lines[70] = "value = 14";            // line 71: dliMinimum.value
        lines[72] = "range = [8, 16]";       // line 73
        InvalidInputException ex = LoadFails(CropFileTemplate.File(CropFileTemplate.Path, CropFileTemplate.Text(lines)));
        ValidationError e = Assert.Single(ex.Errors);
        Assert.Equal("crops/test.toml:77", e.Path);
        Assert.StartsWith("dliTarget.value: 12 must be at least dliMinimum (14)", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_missing_parameter_is_named()
    {
        List<string> lines = CropFileTemplate.Lines();
        int table = CropFileTemplate.TableLine("dliTarget");
        for (int i = table - 1; i < table + 4; i++)
        {
            lines[i] = "# removed";
        }

        InvalidInputException ex = LoadFails(CropFileTemplate.File(CropFileTemplate.Path, CropFileTemplate.Text(lines)));
        ValidationError e = Assert.Single(ex.Errors);
        Assert.Equal("crops/test.toml", e.Path);
        Assert.StartsWith("dliTarget: missing", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_parameter_written_as_a_plain_key_asks_for_a_table()
    {
        List<string> lines = CropFileTemplate.Lines();
        for (int i = 3; i < 8; i++)
        {
            lines[i] = "# removed";              // lines 4-8: the [balanceNumber] table
        }

        lines[2] = "balanceNumber = 3";          // line 3
        InvalidInputException ex = LoadFails(CropFileTemplate.File(CropFileTemplate.Path, CropFileTemplate.Text(lines)));
        Assert.Contains(ex.Errors, e => e.Path == "crops/test.toml:3" && e.Message.StartsWith("balanceNumber: write it as a table [balanceNumber]", StringComparison.Ordinal));
    }

    [Fact]
    public void A_bad_file_name_is_an_error()
    {
        InvalidInputException ex = LoadFails(CropFileTemplate.File("crops/Big Petunia.toml", CropFileTemplate.Text()));
        Assert.Contains(ex.Errors, e => e.Path == "crops/Big Petunia.toml" && e.Message.StartsWith("file name 'Big Petunia' is not a crop id", StringComparison.Ordinal));
    }

    [Fact]
    public void Every_error_in_every_file_is_reported_at_once()
    {
        List<string> first = CropFileTemplate.Lines();
        first[4] = "value = 15";                 // line 5: out of range
        first[29] = "unit = \"cm\"";             // line 30: wrong unit
        first[7] = "source = \"a guess\"";       // line 8: bad provenance
        first[100] = "value = 0.5";              // line 101: nutation sense
        List<string> second = CropFileTemplate.Lines();
        second[1] = "group = \"shrub\"";         // line 2: unknown group
        second[46] = "value = \"warm\"";         // line 47: not a number
        InvalidInputException ex = LoadFails(
            CropFileTemplate.File("crops/one.toml", CropFileTemplate.Text(first)),
            CropFileTemplate.File("crops/two.toml", CropFileTemplate.Text(second)),
            CropFileTemplate.File("crops/three.toml", "name = [\n"));   // malformed: Tomlyn reports lines 1 and 2
        string[] paths = ex.Errors.Select(e => e.Path).ToArray();
        string[] expected = ["crops/one.toml:5", "crops/one.toml:8", "crops/one.toml:30", "crops/one.toml:101", "crops/three.toml:1", "crops/three.toml:2", "crops/two.toml:2", "crops/two.toml:47"];
        Assert.Equal(expected.Order(StringComparer.Ordinal), paths.Order(StringComparer.Ordinal));
        Assert.StartsWith("8 problems:", ex.Message, StringComparison.Ordinal);
    }
}

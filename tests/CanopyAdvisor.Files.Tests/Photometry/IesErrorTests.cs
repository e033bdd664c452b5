using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Files.Photometry;

namespace CanopyAdvisor.Files.Tests.Photometry;

// Each case breaks one rule of the LM-63 layout (ANSI/IES LM-63-19 / LM-63-2002 field order and angle rules) and checks
// that the reader rejects it with the file:line of the problem.
public class IesErrorTests
{
    // Line numbers:             1                   2                   3                        4
    private const string Valid =
        "IESNA:LM-63-2002\n[TEST] demo data\n[MANUFAC] demo data\nTILT=NONE\n" +
        "1 -1 1 5 1 1 2 0 0 0\n" + // 5
        "1 1 100\n" + //                6
        "0 22.5 45 67.5 90\n" + //      7
        "0\n" + //                      8
        "100 90 70 40 0\n"; //          9

    private const string ValidTilt =
        "IESNA:LM-63-2002\n[TEST] demo data\nTILT=INCLUDE\n" +
        "1\n" + //                      4 geometry
        "3\n" + //                      5 count
        "0 45 90\n" + //                6 angles
        "1 0.9 0.8\n" + //              7 factors
        "1 -1 1 5 1 1 2 0 0 0\n" + //   8
        "1 1 100\n" + //                9
        "0 22.5 45 67.5 90\n" + //     10
        "0\n" + //                     11
        "100 90 70 40 0\n"; //         12

    [Fact]
    public void The_base_files_are_valid()
    {
        Assert.Equal(5, IesReader.Read(Valid, "lamp.ies", IesReadOptions.Photon).Grid.VerticalAnglesDeg.Count);
        Assert.Equal(3, IesReader.Read(ValidTilt, "lamp.ies", IesReadOptions.Photon).Tilt!.AnglesDeg.Count);
    }

    public static TheoryData<string, string, string, string> Cases => new()
    {
        // label, text, expected path, expected message fragment
        { "truncated file", Valid.Replace("100 90 70 40 0\n", string.Empty, StringComparison.Ordinal), "lamp.ies:8", "ends early" },
        { "truncated in the header", "IESNA:LM-63-2002\nTILT=NONE\n1 -1 1 5 1\n", "lamp.ies:3", "ends early" },
        { "fewer vertical angles than declared", Valid.Replace("1 -1 1 5 1", "1 -1 1 6 1", StringComparison.Ordinal), "lamp.ies:7", "expected 6 vertical angles (declared on line 5), found 5" },
        { "more vertical angles than declared", Valid.Replace("1 -1 1 5 1", "1 -1 1 4 1", StringComparison.Ordinal), "lamp.ies:7", "expected 4 vertical angles (declared on line 5), found 5" },
        { "fewer horizontal angles than declared", Valid.Replace("1 -1 1 5 1", "1 -1 1 5 2", StringComparison.Ordinal), "lamp.ies:8", "expected 2 horizontal angles (declared on line 5), found 1" },
        { "more values than declared", Valid + "5\n", "lamp.ies:10", "1 more numbers than declared" },
        { "non-numeric value", Valid.Replace("70 40", "7O 40", StringComparison.Ordinal), "lamp.ies:9", "'7O' is not a finite number" },
        { "NaN value", Valid.Replace("70 40", "NaN 40", StringComparison.Ordinal), "lamp.ies:9", "'NaN' is not a finite number" },
        { "infinite value", Valid.Replace("70 40", "1e999 40", StringComparison.Ordinal), "lamp.ies:9", "not a finite number" },
        { "non-monotonic vertical angles", Valid.Replace("0 22.5 45 67.5 90", "0 22.5 50 45 90", StringComparison.Ordinal), "lamp.ies:7", "vertical angles must increase" },
        { "vertical angle out of range", Valid.Replace("0 22.5 45 67.5 90", "0 22.5 45 67.5 95", StringComparison.Ordinal), "lamp.ies:7", "must run from 0° or 90° to 90° or 180°" },
        { "negative vertical start", Valid.Replace("0 22.5 45 67.5 90", "-90 -45 0 45 90", StringComparison.Ordinal), "lamp.ies:7", "must run from 0° or 90°" },
        { "horizontal range with no LM-63 meaning", Valid.Replace("1 -1 1 5 1", "1 -1 1 5 2", StringComparison.Ordinal).Replace("0\n100 90 70 40 0\n", "0 200\n100 90 70 40 0\n100 90 70 40 0\n", StringComparison.Ordinal), "lamp.ies:8", "0–90°, 0–180°, 90–270° or 0–360°" },
        { "single horizontal angle not 0", Valid.Replace("\n0\n", "\n45\n", StringComparison.Ordinal), "lamp.ies:8", "must be 0°" },
        { "negative intensity", Valid.Replace("70 40", "70 -40", StringComparison.Ordinal), "lamp.ies:9", "must be ≥ 0" },
        { "all intensities zero", Valid.Replace("100 90 70 40 0", "0 0 0 0 0", StringComparison.Ordinal), "lamp.ies:9", "every intensity is zero" },
        { "unknown photometric type", Valid.Replace("1 -1 1 5 1 1 2", "1 -1 1 5 1 4 2", StringComparison.Ordinal), "lamp.ies:5", "photometric type" },
        { "unknown units type", Valid.Replace("1 -1 1 5 1 1 2", "1 -1 1 5 1 1 3", StringComparison.Ordinal), "lamp.ies:5", "units type" },
        { "absurd vertical count", Valid.Replace("1 -1 1 5 1", "1 -1 1 1e9 1", StringComparison.Ordinal), "lamp.ies:5", "number of vertical angles must be a whole number from 2 to 10,000" },
        { "negative horizontal count", Valid.Replace("1 -1 1 5 1", "1 -1 1 5 -1", StringComparison.Ordinal), "lamp.ies:5", "number of horizontal angles" },
        { "fractional count", Valid.Replace("1 -1 1 5 1", "1 -1 1 5.5 1", StringComparison.Ordinal), "lamp.ies:5", "whole number" },
        { "too many values in all", Valid.Replace("1 -1 1 5 1", "1 -1 1 5000 5000", StringComparison.Ordinal), "lamp.ies:5", "more than the 1,000,000 accepted" },
        { "zero multiplier", Valid.Replace("1 -1 1 5", "1 -1 0 5", StringComparison.Ordinal), "lamp.ies:5", "candela multiplier must be > 0" },
        { "bad lumens per lamp", Valid.Replace("1 -1 1 5", "1 -2 1 5", StringComparison.Ordinal), "lamp.ies:5", "lumens per lamp" },
        { "zero ballast factor", Valid.Replace("1 1 100", "0 1 100", StringComparison.Ordinal), "lamp.ies:6", "ballast factor must be > 0" },
        { "negative watts", Valid.Replace("1 1 100", "1 1 -100", StringComparison.Ordinal), "lamp.ies:6", "input watts" },
        { "overflowing multiplier", Valid.Replace("1 -1 1 5", "1 -1 1e307 5", StringComparison.Ordinal).Replace("100 90", "1e300 90", StringComparison.Ordinal), "lamp.ies:5", "overflow" },
        { "no TILT line", Valid.Replace("TILT=NONE\n", string.Empty, StringComparison.Ordinal), "lamp.ies:8", "no TILT= line" },
        { "TILT refers to a file", Valid.Replace("TILT=NONE", "TILT=lamp.tlt", StringComparison.Ordinal), "lamp.ies:4", "separate tilt file" },
        { "empty TILT", Valid.Replace("TILT=NONE", "TILT=", StringComparison.Ordinal), "lamp.ies:4", "no value" },
        { "tilt geometry out of range", ValidTilt.Replace("\n1\n3\n", "\n4\n3\n", StringComparison.Ordinal), "lamp.ies:4", "lamp-to-luminaire geometry" },
        { "fewer tilt angles than declared", ValidTilt.Replace("0 45 90\n", "0 45\n", StringComparison.Ordinal).Replace("1 0.9 0.8\n", "1 0.9\n", StringComparison.Ordinal), "lamp.ies:6", "expected 3 tilt angles (declared on line 5), found 2" },
        { "more tilt angles than declared", ValidTilt.Replace("\n3\n", "\n2\n", StringComparison.Ordinal), "lamp.ies:6", "expected 2 tilt angles (declared on line 5), found 3" },
        { "tilt angles not increasing", ValidTilt.Replace("0 45 90", "0 90 45", StringComparison.Ordinal), "lamp.ies:6", "tilt angles must increase" },
        { "negative tilt factor", ValidTilt.Replace("1 0.9 0.8", "1 -0.9 0.8", StringComparison.Ordinal), "lamp.ies:7", "must be ≥ 0" },
        { "tilt count absurd", ValidTilt.Replace("\n3\n", "\n1e9\n", StringComparison.Ordinal), "lamp.ies:5", "number of tilt angles" },
        { "type B angles out of range", Valid.Replace("1 -1 1 5 1 1 2", "1 -1 1 5 2 2 2", StringComparison.Ordinal).Replace("0 22.5 45 67.5 90\n0\n100 90 70 40 0\n", "-45 0 45 67.5 90\n0 90\n100 90 70 40 0\n100 90 70 40 0\n", StringComparison.Ordinal), "lamp.ies:7", "type B vertical angles must run from −90° or 0° to 90°" },
    };

    [Theory]
    [MemberData(nameof(Cases))]
    public void Bad_files_are_rejected_with_the_line(string label, string text, string path, string fragment)
    {
        var e = Assert.Throws<InvalidInputException>(() => IesReader.Read(text, "lamp.ies", IesReadOptions.Photon));
        Assert.True(
            e.Errors.Any(x => x.Path == path && x.Message.Contains(fragment, StringComparison.Ordinal)),
            $"{label}: expected {path}: …{fragment}…, got:\n{e.Message}");
    }

    // The unit is never guessed (MODEL.md §3): the caller must choose, and lumen files need a factor > 0.
    public static TheoryData<string, IesReadOptions, string> BadOptions => new()
    {
        { "unit not chosen", new IesReadOptions(IesValueUnits.Unspecified), "options.units" },
        { "undefined unit", new IesReadOptions((IesValueUnits)7), "options.units" },
        { "lumen without factor", new IesReadOptions(IesValueUnits.Lumen), "options.micromolesPerLumen" },
        { "lumen with zero factor", IesReadOptions.Lumen(0), "options.micromolesPerLumen" },
        { "lumen with NaN factor", IesReadOptions.Lumen(double.NaN), "options.micromolesPerLumen" },
        { "photon with a factor", new IesReadOptions(IesValueUnits.Photon, 0.015), "options.micromolesPerLumen" },
    };

    [Theory]
    [MemberData(nameof(BadOptions))]
    public void Unit_choice_is_required(string label, IesReadOptions options, string path)
    {
        var e = Assert.Throws<InvalidInputException>(() => IesReader.Read(Valid, "lamp.ies", options));
        Assert.True(e.Errors.Any(x => x.Path == path), $"{label}: {e.Message}");
    }
}

namespace CanopyAdvisor.Files.Photometry;

/// <summary>Header fields for <see cref="IesWriter"/> (meanings as in ANSI/IES LM-63-19; defaults give a plain absolute-photometry file).</summary>
/// <remarks>
/// An LM-63-19 file should carry the keywords [TEST], [TESTLAB], [ISSUEDATE] and [MANUFAC]; the writer writes what it
/// is given and does not invent them. Values are written as given, so for a photon file they are µmol s⁻¹ sr⁻¹.
/// </remarks>
public sealed record IesWriteSettings
{
    /// <summary>The first line, e.g. <c>IES:LM-63-2019</c> or <c>IESNA:LM-63-2002</c>; empty writes none (LM-63-1986 style).</summary>
    public string FormatLine { get; init; } = "IES:LM-63-2019";

    /// <summary>Keyword lines, written in order as <c>[NAME] value</c> (a value with newlines continues on <c>[MORE]</c> lines).</summary>
    public IReadOnlyList<IesKeyword> Keywords { get; init; } = [];

    /// <summary>A tilt table to write as TILT=INCLUDE, or null for TILT=NONE.</summary>
    public IesTilt? Tilt { get; init; }

    /// <summary>Number of lamps.</summary>
    public int LampCount { get; init; } = 1;

    /// <summary>Lumens per lamp; −1 = absolute photometry.</summary>
    public double LumensPerLamp { get; init; } = -1;

    /// <summary>Candela multiplier.</summary>
    public double CandelaMultiplier { get; init; } = 1;

    /// <summary>Units type of the dimensions: 1 = feet, 2 = metres.</summary>
    public int UnitsType { get; init; } = 2;

    /// <summary>Luminous opening width in the file's units.</summary>
    public double Width { get; init; }

    /// <summary>Luminous opening length in the file's units.</summary>
    public double Length { get; init; }

    /// <summary>Luminous opening height in the file's units.</summary>
    public double Height { get; init; }

    /// <summary>Ballast factor.</summary>
    public double BallastFactor { get; init; } = 1;

    /// <summary>The "future use" / file generation type field.</summary>
    public double FutureUse { get; init; } = 1;

    /// <summary>Input watts.</summary>
    public double InputWatts { get; init; }
}

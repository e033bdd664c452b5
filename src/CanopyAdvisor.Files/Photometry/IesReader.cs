using CanopyAdvisor.Core.Validation;

namespace CanopyAdvisor.Files.Photometry;

/// <summary>Reads IES LM-63 photometric files (ANSI/IES LM-63-19, LM-63-2002, LM-63-1995, LM-63-1991 and LM-63-1986).</summary>
/// <remarks>
/// <para>
/// Layout (common to all editions): an optional format line (<c>IES:LM-63-2019</c>, <c>IESNA:LM-63-2002</c>,
/// <c>IESNA:LM-63-1995</c>, <c>IESNA91</c>; none in 1986), keyword lines <c>[KEYWORD] value</c>, a <c>TILT=</c> line
/// (NONE or INCLUDE; <c>TILT=&lt;file&gt;</c> is rejected because it refers to another file), then numbers separated by
/// spaces, commas or line breaks: number of lamps, lumens per lamp (−1 = absolute), candela multiplier, number of
/// vertical angles, number of horizontal angles, photometric type (1 = C, 2 = B, 3 = A), units type (1 = feet,
/// 2 = metres), width, length, height; ballast factor, future use, input watts; the vertical angles; the horizontal
/// angles; and the values, one block per horizontal angle listing every vertical angle.
/// </para>
/// <para>
/// Angle rules (LM-63-2002 §5 and LM-63-19, which require complete explorations). Type C: vertical angles start at 0° or
/// 90° and end at 90° or 180° (directions outside them get no light); horizontal angles are 0 alone (axially symmetric),
/// 0–90° (symmetric in each quadrant), 0–180° (symmetric about the 0–180° plane), 90–270° (symmetric about the 90–270°
/// plane) or 0–360°. Symmetric files are expanded to the full circle. Types A and B: vertical and horizontal angles
/// start at −90° or 0° (0 = the file gives one half, mirrored) and end at 90°.
/// </para>
/// <para>
/// Lamp frame. The lamp's optical axis (<c>polar</c> 0) is LM-63's photometric zero and its C = 0° reference is LM-63's
/// photometric horizontal, for every type. Type C: polar = V, around = H. Type B (planes share the horizontal axis
/// through C = ±90°): a direction at (H, V) is cos H (sin V R + cos V A) − sin H L, with A the axis, R the C = 0°
/// reference and L the C = 90° direction; H is counted clockwise (LM-63: clockwise for A and B, counter-clockwise for C),
/// so positive H goes toward C = 270°. Type A (vertical planes about the axis; the zero direction V = 0 is photometric
/// horizontal): cos V (cos H R − sin H L) − sin V A. Types A and B cover one hemisphere only (B: in front of the lamp;
/// A: the half toward the reference), the rest gets no light. They are resampled onto a type C grid (0.5°–2° steps,
/// finer for finer files) by bilinear interpolation in their own angles.
/// </para>
/// <para>
/// Errors: every problem is reported as <see cref="InvalidInputException"/> with paths <c>file:line</c>; the reader
/// never returns partly read data. Counts are capped (<see cref="MaximumAngleCount"/>, <see cref="MaximumValueCount"/>)
/// before anything is allocated from them.
/// </para>
/// </remarks>
public static class IesReader
{
    /// <summary>Largest number of vertical or horizontal angles (or tilt pairs) accepted.</summary>
    public const int MaximumAngleCount = 10_000;

    /// <summary>Largest number of intensity values (vertical × horizontal) accepted.</summary>
    public const int MaximumValueCount = 1_000_000;

    /// <summary>Largest file accepted, in characters.</summary>
    public const int MaximumFileLength = 64 * 1024 * 1024;

    /// <summary>Reads an IES file from text.</summary>
    /// <param name="text">The whole file.</param>
    /// <param name="fileName">Name used in error paths, e.g. <c>lamp.ies</c>.</param>
    /// <param name="options">The unit of the values (never guessed).</param>
    /// <exception cref="InvalidInputException">When the options or the file are invalid (paths <c>file:line</c>).</exception>
    public static IesPhotometry Read(string text, string fileName, IesReadOptions options)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(fileName);
        ArgumentNullException.ThrowIfNull(options);
        if (text.Length > MaximumFileLength)
        {
            throw new InvalidInputException(fileName, $"is larger than {MaximumFileLength / (1024 * 1024)} MB: not a photometric file");
        }

        return new IesParser(text, fileName, options).Parse();
    }

    /// <summary>Reads an IES file from a reader (read to the end, at most <see cref="MaximumFileLength"/> characters).</summary>
    /// <param name="reader">The source.</param>
    /// <param name="fileName">Name used in error paths.</param>
    /// <param name="options">The unit of the values (never guessed).</param>
    /// <exception cref="InvalidInputException">When the options or the file are invalid.</exception>
    public static IesPhotometry Read(TextReader reader, string fileName, IesReadOptions options)
    {
        ArgumentNullException.ThrowIfNull(reader);
        var text = new System.Text.StringBuilder();
        char[] buffer = new char[65536];
        int read;
        while ((read = reader.Read(buffer, 0, buffer.Length)) > 0)
        {
            text.Append(buffer, 0, read);
            if (text.Length > MaximumFileLength)
            {
                break;
            }
        }

        return Read(text.ToString(), fileName, options);
    }

    /// <summary>Reads an IES file from disk; error paths use the file's name (without its folder).</summary>
    /// <param name="path">Path of the file.</param>
    /// <param name="options">The unit of the values (never guessed).</param>
    /// <exception cref="InvalidInputException">When the file cannot be opened, or the options or the file are invalid.</exception>
    public static IesPhotometry ReadFile(string path, IesReadOptions options)
    {
        ArgumentNullException.ThrowIfNull(path);
        string name = Path.GetFileName(path);
        try
        {
            using var reader = new StreamReader(path, detectEncodingFromByteOrderMarks: true);
            return Read(reader, name, options);
        }
        catch (IOException e)
        {
            throw new InvalidInputException(name, $"cannot be read: {e.Message}");
        }
        catch (UnauthorizedAccessException e)
        {
            throw new InvalidInputException(name, $"cannot be read: {e.Message}");
        }
    }
}

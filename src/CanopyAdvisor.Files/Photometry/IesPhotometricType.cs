namespace CanopyAdvisor.Files.Photometry;

/// <summary>The goniometer coordinate system of an IES LM-63 file (its "photometric type" field).</summary>
/// <remarks>
/// Definitions from ANSI/IES LM-63-19 (and LM-63-2002 §3): in types A and C the measuring planes are vertical and share
/// a vertical axis; in type B they share a horizontal axis. "Photometric zero" is H = 0, V = 0 for types B and C and
/// H = 0, V = −90° for type A; "photometric horizontal" is H = 0, V = 90° for B and C and H = 0, V = 0 for A.
/// See <see cref="IesReader"/> for how each is placed in the lamp frame.
/// </remarks>
public enum IesPhotometricType
{
    /// <summary>Not a valid file value (the reader rejects anything but 1, 2 or 3).</summary>
    Unknown = 0,

    /// <summary>Type C (file value 1): polar axis vertical; the usual type for luminaires.</summary>
    TypeC = 1,

    /// <summary>Type B (file value 2): polar axis horizontal; used for floodlights.</summary>
    TypeB = 2,

    /// <summary>Type A (file value 3): vertical planes about a vertical axis, zero direction horizontal; automotive.</summary>
    TypeA = 3,
}

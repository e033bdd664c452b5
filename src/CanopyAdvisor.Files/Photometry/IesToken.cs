namespace CanopyAdvisor.Files.Photometry;

/// <summary>One whitespace- or comma-separated field of the numeric part of an IES file, with its 1-based line.</summary>
internal readonly record struct IesToken(string Text, int Line);

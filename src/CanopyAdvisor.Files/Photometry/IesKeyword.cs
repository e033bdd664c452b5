namespace CanopyAdvisor.Files.Photometry;

/// <summary>One keyword line of an IES LM-63 file, <c>[NAME] value</c>, with any <c>[MORE]</c> lines joined by newlines.</summary>
/// <param name="Name">The keyword without brackets, e.g. <c>TEST</c>, <c>MANUFAC</c>, <c>_USERKEY</c>.</param>
/// <param name="Value">The text after the keyword, trimmed.</param>
/// <param name="Line">1-based line number of the keyword line.</param>
public sealed record IesKeyword(string Name, string Value, int Line);

namespace CanopyAdvisor.Core.Validation;

/// <summary>One problem found in user input, located by a path in the input's own field names.</summary>
/// <param name="Path">Where the problem is, e.g. <c>benches[3].widthM</c> or <c>lamp.ies:14</c>.</param>
/// <param name="Message">What is wrong, e.g. <c>must be &gt; 0</c>.</param>
public sealed record ValidationError(string Path, string Message)
{
    /// <inheritdoc />
    public override string ToString() => $"{Path}: {Message}";
}

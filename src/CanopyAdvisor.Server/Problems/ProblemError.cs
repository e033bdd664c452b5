namespace CanopyAdvisor.Server.Problems;

/// <summary>One problem of a rejected request, in the <c>errors</c> member of its ProblemDetails (RFC 9457 §3.2 allows
/// extension members; the member names follow the RFC's own example: a location and a <c>detail</c>).</summary>
/// <param name="Path">Where: a field path in the request's own names (<c>benches[3].footprint.widthM</c>), or
/// <c>body</c> for the body as a whole.</param>
/// <param name="Detail">What is wrong.</param>
public sealed record ProblemError(string Path, string Detail);

using NodaTime;

namespace CanopyAdvisor.Files.Logs;

/// <summary>One row of a timestamped CSV log: where it is in the file, when, and its parsed readings.</summary>
internal sealed record TimestampedRow<T>(string Where, Instant Time, T Values);

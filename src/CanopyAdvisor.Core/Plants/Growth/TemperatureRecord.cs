using NodaTime;

namespace CanopyAdvisor.Core.Plants.Growth;

/// <summary>One reading of a temperature log.</summary>
/// <param name="Time">When the reading was taken.</param>
/// <param name="AirC">Air temperature, °C; null for a missing reading (blank in the file, or a rejected spike).</param>
public sealed record TemperatureRecord(Instant Time, double? AirC);

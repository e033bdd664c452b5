using System.Collections.Immutable;
using CanopyAdvisor.Core.Plants.Growth;

namespace CanopyAdvisor.Files.Temperature;

/// <summary>A temperature log as read: every row as a record (spikes and blanks as missing readings) and the spikes rejected.</summary>
/// <param name="Records">One record per data row, in file order; a rejected spike has a null value.</param>
/// <param name="Spikes">The rejected spikes (warnings), in file order.</param>
public sealed record TemperatureLog(ImmutableArray<TemperatureRecord> Records, ImmutableArray<TemperatureSpike> Spikes);

using System.Collections.Immutable;
using CanopyAdvisor.Core.Lamps;

namespace CanopyAdvisor.Core.Light;

/// <summary>Lamps that always switch together and shine the same spectrum at the same dimming, so their light is summed once.</summary>
/// <remarks>
/// A compiled light field stores one contribution per point and group, not per point and lamp, so a time step
/// costs points × groups. Lamps fall into the same group when their schedules, dimming and band fractions are
/// equal (record equality).
/// </remarks>
/// <param name="Schedule">The shared schedule.</param>
/// <param name="Dimming">The shared output fraction.</param>
/// <param name="Bands">The shared spectral make-up.</param>
/// <param name="LampIds">Ids of the member lamps, in site order.</param>
public sealed record LampGroup(LampSchedule Schedule, double Dimming, BandFractions Bands, ImmutableArray<string> LampIds);

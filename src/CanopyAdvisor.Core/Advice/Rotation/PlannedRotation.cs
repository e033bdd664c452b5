using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;
using NodaTime;

namespace CanopyAdvisor.Core.Advice.Rotation;

/// <summary>One turn of a bench's pots that a rotation policy plans: a task for the labour calendar.</summary>
/// <param name="LotId">The lot turned.</param>
/// <param name="BenchId">The bench it stands on.</param>
/// <param name="Pots">How many pots to turn (the lot's <see cref="Lot.Pots"/>).</param>
/// <param name="Angle">The turn, positive = clockwise from above.</param>
/// <param name="At">The nominal time of the turn (the policy's grid).</param>
/// <param name="Earliest">The window's start: the turn may be made from here …</param>
/// <param name="Latest">… to here; the plan was checked to hold with every turn made at this end, and with turns made
/// alternately at either end.</param>
public sealed record PlannedRotation(string LotId, string BenchId, int Pots, Angle Angle, Instant At, Instant Earliest, Instant Latest)
{
    /// <summary>The turn as a rotation record at its nominal time (for <c>ForecastRequest.PlannedRotations</c>).</summary>
    public RotationRecord ToRecord() => new(At, Angle);
}

using NodaTime;

namespace CanopyAdvisor.Core.Sky;

/// <summary>Gives the outside daylight at any instant: a clear-sky model scaled by daily clearness, or a measured log.</summary>
public interface IOutsideLightSource
{
    /// <summary>The outside light at an instant.</summary>
    OutsideLight At(Instant time);
}

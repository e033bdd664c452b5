namespace CanopyAdvisor.Core.Sky;

/// <summary>Whether the sun rises and sets on a local date (Reda &amp; Andreas 2004, appendix A.2, eq. A11).</summary>
public enum SunDayKind
{
    /// <summary>The sun crosses the rise/set altitude h0′ twice: sunrise and sunset exist.</summary>
    RisesAndSets,

    /// <summary>The sun stays above h0′ all day (midnight sun): no sunrise or sunset.</summary>
    PolarDay,

    /// <summary>The sun stays below h0′ all day: no sunrise or sunset.</summary>
    PolarNight,
}

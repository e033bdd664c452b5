namespace CanopyAdvisor.Core.Sky;

/// <summary>How sunrise, transit and sunset are found from the equations of the NREL SPA report's appendix A.2.</summary>
/// <remarks>
/// The report (Reda &amp; Andreas 2004, appendix A.2) counts the day from 0 h UT of the date, decides polar day or night
/// from the declination at 0 h, makes one correction step, and wraps event times into the local day. Two consequences:
/// far from Greenwich it returns, for a western site, the sunset of the previous local day (18:00 in UTC−7 is 01:00 UT of
/// the next UT day; the worked example's sunset 17:20:19 at Golden on 2003-10-17 is such a value, about 1.5 min off that
/// date's own sunset); and on days when the sun barely rises (78° N in mid-February: a 28-minute day) the declination at
/// 0 h can call the day polar night. <see cref="LocalDayIterated"/> keeps the report's equations but counts from local
/// midnight, decides polar day or night from the declination interpolated at transit, and repeats the correction step
/// until it moves the event by less than 0.01 s (at most 10 steps).
/// </remarks>
public enum SunTimesMethod
{
    /// <summary>Default: the events of the requested local date, iterated to convergence (see remarks).</summary>
    LocalDayIterated,

    /// <summary>Exactly the report's appendix A.2 and its reference C code (reproduces the worked example).</summary>
    ReportAppendixA2,
}

namespace CanopyAdvisor.Core.Sites;

/// <summary>Where a site's outside light comes from when no measured log is given.</summary>
/// <param name="LinkeTurbidity">Linke turbidity for the Ineichen–Perez clear sky (≈ 2–3 clean air, 4–6 hazy; Ineichen &amp; Perez 2002).</param>
/// <param name="DailyClearness">Fraction of clear-sky light reaching the ground each day, in (0, 1]; 1 = clear sky.</param>
public sealed record WeatherSettings(double LinkeTurbidity, double DailyClearness);

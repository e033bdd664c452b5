using System.Collections.Immutable;
using System.Globalization;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;
using NodaTime;

namespace CanopyAdvisor.Core.Sky;

/// <summary>
/// Outside light from a clear-sky model scaled by a daily clearness: GHI = Ineichen–Perez clear-sky GHI
/// (Ineichen &amp; Perez 2002) × the clearness of the local date, split into beam and diffuse by Erbs, Klein &amp; Duffie
/// (1982), converted to photons (Thimijan &amp; Heins 1983), with the sun's direction from the NREL SPA
/// (Reda &amp; Andreas 2004).
/// </summary>
/// <remarks>
/// Extraterrestrial irradiance: Spencer (1971) for the local date's day of year. The zenith angle is the apparent
/// (refraction-corrected) one for the refraction formula's standard atmosphere. With the sun at or below the horizon
/// the light is <see cref="OutsideLight.Dark"/>. Immutable and thread-safe.
/// </remarks>
public sealed class ClearSkyOutsideLight : IOutsideLightSource
{
    private readonly ImmutableDictionary<LocalDate, double> _clearnessByDate;

    /// <summary>Creates the source; every problem with the settings is reported at once.</summary>
    /// <param name="location">Site latitude, longitude and elevation.</param>
    /// <param name="zone">The site's time zone: clearness is per local date.</param>
    /// <param name="settings">Linke turbidity (&gt; 0) and the default daily clearness, in (0, 1].</param>
    /// <param name="clearnessByDate">Optional clearness for particular local dates, each in (0, 1].</param>
    /// <param name="deltaTSeconds">ΔT = TT − UT1 for the sun position, seconds.</param>
    /// <exception cref="InvalidInputException">A setting is out of range.</exception>
    public ClearSkyOutsideLight(
        GeoLocation location,
        DateTimeZone zone,
        WeatherSettings settings,
        IReadOnlyDictionary<LocalDate, double>? clearnessByDate = null,
        double deltaTSeconds = ModelConstants.DefaultDeltaTSeconds)
    {
        ArgumentNullException.ThrowIfNull(location);
        ArgumentNullException.ThrowIfNull(zone);
        ArgumentNullException.ThrowIfNull(settings);
        var errors = new List<ValidationError>();
        SolarPosition.AddLocationErrors(errors, location);
        if (!(settings.LinkeTurbidity > 0 && settings.LinkeTurbidity <= 10))
        {
            errors.Add(new ValidationError("weather.linkeTurbidity", "must be in (0, 10]"));
        }

        if (!IsClearness(settings.DailyClearness))
        {
            errors.Add(new ValidationError("weather.dailyClearness", "must be in (0, 1]"));
        }

        foreach (var (date, clearness) in clearnessByDate ?? ImmutableDictionary<LocalDate, double>.Empty)
        {
            if (!IsClearness(clearness))
            {
                string key = date.ToString("uuuu-MM-dd", CultureInfo.InvariantCulture);
                errors.Add(new ValidationError($"weather.clearnessByDate[{key}]", "must be in (0, 1]"));
            }
        }

        if (!(Math.Abs(deltaTSeconds) <= 8000))
        {
            errors.Add(new ValidationError("deltaTSeconds", "must be in [-8000, 8000]"));
        }

        if (errors.Count > 0)
        {
            throw new InvalidInputException(errors);
        }

        Location = location;
        Zone = zone;
        Settings = settings;
        DeltaTSeconds = deltaTSeconds;
        _clearnessByDate = (clearnessByDate ?? ImmutableDictionary<LocalDate, double>.Empty).ToImmutableDictionary();
    }

    /// <summary>The site.</summary>
    public GeoLocation Location { get; }

    /// <summary>The site's time zone.</summary>
    public DateTimeZone Zone { get; }

    /// <summary>Linke turbidity and default daily clearness.</summary>
    public WeatherSettings Settings { get; }

    /// <summary>ΔT used for the sun position, seconds.</summary>
    public double DeltaTSeconds { get; }

    /// <summary>The clearness for a local date: its override if given, else the default.</summary>
    public double ClearnessOn(LocalDate date) =>
        _clearnessByDate.TryGetValue(date, out double clearness) ? clearness : Settings.DailyClearness;

    /// <inheritdoc />
    public OutsideLight At(Instant time)
    {
        Vector3 sun = SolarPosition.SunDirection(time, Location, DeltaTSeconds);
        Angle zenith = Direction.Zenith(sun);
        if (zenith.Degrees >= 90.0)
        {
            return OutsideLight.Dark(time, sun);
        }

        LocalDate date = time.InZone(Zone).Date;
        double extraterrestrial = ExtraterrestrialIrradiance.Spencer(date.DayOfYear);
        SolarIrradiance clear = IneichenPerezClearSky.Calculate(zenith, Settings.LinkeTurbidity, Location.ElevationM, extraterrestrial);
        double global = clear.GlobalHorizontalWm2 * ClearnessOn(date);
        DiffuseSplit split = ErbsDecomposition.Split(global, zenith, extraterrestrial);
        return SunlightPhotons.ToOutsideLight(time, sun, split.Irradiance);
    }

    private static bool IsClearness(double value) => value > 0 && value <= 1;
}

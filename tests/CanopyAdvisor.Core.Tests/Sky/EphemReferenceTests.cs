using System.Globalization;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using NodaTime;
using NodaTime.Text;

namespace CanopyAdvisor.Core.Tests.Sky;

/// <summary>
/// SPA against PyEphem 4.1.4 (Debian python3-ephem; tests/reference/make_sun_positions.py): six sites from 78° N to
/// 70° S, one day a month in 2026, eight times a day, including polar day and polar night. Both sides use ephem's
/// own ΔT (stored per row).
/// </summary>
public class EphemReferenceTests
{
    private static double D(string s) => double.Parse(s, CultureInfo.InvariantCulture);

    public static TheoryData<string, string> PositionRows()
    {
        var data = new TheoryData<string, string>();
        foreach (string[] r in ReferenceTable.Rows("sun_positions.csv"))
        {
            data.Add(r[0], string.Join(',', r));
        }

        return data;
    }

    // MODEL.md §1.1 asks for 0.01°; the largest difference seen is 0.00013° in zenith and 0.0004° in azimuth, so the test
    // holds SPA to 0.001°. Compared without refraction on both sides (ephem pressure = 0; SPA e0), so every row is
    // compared, below the horizon too: the refraction models differ, the geometry must not.
    // Azimuth is compared as the angle between horizontal directions scaled by sin(zenith), since azimuth is
    // ill-defined as the sun nears the zenith.
    [Theory]
    [MemberData(nameof(PositionRows))]
    public void TopocentricPosition_AgreesWithEphem(string site, string row)
    {
        string[] r = row.Split(',');
        var location = new GeoLocation(Angle.FromDegrees(D(r[1])), Angle.FromDegrees(D(r[2])), D(r[3]));
        Instant time = InstantPattern.General.Parse(r[4]).Value;
        var result = SolarPosition.Calculate(new SolarPositionInput(time, location) { DeltaTSeconds = D(r[5]) });
        double zenith = D(r[6]);
        double azimuth = D(r[7]);

        Assert.True(
            Math.Abs(result.ZenithWithoutRefraction.Degrees - zenith) <= 0.001,
            $"{site} {r[4]}: zenith SPA {result.ZenithWithoutRefraction.Degrees:F6} vs ephem {zenith:F6}");
        double azimuthDifference = Math.Abs(SpaAlgorithm.LimitDegrees180PlusMinus(result.Azimuth.Degrees - azimuth));
        Assert.True(
            azimuthDifference * Math.Sin(zenith * Math.PI / 180.0) <= 0.001,
            $"{site} {r[4]}: azimuth SPA {result.Azimuth.Degrees:F6} vs ephem {azimuth:F6}");
    }

    // With refraction at 1010 mbar and 10 °C on both sides (SPA's defaults): compared where the sun is above the
    // horizon only, since below −0.83° SPA stops refracting (report eq. 42 switch) and ephem does not. The two
    // refraction formulas (SPA's Bennett form, libastro's own) differ by at most 0.004° there (seen: near the horizon),
    // so the 0.01° tolerance of MODEL.md §1.1 applies.
    [Theory]
    [MemberData(nameof(RowsAboveHorizon))]
    public void RefractedZenith_AgreesWithEphemAboveHorizon(string site, string row)
    {
        string[] r = row.Split(',');
        var location = new GeoLocation(Angle.FromDegrees(D(r[1])), Angle.FromDegrees(D(r[2])), D(r[3]));
        Instant time = InstantPattern.General.Parse(r[4]).Value;
        var result = SolarPosition.Calculate(new SolarPositionInput(time, location)
        {
            DeltaTSeconds = D(r[5]),
            PressureMillibars = 1010,
            TemperatureCelsius = 10,
        });
        double refracted = D(r[8]);
        Assert.True(
            Math.Abs(result.Zenith.Degrees - refracted) <= 0.01,
            $"{site} {r[4]}: refracted zenith SPA {result.Zenith.Degrees:F6} vs ephem {refracted:F6}");
    }

    public static TheoryData<string, string> RowsAboveHorizon()
    {
        var data = new TheoryData<string, string>();
        foreach (string[] r in ReferenceTable.Rows("sun_positions.csv").Where(r => D(r[6]) < 90.0))
        {
            data.Add(r[0], string.Join(',', r));
        }

        return data;
    }

    public static TheoryData<string, string> TimeRows()
    {
        var data = new TheoryData<string, string>();
        foreach (string[] r in ReferenceTable.Rows("sun_times.csv"))
        {
            data.Add($"{r[0]} {r[5]}", string.Join(',', r));
        }

        return data;
    }

    // Sunrise and sunset for the sun's centre at −0.8333° geometric altitude on both sides. Tolerance 5 s on ordinary
    // days: SPA's appendix A.2 interpolates α and δ from three daily values and ignores parallax (8.8″ ≈ 1–2 s), ephem
    // iterates on topocentric positions; the largest difference seen is 3.6 s. On days shorter than 3 h the sun grazes
    // the horizon, 0.001° of altitude becomes seconds to a minute of time, and the tolerance is 60 s (largest seen 47 s,
    // 78° N on 15 February, a 28-minute day).
    [Theory]
    [MemberData(nameof(TimeRows))]
    public void SunriseAndSunset_AgreeWithEphem(string label, string row)
    {
        string[] r = row.Split(',');
        var location = new GeoLocation(Angle.FromDegrees(D(r[1])), Angle.FromDegrees(D(r[2])), D(r[3]));
        var zone = DateTimeZone.ForOffset(Offset.FromHours(int.Parse(r[4], CultureInfo.InvariantCulture)));
        LocalDate date = LocalDatePattern.Iso.Parse(r[5]).Value;
        SunTimes times = SolarPosition.CalculateSunTimes(new SunTimesInput(date, zone, location) { DeltaTSeconds = D(r[6]) });

        Assert.Equal(Enum.Parse<SunDayKind>(r[7]), times.Kind);
        if (times.Kind == SunDayKind.RisesAndSets)
        {
            double dayHours = times.SunsetHours!.Value - times.SunriseHours!.Value;
            double tolerance = dayHours < 3.0 ? 60.0 : 5.0;
            AssertWithin(label + " sunrise", r[8], times.SunriseHours!.Value, tolerance);
            AssertWithin(label + " sunset", r[9], times.SunsetHours!.Value, tolerance);
            Assert.Equal(date, times.Sunrise!.Value.Date);
            Assert.Equal(date, times.Sunset!.Value.Date);
        }
        else
        {
            Assert.Null(times.SunriseHours);
            Assert.Null(times.Sunset);
        }
    }

    private static void AssertWithin(string label, string expectedLocal, double actualHours, double seconds)
    {
        double expected = LocalTimePattern.ExtendedIso.Parse(expectedLocal).Value.TickOfDay / (double)NodaConstants.TicksPerSecond;
        double difference = (actualHours * 3600.0) - expected;
        Assert.True(Math.Abs(difference) <= seconds, $"{label}: SPA {actualHours:F5} h vs ephem {expectedLocal}: {difference:F1} s");
    }
}

using CanopyAdvisor.Core.Geometry;
using NodaTime;

namespace CanopyAdvisor.Core.Light;

/// <summary>The light on one bench over a period of local days: the days' values combined.</summary>
/// <remarks>
/// Means are weighted by each day's usable time, so a day with steps missing from a weather log counts for less,
/// and a period with no usable time has NaN means. Uniformity is over the points' mean DLI (lowest over mean), so
/// a point that is dark one day and bright the next is judged on its period mean, as a crop experiences it.
/// </remarks>
/// <param name="Days">Number of days combined.</param>
/// <param name="MeanHorizontalPpfd">Time-weighted mean horizontal PPFD, µmol m⁻² s⁻¹.</param>
/// <param name="MeanDli">Mean of the days' DLI, mol m⁻² d⁻¹.</param>
/// <param name="DliUniformity">Lowest point mean DLI over the mean point mean DLI, or null without light.</param>
/// <param name="MeanLightVector">Time-weighted mean light vector, µmol m⁻² s⁻¹.</param>
/// <param name="LightVectorTilt">Tilt of the mean light vector from the vertical.</param>
/// <param name="LightVectorAzimuth">Compass azimuth of the mean light vector's horizontal part.</param>
/// <param name="MeanBlueVector">Time-weighted mean blue light vector, µmol m⁻² s⁻¹.</param>
/// <param name="BlueVectorTilt">Tilt of the mean blue vector from the vertical.</param>
/// <param name="BlueVectorAzimuth">Compass azimuth of the mean blue vector's horizontal part.</param>
/// <param name="RedToFarRed">Photon-weighted R:FR over the period, or null without far-red light.</param>
public sealed record BenchPeriodLight(
    int Days,
    double MeanHorizontalPpfd,
    double MeanDli,
    double? DliUniformity,
    Vector3 MeanLightVector,
    Angle LightVectorTilt,
    Angle LightVectorAzimuth,
    Vector3 MeanBlueVector,
    Angle BlueVectorTilt,
    Angle BlueVectorAzimuth,
    double? RedToFarRed)
{
    /// <summary>Combines one bench's days (all of the same bench, each with the same points).</summary>
    public static BenchPeriodLight From(IReadOnlyList<BenchDayLight> days)
    {
        ArgumentNullException.ThrowIfNull(days);
        if (days.Count == 0)
        {
            throw new ArgumentException("at least one day is needed", nameof(days));
        }

        double usableSeconds = 0, ppfdSeconds = 0, dliSum = 0, red = 0, farRed = 0;
        Vector3 light = Vector3.Zero, blue = Vector3.Zero;
        int pointCount = days[0].Points.Length;
        var pointDli = new double[pointCount];
        foreach (BenchDayLight d in days)
        {
            double seconds = UsableSeconds(d);
            usableSeconds += seconds;
            ppfdSeconds += d.MeanHorizontalPpfd * seconds;
            light += d.MeanLightVector * seconds;
            blue += d.MeanBlueVector * seconds;
            dliSum += d.Dli;
            red += d.Red660Integral;
            farRed += d.FarRed730Integral;
            for (int p = 0; p < pointCount; p++)
            {
                pointDli[p] += d.Points[p].Dli;
            }
        }

        Vector3 meanLight = usableSeconds > 0 ? light / usableSeconds : new Vector3(double.NaN, double.NaN, double.NaN);
        Vector3 meanBlue = usableSeconds > 0 ? blue / usableSeconds : new Vector3(double.NaN, double.NaN, double.NaN);
        double meanPointDli = pointDli.Average();
        return new BenchPeriodLight(
            days.Count,
            usableSeconds > 0 ? ppfdSeconds / usableSeconds : double.NaN,
            dliSum / days.Count,
            meanPointDli > 0 ? pointDli.Min() / meanPointDli : null,
            meanLight,
            Direction.Zenith(meanLight),
            Direction.Azimuth(meanLight),
            meanBlue,
            Direction.Zenith(meanBlue),
            Direction.Azimuth(meanBlue),
            farRed > 0 ? red / farRed : null);
    }

    private static double UsableSeconds(BenchDayLight d) =>
        d.Steps == 0 ? 0 : d.DayLength.TotalSeconds * (d.Steps - d.MissingSteps) / d.Steps;
}

using System.Globalization;
using System.Text;
using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Core.Plants.Growth;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using CanopyAdvisor.Files.Crops;
using CanopyAdvisor.Files.Sites;
using NodaTime;
using NodaTime.Text;

namespace CanopyAdvisor.Files.Tests.Observations;

/// <summary>Makes the glasshouse demo observations (invented demo data): the simulator's bench lean of the petunia lot
/// on south-1 with chosen parameters, plus seeded Gaussian noise. The embedded file must equal what this makes.</summary>
internal static class DemoObservationsGenerator
{
    public const double TrueM = 1.2;
    public const double TrueGamma = 1.1;
    public const double NoisePerPlant = 0.02;
    public const int Plants = 10;
    public const int Seed = 2026;

    private static readonly OffsetDateTimePattern Printed = OffsetDateTimePattern.CreateWithInvariantCulture("uuuu'-'MM'-'dd'T'HH':'mm':'sso<+HH:mm>");

    public static Site Site { get; } = DemoSites.Load("glasshouse", StandardBeamFactory.Instance);

    public static Lot Lot => Site.Lots.Single(l => l.BenchId == "south-1");

    /// <summary>11:00 and 15:00 local (edges of the 24-minute spin-up steps, so the lean track has a sample there) every other day from 14 November, and on 1 December.</summary>
    public static IEnumerable<Instant> Times()
    {
        DateTimeZone zone = Site.Zone;
        var days = new List<LocalDate>();
        for (LocalDate d = new(2026, 11, 14); d <= new LocalDate(2026, 11, 30); d = d.PlusDays(2))
        {
            days.Add(d);
        }

        days.Add(new LocalDate(2026, 12, 1));
        foreach (LocalDate d in days)
        {
            yield return d.At(new LocalTime(11, 0)).InZoneStrictly(zone).ToInstant();
            yield return d.At(new LocalTime(15, 0)).InZoneStrictly(zone).ToInstant();
        }
    }

    public static Instant Last => Times().Max();

    /// <summary>The request the calibrate command builds for the demo (clear sky × clearness, setpoints, defaults).</summary>
    public static ForecastRequest Request(Crop petunia) =>
        new(
            Site,
            new Dictionary<string, Crop> { [petunia.Id] = petunia },
            new ClearSkyOutsideLight(Site.Location, Site.Zone, Site.Weather),
            new SetpointTemperature(Site.Temperatures, Site.Location, Site.Zone),
            Last);

    public static string Generate()
    {
        Crop petunia = CropLibrary.LoadBuiltIn().Get("petunia");
        Crop truth = petunia.WithParameter("photoCoefficient", TrueM).WithParameter("proprioceptiveSensitivity", TrueGamma);
        Instant planted = Lot.PlantedOn.AtStartOfDayInZone(Site.Zone).ToInstant();
        ForecastRequest request = Request(petunia) with
        {
            Site = Site with { Lots = [Lot] },
            SpinUp = Last - planted,
            Horizon = Duration.FromHours(1),
            IncludeUncertainty = false,
        };
        var track = ForecastSession.Prepare(request).RunLot(Lot.Id, new LotScenario { Crop = truth }).LeanTrack;
        var random = new Random(Seed);
        double sigma = NoisePerPlant / Math.Sqrt(Plants);
        var text = new StringBuilder();
        text.Append("# DEMO DATA, invented: not measurements of real plants. Leans of the petunia lot on bench south-1 of the\n");
        text.Append("# glasshouse demo site, made by the CanopyAdvisor simulator with photoCoefficient (M) = 1.2 and\n");
        text.Append("# proprioceptiveSensitivity (gamma) = 1.1 (the other parameters as in crops/petunia.toml), clear sky x the\n");
        text.Append("# site's clearness and its temperature setpoints, plus Gaussian noise of 0.02/sqrt(10) on each lean-vector\n");
        text.Append("# component (seed 2026). Each row is the mean lean of 10 plants; height measured on 1 December only.\n");
        text.Append("benchId,at,tiltDeg,azimuthDeg,heightMm,plants\n");
        foreach (Instant at in Times())
        {
            LeanSample sample = track.Single(s => s.At == at);
            double east = (sample.Lean.Tilt.Sin() * sample.Lean.Azimuth.Sin()) + (sigma * Gaussian(random));
            double north = (sample.Lean.Tilt.Sin() * sample.Lean.Azimuth.Cos()) + (sigma * Gaussian(random));
            LeanReading noisy = LeanReading.FromLeanVector(east, north);
            string height = at.InZone(Site.Zone).Date == Lot.MeasuredOn ? "40" : string.Empty;
            text.Append(CultureInfo.InvariantCulture, $"south-1,{Printed.Format(at.InZone(Site.Zone).ToOffsetDateTime())},{noisy.Tilt.Degrees:0.00},{noisy.Azimuth.Degrees:0.0},{height},{Plants}\n");
        }

        return text.ToString();
    }

    // Box–Muller: a standard normal deviate from two uniforms.
    private static double Gaussian(Random random)
    {
        double u1 = 1.0 - random.NextDouble();
        double u2 = random.NextDouble();
        return Math.Sqrt(-2 * Math.Log(u1)) * Math.Cos(2 * Math.PI * u2);
    }
}

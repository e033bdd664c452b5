using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Light;
using CanopyAdvisor.Core.Plants.Growth;
using CanopyAdvisor.Core.Sky;
using NodaTime;

namespace CanopyAdvisor.Core.Forecast;

/// <summary>A step grid through the forecast start and what is the same for every bench in each step: outside light,
/// local time, air temperature and the day's DIF, evaluated once at each step's midpoint (midpoint rule).</summary>
/// <remarks>Built on one thread; read-only afterwards, so benches may be run in parallel on it.</remarks>
internal sealed class ForecastTimeline
{
    /// <summary>Builds a grid that has an edge at <paramref name="anchor"/>, steps of <paramref name="dtBefore"/> from at or
    /// before <paramref name="from"/> to the anchor and of <paramref name="dt"/> from the anchor to exactly
    /// <paramref name="to"/> (the last step shortened if needed).</summary>
    public ForecastTimeline(
        Instant from, Instant anchor, Instant to, Duration dtBefore, Duration dt, IOutsideLightSource outside,
        ITemperatureSource temperature, DateTimeZone zone)
    {
        long before = (long)Math.Ceiling((anchor - from).TotalTicks / (double)dtBefore.TotalTicks);
        before = Math.Max(0, before);
        Instant start = anchor - (dtBefore * before);
        var edges = new List<Instant>();
        for (Instant t = start; t < anchor; t += dtBefore)
        {
            edges.Add(t);
        }

        for (Instant t = anchor; t < to; t += dt)
        {
            edges.Add(t);
        }

        edges.Add(to);
        Edges = [.. edges];
        int n = Edges.Length - 1;
        AnchorEdge = (int)before;
        Hours = new double[n];
        Steps = new Duration[n];
        Outside = new OutsideLight[n];
        LocalTimes = new LocalTime[n];
        AirC = new double[n];
        DifK = new double[n];
        Day = new int[n];
        var dif = new Dictionary<LocalDate, double>();
        LocalDate firstDate = Edges[0].InZone(zone).Date;
        for (int s = 0; s < n; s++)
        {
            Instant middle = Edges[s] + ((Edges[s + 1] - Edges[s]) / 2);
            Steps[s] = Edges[s + 1] - Edges[s];
            Hours[s] = Steps[s].TotalHours;
            OutsideLight light = outside.At(middle);
            if (!CompiledLightField.IsUsable(light))
            {
                MissingLight++;
                light = OutsideLight.Dark(middle, new Vector3(0, 0, -1));
            }

            Outside[s] = light;
            ZonedDateTime local = middle.InZone(zone);
            LocalTimes[s] = local.TimeOfDay;
            Day[s] = Period.Between(firstDate, local.Date, PeriodUnits.Days).Days;
            double air = temperature.AirTemperatureC(middle);
            if (!double.IsFinite(air))
            {
                MissingTemperature++;
                air = double.NaN;
            }

            AirC[s] = air;
            if (!dif.TryGetValue(local.Date, out double d))
            {
                d = temperature.DayNightMeans(local.Date).DifKelvin;
                dif[local.Date] = d;
            }

            DifK[s] = double.IsFinite(d) ? d : 0;
        }
    }

    /// <summary>Step edges; step s runs from Edges[s] to Edges[s + 1].</summary>
    public Instant[] Edges { get; }

    /// <summary>The index of the edge at the anchor (the forecast start).</summary>
    public int AnchorEdge { get; }

    /// <summary>Number of steps.</summary>
    public int Count => Hours.Length;

    /// <summary>Length of each step, hours.</summary>
    public double[] Hours { get; }

    /// <summary>Length of each step.</summary>
    public Duration[] Steps { get; }

    /// <summary>Outside light at each step's midpoint (dark where the source had a gap).</summary>
    public OutsideLight[] Outside { get; }

    /// <summary>Local time of day at each step's midpoint.</summary>
    public LocalTime[] LocalTimes { get; }

    /// <summary>Air temperature at each step's midpoint, °C; NaN where missing.</summary>
    public double[] AirC { get; }

    /// <summary>DIF of the local date of each step's midpoint, K (0 where unknown).</summary>
    public double[] DifK { get; }

    /// <summary>Local day number of each step's midpoint, counted from the first step's date.</summary>
    public int[] Day { get; }

    /// <summary>Steps with missing outside light.</summary>
    public int MissingLight { get; }

    /// <summary>Steps with missing air temperature.</summary>
    public int MissingTemperature { get; }

    /// <summary>The index of the first edge at or after an instant (Count when none).</summary>
    public int FirstEdgeAtOrAfter(Instant t)
    {
        int i = Array.BinarySearch(Edges, t);
        return i >= 0 ? i : Math.Min(~i, Edges.Length - 1);
    }
}

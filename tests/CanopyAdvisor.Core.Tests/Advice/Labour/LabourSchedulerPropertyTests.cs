using System.Collections.Immutable;
using CanopyAdvisor.Core.Advice.Labour;
using CanopyAdvisor.Core.Geometry;
using CsCheck;
using NodaTime;

namespace CanopyAdvisor.Core.Tests.Advice.Labour;

/// <summary>
/// The scheduler's promises on generated calendars (CsCheck): every task placed or reported, each placed task within its
/// window, on a working day of its crew that is not a holiday, within the crew's working hours (computed here
/// independently with NodaTime's <see cref="DateTimeZone.AtLeniently"/>, the lenient rule of MODEL.md §0), a crew on one
/// task at a time; and levelling never worse than the naive earliest-first schedule. Windows are drawn around the 2027
/// spring change in Europe/Amsterdam and America/Chicago so daylight-saving days are crossed.
/// </summary>
public class LabourSchedulerPropertyTests
{
    private static readonly string[] Zones = ["Europe/Amsterdam", "America/Chicago", "Etc/UTC"];

    private static readonly Gen<Crew> GenCrew =
        Gen.Select(Gen.Int[1, 3], Gen.Int[1, 127], Gen.Int[0, 10], Gen.Int[0, 3], Gen.Int[1, 10], Gen.Int[0, 3])
            .Select((people, dayMask, startHour, startQuarter, hours, endQuarter) => new Crew(
                "c",
                "crew",
                people,
                [.. Enumerable.Range(0, 7).Where(d => (dayMask & (1 << d)) != 0).Select(d => (IsoDayOfWeek)(d + 1))],
                new LocalTime(startHour, startQuarter * 15),
                new LocalTime(Math.Min(23, startHour + hours), endQuarter * 15)));

    private static readonly Gen<Case> GenCase =
        Gen.Select(
            Gen.Int[0, Zones.Length - 1],
            GenCrew.Array[1, 3],
            Gen.Int[0, 14].Array[0, 2],
            Gen.Double[1, 6],
            Gen.Int[0, 15],
            Gen.Select(Gen.Int[10, 2000], Gen.Int[0, 14 * 24 * 60], Gen.Int[30, 5 * 24 * 60]).Array[1, 25])
        .Select((zone, crews, holidayOffsets, secondsPerPot, setUp, tasks) => MakeCase(zone, crews, holidayOffsets, secondsPerPot, setUp, tasks))
        .Where(c => c is not null)
        .Select(c => c!);

    [Fact]
    public void Every_placed_task_keeps_the_rules()
    {
        GenCase.Sample(c =>
        {
            LabourSchedule s = LabourScheduler.Schedule(c.Tasks, c.Settings, c.Zone);
            CheckRules(c, s);
        }, iter: 300);
    }

    [Fact]
    public void Levelling_is_never_worse_than_earliest_first()
    {
        GenCase.Sample(c =>
        {
            LabourSchedule levelled = LabourScheduler.Schedule(c.Tasks, c.Settings, c.Zone);
            LabourSchedule naive = LabourScheduler.ScheduleEarliestFirst(c.Tasks, c.Settings, c.Zone);
            CheckRules(c, naive);

            Assert.True(levelled.Unscheduled.Length <= naive.Unscheduled.Length);
            if (levelled.Unscheduled.Length == naive.Unscheduled.Length)
            {
                Assert.True(levelled.PeakDailyLabour <= naive.PeakDailyLabour, $"peak {levelled.PeakDailyLabour} > earliest-first {naive.PeakDailyLabour}");
            }
        }, iter: 300);
    }

    [Fact]
    public void The_same_input_gives_the_same_calendar()
    {
        GenCase.Sample(c =>
        {
            LabourSchedule a = LabourScheduler.Schedule(c.Tasks, c.Settings, c.Zone);
            LabourSchedule b = LabourScheduler.Schedule([.. c.Tasks], c.Settings, c.Zone);
            Assert.Equal(a.Scheduled.AsEnumerable(), b.Scheduled.AsEnumerable());
            Assert.Equal(a.Days.AsEnumerable(), b.Days.AsEnumerable());
            Assert.Equal(a.Unscheduled.Select(u => (u.Task.Id, u.Reason)), b.Unscheduled.Select(u => (u.Task.Id, u.Reason)));
        }, iter: 50);
    }

    [Fact]
    public void Levelling_spreads_a_pile_of_equal_tasks_evenly()
    {
        // n equal 50 min tasks with the same five-day window and one ample crew: the best peak is ceil(n / 5) tasks, which the
        // construction reaches (each task goes to the least-loaded day; by hand).
        Gen.Int[1, 40].Sample(n =>
        {
            LabourSettings settings = LabourCases.Settings(4, 10, LabourCases.Crew("a", 1, Crew.Weekdays, 6, 0, 22, 0));
            RotationTask[] tasks = [.. Enumerable.Range(0, n).Select(i => LabourCases.Task(
                $"t{i:00}", 600, settings, LabourCases.Amsterdam, LabourCases.At(2026, 12, 7), LabourCases.At(2026, 12, 11, 23, 0)))];

            LabourSchedule s = LabourScheduler.Schedule(tasks, settings, LabourCases.Amsterdam);

            Assert.Empty(s.Unscheduled);
            Assert.Equal(Duration.FromMinutes(50 * ((n + 4) / 5)), s.PeakDailyLabour);
        });
    }

    [Fact]
    public void With_one_shared_window_the_peak_keeps_Grahams_LPT_bound()
    {
        // Tasks sharing one window of m = 5 working days with room to spare are Graham's identical machines (the days)
        // and jobs (the tasks). The construction is his LPT rule, whose peak is at most (4/3 − 1/(3m)) × the optimum
        // (Graham 1969, SIAM J. Appl. Math. 17:416, Theorem 1); the optimum is found here by exhaustive search. The
        // improvement passes never raise the peak.
        DateTimeZone utc = DateTimeZoneProviders.Tzdb["Etc/UTC"];
        LabourSettings settings = LabourCases.Settings(4, 10, LabourCases.Crew("a", 1, Crew.Weekdays, 0, 0, 23, 59));
        Gen.Int[10, 3000].Array[1, 10].Sample(pots =>
        {
            RotationTask[] tasks = [.. pots.Select((p, i) => LabourCases.Task(
                $"t{i:00}", p, settings, utc, LabourCases.At(2026, 12, 7), LabourCases.At(2026, 12, 11, 23, 59)))];

            LabourSchedule s = LabourScheduler.Schedule(tasks, settings, utc);

            const int m = 5;
            double optimum = OptimalPeak([.. tasks.Select(t => t.Labour.TotalMinutes)], m);
            Assert.Empty(s.Unscheduled);
            Assert.True(s.PeakDailyLabour.TotalMinutes >= optimum - 1e-9);
            Assert.True(s.PeakDailyLabour.TotalMinutes <= ((4.0 / 3.0) - (1.0 / (3 * m))) * optimum + 1e-9, $"peak {s.PeakDailyLabour.TotalMinutes} min, optimum {optimum} min");
        });
    }

    /// <summary>The least possible largest load of jobs on m identical machines, by depth-first search (small cases only).</summary>
    private static double OptimalPeak(double[] jobs, int m)
    {
        double[] sorted = [.. jobs.OrderDescending()];
        var loads = new double[m];
        double best = double.PositiveInfinity;
        void Search(int j, double peak)
        {
            if (peak >= best)
            {
                return;
            }

            if (j == sorted.Length)
            {
                best = peak;
                return;
            }

            var seen = new HashSet<double>();
            for (int k = 0; k < m; k++)
            {
                // Machines with equal loads are interchangeable: try one of them.
                if (!seen.Add(loads[k]))
                {
                    continue;
                }

                loads[k] += sorted[j];
                Search(j + 1, Math.Max(peak, loads[k]));
                loads[k] -= sorted[j];
            }
        }

        Search(0, 0);
        return best;
    }

    private static void CheckRules(Case c, LabourSchedule s)
    {
        Assert.Equal(c.Tasks.Count, s.Scheduled.Length + s.Unscheduled.Length);
        Assert.Equal(c.Tasks.Select(t => t.Id).Order(StringComparer.Ordinal), s.Scheduled.Select(t => t.Task.Id).Concat(s.Unscheduled.Select(u => u.Task.Id)).Order(StringComparer.Ordinal));
        foreach (ScheduledTask t in s.Scheduled)
        {
            Crew crew = c.Settings.Crews.Single(x => x.Id == t.CrewId);
            Instant start = t.Start.ToInstant();
            Instant end = t.End.ToInstant();
            Assert.True(start >= t.Task.Earliest && end <= t.Task.Latest, $"{t.Task.Id} outside its window");
            Assert.True(crew.WorksOn(t.Date.DayOfWeek), $"{t.Task.Id} on a day off");
            Assert.DoesNotContain(t.Date, c.Settings.Holidays);
            Assert.True(start >= c.Zone.AtLeniently(t.Date.At(crew.Start)).ToInstant(), $"{t.Task.Id} before the crew starts");
            Assert.True(end <= c.Zone.AtLeniently(t.Date.At(crew.End)).ToInstant(), $"{t.Task.Id} after the crew stops");
            Assert.Equal(Math.Ceiling(Math.Round(t.Task.Labour.TotalMinutes / crew.People, 6)), t.CrewTime.TotalMinutes);
            Assert.Equal(0, t.Start.Second);
        }

        foreach (IGrouping<string, ScheduledTask> byCrew in s.Scheduled.GroupBy(t => t.CrewId))
        {
            ScheduledTask[] ordered = [.. byCrew.OrderBy(t => t.Start.ToInstant())];
            for (int i = 1; i < ordered.Length; i++)
            {
                Assert.True(ordered[i].Start.ToInstant() >= ordered[i - 1].End.ToInstant(), "a crew on two tasks at once");
            }
        }

        foreach (DailyLoad d in s.Days)
        {
            ScheduledTask[] on = [.. s.Scheduled.Where(t => t.CrewId == d.CrewId && t.Date == d.Date)];
            Assert.Equal(on.Length, d.Tasks);
            Assert.Equal(on.Aggregate(Duration.Zero, (sum, t) => sum + t.Task.Labour), d.Labour);
            Assert.True(d.Labour <= d.Capacity);
        }

        Assert.Equal(s.Scheduled.Length, s.Days.Sum(d => d.Tasks));
        Assert.Equal(s.Scheduled.Length, s.Weeks.Sum(w => w.Tasks));
    }

    private static Case? MakeCase(int zoneIndex, Crew[] crews, int[] holidayOffsets, double secondsPerPot, int setUp, (int Pots, int StartMinute, int LengthMinutes)[] tasks)
    {
        DateTimeZone zone = DateTimeZoneProviders.Tzdb[Zones[zoneIndex]];
        crews = [.. crews.Select((c, i) => c with { Id = $"c{i}", Name = $"crew {i}" })];
        if (crews.Any(c => c.End <= c.Start || c.WorkingDays.IsEmpty))
        {
            return null;
        }

        LocalDate first = new(2027, 3, 20);
        var settings = new LabourSettings(secondsPerPot, setUp, [.. crews], [.. holidayOffsets.Distinct().Select(o => first.PlusDays(o))]);
        Instant origin = zone.AtLeniently(first.AtMidnight()).ToInstant();
        RotationTask[] list = [.. tasks.Select((t, i) => RotationTask.Create(
            $"t{i:00}", "site", $"b{i}", $"lot{i}", Angle.FromDegrees(90), origin + Duration.FromMinutes(t.StartMinute),
            origin + Duration.FromMinutes(t.StartMinute + t.LengthMinutes), t.Pots, settings))];
        return new Case(zone, settings, list);
    }

    private sealed record Case(DateTimeZone Zone, LabourSettings Settings, IReadOnlyList<RotationTask> Tasks)
    {
        public override string ToString() =>
            $"{Zone.Id}; {Settings.SecondsPerPot:0.##} s/pot, {Settings.SetUpMinutesPerBench} min; crews: "
            + string.Join(" | ", Settings.Crews.Select(c => $"{c.People}p {string.Join(',', c.WorkingDays)} {c.Start}-{c.End}"))
            + "; tasks: " + string.Join(" | ", Tasks.Select(t => $"{t.Id} {t.Labour.TotalMinutes:0.#}min {t.Earliest}..{t.Latest}"));
    }
}

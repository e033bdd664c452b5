using System.Collections.Immutable;
using System.Globalization;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;
using NodaTime;
using NodaTime.Calendars;
using NodaTime.TimeZones;

namespace CanopyAdvisor.Core.Advice.Labour;

/// <summary>Places rotation tasks on crews' working time within their windows and levels the labour across days.</summary>
/// <remarks>
/// <para>
/// <b>Rules.</b> Each task is done in one go by one crew on one of its working days (not a site holiday, a day of the week
/// the crew works), within the crew's working hours and wholly within the task's window. A crew does one task at a time;
/// a task of labour <c>L</c> takes a crew of <c>n</c> people <c>L / n</c> of clock time, rounded up to a whole minute, and
/// starts on a whole minute. Working hours are local times in the site's zone, turned into instants day by day with the
/// lenient rules of MODEL.md §0: a time in a daylight-saving gap moves forward by the gap, an ambiguous time takes the
/// earlier instant (NodaTime <see cref="Resolvers.ReturnForwardShifted"/> and <see cref="Resolvers.ReturnEarlier"/>), so a
/// day's capacity is its real length. A task that fits nowhere is reported, with the reason and the least extra labour
/// on some day that would fit it (<see cref="UnscheduledTask"/>), never dropped silently.
/// </para>
/// <para>
/// <b>Levelling.</b> The load of a date is all crews' labour on it; the aim is a low peak and, below that, an even
/// spread. This is a heuristic (levelling with windows is NP-hard in general), in three steps:
/// (1) construction: tasks in order of fewest feasible crew-days first, then the longest first (Graham's LPT rule,
/// Graham 1969, SIAM J. Appl. Math. 17:416), then the earliest deadline, then id; each goes to the feasible crew-day whose
/// date has the least load so far (then the crew least used, earliest date, crew order), at the earliest free time there;
/// (2) improvement passes: each placed task, heaviest dates first, moves to another date whose load plus the task is
/// still below its present date's load, choosing the least-loaded such date. Such a move never raises the peak and
/// strictly lowers the sum of squared daily loads, so the passes end; tasks that did not fit are retried after each pass;
/// (3) the same passes also run from the naive earliest-first schedule (each task, by earliest window start, at the
/// earliest time any crew can do it), and the better of the two results is kept: fewer tasks left out, then the lower
/// peak, then the lower sum of squares, else the levelled one. So the result never leaves out more tasks than the
/// earliest-first schedule and, leaving out as many, never has a higher peak. Finally each crew-day's tasks are packed to
/// the start of the day in their order.
/// </para>
/// <para>Every tie is broken by dates, crew order in the settings and ordinal task ids: the result is deterministic. Pure and thread-safe.</para>
/// </remarks>
public static class LabourScheduler
{
    /// <summary>Most extra-labour options reported for a task that could not be placed, 3.</summary>
    public const int MaxExtraLabourOptions = 3;

    /// <summary>Most improvement passes per schedule, 100 (a bound; the passes normally stop far earlier).</summary>
    public const int MaxImprovementPasses = 100;

    private static readonly ZoneLocalMappingResolver Lenient =
        Resolvers.CreateMappingResolver(Resolvers.ReturnEarlier, Resolvers.ReturnForwardShifted);

    /// <summary>Schedules a site's rotation tasks with the site's labour settings and time zone.</summary>
    /// <param name="site">The site: its <see cref="Site.Labour"/>, <see cref="Site.Zone"/>, benches and lots.</param>
    /// <param name="tasks">The tasks; each of this site, on one of its benches with the lot on that bench.</param>
    /// <exception cref="InvalidInputException">A task or the labour settings are invalid; carries every problem.</exception>
    public static LabourSchedule Schedule(Site site, IReadOnlyList<RotationTask> tasks)
    {
        ArgumentNullException.ThrowIfNull(site);
        ArgumentNullException.ThrowIfNull(tasks);
        var errors = new List<ValidationError>(Check(tasks, site.Labour));
        for (int i = 0; i < tasks.Count; i++)
        {
            RotationTask? t = tasks[i];
            if (t is null)
            {
                continue;
            }

            string path = string.Create(CultureInfo.InvariantCulture, $"tasks[{i}]");
            if (!string.IsNullOrEmpty(t.SiteId) && !string.Equals(t.SiteId, site.Id, StringComparison.Ordinal))
            {
                errors.Add(new($"{path}.siteId", $"task of site '{t.SiteId}' given to site '{site.Id}'"));
            }

            if (!string.IsNullOrEmpty(t.BenchId) && !site.Benches.Any(b => string.Equals(b.Id, t.BenchId, StringComparison.Ordinal)))
            {
                errors.Add(new($"{path}.benchId", $"unknown bench '{t.BenchId}'"));
            }
            else if (!string.IsNullOrEmpty(t.LotId)
                && !site.Lots.Any(l => string.Equals(l.Id, t.LotId, StringComparison.Ordinal) && string.Equals(l.BenchId, t.BenchId, StringComparison.Ordinal)))
            {
                errors.Add(new($"{path}.lotId", $"no lot '{t.LotId}' on bench '{t.BenchId}'"));
            }
        }

        if (errors.Count > 0)
        {
            throw new InvalidInputException(errors);
        }

        return Run(tasks, site.Labour, site.Zone, levelled: true);
    }

    /// <summary>Schedules rotation tasks on the crews of the given labour settings, in the given time zone.</summary>
    /// <param name="tasks">The tasks (unique ids).</param>
    /// <param name="settings">Crews, holidays and times.</param>
    /// <param name="zone">The site's time zone, in which working hours and holidays are local.</param>
    /// <exception cref="InvalidInputException">A task or the settings are invalid; carries every problem.</exception>
    public static LabourSchedule Schedule(IReadOnlyList<RotationTask> tasks, LabourSettings settings, DateTimeZone zone)
    {
        ArgumentNullException.ThrowIfNull(tasks);
        ArgumentNullException.ThrowIfNull(settings);
        ArgumentNullException.ThrowIfNull(zone);
        List<ValidationError> errors = Check(tasks, settings);
        if (errors.Count > 0)
        {
            throw new InvalidInputException(errors);
        }

        return Run(tasks, settings, zone, levelled: true);
    }

    /// <summary>The naive baseline: each task, by earliest window start, at the earliest time any crew can do it; no levelling.</summary>
    /// <remarks>For comparison in tests; same rules and report as <see cref="Schedule(IReadOnlyList{RotationTask}, LabourSettings, DateTimeZone)"/>.</remarks>
    internal static LabourSchedule ScheduleEarliestFirst(IReadOnlyList<RotationTask> tasks, LabourSettings settings, DateTimeZone zone)
    {
        List<ValidationError> errors = Check(tasks, settings);
        if (errors.Count > 0)
        {
            throw new InvalidInputException(errors);
        }

        return Run(tasks, settings, zone, levelled: false);
    }

    private static List<ValidationError> Check(IReadOnlyList<RotationTask> tasks, LabourSettings settings) =>
        [.. LabourValidator.CheckSettings(settings, "labour"), .. LabourValidator.CheckTasks(tasks, "tasks")];

    private static LabourSchedule Run(IReadOnlyList<RotationTask> tasks, LabourSettings settings, DateTimeZone zone, bool levelled)
    {
        var calendar = new WorkCalendar(settings, zone);
        var problem = new Problem(tasks, calendar);
        Plan result;
        if (levelled)
        {
            Plan fromLevelled = problem.Construct(levelled: true);
            fromLevelled.Improve();
            Plan fromEarliest = problem.Construct(levelled: false);
            fromEarliest.Improve();
            result = fromEarliest.IsBetterThan(fromLevelled) ? fromEarliest : fromLevelled;
        }
        else
        {
            result = problem.Construct(levelled: false);
        }

        result.Compact();
        return result.Report();
    }

    private static Instant RoundUpToMinute(Instant instant)
    {
        long ticks = instant.ToUnixTimeTicks();
        long rest = ((ticks % NodaConstants.TicksPerMinute) + NodaConstants.TicksPerMinute) % NodaConstants.TicksPerMinute;
        return rest == 0 ? instant : Instant.FromUnixTimeTicks(ticks - rest + NodaConstants.TicksPerMinute);
    }

    private static Duration RoundUpToMinute(Duration duration)
    {
        long ticks = duration.BclCompatibleTicks;
        long minutes = (ticks + NodaConstants.TicksPerMinute - 1) / NodaConstants.TicksPerMinute;
        return Duration.FromMinutes(minutes);
    }

    private static Instant Max(Instant a, Instant b) => a > b ? a : b;

    private static Instant Min(Instant a, Instant b) => a < b ? a : b;

    /// <summary>The crews' working days as instants, made once per local date.</summary>
    private sealed class WorkCalendar(LabourSettings settings, DateTimeZone zone)
    {
        private readonly Dictionary<LocalDate, List<CrewDay>> byDate = [];

        public LabourSettings Settings { get; } = settings;

        public DateTimeZone Zone { get; } = zone;

        public IReadOnlyList<Crew> Crews => Settings.Crews;

        /// <summary>The working days of all crews on a date, in crew order; empty on a holiday.</summary>
        public List<CrewDay> On(LocalDate date)
        {
            if (byDate.TryGetValue(date, out List<CrewDay>? days))
            {
                return days;
            }

            days = [];
            if (!Settings.IsHoliday(date))
            {
                for (int c = 0; c < Crews.Count; c++)
                {
                    Crew crew = Crews[c];
                    if (!crew.WorksOn(date.DayOfWeek))
                    {
                        continue;
                    }

                    LocalDateTime from = date.At(crew.Start);
                    LocalDateTime to = date.At(crew.End);
                    Instant start = Zone.ResolveLocal(from, Lenient).ToInstant();
                    Instant end = Zone.ResolveLocal(to, Lenient).ToInstant();
                    bool clockChange = end - start != crew.ShiftLength || Zone.MapLocal(from).Count != 1 || Zone.MapLocal(to).Count != 1;

                    // Both times can land on the same instant or cross when a gap swallows one of them: then no working time.
                    if (end > start)
                    {
                        days.Add(new CrewDay(c, crew, date, start, end, clockChange));
                    }
                }
            }

            byDate[date] = days;
            return days;
        }

        public LocalDate DateOf(Instant instant) => instant.InZone(Zone).Date;
    }

    /// <summary>One crew's working day: its instants and nominal capacity.</summary>
    private sealed record CrewDay(int CrewIndex, Crew Crew, LocalDate Date, Instant Start, Instant End, bool ClockChange)
    {
        public Duration Capacity => (End - Start) * Crew.People;
    }

    /// <summary>The tasks with what is fixed about them: clock time per crew and the crew-days that could hold them.</summary>
    private sealed class Problem
    {
        public Problem(IReadOnlyList<RotationTask> tasks, WorkCalendar calendar)
        {
            Tasks = tasks;
            Calendar = calendar;
            CrewTime = new Duration[tasks.Count, calendar.Crews.Count];
            Candidates = new List<CrewDay>[tasks.Count];
            for (int t = 0; t < tasks.Count; t++)
            {
                for (int c = 0; c < calendar.Crews.Count; c++)
                {
                    CrewTime[t, c] = RoundUpToMinute(tasks[t].Labour / calendar.Crews[c].People);
                }

                Candidates[t] = [];
                foreach (CrewDay day in DaysInWindow(t))
                {
                    if (WindowPart(t, day) is (Instant lo, Instant hi) && hi - lo >= CrewTime[t, day.CrewIndex])
                    {
                        Candidates[t].Add(day);
                    }
                }
            }

            if (tasks.Count > 0)
            {
                FirstDate = tasks.Select(t => calendar.DateOf(t.Earliest)).Min();
                LastDate = tasks.Select(t => calendar.DateOf(t.Latest)).Max();
            }
        }

        public IReadOnlyList<RotationTask> Tasks { get; }

        public WorkCalendar Calendar { get; }

        /// <summary>Clock time of task t for crew c, whole minutes.</summary>
        public Duration[,] CrewTime { get; }

        /// <summary>Per task, the crew-days whose part within its window is long enough, by date then crew order.</summary>
        public List<CrewDay>[] Candidates { get; }

        public LocalDate FirstDate { get; }

        public LocalDate LastDate { get; }

        /// <summary>Every crew-day on a date the window touches, by date then crew order.</summary>
        public IEnumerable<CrewDay> DaysInWindow(int t)
        {
            LocalDate last = Calendar.DateOf(Tasks[t].Latest);
            for (LocalDate d = Calendar.DateOf(Tasks[t].Earliest); d <= last; d = d.PlusDays(1))
            {
                foreach (CrewDay day in Calendar.On(d))
                {
                    yield return day;
                }
            }
        }

        /// <summary>The part of a crew-day within a task's window, starting on a whole minute; null when none.</summary>
        public (Instant Lo, Instant Hi)? WindowPart(int t, CrewDay day)
        {
            Instant lo = RoundUpToMinute(Max(day.Start, Tasks[t].Earliest));
            Instant hi = Min(day.End, Tasks[t].Latest);
            return hi > lo ? (lo, hi) : null;
        }

        public Plan Construct(bool levelled)
        {
            var plan = new Plan(this);
            IEnumerable<int> order = levelled
                ? Enumerable.Range(0, Tasks.Count)
                    .OrderBy(t => Candidates[t].Count)
                    .ThenByDescending(t => Tasks[t].Labour)
                    .ThenBy(t => Tasks[t].Latest)
                    .ThenBy(t => Tasks[t].Id, StringComparer.Ordinal)
                : Enumerable.Range(0, Tasks.Count)
                    .OrderBy(t => Tasks[t].Earliest)
                    .ThenBy(t => Tasks[t].Id, StringComparer.Ordinal);
            plan.Order = [.. order];
            foreach (int t in plan.Order)
            {
                if (levelled)
                {
                    plan.PlaceOnLeastLoaded(t);
                }
                else
                {
                    plan.PlaceEarliest(t);
                }
            }

            return plan;
        }
    }

    /// <summary>A task placed on a crew-day.</summary>
    private sealed record Slot(int Task, Instant Start, Instant End);

    /// <summary>One schedule being built: slots per crew-day and the load per date.</summary>
    private sealed class Plan(Problem problem)
    {
        private readonly Dictionary<CrewDay, List<Slot>> slots = [];
        private readonly Dictionary<CrewDay, Duration> crewLoad = [];
        private readonly Dictionary<LocalDate, Duration> dateLoad = [];
        private readonly Dictionary<int, (CrewDay Day, Slot Slot)> placed = [];

        /// <summary>The construction order; unplaced tasks are retried in it.</summary>
        public List<int> Order { get; set; } = [];

        public bool PlaceOnLeastLoaded(int t)
        {
            foreach (CrewDay day in problem.Candidates[t]
                .OrderBy(d => LoadOn(d.Date))
                .ThenBy(d => Use(d))
                .ThenBy(d => d.Date)
                .ThenBy(d => d.CrewIndex))
            {
                if (Fit(t, day) is Instant start)
                {
                    Add(t, day, start);
                    return true;
                }
            }

            return false;
        }

        public bool PlaceEarliest(int t)
        {
            (CrewDay Day, Instant Start)? best = null;
            foreach (CrewDay day in problem.Candidates[t])
            {
                if (Fit(t, day) is Instant start && (best is null || start < best.Value.Start))
                {
                    best = (day, start);
                }
            }

            if (best is (CrewDay d, Instant s))
            {
                Add(t, d, s);
                return true;
            }

            return false;
        }

        /// <summary>Improvement passes (see the class remarks): moves that lower the sum of squared daily loads, and retries.</summary>
        public void Improve()
        {
            for (int pass = 0; pass < MaxImprovementPasses; pass++)
            {
                bool changed = false;
                List<int> movers = [.. placed.Keys
                    .OrderByDescending(t => LoadOn(placed[t].Day.Date))
                    .ThenByDescending(t => problem.Tasks[t].Labour)
                    .ThenBy(t => problem.Tasks[t].Id, StringComparer.Ordinal)];
                foreach (int t in movers)
                {
                    (CrewDay from, Slot slot) = placed[t];
                    Duration labour = problem.Tasks[t].Labour;
                    Duration fromLoad = LoadOn(from.Date);
                    foreach (CrewDay to in problem.Candidates[t]
                        .Where(d => d.Date != from.Date && LoadOn(d.Date) + labour < fromLoad)
                        .OrderBy(d => LoadOn(d.Date))
                        .ThenBy(d => Use(d))
                        .ThenBy(d => d.Date)
                        .ThenBy(d => d.CrewIndex))
                    {
                        if (Fit(t, to) is Instant start)
                        {
                            Remove(t);
                            Add(t, to, start);
                            changed = true;
                            break;
                        }
                    }
                }

                foreach (int t in Order.Where(t => !placed.ContainsKey(t)))
                {
                    changed |= PlaceOnLeastLoaded(t);
                }

                if (!changed)
                {
                    return;
                }
            }
        }

        /// <summary>Packs each crew-day's tasks toward the start of the day, in their order; no task moves later.</summary>
        public void Compact()
        {
            foreach (CrewDay day in slots.Keys.ToList())
            {
                List<Slot> daySlots = [.. slots[day]];
                foreach (Slot s in daySlots)
                {
                    Remove(s.Task);
                }

                foreach (Slot s in daySlots)
                {
                    // The task's old place is free (everything before it moved earlier or stayed), so it fits at or before it.
                    Instant start = Fit(s.Task, day) ?? s.Start;
                    Add(s.Task, day, start);
                }
            }
        }

        public bool IsBetterThan(Plan other)
        {
            int left = problem.Tasks.Count - placed.Count;
            int otherLeft = problem.Tasks.Count - other.placed.Count;
            if (left != otherLeft)
            {
                return left < otherLeft;
            }

            Duration peak = Peak();
            Duration otherPeak = other.Peak();
            if (peak != otherPeak)
            {
                return peak < otherPeak;
            }

            return SumOfSquares() < other.SumOfSquares();
        }

        public LabourSchedule Report()
        {
            DateTimeZone zone = problem.Calendar.Zone;
            ImmutableArray<ScheduledTask> scheduled = [.. placed
                .OrderBy(p => p.Value.Slot.Start)
                .ThenBy(p => p.Value.Day.CrewIndex)
                .ThenBy(p => problem.Tasks[p.Key].Id, StringComparer.Ordinal)
                .Select(p => new ScheduledTask(
                    problem.Tasks[p.Key],
                    p.Value.Day.Crew.Id,
                    p.Value.Slot.Start.InZone(zone),
                    p.Value.Slot.End.InZone(zone)))];
            ImmutableArray<UnscheduledTask> unscheduled = [.. Enumerable.Range(0, problem.Tasks.Count)
                .Where(t => !placed.ContainsKey(t))
                .Select(Explain)];

            var days = new List<DailyLoad>();
            if (problem.Tasks.Count > 0)
            {
                for (LocalDate d = problem.FirstDate; d <= problem.LastDate; d = d.PlusDays(1))
                {
                    foreach (CrewDay day in problem.Calendar.On(d))
                    {
                        int count = slots.TryGetValue(day, out List<Slot>? s) ? s.Count : 0;
                        days.Add(new DailyLoad(d, day.Crew.Id, crewLoad.GetValueOrDefault(day, Duration.Zero), day.Capacity, count, day.ClockChange));
                    }
                }
            }

            IWeekYearRule iso = WeekYearRules.Iso;
            var crewOrder = problem.Calendar.Crews.Select((c, i) => (c.Id, i)).ToDictionary(x => x.Id, x => x.i, StringComparer.Ordinal);
            ImmutableArray<WeeklyLoad> weeks = [.. days
                .GroupBy(d => (Year: iso.GetWeekYear(d.Date), Week: iso.GetWeekOfWeekYear(d.Date), d.CrewId))
                .OrderBy(g => g.Key.Year)
                .ThenBy(g => g.Key.Week)
                .ThenBy(g => crewOrder[g.Key.CrewId])
                .Select(g => new WeeklyLoad(
                    g.Key.Year,
                    g.Key.Week,
                    g.Key.CrewId,
                    g.Aggregate(Duration.Zero, (sum, d) => sum + d.Labour),
                    g.Aggregate(Duration.Zero, (sum, d) => sum + d.Capacity),
                    g.Sum(d => d.Tasks)))];
            return new LabourSchedule(zone, scheduled, unscheduled, [.. days], weeks);
        }

        /// <summary>Why a task did not fit, and the least extra labour on a day that would fit it.</summary>
        private UnscheduledTask Explain(int t)
        {
            RotationTask task = problem.Tasks[t];
            var options = new List<(ExtraLabour Extra, int CrewIndex)>();
            List<(CrewDay Day, Instant Lo, Instant Hi)> parts = [.. problem.DaysInWindow(t)
                .Select(d => (Day: d, Part: problem.WindowPart(t, d)))
                .Where(x => x.Part is not null)
                .Select(x => (x.Day, x.Part!.Value.Lo, x.Part!.Value.Hi))];
            UnscheduledReason reason;
            if (parts.Count == 0)
            {
                reason = UnscheduledReason.NoWorkingTimeInWindow;

                // Nobody works in the window: a whole extra shift on a day of the window (or the day it starts, when it is shorter).
                LocalDate last = problem.Calendar.DateOf(task.Latest);
                for (LocalDate d = problem.Calendar.DateOf(task.Earliest); d <= last && options.Count < MaxExtraLabourOptions; d = d.PlusDays(1))
                {
                    options.Add((new ExtraLabour(d, null, task.Labour), -1));
                }
            }
            else
            {
                bool anyLongEnough = problem.Candidates[t].Count > 0;
                reason = anyLongEnough ? UnscheduledReason.CrewsFullyBooked : UnscheduledReason.LongerThanWorkingTimeInWindow;
                foreach ((CrewDay day, Instant lo, Instant hi) in parts)
                {
                    Duration need = problem.CrewTime[t, day.CrewIndex];
                    Duration gap = anyLongEnough ? LongestFreeStretch(day, lo, hi) : hi - lo;
                    if (anyLongEnough && hi - lo < need)
                    {
                        continue;
                    }

                    Duration shortBy = need - gap;
                    if (shortBy > Duration.Zero)
                    {
                        options.Add((new ExtraLabour(day.Date, day.Crew.Id, RoundUpToMinute(shortBy * day.Crew.People)), day.CrewIndex));
                    }
                }
            }

            ImmutableArray<ExtraLabour> best = [.. options
                .OrderBy(o => o.Extra.Labour)
                .ThenBy(o => o.Extra.Date)
                .ThenBy(o => o.CrewIndex)
                .Take(MaxExtraLabourOptions)
                .Select(o => o.Extra)];
            return new UnscheduledTask(task, reason, best);
        }

        private Duration LongestFreeStretch(CrewDay day, Instant lo, Instant hi)
        {
            Duration longest = Duration.Zero;
            Instant cursor = lo;
            foreach (Slot s in slots.GetValueOrDefault(day, []))
            {
                if (s.End <= cursor)
                {
                    continue;
                }

                if (s.Start >= hi)
                {
                    break;
                }

                if (s.Start > cursor)
                {
                    longest = Duration.Max(longest, s.Start - cursor);
                }

                cursor = Max(cursor, s.End);
            }

            return hi > cursor ? Duration.Max(longest, hi - cursor) : longest;
        }

        /// <summary>The earliest start of task t on a crew-day, in a free stretch within its window; null when none.</summary>
        private Instant? Fit(int t, CrewDay day)
        {
            if (problem.WindowPart(t, day) is not (Instant lo, Instant hi))
            {
                return null;
            }

            Duration need = problem.CrewTime[t, day.CrewIndex];
            Instant cursor = lo;
            foreach (Slot s in slots.GetValueOrDefault(day, []))
            {
                if (s.End <= cursor)
                {
                    continue;
                }

                if (s.Start >= cursor + need)
                {
                    break;
                }

                cursor = RoundUpToMinute(s.End);
            }

            return cursor + need <= hi ? cursor : null;
        }

        private void Add(int t, CrewDay day, Instant start)
        {
            var slot = new Slot(t, start, start + problem.CrewTime[t, day.CrewIndex]);
            if (!slots.TryGetValue(day, out List<Slot>? list))
            {
                list = [];
                slots[day] = list;
            }

            int at = list.FindIndex(s => s.Start > start);
            list.Insert(at < 0 ? list.Count : at, slot);
            Duration labour = problem.Tasks[t].Labour;
            crewLoad[day] = crewLoad.GetValueOrDefault(day, Duration.Zero) + labour;
            dateLoad[day.Date] = LoadOn(day.Date) + labour;
            placed[t] = (day, slot);
        }

        private void Remove(int t)
        {
            (CrewDay day, Slot slot) = placed[t];
            slots[day].Remove(slot);
            Duration labour = problem.Tasks[t].Labour;
            crewLoad[day] -= labour;
            dateLoad[day.Date] -= labour;
            placed.Remove(t);
        }

        private Duration LoadOn(LocalDate date) => dateLoad.GetValueOrDefault(date, Duration.Zero);

        private double Use(CrewDay day) => crewLoad.GetValueOrDefault(day, Duration.Zero).TotalSeconds / day.Capacity.TotalSeconds;

        private Duration Peak() => dateLoad.Values.DefaultIfEmpty(Duration.Zero).Max();

        private double SumOfSquares() => dateLoad.Values.Sum(d => d.TotalMinutes * d.TotalMinutes);
    }
}

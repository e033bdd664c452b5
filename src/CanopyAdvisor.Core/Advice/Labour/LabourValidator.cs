using System.Globalization;
using CanopyAdvisor.Core.Validation;
using NodaTime;
using NodaTime.Text;

namespace CanopyAdvisor.Core.Advice.Labour;

/// <summary>Checks labour settings, crews and rotation tasks, reporting every problem with a path in the site file's names.</summary>
/// <remarks>
/// Paths follow the site file's <c>labour</c> section (<c>labour.crews[1].end</c>) and, for tasks, the caller's prefix
/// (<c>tasks[3].latest</c>). Pure and thread-safe.
/// </remarks>
public static class LabourValidator
{
    /// <summary>Largest hand time per pot accepted, 600 s (a guard against a bench's time entered per pot).</summary>
    public const double MaxSecondsPerPot = 600;

    /// <summary>Largest set-up time per bench accepted, 240 min.</summary>
    public const double MaxSetUpMinutesPerBench = 240;

    /// <summary>Most people in one crew, 100.</summary>
    public const int MaxPeople = 100;

    /// <summary>Longest task window accepted, 366 days (a rotation is due within days; a guard against wrong dates).</summary>
    public const int MaxWindowDays = 366;

    /// <summary>Most labour accepted for one task, 1,000 person-hours (a bench is turned in one go, on one day; a guard).</summary>
    public const int MaxTaskLabourHours = 1000;

    /// <summary>Earliest instant a task window may touch, 1900-01-01T00:00Z (a guard against unset dates).</summary>
    public static Instant EarliestAccepted { get; } = Instant.FromUtc(1900, 1, 1, 0, 0);

    /// <summary>Latest instant a task window may touch, 2200-01-01T00:00Z (a guard against unset dates).</summary>
    public static Instant LatestAccepted { get; } = Instant.FromUtc(2200, 1, 1, 0, 0);

    /// <summary>All the labour settings: times, crews (at least one, unique ids) and holidays (no repeats).</summary>
    /// <param name="settings">The settings.</param>
    /// <param name="path">Path of the settings, usually <c>labour</c>.</param>
    public static IReadOnlyList<ValidationError> CheckSettings(LabourSettings settings, string path)
    {
        ArgumentNullException.ThrowIfNull(settings);
        var errors = new List<ValidationError>(CheckTimes(settings, path));
        if (settings.Crews.IsDefaultOrEmpty)
        {
            errors.Add(new($"{path}.crews", "must list at least one crew"));
        }
        else
        {
            var seen = new Dictionary<string, int>(StringComparer.Ordinal);
            for (int i = 0; i < settings.Crews.Length; i++)
            {
                string crewPath = Item($"{path}.crews", i);
                Crew crew = settings.Crews[i];
                errors.AddRange(CheckCrew(crew, crewPath));
                if (!string.IsNullOrEmpty(crew?.Id))
                {
                    if (seen.TryGetValue(crew.Id, out int first))
                    {
                        errors.Add(new($"{crewPath}.id", $"duplicate crew id '{crew.Id}' (first used at {Item($"{path}.crews", first)})"));
                    }
                    else
                    {
                        seen[crew.Id] = i;
                    }
                }
            }
        }

        if (!settings.Holidays.IsDefault)
        {
            var days = new Dictionary<LocalDate, int>();
            for (int i = 0; i < settings.Holidays.Length; i++)
            {
                LocalDate day = settings.Holidays[i];
                if (days.TryGetValue(day, out int first))
                {
                    errors.Add(new(Item($"{path}.holidays", i), $"{IsoDate(day)} is listed twice (first at {Item($"{path}.holidays", first)})"));
                }
                else
                {
                    days[day] = i;
                }
            }
        }

        return errors;
    }

    /// <summary>The hand time per pot within (0, 600] s and the set-up time per bench within [0, 240] min.</summary>
    public static IReadOnlyList<ValidationError> CheckTimes(LabourSettings settings, string path)
    {
        ArgumentNullException.ThrowIfNull(settings);
        var errors = new List<ValidationError>();
        if (!(settings.SecondsPerPot > 0 && settings.SecondsPerPot <= MaxSecondsPerPot))
        {
            errors.Add(new($"{path}.secondsPerPot", $"must be within (0, {Format(MaxSecondsPerPot)}] s, got {Format(settings.SecondsPerPot)}"));
        }

        if (!(settings.SetUpMinutesPerBench >= 0 && settings.SetUpMinutesPerBench <= MaxSetUpMinutesPerBench))
        {
            errors.Add(new($"{path}.setUpMinutesPerBench", $"must be within [0, {Format(MaxSetUpMinutesPerBench)}] min, got {Format(settings.SetUpMinutesPerBench)}"));
        }

        return errors;
    }

    /// <summary>A crew: id and name not empty, 1–100 people, at least one working day and no repeats, end after start.</summary>
    public static IReadOnlyList<ValidationError> CheckCrew(Crew crew, string path)
    {
        var errors = new List<ValidationError>();
        if (crew is null)
        {
            errors.Add(new(path, "must not be null"));
            return errors;
        }

        if (string.IsNullOrWhiteSpace(crew.Id))
        {
            errors.Add(new($"{path}.id", "must not be empty"));
        }

        if (string.IsNullOrWhiteSpace(crew.Name))
        {
            errors.Add(new($"{path}.name", "must not be empty"));
        }

        if (crew.People is < 1 or > MaxPeople)
        {
            errors.Add(new($"{path}.people", $"must be within [1, {MaxPeople}], got {crew.People}"));
        }

        if (crew.WorkingDays.IsDefaultOrEmpty)
        {
            errors.Add(new($"{path}.days", "must name at least one working day"));
        }
        else
        {
            for (int i = 0; i < crew.WorkingDays.Length; i++)
            {
                IsoDayOfWeek day = crew.WorkingDays[i];
                if (day is < IsoDayOfWeek.Monday or > IsoDayOfWeek.Sunday)
                {
                    errors.Add(new(Item($"{path}.days", i), $"must be a day of the week, got {day}"));
                }
                else if (crew.WorkingDays.IndexOf(day) < i)
                {
                    errors.Add(new(Item($"{path}.days", i), $"{day} is listed twice"));
                }
            }
        }

        if (crew.End <= crew.Start)
        {
            errors.Add(new(
                $"{path}.end",
                $"must be after start ({IsoTime(crew.Start)}), got {IsoTime(crew.End)}; working hours do not run past midnight"));
        }

        return errors;
    }

    /// <summary>
    /// A task: ids not empty, the window within the years 1900–2199, its end not before its start and at most 366 days
    /// after it, at least one pot, labour within (0, 1000 h], an angle within (−360°, 360°) and not 0 (as for rotations
    /// done, site file reference).
    /// </summary>
    public static IReadOnlyList<ValidationError> CheckTask(RotationTask task, string path)
    {
        var errors = new List<ValidationError>();
        if (task is null)
        {
            errors.Add(new(path, "must not be null"));
            return errors;
        }

        if (string.IsNullOrWhiteSpace(task.Id))
        {
            errors.Add(new($"{path}.id", "must not be empty"));
        }

        if (string.IsNullOrWhiteSpace(task.SiteId))
        {
            errors.Add(new($"{path}.siteId", "must not be empty"));
        }

        if (string.IsNullOrWhiteSpace(task.BenchId))
        {
            errors.Add(new($"{path}.benchId", "must not be empty"));
        }

        if (string.IsNullOrWhiteSpace(task.LotId))
        {
            errors.Add(new($"{path}.lotId", "must not be empty"));
        }

        bool inRange = true;
        foreach ((string name, Instant at) in new[] { ("earliest", task.Earliest), ("latest", task.Latest) })
        {
            if (at < EarliestAccepted || at > LatestAccepted)
            {
                inRange = false;
                errors.Add(new($"{path}.{name}", $"must be within [1900-01-01, 2200-01-01] UTC, got {InstantPattern.General.Format(at)}"));
            }
        }

        if (task.Latest < task.Earliest)
        {
            errors.Add(new(
                $"{path}.latest",
                $"must not be before earliest ({InstantPattern.General.Format(task.Earliest)}), got {InstantPattern.General.Format(task.Latest)}"));
        }
        else if (inRange && task.Latest - task.Earliest > Duration.FromDays(MaxWindowDays))
        {
            errors.Add(new($"{path}.latest", $"the window must be at most {MaxWindowDays} days long, got {Format((task.Latest - task.Earliest).TotalDays)} days"));
        }

        if (task.Pots < 1)
        {
            errors.Add(new($"{path}.pots", $"must be ≥ 1, got {task.Pots}"));
        }

        if (task.Labour <= Duration.Zero || task.Labour > Duration.FromHours(MaxTaskLabourHours))
        {
            errors.Add(new(
                $"{path}.labour",
                $"must be > 0 and at most {MaxTaskLabourHours} h, got {task.Labour.TotalMinutes.ToString("0.###", CultureInfo.InvariantCulture)} min"));
        }

        double deg = task.Angle.Degrees;
        if (!(deg > -360 && deg < 360) || deg == 0)
        {
            errors.Add(new($"{path}.angleDeg", $"must be within (−360, 360) and not 0, got {Format(deg)}"));
        }

        return errors;
    }

    /// <summary>Every task (see <see cref="CheckTask"/>) and that their ids are unique; paths <c>{path}[i]</c>.</summary>
    public static IReadOnlyList<ValidationError> CheckTasks(IReadOnlyList<RotationTask> tasks, string path)
    {
        ArgumentNullException.ThrowIfNull(tasks);
        var errors = new List<ValidationError>();
        var seen = new Dictionary<string, int>(StringComparer.Ordinal);
        for (int i = 0; i < tasks.Count; i++)
        {
            errors.AddRange(CheckTask(tasks[i], Item(path, i)));
            string? id = tasks[i]?.Id;
            if (!string.IsNullOrEmpty(id))
            {
                if (seen.TryGetValue(id, out int first))
                {
                    errors.Add(new($"{Item(path, i)}.id", $"duplicate task id '{id}' (first used at {Item(path, first)})"));
                }
                else
                {
                    seen[id] = i;
                }
            }
        }

        return errors;
    }

    private static string Item(string path, int index) => string.Create(CultureInfo.InvariantCulture, $"{path}[{index}]");

    private static string IsoDate(LocalDate date) => LocalDatePattern.Iso.Format(date);

    private static string IsoTime(LocalTime time) => LocalTimePattern.CreateWithInvariantCulture("HH:mm").Format(time);

    private static string Format(double value) => value.ToString("0.####", CultureInfo.InvariantCulture);
}

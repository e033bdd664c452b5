using System.Collections.Immutable;
using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;
using NodaTime;
using NodaTime.Calendars;

namespace CanopyAdvisor.Reports.Outlook;

/// <summary>The weekly lean outlook of a site (GLOSSARY "outlook"): benches ranked by risk with their forecast, daily
/// DLI and rotation advice, and the change against an earlier outlook. Written by <see cref="OutlookPage"/> (HTML),
/// <see cref="OutlookCsv"/> and <see cref="OutlookSnapshotJson"/>.</summary>
/// <param name="Site">The site.</param>
/// <param name="Now">The start of the week.</param>
/// <param name="WeekEnd">The end of the week (the forecast's horizon end).</param>
/// <param name="WeekLabel">The ISO week (ISO 8601 week-numbering year and week) of the start's local date, e.g. <c>2026-W49</c>.</param>
/// <param name="Days">The local dates the week touches, first to last (DLI chart columns).</param>
/// <param name="Benches">The benches with a lot, in rank order (<see cref="OutlookRanking"/>).</param>
/// <param name="RotationHoursThisWeek">Rotation labour planned for the site this week, hours, or null when not planned.</param>
/// <param name="Change">The change against the previous outlook, or null when there is none to compare with.</param>
/// <param name="Notes">Lines for the notes section.</param>
/// <param name="MissingLightSteps">Forecast steps without outside light (from the forecast).</param>
/// <param name="MissingTemperatureSteps">Forecast steps without air temperature (from the forecast).</param>
public sealed record OutlookReport(
    Site Site,
    Instant Now,
    Instant WeekEnd,
    string WeekLabel,
    ImmutableArray<LocalDate> Days,
    ImmutableArray<OutlookBench> Benches,
    double? RotationHoursThisWeek,
    OutlookChange? Change,
    ImmutableArray<string> Notes,
    int MissingLightSteps,
    int MissingTemperatureSteps)
{
    /// <summary>Ranks the benches, attaches DLI and advice, and compares with the previous outlook when given.</summary>
    /// <param name="input">The site, forecast, crops, daily DLI, advice and previous outlook.</param>
    /// <exception cref="InvalidInputException">Advice or DLI name benches that are not forecast, repeat a bench or day,
    /// or carry negative or non-finite numbers; a crop is missing; the previous outlook is of another site. Every
    /// problem is listed with its path.</exception>
    public static OutlookReport Build(OutlookInput input)
    {
        ArgumentNullException.ThrowIfNull(input);
        Site site = input.Site;
        SiteForecast forecast = input.Forecast;
        var errors = new List<ValidationError>();
        var forecastIds = forecast.Benches.Select(b => b.BenchId).ToHashSet(StringComparer.Ordinal);
        var siteIds = site.Benches.Select(b => b.Id).ToHashSet(StringComparer.Ordinal);
        foreach (BenchForecast b in forecast.Benches)
        {
            if (!siteIds.Contains(b.BenchId))
            {
                errors.Add(new ValidationError("forecast.benches", $"bench '{b.BenchId}' is not a bench of site '{site.Id}'"));
            }

            if (!input.Crops.ContainsKey(b.CropId))
            {
                errors.Add(new ValidationError("crops", $"no crop '{b.CropId}' (bench '{b.BenchId}')"));
            }
        }

        Dictionary<string, BenchAdviceSummary> advice = CheckAdvice(input, forecastIds, errors);
        ImmutableArray<LocalDate> days = WeekDays(forecast.Now, forecast.HorizonEnd, site.Zone);
        Dictionary<(string, LocalDate), double> dli = CheckDli(input.DailyDli, siteIds, errors);
        if (input.RotationHoursThisWeek is double hours && !(double.IsFinite(hours) && hours >= 0))
        {
            errors.Add(new ValidationError("rotationHoursThisWeek", "must be a finite number of hours ≥ 0"));
        }

        if (input.Previous is OutlookSnapshot previous && previous.SiteId != site.Id)
        {
            errors.Add(new ValidationError("previous.siteId", $"the previous outlook is of site '{previous.SiteId}', not '{site.Id}'"));
        }

        if (errors.Count > 0)
        {
            throw new InvalidInputException(errors);
        }

        var lots = site.Lots.IsDefault ? [] : site.Lots.ToDictionary(l => l.Id, StringComparer.Ordinal);
        IReadOnlyList<BenchForecast> ranked = OutlookRanking.Rank(forecast.Benches);
        var benches = ImmutableArray.CreateBuilder<OutlookBench>(ranked.Count);
        for (int i = 0; i < ranked.Count; i++)
        {
            BenchForecast f = ranked[i];
            Crop crop = input.Crops[f.CropId];
            LocalDate sale = lots.TryGetValue(f.LotId, out Lot? lot) ? lot.SaleOn : days[^1];
            ImmutableArray<double> daily = [.. days.Select(d => dli.TryGetValue((f.BenchId, d), out double v) ? v : double.NaN)];
            benches.Add(new OutlookBench(
                i + 1,
                OutlookRanking.RiskOf(f),
                f,
                crop.Name,
                sale,
                crop.DliTarget.Value,
                crop.DliMinimum.Value,
                daily,
                advice.GetValueOrDefault(f.BenchId)));
        }

        LocalDate first = forecast.Now.InZone(site.Zone).Date;
        string week = WeekLabelOf(first);
        var report = new OutlookReport(
            site,
            forecast.Now,
            forecast.HorizonEnd,
            week,
            days,
            benches.MoveToImmutable(),
            input.RotationHoursThisWeek,
            null,
            [.. input.Notes],
            forecast.MissingLightSteps,
            forecast.MissingTemperatureSteps);
        if (input.Previous is not OutlookSnapshot earlier)
        {
            return report;
        }

        OutlookChange change = OutlookComparison.Compare(OutlookSnapshot.From(report), earlier);
        var byBench = change.Benches.ToDictionary(c => c.BenchId, StringComparer.Ordinal);
        return report with
        {
            Change = change,
            Benches = [.. report.Benches.Select(b => b with { Change = byBench.GetValueOrDefault(b.BenchId) })],
        };
    }

    /// <summary>The ISO 8601 week of a date, e.g. <c>2026-W49</c> (week-numbering year, Monday-first weeks).</summary>
    public static string WeekLabelOf(LocalDate date)
    {
        IWeekYearRule rule = WeekYearRules.Iso;
        return Markup.Invariant($"{rule.GetWeekYear(date):0000}-W{rule.GetWeekOfWeekYear(date):00}");
    }

    /// <summary>The local dates from the start's date to the date of the last instant before the end.</summary>
    private static ImmutableArray<LocalDate> WeekDays(Instant now, Instant end, DateTimeZone zone)
    {
        LocalDate first = now.InZone(zone).Date;
        LocalDate last = end > now ? (end - Duration.Epsilon).InZone(zone).Date : first;
        var days = ImmutableArray.CreateBuilder<LocalDate>();
        for (LocalDate d = first; d <= last; d = d.PlusDays(1))
        {
            days.Add(d);
        }

        return days.ToImmutable();
    }

    private static Dictionary<string, BenchAdviceSummary> CheckAdvice(OutlookInput input, HashSet<string> forecastIds, List<ValidationError> errors)
    {
        var advice = new Dictionary<string, BenchAdviceSummary>(StringComparer.Ordinal);
        for (int i = 0; i < input.Advice.Count; i++)
        {
            string path = $"advice[{i}]";
            BenchAdviceSummary? a = input.Advice[i];
            if (a is null)
            {
                errors.Add(new ValidationError(path, "is required"));
                continue;
            }

            if (!forecastIds.Contains(a.BenchId ?? string.Empty))
            {
                errors.Add(new ValidationError($"{path}.benchId", $"'{a.BenchId}' is not a forecast bench"));
            }
            else if (!advice.TryAdd(a.BenchId!, a))
            {
                errors.Add(new ValidationError($"{path}.benchId", $"bench '{a.BenchId}' has advice twice"));
            }

            if (string.IsNullOrWhiteSpace(a.Recommendation))
            {
                errors.Add(new ValidationError($"{path}.recommendation", "is required"));
            }

            if (a.RotationsThisWeek < 0)
            {
                errors.Add(new ValidationError($"{path}.rotationsThisWeek", "must be ≥ 0"));
            }

            if (!(double.IsFinite(a.LabourHoursThisWeek) && a.LabourHoursThisWeek >= 0))
            {
                errors.Add(new ValidationError($"{path}.labourHoursThisWeek", "must be a finite number of hours ≥ 0"));
            }
        }

        return advice;
    }

    private static Dictionary<(string, LocalDate), double> CheckDli(IReadOnlyList<BenchDayDli> daily, HashSet<string> siteIds, List<ValidationError> errors)
    {
        var dli = new Dictionary<(string, LocalDate), double>();
        for (int i = 0; i < daily.Count; i++)
        {
            string path = $"dailyDli[{i}]";
            BenchDayDli? d = daily[i];
            if (d is null)
            {
                errors.Add(new ValidationError(path, "is required"));
                continue;
            }

            if (!siteIds.Contains(d.BenchId ?? string.Empty))
            {
                errors.Add(new ValidationError($"{path}.benchId", $"'{d.BenchId}' is not a bench of the site"));
            }
            else if (!dli.TryAdd((d.BenchId!, d.Date), d.DliMolPerM2Day))
            {
                errors.Add(new ValidationError($"{path}.date", $"bench '{d.BenchId}' has {d.Date:uuuu-MM-dd} twice"));
            }

            if (!(double.IsFinite(d.DliMolPerM2Day) && d.DliMolPerM2Day >= 0))
            {
                errors.Add(new ValidationError($"{path}.dliMolPerM2Day", "must be a finite number ≥ 0"));
            }
        }

        return dli;
    }
}

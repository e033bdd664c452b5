using System.Globalization;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Server.Contracts;
using CanopyAdvisor.Storage;
using NodaTime;
using NodaTime.Text;

namespace CanopyAdvisor.Server.Advice;

/// <summary>Checks observations and rotations done against the site before they are stored, with the rules of the CLI's
/// readers (<c>LeanObservationReader</c> for observations; a lot's <c>rotations</c> in <c>SiteValidator.CheckLot</c>),
/// except that "not in the future" is judged against the service's clock; every problem is collected.</summary>
internal static class GrowerRecordRules
{
    private static readonly IPattern<OffsetDateTime> TimePattern = new CompositePatternBuilder<OffsetDateTime>
    {
        { OffsetDateTimePattern.ExtendedIso, _ => true },
        { OffsetDateTimePattern.CreateWithInvariantCulture("uuuu'-'MM'-'dd'T'HH':'mmo<G>"), _ => false },
    }.Build();

    /// <summary>The observation to store, or every problem.</summary>
    /// <exception cref="InvalidInputException">Every problem with its path.</exception>
    public static ObservationRecord Observation(NewObservationRequest request, Site site, SiteRecord record, Instant now, string id, string userId)
    {
        var errors = new List<ValidationError>();
        Lot? lot = null;
        if (string.IsNullOrWhiteSpace(request.BenchId))
        {
            errors.Add(new("benchId", "missing"));
        }
        else if (!site.Benches.Any(b => b.Id == request.BenchId))
        {
            errors.Add(new("benchId", $"no bench '{request.BenchId}' in site '{site.Id}'"));
        }
        else if ((lot = site.Lots.FirstOrDefault(l => l.BenchId == request.BenchId)) is null)
        {
            errors.Add(new("benchId", $"bench '{request.BenchId}' carries no lot; observe a bench with plants on it"));
        }

        Instant? at = Time(request.At, "at", errors);
        if (at is Instant t)
        {
            if (t > now)
            {
                errors.Add(new("at", $"{Iso(t, site)} is in the future (now {Iso(now, site)})"));
            }

            if (lot is not null && t < lot.PlantedOn.AtStartOfDayInZone(site.Zone).ToInstant())
            {
                errors.Add(new("at", $"{Iso(t, site)} is before lot '{lot.Id}' was planted ({lot.PlantedOn:uuuu-MM-dd})"));
            }
        }

        Range(request.TiltDeg, "tiltDeg", 0, 90, errors);
        Range(request.AzimuthDeg, "azimuthDeg", 0, 360, errors);
        if (request.HeightMm is double h && !(double.IsFinite(h) && h > 0))
        {
            errors.Add(new("heightMm", string.Create(CultureInfo.InvariantCulture, $"must be more than 0, got {h}")));
        }

        if (request.Plants is int p && p < 1)
        {
            errors.Add(new("plants", string.Create(CultureInfo.InvariantCulture, $"must be a whole number of at least 1, got {p}")));
        }

        return errors.Count > 0
            ? throw new InvalidInputException(errors)
            : new ObservationRecord(id, record.OrganisationId, record.Id, request.BenchId, at!.Value, request.TiltDeg, request.AzimuthDeg, request.HeightMm, request.Plants ?? 1, now, userId);
    }

    /// <summary>The rotation done to store, or every problem.</summary>
    /// <exception cref="InvalidInputException">Every problem with its path.</exception>
    public static RotationDoneRecord Rotation(NewRotationDoneRequest request, Site site, SiteRecord record, Instant now, string id, string userId)
    {
        var errors = new List<ValidationError>();
        Lot? lot = null;
        if (request.LotId is null && request.BenchId is null)
        {
            errors.Add(new("lotId", "give the lot turned (lotId) or its bench (benchId)"));
        }

        if (request.LotId is not null && (lot = site.Lots.FirstOrDefault(l => l.Id == request.LotId)) is null)
        {
            errors.Add(new("lotId", $"no lot '{request.LotId}' in site '{site.Id}'"));
        }

        if (request.BenchId is not null)
        {
            Lot? onBench = site.Lots.FirstOrDefault(l => l.BenchId == request.BenchId);
            if (!site.Benches.Any(b => b.Id == request.BenchId))
            {
                errors.Add(new("benchId", $"no bench '{request.BenchId}' in site '{site.Id}'"));
            }
            else if (onBench is null)
            {
                errors.Add(new("benchId", $"bench '{request.BenchId}' carries no lot"));
            }
            else if (lot is not null && lot.Id != onBench.Id)
            {
                errors.Add(new("benchId", $"lot '{lot.Id}' stands on bench '{lot.BenchId}', not '{request.BenchId}'"));
            }
            else
            {
                lot ??= request.LotId is null ? onBench : null;
            }
        }

        Instant? at = Time(request.At, "at", errors);
        if (at is Instant t)
        {
            if (t > now)
            {
                errors.Add(new("at", $"{Iso(t, site)} is in the future (now {Iso(now, site)}); record only rotations already done"));
            }

            if (lot is not null)
            {
                Instant planted = lot.PlantedOn.AtStartOfDayInZone(site.Zone).ToInstant();
                Instant sold = lot.SaleOn.PlusDays(1).AtStartOfDayInZone(site.Zone).ToInstant();
                if (t < planted)
                {
                    errors.Add(new("at", $"{Iso(t, site)} is before lot '{lot.Id}' was planted ({lot.PlantedOn:uuuu-MM-dd})"));
                }
                else if (t >= sold)
                {
                    errors.Add(new("at", $"{Iso(t, site)} is after lot '{lot.Id}' was sold ({lot.SaleOn:uuuu-MM-dd})"));
                }
            }
        }

        double deg = request.AngleDeg;
        if (!(deg > -360 && deg < 360) || deg == 0)
        {
            errors.Add(new("angleDeg", string.Create(CultureInfo.InvariantCulture, $"must be within (−360, 360) and not 0, got {deg}")));
        }

        return errors.Count > 0
            ? throw new InvalidInputException(errors)
            : new RotationDoneRecord(id, record.OrganisationId, record.Id, lot!.Id, lot.BenchId, at!.Value, deg, now, userId);
    }

    private static Instant? Time(string text, string path, List<ValidationError> errors)
    {
        ParseResult<OffsetDateTime> parsed = TimePattern.Parse(text ?? "");
        if (parsed.Success)
        {
            return parsed.Value.ToInstant();
        }

        errors.Add(new(path, string.IsNullOrWhiteSpace(text) ? "missing" : "not an ISO-8601 date-time with UTC offset (e.g. 2026-11-30T10:00:00+01:00)"));
        return null;
    }

    private static void Range(double value, string path, double min, double max, List<ValidationError> errors)
    {
        if (!double.IsFinite(value) || value < min || value > max)
        {
            errors.Add(new(path, string.Create(CultureInfo.InvariantCulture, $"{value} is outside {min} to {max}")));
        }
    }

    private static string Iso(Instant t, Site site) =>
        OffsetDateTimePattern.ExtendedIso.Format(t.InZone(site.Zone).ToOffsetDateTime());
}

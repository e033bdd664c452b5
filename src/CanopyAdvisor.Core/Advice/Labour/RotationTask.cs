using System.Globalization;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Validation;
using NodaTime;

namespace CanopyAdvisor.Core.Advice.Labour;

/// <summary>One rotation in the calendar: turn the pots of a lot on a bench by an angle, some time within a window.</summary>
/// <remarks>
/// <para>
/// This is the seam between the rotation policy (which decides which bench to turn, by how much and by when) and the
/// labour scheduler (which decides who turns it and at what time). <see cref="Id"/> must stay the same when the same
/// rotation is planned again with other times, so exports update the same calendar entry instead of adding a new one;
/// <see cref="IdFor"/> gives such an id from the lot and the rotation's number in the lot's plan.
/// </para>
/// <para>
/// The window is closed: the whole task, start to end, lies within [<see cref="Earliest"/>, <see cref="Latest"/>].
/// <see cref="Labour"/> is person-time; build tasks with <see cref="Create"/> so it follows the site's
/// <see cref="LabourSettings"/>. A task is done in one go by one crew on one day (a bench is turned at once, not half
/// today and half tomorrow). Immutable.
/// </para>
/// </remarks>
/// <param name="Id">Stable identifier, unique among the tasks given to one schedule (see <see cref="IdFor"/>).</param>
/// <param name="SiteId">The site's id.</param>
/// <param name="BenchId">The bench whose pots are turned.</param>
/// <param name="LotId">The lot on that bench.</param>
/// <param name="Angle">How far the pots are turned, positive clockwise seen from above (90° or 180° in practice).</param>
/// <param name="Earliest">Earliest start of the task.</param>
/// <param name="Latest">Latest end of the task (not before <paramref name="Earliest"/>).</param>
/// <param name="Pots">Pots to turn (≥ 1).</param>
/// <param name="Labour">Person-time the task takes (&gt; 0): pots × seconds per pot + set-up.</param>
public sealed record RotationTask(
    string Id,
    string SiteId,
    string BenchId,
    string LotId,
    Angle Angle,
    Instant Earliest,
    Instant Latest,
    int Pots,
    Duration Labour)
{
    /// <summary>A stable task id from the lot's id and the rotation's number in that lot's plan: <c>lot-south-1/r3</c>.</summary>
    /// <param name="lotId">The lot's id.</param>
    /// <param name="rotationNumber">The rotation's number in the lot's plan, counting from 1.</param>
    public static string IdFor(string lotId, int rotationNumber) =>
        string.Create(CultureInfo.InvariantCulture, $"{lotId}/r{rotationNumber}");

    /// <summary>Creates a task whose labour is computed from the site's labour settings (<see cref="LabourSettings.LabourFor"/>).</summary>
    /// <param name="id">Stable identifier (see <see cref="IdFor"/>).</param>
    /// <param name="siteId">The site's id.</param>
    /// <param name="benchId">The bench whose pots are turned.</param>
    /// <param name="lotId">The lot on that bench.</param>
    /// <param name="angle">How far the pots are turned.</param>
    /// <param name="earliest">Earliest start.</param>
    /// <param name="latest">Latest end.</param>
    /// <param name="pots">Pots to turn (≥ 1).</param>
    /// <param name="labour">The site's labour settings.</param>
    /// <exception cref="InvalidInputException">A value is out of range; carries every problem.</exception>
    public static RotationTask Create(
        string id,
        string siteId,
        string benchId,
        string lotId,
        Angle angle,
        Instant earliest,
        Instant latest,
        int pots,
        LabourSettings labour)
    {
        ArgumentNullException.ThrowIfNull(labour);
        var errors = new List<ValidationError>(LabourValidator.CheckTimes(labour, "labour"));
        var task = new RotationTask(id, siteId, benchId, lotId, angle, earliest, latest, pots, Duration.Zero);
        errors.AddRange(LabourValidator.CheckTask(task, "task").Where(e => e.Path != "task.labour"));
        if (errors.Count > 0)
        {
            throw new InvalidInputException(errors);
        }

        return task with { Labour = labour.LabourFor(pots) };
    }
}

using NodaTime;

namespace CanopyAdvisor.Reports.Outlook;

/// <summary>What became of an earlier outlook file offered for comparison: the snapshot to compare with, or why none
/// is used.</summary>
/// <param name="Snapshot">The earlier outlook to compare with, or null.</param>
/// <param name="Note">What happened, in words, for the notes section (and, when <paramref name="IsWarning"/>, the
/// error stream); null when the earlier outlook is used without remark.</param>
/// <param name="IsWarning">True when the file was there but unusable (not readable as an outlook).</param>
public sealed record PreviousOutlook(OutlookSnapshot? Snapshot, string? Note, bool IsWarning)
{
    /// <summary>Decides whether an earlier outlook file is used: absent (no comparison), corrupt (a warning, no
    /// comparison), of another site (ignored with a note), not earlier than this week's start (ignored with a note).</summary>
    /// <param name="text">The file's text, or null when there is no file.</param>
    /// <param name="source">How to name the file in notes (e.g. its path).</param>
    /// <param name="siteId">This outlook's site.</param>
    /// <param name="now">This outlook's start.</param>
    public static PreviousOutlook Resolve(string? text, string source, string siteId, Instant now)
    {
        if (text is null)
        {
            return new PreviousOutlook(null, "no earlier outlook to compare with: change against last week is not shown", false);
        }

        if (!OutlookSnapshotJson.TryRead(text, out OutlookSnapshot? snapshot, out string? problem))
        {
            return new PreviousOutlook(null, $"{source} could not be read as an outlook ({problem}); change against last week is not shown", true);
        }

        if (snapshot.SiteId != siteId)
        {
            return new PreviousOutlook(null, $"{source} is the outlook of another site ('{snapshot.SiteId}'); ignored", false);
        }

        if (snapshot.Now >= now)
        {
            return new PreviousOutlook(null, $"{source} starts at or after this outlook ({snapshot.WeekLabel}); ignored", false);
        }

        return new PreviousOutlook(snapshot, null, false);
    }
}

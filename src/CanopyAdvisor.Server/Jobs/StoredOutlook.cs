using System.Text.Json;

namespace CanopyAdvisor.Server.Jobs;

/// <summary>A weekly outlook as kept with its job run.</summary>
/// <param name="Page">The printable page (HTML).</param>
/// <param name="Csv">The benches as CSV.</param>
/// <param name="Snapshot">The gist (JSON) next week's outlook compares with.</param>
/// <param name="Calendar">The scheduled turns (iCalendar).</param>
internal sealed record StoredOutlook(string Page, string Csv, string Snapshot, string Calendar)
{
    /// <summary>How it is written and read.</summary>
    public static JsonSerializerOptions JsonOptions { get; } = new(JsonSerializerDefaults.Web);
}

using NodaTime;

namespace CanopyAdvisor.Storage;

/// <summary>An organisation (a nursery): the owner of users, tokens, sites and forecasts.</summary>
/// <param name="Id">Opaque id chosen by the caller (unique).</param>
/// <param name="Name">Display name.</param>
/// <param name="DemoData">True for the invented demo organisation.</param>
/// <param name="CreatedAt">When it was created.</param>
public sealed record OrganisationRecord(string Id, string Name, bool DemoData, Instant CreatedAt);

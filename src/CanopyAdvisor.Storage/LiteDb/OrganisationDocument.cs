#pragma warning disable CA1812 // Instantiated by the BsonMapper through reflection.
using NodaTime;

namespace CanopyAdvisor.Storage.LiteDb;

/// <summary>An organisation as stored.</summary>
internal sealed class OrganisationDocument
{
    public string Id { get; set; } = "";

    public string Name { get; set; } = "";

    public bool DemoData { get; set; }

    public Instant CreatedAt { get; set; }

    public static OrganisationDocument From(OrganisationRecord r) =>
        new() { Id = r.Id, Name = r.Name, DemoData = r.DemoData, CreatedAt = r.CreatedAt };

    public OrganisationRecord ToRecord() => new(Id, Name, DemoData, CreatedAt);
}

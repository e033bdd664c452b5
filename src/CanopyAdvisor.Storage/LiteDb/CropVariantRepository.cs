namespace CanopyAdvisor.Storage.LiteDb;

/// <summary>Crop variants in the LiteDB store.</summary>
internal sealed class CropVariantRepository(LiteDbCanopyStore store) : ICropVariantStore
{
    public Task<IReadOnlyList<CropVariantRecord>> ListAsync(string organisationId, CancellationToken cancellationToken = default)
    {
        List<CropVariantRecord> list = store.CropVariantCollection.Find(v => v.OrganisationId == organisationId)
            .Select(v => v.ToRecord())
            .OrderBy(v => v.CropId, StringComparer.Ordinal)
            .ToList();
        return Task.FromResult<IReadOnlyList<CropVariantRecord>>(list);
    }

    public Task<WriteOutcome> AddAsync(CropVariantRecord variant, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(variant);
        cancellationToken.ThrowIfCancellationRequested();
        return Task.FromResult(store.Write(() =>
        {
            store.CropVariantCollection.Insert(CropVariantDocument.From(variant));
            return WriteOutcome.Written;
        }));
    }
}

namespace CanopyAdvisor.Storage;

/// <summary>The organisations' own crop variants.</summary>
public interface ICropVariantStore
{
    /// <summary>An organisation's variants, by crop id.</summary>
    Task<IReadOnlyList<CropVariantRecord>> ListAsync(string organisationId, CancellationToken cancellationToken = default);

    /// <summary>Adds a variant.</summary>
    /// <returns><see cref="WriteOutcome.Written"/>, or <see cref="WriteOutcome.KeyTaken"/> when the organisation has a
    /// variant with this crop id (then nothing is written).</returns>
    Task<WriteOutcome> AddAsync(CropVariantRecord variant, CancellationToken cancellationToken = default);
}

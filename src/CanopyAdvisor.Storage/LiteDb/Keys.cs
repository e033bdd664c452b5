namespace CanopyAdvisor.Storage.LiteDb;

/// <summary>Compound keys: parts joined by a character that ids and hashes never contain.</summary>
internal static class Keys
{
    public static string Join(params string[] parts) => string.Join('\u001f', parts);
}

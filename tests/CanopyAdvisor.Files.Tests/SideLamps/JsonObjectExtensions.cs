using System.Text.Json.Nodes;

namespace CanopyAdvisor.Files.Tests.SideLamps;

/// <summary>A small helper for editing JSON nodes inline in tests.</summary>
internal static class JsonObjectExtensions
{
    public static JsonObject Also(this JsonObject o, Action<JsonObject> change)
    {
        change(o);
        return o;
    }
}

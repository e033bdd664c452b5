using System.Text.Json;
using System.Text.Json.Serialization;
using NodaTime;
using NodaTime.Serialization.SystemTextJson;

namespace CanopyAdvisor.Server.Problems;

/// <summary>The JSON settings of the API, for responses and for reading request bodies.</summary>
/// <remarks>Strict on input: unknown properties, missing required ones, <c>null</c> where a value is required, numbers
/// written as strings, a property named twice, and <c>NaN</c>/<c>Infinity</c> are all errors. NodaTime values are ISO-8601 strings (time zones from
/// the IANA database), enums camelCase strings.</remarks>
internal static class ServerJson
{
    /// <summary>Applies the settings to the framework's options (used by <c>ConfigureHttpJsonOptions</c>).</summary>
    public static void Configure(JsonSerializerOptions options)
    {
        options.ConfigureForNodaTime(DateTimeZoneProviders.Tzdb);
        options.Converters.Add(new JsonStringEnumConverter(JsonNamingPolicy.CamelCase, allowIntegerValues: false));
        options.UnmappedMemberHandling = JsonUnmappedMemberHandling.Disallow;
        options.RespectNullableAnnotations = true;
        options.RespectRequiredConstructorParameters = true;
        options.NumberHandling = JsonNumberHandling.Strict;
        options.AllowDuplicateProperties = false;
        options.PropertyNamingPolicy = JsonNamingPolicy.CamelCase;
        options.DefaultIgnoreCondition = JsonIgnoreCondition.Never;
    }
}

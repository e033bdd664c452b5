using Microsoft.AspNetCore.OpenApi;
using Microsoft.OpenApi;
using NodaTime;

namespace CanopyAdvisor.Server.OpenApi;

/// <summary>Describes NodaTime values as the strings the API sends: <see cref="Instant"/> and <see cref="OffsetDateTime"/>
/// as RFC 3339 <c>date-time</c> (the OpenAPI format), <see cref="LocalDate"/> as <c>date</c>, <see cref="LocalTime"/>
/// as <c>time</c>, zone ids as plain strings.</summary>
internal sealed class NodaTimeSchemaTransformer : IOpenApiSchemaTransformer
{
    public Task TransformAsync(OpenApiSchema schema, OpenApiSchemaTransformerContext context, CancellationToken cancellationToken)
    {
        Type type = Nullable.GetUnderlyingType(context.JsonTypeInfo.Type) ?? context.JsonTypeInfo.Type;
        string? format = type == typeof(Instant) || type == typeof(OffsetDateTime) ? "date-time"
            : type == typeof(LocalDate) ? "date"
            : type == typeof(LocalTime) ? "time"
            : type == typeof(DateTimeZone) || type == typeof(Duration) || type == typeof(LocalDateTime) ? ""
            : null;
        if (format is null)
        {
            return Task.CompletedTask;
        }

        bool nullable = Nullable.GetUnderlyingType(context.JsonTypeInfo.Type) is not null;
        schema.Type = nullable ? JsonSchemaType.String | JsonSchemaType.Null : JsonSchemaType.String;
        schema.Format = format.Length == 0 ? null : format;
        schema.Properties?.Clear();
        schema.Required?.Clear();
        return Task.CompletedTask;
    }
}

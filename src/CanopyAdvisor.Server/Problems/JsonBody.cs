using System.Reflection;
using Microsoft.AspNetCore.Http.Metadata;

namespace CanopyAdvisor.Server.Problems;

/// <summary>A JSON request body read with the service's limits and strict settings (<see cref="RequestBody"/>); any
/// problem is thrown as a 4xx and answered as ProblemDetails before the handler runs, so a handler never sees bad input.</summary>
/// <typeparam name="T">The body's type; an <see cref="IOptionalBody"/> type may be sent as an empty body.</typeparam>
/// <param name="Value">The body.</param>
internal sealed record JsonBody<T>(T Value) : IEndpointParameterMetadataProvider
    where T : class
{
    /// <summary>Binds the body (called by minimal APIs).</summary>
    public static async ValueTask<JsonBody<T>?> BindAsync(HttpContext context, ParameterInfo parameter) =>
        new(await RequestBody.ReadJsonAsync<T>(context, typeof(IOptionalBody).IsAssignableFrom(typeof(T))));

    /// <summary>Documents the body in the OpenAPI description.</summary>
    public static void PopulateMetadata(ParameterInfo parameter, EndpointBuilder builder)
    {
        ArgumentNullException.ThrowIfNull(builder);
        builder.Metadata.Add(new AcceptsMetadata(["application/json"], typeof(T), typeof(IOptionalBody).IsAssignableFrom(typeof(T))));
    }
}

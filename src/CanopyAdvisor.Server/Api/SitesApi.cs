using System.Security.Claims;
using System.Text.Json;
using System.Text.Json.Nodes;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Files.Sites;
using CanopyAdvisor.Server.Accounts;
using CanopyAdvisor.Server.Contracts;
using CanopyAdvisor.Server.Forecasting;
using CanopyAdvisor.Server.Problems;
using CanopyAdvisor.Storage;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.Net.Http.Headers;
using NodaTime;

namespace CanopyAdvisor.Server.Api;

/// <summary>Sites: list, read, create, replace, delete. The body is a site file (the site file README's format),
/// checked in full by <see cref="SiteFileReader"/> before anything is stored.</summary>
internal static class SitesApi
{
    /// <summary>Maps <c>/api/sites</c>.</summary>
    public static RouteGroupBuilder MapSitesApi(this IEndpointRouteBuilder routes)
    {
        RouteGroupBuilder group = routes.MapGroup("/api/sites").WithTags("Sites");
        group.MapGet("/", List).WithSummary("List the organisation's sites");
        group.MapGet("/{siteId}", Get)
            .WithSummary("Read a site")
            .WithDescription("The bookkeeping and the site file. The ETag is the version; send it back in If-Match when replacing.");
        group.MapPost("/", Create)
            .Accepts<JsonObject>("application/json")
            .WithSummary("Create a site (admin)")
            .WithDescription("The body is a site file. Every problem is listed with its path; nothing is stored when there is one.")
            .ProducesProblem(StatusCodes.Status400BadRequest)
            .ProducesProblem(StatusCodes.Status413PayloadTooLarge)
            .ProducesProblem(StatusCodes.Status415UnsupportedMediaType);
        group.MapPut("/{siteId}", Replace)
            .Accepts<JsonObject>("application/json")
            .WithSummary("Replace a site")
            .WithDescription("The body is the whole site file. Each role may change only its own sections (growers: lots, labour, temperatures; lighting designers: lampTypes, lamps, lampRows; admins: all; managers: none). With If-Match, a site changed meanwhile answers 412.")
            .ProducesProblem(StatusCodes.Status400BadRequest)
            .ProducesProblem(StatusCodes.Status413PayloadTooLarge)
            .ProducesProblem(StatusCodes.Status415UnsupportedMediaType);
        group.MapDelete("/{siteId}", Delete).WithSummary("Delete a site and its forecasts (admin)");
        return group;
    }

    private static async Task<Ok<List<SiteSummary>>> List(ClaimsPrincipal principal, ICanopyStore store, CancellationToken cancellationToken)
    {
        Caller caller = Caller.From(principal);
        return TypedResults.Ok((await store.Sites.ListAsync(caller.OrganisationId, cancellationToken)).Select(SiteSummary.Of).ToList());
    }

    private static async Task<Results<Ok<SiteView>, ProblemHttpResult>> Get(string siteId, ClaimsPrincipal principal, HttpContext context, ICanopyStore store, CancellationToken cancellationToken)
    {
        Caller caller = Caller.From(principal);
        if (await store.Sites.GetAsync(caller.OrganisationId, siteId, cancellationToken) is not { } site)
        {
            return ApiProblems.NotFound("site");
        }

        context.Response.Headers.ETag = ETagOf(site.Version);
        using JsonDocument document = JsonDocument.Parse(site.Json);
        return TypedResults.Ok(new SiteView(SiteSummary.Of(site), document.RootElement.Clone()));
    }

    private static async Task<Results<Created<SiteSummary>, ProblemHttpResult>> Create(
        ClaimsPrincipal principal, HttpContext context, ICanopyStore store, IClock clock, CancellationToken cancellationToken)
    {
        Caller caller = Caller.From(principal);
        if (!SitePermissions.MayCreateOrDelete(caller.Role))
        {
            return ApiProblems.Forbidden("only admins create sites");
        }

        string json = await RequestBody.ReadJsonTextAsync(context);
        ReadObject(json);
        Site site = Read(json);
        Instant now = clock.GetCurrentInstant();
        var record = new SiteRecord(ApiTokens.NewId("site"), caller.OrganisationId, site.Id, site.Name, json, 1, now, now, caller.UserId);
        if (await store.Sites.AddAsync(record, cancellationToken) != WriteOutcome.Written)
        {
            return ApiProblems.Conflict($"your organisation already has a site with id '{site.Id}'");
        }

        context.Response.Headers.ETag = ETagOf(record.Version);
        return TypedResults.Created($"/api/sites/{record.Id}", SiteSummary.Of(record));
    }

    private static async Task<Results<Ok<SiteSummary>, ProblemHttpResult>> Replace(
        string siteId, ClaimsPrincipal principal, HttpContext context, ICanopyStore store, IClock clock, CancellationToken cancellationToken)
    {
        Caller caller = Caller.From(principal);
        if (await store.Sites.GetAsync(caller.OrganisationId, siteId, cancellationToken) is not { } current)
        {
            return ApiProblems.NotFound("site");
        }

        if (!SitePermissions.MayChangeAnything(caller.Role))
        {
            return ApiProblems.Forbidden("managers read sites but do not change them");
        }

        // RFC 9110 §13.1.1: If-Match with a current ETag (or *) lets the write go ahead; any other value answers 412.
        string? ifMatch = context.Request.Headers.IfMatch.ToString();
        if (!string.IsNullOrEmpty(ifMatch) && ifMatch.Trim() != "*"
            && !ifMatch.Split(',').Select(t => t.Trim()).Contains(ETagOf(current.Version)))
        {
            return ApiProblems.PreconditionFailed($"the site is at version {current.Version} ({ETagOf(current.Version)}); read it again and reapply your change");
        }

        string json = await RequestBody.ReadJsonTextAsync(context);
        JsonObject submitted = ReadObject(json);
        // Fail closed: a stored site that does not read as an object (never written so) is an error, not a free pass.
        JsonObject stored = TryParseObject(current.Json)
            ?? throw new InvalidOperationException($"Stored site {current.Id} is not a JSON object.");
        List<ProblemError> denied = ChangedSections(stored, submitted)
            .Where(section => !SitePermissions.MayChange(caller.Role, section))
            .Select(section => new ProblemError(section, $"your role ({RoleNames.Of(caller.Role)}) may not change this section"))
            .ToList();
        if (denied.Count > 0)
        {
            return ApiProblems.Forbidden($"your role may change: {SitePermissions.Describe(caller.Role)}", denied);
        }

        Site site = Read(json);
        Instant now = clock.GetCurrentInstant();
        SiteRecord updated = current with { SiteKey = site.Id, Name = site.Name, Json = json, Version = current.Version + 1, UpdatedAt = now, UpdatedBy = caller.UserId };
        switch (await store.Sites.ReplaceAsync(updated, current.Version, cancellationToken))
        {
            case WriteOutcome.Written:
                context.Response.Headers.ETag = ETagOf(updated.Version);
                return TypedResults.Ok(SiteSummary.Of(updated));
            case WriteOutcome.KeyTaken:
                return ApiProblems.Conflict($"your organisation already has another site with id '{site.Id}'");
            case WriteOutcome.VersionMismatch:
                return ApiProblems.Conflict("the site was changed by someone else meanwhile; read it again and reapply your change");
            default:
                return ApiProblems.NotFound("site");
        }
    }

    private static async Task<Results<NoContent, ProblemHttpResult>> Delete(string siteId, ClaimsPrincipal principal, ICanopyStore store, CancellationToken cancellationToken)
    {
        Caller caller = Caller.From(principal);
        if (await store.Sites.GetAsync(caller.OrganisationId, siteId, cancellationToken) is null)
        {
            return ApiProblems.NotFound("site");
        }

        if (!SitePermissions.MayCreateOrDelete(caller.Role))
        {
            return ApiProblems.Forbidden("only admins delete sites");
        }

        return await store.Sites.DeleteAsync(caller.OrganisationId, siteId, cancellationToken) ? TypedResults.NoContent() : ApiProblems.NotFound("site");
    }

    /// <summary>Reads a site file with the one parser and validator; every problem is thrown (400), nothing is stored.</summary>
    private static Site Read(string json)
    {
        if (json.Length == 0)
        {
            throw new InvalidInputException("body", "a site file (JSON) is required");
        }

        return new SiteFileReader(ServerBeamFactory.Instance).Parse(json, "body", baseDirectory: null);
    }

    /// <summary>The body as a JSON object for comparing sections; a body that is not one is checked by the site file
    /// reader (malformed JSON with line and byte, or not an object) and answered 400. A property named twice in one
    /// object is refused too, so no section can hide behind a duplicate.</summary>
    private static JsonObject ReadObject(string json)
    {
        if (TryParseObject(json) is { } parsed)
        {
            return parsed;
        }

        Read(json);
        throw new InvalidInputException("body", "a property name appears twice in one object; give each once");
    }

    private static JsonObject? TryParseObject(string json)
    {
        try
        {
            if (JsonNode.Parse(json) is not JsonObject root)
            {
                return null;
            }

            // JsonObject builds its dictionary lazily: touch every object now so a duplicate name surfaces here.
            Touch(root);
            return root;
        }
        catch (Exception e) when (e is JsonException or ArgumentException or InvalidOperationException)
        {
            return null;
        }
    }

    private static void Touch(JsonNode? node)
    {
        switch (node)
        {
            case JsonObject o:
                foreach (KeyValuePair<string, JsonNode?> p in o)
                {
                    Touch(p.Value);
                }

                break;
            case JsonArray a:
                foreach (JsonNode? item in a)
                {
                    Touch(item);
                }

                break;
        }
    }

    /// <summary>The top-level sections whose content differs (present in one and not the other, or not equal as JSON).
    /// <c>$schema</c> is an editor hint and never counts.</summary>
    internal static IEnumerable<string> ChangedSections(JsonObject stored, JsonObject submitted) =>
        stored.Select(p => p.Key).Union(submitted.Select(p => p.Key), StringComparer.Ordinal)
            .Where(key => key != "$schema")
            .Where(key => !JsonNode.DeepEquals(stored[key], submitted[key]))
            .Order(StringComparer.Ordinal);

    private static string ETagOf(int version) => $"\"{version}\"";
}

using System.Net;
using CanopyAdvisor.Server.Accounts;
using CanopyAdvisor.Server.Api;
using CanopyAdvisor.Server.Forecasting;
using CanopyAdvisor.Server.Jobs;
using CanopyAdvisor.Server.OpenApi;
using CanopyAdvisor.Server.Problems;
using CanopyAdvisor.Storage;
using CanopyAdvisor.Storage.LiteDb;
using Microsoft.AspNetCore.Http.Json;
using Microsoft.Extensions.Options;
using NodaTime;

namespace CanopyAdvisor.Server.Hosting;

/// <summary>The service's parts and its request pipeline, so Program.cs stays a short list.</summary>
internal static class ServiceSetup
{
    /// <summary>Adds settings, store, accounts, JSON, problems, rate limits, OpenAPI and health checks.</summary>
    public static WebApplicationBuilder AddCanopyService(this WebApplicationBuilder builder)
    {
        IServiceCollection services = builder.Services;
        services.AddOptions<CanopyServerOptions>().BindConfiguration(CanopyServerOptions.Section)
            .Validate(o => o.Port is >= 0 and <= 65535, "Canopy:Port must be 0 to 65535")
            .Validate(o => o.MaxRequestBodyBytes > 0, "Canopy:MaxRequestBodyBytes must be positive")
            .Validate(o => !string.IsNullOrWhiteSpace(o.DataFolder), "Canopy:DataFolder is required")
            .ValidateOnStart();

        // Listen on the loopback address only; the port comes from the settings (read when the server starts).
        builder.WebHost.ConfigureKestrel((context, kestrel) =>
        {
            CanopyServerOptions settings = context.Configuration.GetSection(CanopyServerOptions.Section).Get<CanopyServerOptions>() ?? new CanopyServerOptions();
            kestrel.Listen(IPAddress.Loopback, settings.Port);
            kestrel.Limits.MaxRequestBodySize = settings.MaxRequestBodyBytes;
            kestrel.AddServerHeader = false;
        });

        services.AddSingleton(_ => StartingClock.FromSettings(builder.Configuration));
        services.AddSingleton<ICanopyStore>(provider =>
        {
            CanopyServerOptions settings = provider.GetRequiredService<IOptions<CanopyServerOptions>>().Value;
            Directory.CreateDirectory(settings.DataFolder);
            return new LiteDbCanopyStore(settings.StorePath);
        });
        services.AddSingleton<CropCatalogue>();
        services.AddSingleton<ForecastRunner>();
        services.AddSingleton<CanopyAdvisor.Server.Advice.PlanRunner>();
        services.AddSingleton<CanopyAdvisor.Server.Advice.LampsRunner>();
        services.AddSingleton<CanopyAdvisor.Server.Advice.CalibrationRunner>();
        services.AddSingleton<CanopyAdvisor.Server.Advice.OutlookRunner>();
        services.AddSingleton<DemoSeeder>();
        services.AddHostedService<StoreStartup>();
        services.AddCanopyJobs();

        services.ConfigureHttpJsonOptions(o => ServerJson.Configure(o.SerializerOptions));
        services.AddProblemDetails();
        services.AddExceptionHandler<ProblemExceptionHandler>();
        services.Configure<RouteHandlerOptions>(o => o.ThrowOnBadRequest = true);
        services.AddCanopyAccounts();
        services.AddCanopyRateLimits();
        services.AddOpenApi(o =>
        {
            o.AddSchemaTransformer<NodaTimeSchemaTransformer>();
            o.AddDocumentTransformer((document, _, _) =>
            {
                document.Info.Title = "CanopyAdvisor API";
                document.Info.Description = "Sites, forecasts, crops and accounts of a CanopyAdvisor service. Errors are ProblemDetails (RFC 9457) with an 'errors' list of {path, detail}.";
                document.Components ??= new Microsoft.OpenApi.OpenApiComponents();
                document.Components.SecuritySchemes ??= new Dictionary<string, Microsoft.OpenApi.IOpenApiSecurityScheme>();
                document.Components.SecuritySchemes["apiToken"] = new Microsoft.OpenApi.OpenApiSecurityScheme
                {
                    Type = Microsoft.OpenApi.SecuritySchemeType.Http,
                    Scheme = "bearer",
                    Description = "An API token from POST /api/tokens, sent as 'Authorization: Bearer <token>' (RFC 6750).",
                };
                document.Components.SecuritySchemes["session"] = new Microsoft.OpenApi.OpenApiSecurityScheme
                {
                    Type = Microsoft.OpenApi.SecuritySchemeType.ApiKey,
                    In = Microsoft.OpenApi.ParameterLocation.Cookie,
                    Name = AuthenticationSetup.CookieName,
                    Description = "The sign-in cookie set by POST /api/session.",
                };
                return Task.CompletedTask;
            });
        });
        services.AddHealthChecks().AddCheck<StoreHealthCheck>("store");
        return builder;
    }

    /// <summary>The pipeline: errors as ProblemDetails, routing, authentication, rate limits, authorisation, endpoints.</summary>
    public static WebApplication UseCanopyService(this WebApplication app)
    {
        app.UseExceptionHandler();
        app.UseStatusCodePages();
        app.UseWebPages();
        app.UseRouting();
        app.UseAuthentication();
        app.UseRateLimiter();
        app.UseAuthorization();
        app.UseSiteJobRefresh();

        app.MapOpenApi().AllowAnonymous();
        app.MapHealthChecks("/health").AllowAnonymous();
        app.MapSessionApi();
        app.MapTokensApi();
        app.MapUsersApi();
        app.MapSitesApi();
        app.MapForecastsApi();
        app.MapCropsApi();
        app.MapMapsApi();
        app.MapJobsApi();
        app.MapGrowerRecordsApi();
        app.MapAdviceApi();
        app.MapWebPages();
        return app;
    }
}

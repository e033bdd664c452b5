using Microsoft.Extensions.FileProviders;

namespace CanopyAdvisor.Server.Hosting;

/// <summary>The web pages in <c>wwwroot</c>: plain HTML, CSS and JavaScript served as static files, with the page
/// addresses (<c>/sites/{id}</c>, <c>/sites/{id}/benches/{benchId}</c>, …) answered by the one page that draws them.</summary>
internal static class WebPages
{
    /// <summary>The page that draws every page address.</summary>
    public const string AppPage = "index.html";

    /// <summary>The content security policy of the pages: only this service's own scripts, styles, pictures and API.</summary>
    public const string ContentSecurityPolicy =
        "default-src 'self'; img-src 'self' data:; style-src 'self'; script-src 'self'; connect-src 'self'; frame-ancestors 'none'; base-uri 'none'; form-action 'self'";

    /// <summary>The pages beside the service's own assembly (copied there by the build), so they are found whatever
    /// the working directory.</summary>
    private static StaticFileOptions Files => new()
    {
        FileProvider = new PhysicalFileProvider(Path.Combine(AppContext.BaseDirectory, "wwwroot")),
    };

    /// <summary>Serves the static files (before authentication: the pages hold no data; the API checks every read).</summary>
    public static WebApplication UseWebPages(this WebApplication app)
    {
        app.Use(async (context, next) =>
        {
            if (!context.Request.Path.StartsWithSegments("/api", StringComparison.Ordinal))
            {
                context.Response.Headers.ContentSecurityPolicy = ContentSecurityPolicy;
                context.Response.Headers.XContentTypeOptions = "nosniff";
            }

            await next(context);
        });
        app.UseStaticFiles(Files);
        return app;
    }

    /// <summary>Maps the page addresses to the app page; <c>/api/…</c> addresses keep their own 404 answers.</summary>
    public static WebApplication MapWebPages(this WebApplication app)
    {
        foreach (string pattern in new[] { "/", "/sign-in", "/sites", "/sites/{**rest}", "/calendar/{**rest}", "/lamps/{**rest}", "/outlook/{**rest}" })
        {
            app.MapFallbackToFile(pattern, AppPage, Files).AllowAnonymous().ExcludeFromDescription();
        }

        return app;
    }
}

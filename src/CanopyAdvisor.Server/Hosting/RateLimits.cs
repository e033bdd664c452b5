using System.Threading.RateLimiting;
using CanopyAdvisor.Server.Problems;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.RateLimiting;
using Microsoft.Extensions.Options;

namespace CanopyAdvisor.Server.Hosting;

/// <summary>Rate limits: every caller (user, or client address before sign-in) a number of requests per minute, sign-in
/// attempts per client address per minute (OWASP authentication guidance against password guessing, from memory), and
/// a few forecasts at once. A refused request answers 429 Too Many Requests (RFC 6585 §4) with Retry-After, not the
/// middleware's default 503.</summary>
internal static class RateLimits
{
    /// <summary>The sign-in policy.</summary>
    public const string SignInPolicy = "sign-in";

    /// <summary>The forecast policy.</summary>
    public const string ForecastPolicy = "forecast";

    /// <summary>Adds the limiter and its policies (settings from <see cref="CanopyServerOptions"/>).</summary>
    public static IServiceCollection AddCanopyRateLimits(this IServiceCollection services) =>
        services.AddRateLimiter(o =>
        {
            o.RejectionStatusCode = StatusCodes.Status429TooManyRequests;
            o.OnRejected = OnRejectedAsync;
            o.GlobalLimiter = PartitionedRateLimiter.Create<HttpContext, string>(context =>
                RateLimitPartition.GetFixedWindowLimiter(
                    "caller:" + (context.User.Identity?.IsAuthenticated == true
                        ? context.User.FindFirst(System.Security.Claims.ClaimTypes.NameIdentifier)?.Value
                        : ClientAddress(context)),
                    _ => new FixedWindowRateLimiterOptions
                    {
                        PermitLimit = Settings(context).RequestsPerMinute,
                        Window = TimeSpan.FromMinutes(1),
                        QueueLimit = 0,
                    }));
            o.AddPolicy(SignInPolicy, context =>
                RateLimitPartition.GetFixedWindowLimiter(
                    "sign-in:" + ClientAddress(context),
                    _ => new FixedWindowRateLimiterOptions
                    {
                        PermitLimit = Settings(context).SignInAttemptsPerMinute,
                        Window = TimeSpan.FromMinutes(1),
                        QueueLimit = 0,
                    }));
            o.AddPolicy(ForecastPolicy, context =>
                RateLimitPartition.GetConcurrencyLimiter(
                    "forecast",
                    _ => new ConcurrencyLimiterOptions
                    {
                        PermitLimit = Settings(context).ConcurrentForecasts,
                        QueueLimit = 8,
                        QueueProcessingOrder = QueueProcessingOrder.OldestFirst,
                    }));
        });

    private static CanopyServerOptions Settings(HttpContext context) =>
        context.RequestServices.GetRequiredService<IOptions<CanopyServerOptions>>().Value;

    private static string ClientAddress(HttpContext context) => context.Connection.RemoteIpAddress?.ToString() ?? "local";

    private static async ValueTask OnRejectedAsync(OnRejectedContext context, CancellationToken cancellationToken)
    {
        HttpContext http = context.HttpContext;
        string detail = "too many requests; wait and try again";
        if (context.Lease.TryGetMetadata(MetadataName.RetryAfter, out TimeSpan retryAfter))
        {
            int seconds = (int)Math.Ceiling(retryAfter.TotalSeconds);
            http.Response.Headers.RetryAfter = seconds.ToString(System.Globalization.CultureInfo.InvariantCulture);
            detail = $"too many requests; try again in {seconds} s";
        }

        http.Response.StatusCode = StatusCodes.Status429TooManyRequests;
        ProblemDetails problem = ApiProblems.Create(StatusCodes.Status429TooManyRequests, "Too many requests", detail);
        await http.RequestServices.GetRequiredService<IProblemDetailsService>().TryWriteAsync(new ProblemDetailsContext { HttpContext = http, ProblemDetails = problem });
    }
}

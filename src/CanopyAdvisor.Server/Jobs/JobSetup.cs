using Quartz;

namespace CanopyAdvisor.Server.Jobs;

/// <summary>Registers the scheduled jobs: Quartz (in-memory store, hosted), the job work, the runner and the scheduler
/// that derives triggers from the stored sites; and the middleware that rebuilds an organisation's triggers after a
/// site write.</summary>
internal static partial class JobSetup
{
    /// <summary>Adds Quartz and the site jobs. Call after the store's start-up service, so the store is open and seeded
    /// before triggers are built, and closed only after Quartz and the catch-up have stopped.</summary>
    public static IServiceCollection AddCanopyJobs(this IServiceCollection services)
    {
        services.AddOptions<JobOptions>().BindConfiguration(JobOptions.Section);
        services.AddQuartz(q => q.UseInMemoryStore());
        services.AddQuartzHostedService(o => o.WaitForJobsToComplete = true);
        services.AddSingleton<ISiteJobWork, NightlyForecastWork>();
        services.AddSingleton<ISiteJobWork, WeeklyOutlookWork>();
        services.AddSingleton<ISiteJobWork, TaskListWork>();
        services.AddSingleton<SiteJobRunner>();
        services.AddSingleton<SiteJobScheduler>();
        services.AddHostedService(provider => provider.GetRequiredService<SiteJobScheduler>());
        return services;
    }

    /// <summary>After a successful create, replace or delete of a site (<c>POST /api/sites</c>, <c>PUT</c> or
    /// <c>DELETE /api/sites/{siteId}</c>), rebuilds the caller's organisation's triggers from the store.</summary>
    public static IApplicationBuilder UseSiteJobRefresh(this IApplicationBuilder app) => app.Use(async (context, next) =>
    {
        await next(context);
        string method = context.Request.Method;
        bool write = HttpMethods.IsPost(method) || HttpMethods.IsPut(method) || HttpMethods.IsDelete(method);
        string[] segments = (context.Request.Path.Value ?? "").Split('/', StringSplitOptions.RemoveEmptyEntries);
        bool sitePath = segments.Length is 2 or 3 && segments[0] == "api" && segments[1] == "sites";
        if (write && sitePath && context.Response.StatusCode is >= 200 and < 300
            && context.User.FindFirst(Accounts.CanopyClaims.Organisation)?.Value is { } organisationId)
        {
            SiteJobScheduler scheduler = context.RequestServices.GetRequiredService<SiteJobScheduler>();
            try
            {
                await scheduler.RefreshOrganisationAsync(organisationId, CancellationToken.None);
            }
            catch (Exception e) when (e is SchedulerException or InvalidOperationException)
            {
                // The write stands; the triggers are rebuilt from the store on the next site write or start.
                LogRefreshFailed(context.RequestServices.GetRequiredService<ILoggerFactory>().CreateLogger(typeof(JobSetup)), e, organisationId);
            }
        }
    });

    [LoggerMessage(Level = LogLevel.Error, Message = "Could not rebuild the job triggers of organisation {OrganisationId}")]
    private static partial void LogRefreshFailed(ILogger logger, Exception exception, string organisationId);
}

namespace CanopyAdvisor.Server.Hosting;

/// <summary>The service's settings, bound from the <c>Canopy</c> configuration section (appsettings.json,
/// <c>CANOPY_*</c> environment variables, command-line switches; see the server README).</summary>
public sealed class CanopyServerOptions
{
    /// <summary>The configuration section name.</summary>
    public const string Section = "Canopy";

    /// <summary>TCP port on 127.0.0.1; 0 picks a free one. Default 5180.</summary>
    public int Port { get; set; } = 5180;

    /// <summary>Folder of the store file and the sign-in cookie keys; created when missing. Default: CanopyAdvisor in
    /// the user's local application data folder.</summary>
    public string DataFolder { get; set; } = Path.Combine(
        Environment.GetFolderPath(Environment.SpecialFolder.LocalApplicationData, Environment.SpecialFolderOption.DoNotVerify),
        "CanopyAdvisor");

    /// <summary>Whether a new, empty store is seeded with the invented demo organisation. Default true.</summary>
    public bool SeedDemo { get; set; } = true;

    /// <summary>The demo users' password (demo data; change or turn seeding off for real use).</summary>
    public string DemoPassword { get; set; } = "canopy-demo-2026";

    /// <summary>Largest request body, bytes (1 MiB by default; the demo site files are about 15 kB).</summary>
    public long MaxRequestBodyBytes { get; set; } = 1024 * 1024;

    /// <summary>Sign-in attempts allowed per client address per minute (10 by default).</summary>
    public int SignInAttemptsPerMinute { get; set; } = 10;

    /// <summary>Requests allowed per signed-in user (or client address) per minute (600 by default).</summary>
    public int RequestsPerMinute { get; set; } = 600;

    /// <summary>Forecasts computed at once over the whole service (2 by default); more wait in a short queue, then 429.</summary>
    public int ConcurrentForecasts { get; set; } = 2;

    /// <summary>How long a sign-in cookie lasts without use, hours (8 by default, sliding).</summary>
    public double SessionHours { get; set; } = 8;

    /// <summary>The store file inside <see cref="DataFolder"/>.</summary>
    public string StorePath => Path.Combine(DataFolder, "canopy.db");
}

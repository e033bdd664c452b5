using Microsoft.Playwright;

namespace CanopyAdvisor.Browser.Tests.Support;

/// <summary>One service process and one headless Chromium shared by the browser tests; each test opens its own context
/// (its own cookies).</summary>
/// <remarks>Playwright cannot download its browsers here, so it drives Debian's <c>chromium</c> package
/// (<c>.ci/test.sh</c> installs it when missing) with the flags a container without a GPU or sandbox needs.</remarks>
public sealed class BrowserFixture : IAsyncLifetime
{
    /// <summary>Debian's Chromium.</summary>
    public const string ChromiumPath = "/usr/bin/chromium";

    private ServerProcess? _server;
    private IPlaywright? _playwright;
    private IBrowser? _browser;

    /// <summary>The running service.</summary>
    public ServerProcess Server => _server ?? throw new InvalidOperationException("not started");

    /// <summary>The browser.</summary>
    public IBrowser Browser => _browser ?? throw new InvalidOperationException("not started");

    /// <summary>Where screenshots go: TestResults/screenshots under the test output folder.</summary>
    public static string ScreenshotFolder { get; } = Path.Combine(AppContext.BaseDirectory, "TestResults", "screenshots");

    /// <inheritdoc />
    public async Task InitializeAsync()
    {
        Directory.CreateDirectory(ScreenshotFolder);
        _server = await ServerProcess.StartAsync();
        _playwright = await Playwright.CreateAsync();
        _browser = await _playwright.Chromium.LaunchAsync(new BrowserTypeLaunchOptions
        {
            ExecutablePath = ChromiumPath,
            Headless = true,
            Args = ["--no-sandbox", "--disable-gpu", "--disable-background-networking", "--disable-component-update", "--disable-sync", "--no-first-run"],
        });
    }

    /// <summary>A new page in a fresh context (no cookies), with the service as its base address.</summary>
    public async Task<IPage> NewPageAsync()
    {
        IBrowserContext context = await Browser.NewContextAsync(new BrowserNewContextOptions
        {
            BaseURL = Server.Address.ToString(),
            ViewportSize = new ViewportSize { Width = 1280, Height = 900 },
            Locale = "en-GB",
        });
        return await context.NewPageAsync();
    }

    /// <inheritdoc />
    public async Task DisposeAsync()
    {
        if (_browser is not null)
        {
            await _browser.CloseAsync();
        }

        _playwright?.Dispose();
        if (_server is not null)
        {
            await _server.DisposeAsync();
        }
    }
}

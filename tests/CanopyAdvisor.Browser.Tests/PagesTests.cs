using System.Text.RegularExpressions;
using CanopyAdvisor.Browser.Tests.Support;
using Microsoft.Playwright;

namespace CanopyAdvisor.Browser.Tests;

/// <summary>The pages in a real browser (Debian's Chromium driven by Playwright) against the real service process with
/// the demo organisation (demo data, invented): sign in, the glasshouse lean map, a bench's detail, inline errors.</summary>
/// <remarks>Every check waits for what a person would see (Playwright's web-first assertions retry until it shows or
/// the guard runs out); nothing is timed. Screenshots go to TestResults/screenshots under the test output folder.</remarks>
[Collection(BrowserGroup.Name)]
public sealed partial class PagesTests(BrowserFixture fixture)
{
    private const string Grower = "grower@demo.invalid";
    private const string DemoPassword = "canopy-demo-2026";
    private const string Glasshouse = "Demo glasshouse range (demo data, invented)";

    // The demo glasshouse has eight benches, each with a lot (src/CanopyAdvisor.Files/DemoSites/glasshouse.json, demo data).
    private static readonly string[] GlasshouseBenches = ["south-1", "south-2", "south-3", "south-4", "north-1", "north-2", "north-3", "north-4"];

    // One fixed start for every forecast these tests ask for, so the second one is served from the store. A guard
    // for the computation (not a speed check): a one-day horizon without the band.
    private const string Start = "2026-12-02T09:00:00+01:00";
    private static readonly LocatorAssertionsToBeVisibleOptions Computation = new() { Timeout = 120_000 };

    [Fact]
    public async Task The_demo_grower_signs_in_with_the_keyboard_and_sees_the_sites()
    {
        IPage page = await fixture.NewPageAsync();
        await page.GotoAsync("/sites");

        // Signed out, the page asks for a sign-in; the e-mail field has the focus, Tab moves on, Enter submits.
        await Assertions.Expect(page.GetByRole(AriaRole.Heading, new() { Name = "Sign in", Level = 1 })).ToBeVisibleAsync();
        await Assertions.Expect(page.GetByLabel("E-mail")).ToBeFocusedAsync();
        await page.Keyboard.TypeAsync(Grower);
        await page.Keyboard.PressAsync("Tab");
        await Assertions.Expect(page.GetByLabel("Password")).ToBeFocusedAsync();
        await page.Keyboard.TypeAsync(DemoPassword);
        await page.Keyboard.PressAsync("Enter");

        await Assertions.Expect(page.GetByRole(AriaRole.Heading, new() { Name = "Sites", Level = 1 })).ToBeVisibleAsync();
        await Assertions.Expect(page).ToHaveURLAsync(new Regex("/sites$"));
        await Assertions.Expect(page.GetByRole(AriaRole.Link, new() { Name = Glasshouse })).ToBeVisibleAsync();
        await Assertions.Expect(page.Locator("#who")).ToContainTextAsync("Demo grower (grower)");
        // The pages not built yet have their places in the navigation.
        foreach (string entry in new[] { "Rotation calendar", "Lamp planner", "Weekly outlook" })
        {
            await Assertions.Expect(page.GetByRole(AriaRole.Navigation, new() { Name = "Main" }).GetByRole(AriaRole.Link, new() { Name = entry })).ToBeVisibleAsync();
        }

        await Screenshot(page, "1-sites");
    }

    [Fact]
    public async Task Signing_out_ends_the_session()
    {
        IPage page = await SignedInAsync();
        await page.GetByRole(AriaRole.Button, new() { Name = "Sign out" }).ClickAsync();
        await Assertions.Expect(page.GetByRole(AriaRole.Heading, new() { Name = "Sign in", Level = 1 })).ToBeVisibleAsync();

        // The cookie is gone: a site address asks for a sign-in again and remembers where to go after it.
        await page.GotoAsync("/sites");
        await Assertions.Expect(page.GetByRole(AriaRole.Heading, new() { Name = "Sign in", Level = 1 })).ToBeVisibleAsync();
        await Assertions.Expect(page).ToHaveURLAsync(new Regex(@"/sign-in\?next=%2Fsites$"));
    }

    [Fact]
    public async Task A_wrong_password_is_said_on_the_form()
    {
        IPage page = await fixture.NewPageAsync();
        await page.GotoAsync("/sign-in");
        await page.GetByLabel("E-mail").FillAsync(Grower);
        await page.GetByLabel("Password").FillAsync("not-the-password-at-all");
        await page.GetByRole(AriaRole.Button, new() { Name = "Sign in" }).ClickAsync();

        // The service's 401 ProblemDetails ("Sign-in failed", Server README: Errors) shows in the form's alert.
        await Assertions.Expect(page.GetByRole(AriaRole.Alert)).ToContainTextAsync("Sign-in failed");
        await Assertions.Expect(page.GetByRole(AriaRole.Heading, new() { Name = "Sign in", Level = 1 })).ToBeVisibleAsync();
        await Screenshot(page, "2-sign-in-failed");
    }

    [Fact]
    public async Task The_demo_glasshouse_map_has_one_arrow_per_bench()
    {
        IPage page = await SignedInAsync();
        await OpenGlasshouseAsync(page);
        await RunForecastAsync(page, "1");

        // One arrow per bench on the map, and the same benches in the table beside it.
        ILocator arrows = page.Locator("figure.map svg g.arrow");
        await Assertions.Expect(arrows).ToHaveCountAsync(GlasshouseBenches.Length);
        Assert.Equal(GlasshouseBenches.Order(StringComparer.Ordinal), (await arrows.EvaluateAllAsync<string[]>("gs => gs.map(g => g.dataset.bench)")).Order(StringComparer.Ordinal));
        ILocator rows = page.Locator("table tbody tr");
        await Assertions.Expect(rows).ToHaveCountAsync(GlasshouseBenches.Length);
        Assert.Equal(GlasshouseBenches.Order(StringComparer.Ordinal), (await rows.Locator("th a").AllTextContentsAsync()).Order(StringComparer.Ordinal));
        // The map is a labelled picture (role img with its caption) for screen readers.
        await Assertions.Expect(page.GetByRole(AriaRole.Img, new() { Name = "Lean at the end of the forecast" })).ToBeVisibleAsync();
        await Screenshot(page, "3-glasshouse-map");
    }

    [Fact]
    public async Task A_bench_opens_with_its_lean_now_and_at_the_horizon_and_its_track()
    {
        IPage page = await SignedInAsync();
        await OpenGlasshouseAsync(page);
        await RunForecastAsync(page, "1");

        await page.GetByRole(AriaRole.Link, new() { Name = "south-1", Exact = true }).ClickAsync();
        await Assertions.Expect(page.GetByRole(AriaRole.Heading, new() { Name = "Bench south-1", Level = 1 })).ToBeVisibleAsync();
        await Assertions.Expect(page).ToHaveURLAsync(new Regex("/sites/[^/]+/benches/south-1$"));
        foreach (string fact in new[] { "Lean now", "Lean at the horizon", "Direction now → horizon", "Lean rate", "Grade limit" })
        {
            await Assertions.Expect(page.Locator(".facts dt", new() { HasTextString = fact }).First).ToBeVisibleAsync();
        }

        // A degree figure with a compass direction: "2.3° toward SSE" (16 compass points).
        await Assertions.Expect(page.Locator(".facts div", new() { HasTextString = "Lean now" }).Locator("dd")).ToHaveTextAsync(new Regex(@"^\d+\.\d° toward [NESW]{1,3}$"));
        // The lean track: one hourly line over the day and the grade limit named in words, not by colour alone.
        await Assertions.Expect(page.Locator(".chart svg polyline.track")).ToHaveCountAsync(1);
        await Assertions.Expect(page.Locator(".chart svg")).ToContainTextAsync("grade limit");
        int points = await page.Locator(".chart svg polyline.track").EvaluateAsync<int>("p => p.points.numberOfItems");
        Assert.Equal(25, points); // 24 hours, hourly, both ends (BenchForecast.LeanTrack).
        await Screenshot(page, "4-bench-south-1");

        // Back with the browser's own button: the site page again.
        await page.GoBackAsync();
        await Assertions.Expect(page.GetByRole(AriaRole.Heading, new() { Name = Glasshouse, Level = 1 })).ToBeVisibleAsync();
    }

    [Theory]
    [InlineData("0", "days", "must be more than 0 and at most 366")] // the service's rule for the horizon (Server README)
    [InlineData("400", "days", "must be more than 0 and at most 366")]
    public async Task A_bad_value_shows_the_services_error_beside_its_field(string days, string field, string message)
    {
        IPage page = await SignedInAsync();
        await OpenGlasshouseAsync(page);
        await page.GetByLabel("Days ahead").FillAsync(days);
        await page.GetByLabel("Start").FillAsync("2 December, nine o'clock");
        await page.GetByRole(AriaRole.Button, new() { Name = "Run the forecast" }).ClickAsync();

        // Each ProblemDetails error appears beside its own field, the field is marked invalid and described by the
        // message (WAI-ARIA aria-invalid, aria-describedby), and the focus moves to the first field in error.
        ILocator input = page.GetByLabel("Days ahead");
        await Assertions.Expect(page.Locator($"#fc-{field}-error")).ToHaveTextAsync(message);
        await Assertions.Expect(input).ToHaveAttributeAsync("aria-invalid", "true");
        await Assertions.Expect(input).ToHaveAccessibleDescriptionAsync(new Regex(Regex.Escape(message)));
        await Assertions.Expect(page.Locator("#fc-now-error")).ToContainTextAsync("ISO-8601");
        await Assertions.Expect(page.GetByLabel("Start")).ToBeFocusedAsync();
        await Assertions.Expect(page.GetByRole(AriaRole.Alert)).ToContainTextAsync("2 problems");
        await Screenshot(page, $"5-bad-days-{days}");

        // Corrected, the errors go.
        await page.GetByLabel("Days ahead").FillAsync("1");
        await page.GetByLabel("Start").FillAsync(Start);
        await page.GetByLabel("Include the band over the crop parameters").UncheckAsync();
        await page.GetByRole(AriaRole.Button, new() { Name = "Run the forecast" }).ClickAsync();
        await Assertions.Expect(page.Locator("figure.map svg")).ToBeVisibleAsync(Computation);
        await Assertions.Expect(page.Locator($"#fc-{field}-error")).ToBeHiddenAsync();
        await Assertions.Expect(input).Not.ToHaveAttributeAsync("aria-invalid", "true");
    }

    [Fact]
    public async Task A_grower_corrects_a_lots_height_after_the_services_error_beside_the_field()
    {
        IPage page = await SignedInAsync();
        await OpenGlasshouseAsync(page);
        await page.GotoAsync(page.Url + "/benches/north-2");
        await Assertions.Expect(page.GetByRole(AriaRole.Heading, new() { Name = "Crop lot on this bench" })).ToBeVisibleAsync();

        // A height must be more than 0 mm (Core SiteValidator); the site file's own path names the field (lots[5].heightMm).
        ILocator height = page.GetByLabel("Measured height (mm)");
        await height.FillAsync("-5");
        await page.GetByRole(AriaRole.Button, new() { Name = "Save the lot" }).ClickAsync();
        await Assertions.Expect(page.Locator("#lot-height-error")).ToContainTextAsync("must be within (0,");
        await Assertions.Expect(height).ToHaveAttributeAsync("aria-invalid", "true");
        await Assertions.Expect(height).ToBeFocusedAsync();
        await Screenshot(page, "6-lot-bad-height");

        // Corrected, it saves (a grower may change lots: Server README, who may do what) and the error goes.
        await height.FillAsync("95");
        await page.GetByRole(AriaRole.Button, new() { Name = "Save the lot" }).ClickAsync();
        await Assertions.Expect(page.GetByText(new Regex("^Saved: site version \\d+"))).ToBeVisibleAsync();
        await Assertions.Expect(page.Locator("#lot-height-error")).ToBeHiddenAsync();
        await page.ReloadAsync();
        await Assertions.Expect(page.GetByLabel("Measured height (mm)")).ToHaveValueAsync("95");
    }

    [Fact]
    public async Task A_manager_is_told_on_the_form_that_the_role_may_not_change_lots()
    {
        IPage page = await SignedInAsync("manager@demo.invalid");
        await OpenGlasshouseAsync(page);
        await page.GotoAsync(page.Url + "/benches/south-3");
        await page.GetByLabel("Pots").FillAsync("1200");
        await page.GetByRole(AriaRole.Button, new() { Name = "Save the lot" }).ClickAsync();

        // Managers read sites but change nothing (Server README, who may do what): the 403 ProblemDetails in the alert.
        await Assertions.Expect(page.GetByRole(AriaRole.Alert)).ToContainTextAsync("Not allowed for your role");
        await Screenshot(page, "7-manager-may-not-change-lots");
    }

    private async Task<IPage> SignedInAsync(string email = Grower)
    {
        IPage page = await fixture.NewPageAsync();
        await page.GotoAsync("/sign-in");
        await page.GetByLabel("E-mail").FillAsync(email);
        await page.GetByLabel("Password").FillAsync(DemoPassword);
        await page.GetByRole(AriaRole.Button, new() { Name = "Sign in" }).ClickAsync();
        await Assertions.Expect(page.GetByRole(AriaRole.Heading, new() { Name = "Sites", Level = 1 })).ToBeVisibleAsync();
        return page;
    }

    private static async Task OpenGlasshouseAsync(IPage page)
    {
        await page.GetByRole(AriaRole.Link, new() { Name = Glasshouse }).ClickAsync();
        await Assertions.Expect(page.GetByRole(AriaRole.Heading, new() { Name = Glasshouse, Level = 1 })).ToBeVisibleAsync();
    }

    private static async Task RunForecastAsync(IPage page, string days)
    {
        await page.GetByLabel("Start").FillAsync(Start);
        await page.GetByLabel("Days ahead").FillAsync(days);
        await page.GetByLabel("Include the band over the crop parameters").UncheckAsync();
        await page.GetByRole(AriaRole.Button, new() { Name = "Run the forecast" }).ClickAsync();
        await Assertions.Expect(page.Locator("figure.map svg")).ToBeVisibleAsync(Computation);
        // The busy indicator is gone and the status line says the forecast is ready (a polite live region).
        await Assertions.Expect(page.Locator(".busy")).ToHaveCountAsync(0);
        await Assertions.Expect(page.GetByRole(AriaRole.Status).Filter(new() { HasTextString = "Forecast ready" })).ToHaveTextAsync(new Regex(@"^Forecast ready: \d+ benches\.$"));
    }

    private static async Task Screenshot(IPage page, string name) =>
        await page.ScreenshotAsync(new PageScreenshotOptions { Path = Path.Combine(BrowserFixture.ScreenshotFolder, name + ".png"), FullPage = true });
}

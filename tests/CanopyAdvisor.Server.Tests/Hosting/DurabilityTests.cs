using System.Diagnostics;
using System.Globalization;
using System.Net;
using System.Net.Http.Headers;
using System.Net.Http.Json;
using System.Text.Json;
using System.Text.Json.Nodes;
using System.Text.RegularExpressions;
using CanopyAdvisor.Server.Jobs;
using CanopyAdvisor.Server.Tests.Support;
using CanopyAdvisor.Storage;
using CanopyAdvisor.Storage.LiteDb;

namespace CanopyAdvisor.Server.Tests.Hosting;

/// <summary>The real service process killed with SIGKILL: every write it acknowledged is there after a restart, the
/// store opens cleanly, and a job missed while it was down runs once on the restart. Slower than the other tests (three
/// process starts) but part of the normal run.</summary>
/// <remarks>SIGKILL cannot be caught or ignored (POSIX.1-2017, &lt;signal.h&gt;), so the process gets no chance to close
/// the store: what survives is what LiteDB committed before the API answered.</remarks>
[Trait("Speed", "slower")]
public sealed partial class DurabilityTests : IDisposable
{
    /// <summary>Sites written (each created, then changed twice), besides the demo changes.</summary>
    private const int Sites = 12;

    private readonly string _folder = Directory.CreateTempSubdirectory("canopy-durability-").FullName;

    public void Dispose() => Directory.Delete(_folder, recursive: true);

    [Fact]
    public async Task Every_acknowledged_write_survives_sigkill_and_a_missed_job_runs_once_on_restart()
    {
        using var guard = new CancellationTokenSource(TimeSpan.FromMinutes(3)); // a guard against a hang, not a speed check
        var created = new Dictionary<string, (string Key, int Version, string Name)>(StringComparer.Ordinal);
        var tokens = new List<string>();
        string indoor;
        string glasshouse;

        // First life, at 2026-12-02 07:30Z (01:30 CST in Chicago, the indoor demo's zone): no job is due yet.
        await using (ServerProcess server = await ServerProcess.StartAsync(_folder, "2026-12-02T07:30:00Z", guard.Token))
        {
            using HttpClient admin = await server.SignedInAsync(Demo.Admin, guard.Token);
            indoor = await SiteEditing.SiteIdAsync(admin, "demo-indoor-farm");
            glasshouse = await SiteEditing.SiteIdAsync(admin, "demo-glasshouse");
            HttpResponseMessage deleted = await admin.DeleteAsync($"/api/sites/{glasshouse}", guard.Token);
            Assert.Equal(HttpStatusCode.NoContent, deleted.StatusCode);

            // Sites without lots (light only): their jobs fail at once on restart ("no lots"), keeping the test quick.
            JsonObject template = JsonNode.Parse(CanopyAdvisor.Files.Sites.DemoSites.ReadText("indoor-farm"))!.AsObject();
            template.Remove("lots");
            for (int i = 0; i < Sites; i++)
            {
                JsonObject site = template.DeepClone().AsObject();
                string key = string.Create(CultureInfo.InvariantCulture, $"durable-{i:00}");
                site["id"] = key;
                site["name"] = $"Durability room {i} (test data)";
                HttpResponseMessage post = await admin.PostAsync("/api/sites", SiteEditing.Json(site.ToJsonString()), guard.Token);
                Assert.Equal(HttpStatusCode.Created, post.StatusCode);
                string id = (await post.Content.ReadFromJsonAsync<JsonElement>(guard.Token)).GetProperty("id").GetString()!;
                created[id] = (key, 1, (string)site["name"]!);
                for (int change = 1; change <= 2; change++)
                {
                    site["name"] = $"Durability room {i}, change {change} (test data)";
                    HttpResponseMessage put = await SiteEditing.ReplaceAsync(admin, id, site, created[id].Version);
                    Assert.Equal(HttpStatusCode.OK, put.StatusCode);
                    created[id] = (key, created[id].Version + 1, (string)site["name"]!);
                }
            }

            for (int i = 0; i < 3; i++)
            {
                HttpResponseMessage issued = await admin.PostAsJsonAsync("/api/tokens", new { name = $"durability {i}" }, guard.Token);
                Assert.Equal(HttpStatusCode.Created, issued.StatusCode);
                tokens.Add((await issued.Content.ReadFromJsonAsync<JsonElement>(guard.Token)).GetProperty("token").GetString()!);
            }

            server.Kill();
        }

        // Second life, at 2026-12-02 12:30Z (06:30 CST): the indoor demo's 02:00 CST nightly forecast was missed.
        await using (ServerProcess server = await ServerProcess.StartAsync(_folder, "2026-12-02T12:30:00Z", guard.Token))
        {
            using HttpClient admin = await server.SignedInAsync(Demo.Admin, guard.Token);
            List<JsonElement> sites = (await admin.GetFromJsonAsync<List<JsonElement>>("/api/sites", guard.Token))!;
            Assert.Equal(Sites + 1, sites.Count); // the indoor demo and every site written; the deleted glasshouse stays deleted
            Assert.Equal(HttpStatusCode.NotFound, (await admin.GetAsync($"/api/sites/{glasshouse}", guard.Token)).StatusCode);
            foreach ((string id, (string key, int version, string name)) in created)
            {
                JsonElement site = await admin.GetFromJsonAsync<JsonElement>($"/api/sites/{id}", guard.Token);
                Assert.Equal(key, site.GetProperty("summary").GetProperty("siteKey").GetString());
                Assert.Equal(version, site.GetProperty("summary").GetProperty("version").GetInt32());
                Assert.Equal(name, site.GetProperty("site").GetProperty("name").GetString());
            }

            foreach (string token in tokens)
            {
                using var bearer = new HttpClient { BaseAddress = server.Address };
                bearer.DefaultRequestHeaders.Authorization = new AuthenticationHeaderValue("Bearer", token);
                Assert.Equal(HttpStatusCode.OK, (await bearer.GetAsync("/api/me", guard.Token)).StatusCode);
            }

            int caughtUp = await server.CatchUpDoneAsync(guard.Token);
            Assert.True(caughtUp >= 1, $"catch-up made {caughtUp} runs");
            JsonElement nightly = Assert.Single(await RunsAsync(admin, indoor, JobKinds.NightlyForecast, guard.Token));
            Assert.Equal("2026-12-02T02:00:00-06:00", nightly.GetProperty("scheduledFor").GetString());
            Assert.True(nightly.GetProperty("caughtUp").GetBoolean());
            Assert.Equal(JobKinds.Succeeded, nightly.GetProperty("outcome").GetString());

            // A light-only site's missed nightly forecast ran too, and failed with the reason recorded.
            JsonElement failed = Assert.Single(await RunsAsync(admin, created.Keys.First(), JobKinds.NightlyForecast, guard.Token));
            Assert.Equal(JobKinds.Failed, failed.GetProperty("outcome").GetString());
            Assert.Contains("lots", failed.GetProperty("message").GetString(), StringComparison.Ordinal);
            server.Kill();
        }

        // Third life, the same clock: nothing more was missed, so nothing runs again.
        await using (ServerProcess server = await ServerProcess.StartAsync(_folder, "2026-12-02T12:30:00Z", guard.Token))
        {
            using HttpClient admin = await server.SignedInAsync(Demo.Admin, guard.Token);
            Assert.Equal(0, await server.CatchUpDoneAsync(guard.Token));
            Assert.Single(await RunsAsync(admin, indoor, JobKinds.NightlyForecast, guard.Token));
            server.Kill();
        }

        // The store opens cleanly after the last SIGKILL and holds every acknowledged write.
        using var store = new LiteDbCanopyStore(Path.Combine(_folder, "canopy.db"));
        UserRecord user = (await store.Users.FindByEmailAsync(Demo.Admin))!;
        IReadOnlyList<SiteRecord> stored = await store.Sites.ListAsync(user.OrganisationId);
        Assert.Equal(Sites + 1, stored.Count);
        Assert.All(created, c => Assert.Equal(c.Value.Version, stored.Single(s => s.Id == c.Key).Version));
        Assert.Equal(3, (await store.ApiTokens.ListForUserAsync(user.OrganisationId, user.Id)).Count);
    }

    private static async Task<List<JsonElement>> RunsAsync(HttpClient client, string siteId, string kind, CancellationToken cancellationToken) =>
        (await client.GetFromJsonAsync<JsonElement>($"/api/sites/{siteId}/jobs", cancellationToken)).GetProperty("runs").EnumerateArray()
            .Where(r => r.GetProperty("kind").GetString() == kind).ToList();

    /// <summary>The service as a child process (the built dll under <c>dotnet exec</c>) on a free loopback port, with
    /// its output read line by line.</summary>
    private sealed partial class ServerProcess : IAsyncDisposable
    {
        private readonly Process _process;
        private readonly List<string> _lines = [];
        private readonly SemaphoreSlim _lineArrived = new(0);
        private readonly Task _reader;

        private ServerProcess(Process process)
        {
            _process = process;
            _reader = Task.Run(async () =>
            {
                while (await process.StandardOutput.ReadLineAsync() is { } line)
                {
                    lock (_lines)
                    {
                        _lines.Add(line);
                    }

                    _lineArrived.Release();
                }

                _lineArrived.Release();
            });
        }

        public Uri Address { get; private set; } = new("http://127.0.0.1/");

        public static async Task<ServerProcess> StartAsync(string folder, string clockStartsAt, CancellationToken cancellationToken)
        {
            string dll = Path.Combine(AppContext.BaseDirectory, "CanopyAdvisor.Server.dll");
            var start = new ProcessStartInfo("dotnet", ["exec", dll, "--port", "0", "--data", folder, $"--Canopy:ClockStartsAt={clockStartsAt}"])
            {
                RedirectStandardOutput = true,
                UseShellExecute = false,
                WorkingDirectory = AppContext.BaseDirectory,
            };
            start.Environment["DOTNET_NOLOGO"] = "1";
            var server = new ServerProcess(Process.Start(start)!);
            Match address = await server.WaitForAsync(AddressLine(), cancellationToken);
            server.Address = new Uri(address.Groups[1].Value);
            return server;
        }

        public async Task<HttpClient> SignedInAsync(string email, CancellationToken cancellationToken)
        {
            var client = new HttpClient { BaseAddress = Address };
            HttpResponseMessage response = await client.PostAsJsonAsync("/api/session", new { email, password = CanopyFactory.DemoPassword }, cancellationToken);
            Assert.Equal(HttpStatusCode.OK, response.StatusCode);
            return client;
        }

        /// <summary>The number of runs the start's catch-up made, once it has logged that it is done.</summary>
        public async Task<int> CatchUpDoneAsync(CancellationToken cancellationToken) =>
            int.Parse((await WaitForAsync(CatchUpLine(), cancellationToken)).Groups[1].Value, CultureInfo.InvariantCulture);

        /// <summary>SIGKILL (kill -9): the process ends at once, without closing anything.</summary>
        public void Kill()
        {
            using Process signal = Process.Start("kill", ["-KILL", _process.Id.ToString(CultureInfo.InvariantCulture)])!;
            signal.WaitForExit();
            Assert.Equal(0, signal.ExitCode);
            _process.WaitForExit();
            Assert.Equal(137, _process.ExitCode); // 128 + SIGKILL (9): killed by the signal (POSIX shells' convention, as .NET reports it)
        }

        public async ValueTask DisposeAsync()
        {
            if (!_process.HasExited)
            {
                _process.Kill(entireProcessTree: true);
                await _process.WaitForExitAsync();
            }

            await _reader;
            _process.Dispose();
            _lineArrived.Dispose();
        }

        private async Task<Match> WaitForAsync(Regex pattern, CancellationToken cancellationToken)
        {
            int seen = 0;
            while (true)
            {
                lock (_lines)
                {
                    for (; seen < _lines.Count; seen++)
                    {
                        if (pattern.Match(_lines[seen]) is { Success: true } match)
                        {
                            return match;
                        }
                    }

                    if (_reader.IsCompleted)
                    {
                        throw new InvalidOperationException("The service ended before printing the line sought:\n" + string.Join('\n', _lines));
                    }
                }

                await _lineArrived.WaitAsync(cancellationToken);
            }
        }

        [GeneratedRegex(@"listening on (http://\S+?)(,|$)")]
        private static partial Regex AddressLine();

        [GeneratedRegex(@"Job catch-up on start done: (\d+) missed run")]
        private static partial Regex CatchUpLine();
    }
}

using System.Diagnostics;
using System.Net;
using System.Net.Http.Json;
using System.Text.RegularExpressions;
using CanopyAdvisor.Server.Tests.Support;
using CanopyAdvisor.Storage;
using CanopyAdvisor.Storage.LiteDb;

namespace CanopyAdvisor.Server.Tests.Hosting;

/// <summary>The real service process on Kestrel: listens on 127.0.0.1, prints its address and the demo sign-in, and on
/// Ctrl-C (SIGINT) stops and closes its store.</summary>
public sealed partial class ServerProcessTests : IDisposable
{
    private readonly string _folder = Directory.CreateTempSubdirectory("canopy-process-").FullName;

    public void Dispose() => Directory.Delete(_folder, recursive: true);

    [Fact]
    public async Task The_service_starts_on_loopback_prints_its_address_and_stops_cleanly_on_ctrl_c()
    {
        string dll = Path.Combine(AppContext.BaseDirectory, "CanopyAdvisor.Server.dll");
        var start = new ProcessStartInfo("dotnet", ["exec", dll, "--port", "0", "--data", _folder])
        {
            RedirectStandardOutput = true,
            UseShellExecute = false,
            WorkingDirectory = AppContext.BaseDirectory,
        };
        start.Environment["DOTNET_NOLOGO"] = "1";
        using Process process = Process.Start(start)!;
        var output = new List<string>();
        try
        {
            // A guard against a hung start, not a speed check.
            using var guard = new CancellationTokenSource(TimeSpan.FromMinutes(2));
            string? address = null;
            string? signIn = null;
            while (signIn is null && await process.StandardOutput.ReadLineAsync(guard.Token) is { } line)
            {
                output.Add(line);
                address ??= AddressLine().Match(line) is { Success: true } m ? m.Groups[1].Value : null;
                signIn = line.Contains("demo sign-in", StringComparison.Ordinal) ? line : null;
            }

            // Keep draining the output so the service never blocks on a full pipe.
            Task<string> rest = process.StandardOutput.ReadToEndAsync(guard.Token);
            Assert.True(address is not null, string.Join('\n', output));
            Assert.StartsWith("http://127.0.0.1:", address, StringComparison.Ordinal);
            Assert.Contains(Demo.Admin, signIn, StringComparison.Ordinal);
            Assert.Contains(CanopyFactory.DemoPassword, signIn, StringComparison.Ordinal);

            using var client = new HttpClient { BaseAddress = new Uri(address!) };
            Assert.Equal(HttpStatusCode.OK, (await client.GetAsync("/health", guard.Token)).StatusCode);
            HttpResponseMessage signedIn = await client.PostAsJsonAsync("/api/session", new { email = Demo.Admin, password = CanopyFactory.DemoPassword }, guard.Token);
            Assert.Equal(HttpStatusCode.OK, signedIn.StatusCode);

            // A second service on the same data folder is refused (two LiteDB instances would corrupt the file).
            var second = new ProcessStartInfo("dotnet", ["exec", dll, "--port", "0", "--data", _folder])
            {
                RedirectStandardOutput = true,
                RedirectStandardError = true,
                UseShellExecute = false,
                WorkingDirectory = AppContext.BaseDirectory,
            };
            using (Process refused = Process.Start(second)!)
            {
                Task<string> refusedOut = refused.StandardOutput.ReadToEndAsync(guard.Token);
                string refusedError = await refused.StandardError.ReadToEndAsync(guard.Token);
                await refused.WaitForExitAsync(guard.Token);
                await refusedOut;
                Assert.Equal(2, refused.ExitCode);
                Assert.Contains("already open in another instance or process", refusedError, StringComparison.Ordinal);
            }

            Assert.Equal(HttpStatusCode.OK, (await client.GetAsync("/health", guard.Token)).StatusCode);

            // SIGINT is what Ctrl-C sends to the foreground process (POSIX.1-2017, General Terminal Interface §11.1.9).
            using (Process signal = Process.Start("kill", ["-INT", process.Id.ToString(System.Globalization.CultureInfo.InvariantCulture)]))
            {
                await signal.WaitForExitAsync(guard.Token);
                Assert.Equal(0, signal.ExitCode);
            }

            await process.WaitForExitAsync(guard.Token);
            Assert.Equal(0, process.ExitCode);
            string log = await rest;
            Assert.Contains("Application is shutting down", log, StringComparison.Ordinal);
            Assert.Contains("Closed the store", log, StringComparison.Ordinal);
        }
        finally
        {
            if (!process.HasExited)
            {
                process.Kill(entireProcessTree: true);
            }
        }

        // The process has exited; its committed writes are in the file.
        using var store = new LiteDbCanopyStore(Path.Combine(_folder, "canopy.db"));
        UserRecord admin = (await store.Users.FindByEmailAsync(Demo.Admin))!;
        Assert.Equal(2, (await store.Sites.ListAsync(admin.OrganisationId)).Count);
    }

    [GeneratedRegex(@"listening on (http://\S+?)(,|$)")]
    private static partial Regex AddressLine();
}

using System.Diagnostics;
using System.Text.RegularExpressions;

namespace CanopyAdvisor.Browser.Tests.Support;

/// <summary>The built service started as its own process on a free loopback port, with a temporary data folder and the
/// demo organisation seeded; stopped with Ctrl-C (SIGINT) and its folder removed at the end.</summary>
public sealed partial class ServerProcess : IAsyncDisposable
{
    private readonly Process _process;
    private readonly string _folder;
    private readonly Task _drain;

    private ServerProcess(Process process, string folder, Uri address, Task drain)
    {
        _process = process;
        _folder = folder;
        Address = address;
        _drain = drain;
    }

    /// <summary>Where the service listens (http://127.0.0.1:port/).</summary>
    public Uri Address { get; }

    /// <summary>Starts the service from this test's output folder (the project reference puts it there, with its pages).</summary>
    public static async Task<ServerProcess> StartAsync()
    {
        string folder = Directory.CreateTempSubdirectory("canopy-browser-").FullName;
        string dll = Path.Combine(AppContext.BaseDirectory, "CanopyAdvisor.Server.dll");
        var start = new ProcessStartInfo("dotnet", ["exec", dll, "--port", "0", "--data", folder, "--seed-demo", "true"])
        {
            RedirectStandardOutput = true,
            UseShellExecute = false,
            WorkingDirectory = AppContext.BaseDirectory,
        };
        start.Environment["DOTNET_NOLOGO"] = "1";
        Process process = Process.Start(start) ?? throw new InvalidOperationException("the service did not start");
        var output = new List<string>();

        // A guard against a hung start, not a speed check.
        using var guard = new CancellationTokenSource(TimeSpan.FromMinutes(2));
        string? address = null;
        while (address is null && await process.StandardOutput.ReadLineAsync(guard.Token) is { } line)
        {
            output.Add(line);
            address = AddressLine().Match(line) is { Success: true } m ? m.Groups[1].Value : null;
        }

        if (address is null)
        {
            process.Kill();
            throw new InvalidOperationException("the service printed no address:\n" + string.Join('\n', output));
        }

        // Keep draining the output so the service never blocks on a full pipe.
        Task drain = process.StandardOutput.ReadToEndAsync(CancellationToken.None);
        return new ServerProcess(process, folder, new Uri(address.TrimEnd('/') + "/"), drain);
    }

    /// <inheritdoc />
    public async ValueTask DisposeAsync()
    {
        if (!_process.HasExited)
        {
            using (Process signal = Process.Start("kill", ["-INT", _process.Id.ToString(System.Globalization.CultureInfo.InvariantCulture)]))
            {
                await signal.WaitForExitAsync();
            }

            using var guard = new CancellationTokenSource(TimeSpan.FromSeconds(30));
            try
            {
                await _process.WaitForExitAsync(guard.Token);
            }
            catch (OperationCanceledException)
            {
                _process.Kill();
            }
        }

        await _drain;
        _process.Dispose();
        try
        {
            Directory.Delete(_folder, recursive: true);
        }
        catch (IOException)
        {
            // The temp folder is cleaned by the system.
        }
    }

    [GeneratedRegex(@"listening on (http://\S+?)(,|$)")]
    private static partial Regex AddressLine();
}

namespace CanopyAdvisor.Server.Hosting;

/// <summary>Where the service's settings come from, in rising priority: appsettings.json, <c>Canopy__*</c> and the
/// short <c>CANOPY_PORT</c>, <c>CANOPY_DATA</c>, <c>CANOPY_SEED_DEMO</c> environment variables, then the command line
/// (<c>--port</c>, <c>--data</c>, <c>--seed-demo</c>, or any <c>--Canopy:Key=value</c>).</summary>
internal static class ServerConfiguration
{
    private static readonly Dictionary<string, string> Switches = new(StringComparer.Ordinal)
    {
        ["--port"] = "Canopy:Port",
        ["--data"] = "Canopy:DataFolder",
        ["--seed-demo"] = "Canopy:SeedDemo",
    };

    private static readonly (string Variable, string Key)[] Variables =
    [
        ("CANOPY_PORT", "Canopy:Port"),
        ("CANOPY_DATA", "Canopy:DataFolder"),
        ("CANOPY_SEED_DEMO", "Canopy:SeedDemo"),
    ];

    /// <summary>Adds the short environment variables and the command-line switches on top of the defaults.</summary>
    public static void AddCanopySources(this IConfigurationBuilder configuration, string[] args)
    {
        var fromEnvironment = new Dictionary<string, string?>(StringComparer.Ordinal);
        foreach ((string variable, string key) in Variables)
        {
            if (Environment.GetEnvironmentVariable(variable) is { Length: > 0 } value)
            {
                fromEnvironment[key] = value;
            }
        }

        configuration.AddInMemoryCollection(fromEnvironment);
        configuration.AddCommandLine(args, Switches);
    }
}

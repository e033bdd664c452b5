using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Files.Sites;

namespace CanopyAdvisor.Cli;

/// <summary>Resolves the site argument: a path to a site file, or <c>demo:NAME</c> for a built-in demo site.</summary>
internal static class SiteSource
{
    /// <summary>The prefix that names a built-in demo site.</summary>
    public const string DemoPrefix = "demo:";

    public static Site Load(string argument)
    {
        if (argument.StartsWith(DemoPrefix, StringComparison.Ordinal))
        {
            string name = argument[DemoPrefix.Length..];
            if (!DemoSites.Names.Contains(name))
            {
                throw new InvalidInputException("site", $"unknown demo site '{name}'; known: {string.Join(", ", DemoSites.Names)}");
            }

            return DemoSites.Load(name, StandardBeamFactory.Instance);
        }

        if (!File.Exists(argument))
        {
            throw new InvalidInputException("site", $"file not found: {argument}");
        }

        return new SiteFileReader(StandardBeamFactory.Instance).Read(argument);
    }
}

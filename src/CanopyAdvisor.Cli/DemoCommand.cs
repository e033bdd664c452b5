using System.CommandLine;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Files.Sites;

namespace CanopyAdvisor.Cli;

/// <summary><c>canopy demo list</c> and <c>canopy demo show NAME</c>: the built-in demo sites (invented data).</summary>
internal static class DemoCommand
{
    public static Command Create(TextWriter output)
    {
        var list = new Command("list", "List the built-in demo sites (invented data).");
        list.SetAction(_ =>
        {
            foreach (string name in DemoSites.Names)
            {
                output.WriteLine($"demo:{name}");
            }

            return 0;
        });

        var name = new Argument<string>("name") { Description = "Demo site name, as listed by 'canopy demo list'." };
        var show = new Command("show", "Print a demo site's JSON: a starting point for your own site file.") { name };
        show.SetAction(parse =>
        {
            string n = parse.GetValue(name)!;
            if (!DemoSites.Names.Contains(n))
            {
                throw new InvalidInputException("name", $"unknown demo site '{n}'; known: {string.Join(", ", DemoSites.Names)}");
            }

            output.Write(DemoSites.ReadText(n));
            return 0;
        });

        return new Command("demo", "The built-in demo sites.") { list, show };
    }
}

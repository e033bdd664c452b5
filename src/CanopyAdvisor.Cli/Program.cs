namespace CanopyAdvisor.Cli;

internal static class Program
{
    private static int Main(string[] args) =>
        CanopyCommandLine.Run(args, Console.Out, Console.Error, interactive: !Console.IsErrorRedirected);
}

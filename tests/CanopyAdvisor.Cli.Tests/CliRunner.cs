namespace CanopyAdvisor.Cli.Tests;

/// <summary>Runs the canopy command in-process and captures what it prints.</summary>
internal static class CliRunner
{
    public static (int ExitCode, string Output, string Error) Run(params string[] args)
    {
        using var output = new StringWriter();
        using var error = new StringWriter();
        int code = CanopyCommandLine.Run(args, output, error);
        return (code, output.ToString(), error.ToString());
    }
}

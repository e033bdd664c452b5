using System.CommandLine;
using CanopyAdvisor.Core.Validation;
using NodaTime;

namespace CanopyAdvisor.Cli;

/// <summary>The <c>canopy</c> command: its subcommands, and how errors reach the user.</summary>
internal static class CanopyCommandLine
{
    /// <summary>Exit code for input the user must fix (a bad file or option).</summary>
    public const int InvalidInputExitCode = 2;

    /// <summary>Parses and runs a command line, writing results to <paramref name="output"/> and messages to <paramref name="error"/>.</summary>
    /// <remarks>The clock (the system clock by default) only supplies today's date when <c>--from</c> is left out.</remarks>
    public static int Run(string[] args, TextWriter output, TextWriter error, bool interactive = false, IClock? clock = null)
    {
        var root = new RootCommand("CanopyAdvisor: the light at each bench, and what it does to the crop.")
        {
            SunCommand.Create(output),
            LightCommand.Create(output, error, interactive, clock ?? SystemClock.Instance),
            ForecastCommand.Create(output, error, interactive, clock ?? SystemClock.Instance),
            PlanCommand.Create(output, error, interactive, clock ?? SystemClock.Instance),
            OutlookCommand.Create(output, error, interactive, clock ?? SystemClock.Instance),
            LampsCommand.Create(output, error, interactive, clock ?? SystemClock.Instance),
            CalibrateCommand.Create(output, error, interactive),
            DemoCommand.Create(output),
            CropsCommand.Create(output),
        };

        try
        {
            ParseResult parsed = root.Parse(args);
            return parsed.Invoke(new InvocationConfiguration { Output = output, Error = error, EnableDefaultExceptionHandler = false });
        }
        catch (InvalidInputException ex)
        {
            error.WriteLine("error: the input was rejected; nothing was computed.");
            foreach (ValidationError e in ex.Errors)
            {
                error.WriteLine($"  {e}");
            }

            return InvalidInputExitCode;
        }
        catch (IOException ex)
        {
            error.WriteLine($"error: {ex.Message}");
            return InvalidInputExitCode;
        }
        catch (KeyNotFoundException ex)
        {
            error.WriteLine($"error: {ex.Message}");
            return InvalidInputExitCode;
        }
        catch (UnauthorizedAccessException ex)
        {
            error.WriteLine($"error: {ex.Message}");
            return InvalidInputExitCode;
        }
    }
}

using System.Globalization;

namespace CanopyAdvisor.Cli;

/// <summary>Shows progress of a long run on the error stream: a rewriting line on a terminal, a line per tenth otherwise.</summary>
internal sealed class ProgressReporter(TextWriter error, string label, bool interactive) : IProgress<double>
{
    private int _lastShown = -1;

    public void Report(double value)
    {
        int percent = (int)Math.Clamp(Math.Floor(value * 100), 0, 100);
        int bucket = interactive ? percent : percent / 10 * 10;
        if (bucket == _lastShown)
        {
            return;
        }

        _lastShown = bucket;
        string text = string.Create(CultureInfo.InvariantCulture, $"{label}: {bucket,3}%");
        if (interactive)
        {
            error.Write('\r' + text);
            if (bucket == 100)
            {
                error.WriteLine();
            }
        }
        else
        {
            error.WriteLine(text);
        }
    }
}

using System.Text;

namespace CanopyAdvisor.Cli;

/// <summary>Writes output files whole: to a temporary name beside them first, then moved into place.</summary>
internal static class OutputFiles
{
    /// <summary>Writes each file to a temporary name in the folder, then moves them into place, so no reader ever
    /// sees a half-written file (a rename within one folder replaces the old file whole). Temporary files are removed
    /// if a write fails.</summary>
    /// <param name="folder">The folder (it must exist).</param>
    /// <param name="files">File names and their text (UTF-8, no byte-order mark).</param>
    /// <returns>The paths written.</returns>
    public static string[] WriteAll(string folder, IReadOnlyDictionary<string, string> files)
    {
        var temporary = new List<(string Temp, string Final)>();
        var utf8 = new UTF8Encoding(encoderShouldEmitUTF8Identifier: false);
        try
        {
            foreach (var (name, text) in files)
            {
                string final = Path.Combine(folder, name);
                string temp = Path.Combine(folder, $".{name}.{Guid.NewGuid():N}.tmp");
                temporary.Add((temp, final));
                File.WriteAllText(temp, text, utf8);
            }

            foreach (var (temp, final) in temporary)
            {
                File.Move(temp, final, overwrite: true);
            }
        }
        finally
        {
            foreach (var (temp, _) in temporary)
            {
                if (File.Exists(temp))
                {
                    File.Delete(temp);
                }
            }
        }

        return [.. temporary.Select(t => t.Final)];
    }

    /// <summary>Writes one file whole (see <see cref="WriteAll"/>).</summary>
    /// <param name="path">The file.</param>
    /// <param name="text">Its text.</param>
    public static void WriteWhole(string path, string text)
    {
        string full = Path.GetFullPath(path);
        string folder = Path.GetDirectoryName(full) ?? ".";
        if (!Directory.Exists(folder))
        {
            throw new DirectoryNotFoundException($"cannot write {path}: the folder {folder} does not exist");
        }

        WriteAll(folder, new Dictionary<string, string>(StringComparer.Ordinal) { [Path.GetFileName(full)] = text });
    }
}

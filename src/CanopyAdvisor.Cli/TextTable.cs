using System.Globalization;
using System.Text;

namespace CanopyAdvisor.Cli;

/// <summary>A plain-text table with a header row and right-aligned numeric columns, for terminal output.</summary>
internal sealed class TextTable
{
    private readonly string[] _headers;
    private readonly bool[] _rightAligned;
    private readonly List<string[]> _rows = [];

    /// <summary>Creates a table; a header starting with '&gt;' is right-aligned (the marker is not printed).</summary>
    public TextTable(params string[] headers)
    {
        _rightAligned = headers.Select(h => h.StartsWith('>')).ToArray();
        _headers = headers.Select(h => h.TrimStart('>')).ToArray();
    }

    public void Add(params string[] cells)
    {
        if (cells.Length != _headers.Length)
        {
            throw new ArgumentException($"expected {_headers.Length} cells, got {cells.Length}", nameof(cells));
        }

        _rows.Add(cells);
    }

    public override string ToString()
    {
        int[] widths = _headers.Select((h, i) => Math.Max(h.Length, _rows.Count == 0 ? 0 : _rows.Max(r => r[i].Length))).ToArray();
        var sb = new StringBuilder();
        AppendRow(sb, _headers, widths);
        sb.AppendLine(string.Join("  ", widths.Select(w => new string('-', w))));
        foreach (string[] row in _rows)
        {
            AppendRow(sb, row, widths);
        }

        return sb.ToString();
    }

    public static string Number(double value, int decimals) =>
        double.IsFinite(value) ? value.ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture) : "-";

    private void AppendRow(StringBuilder sb, string[] cells, int[] widths)
    {
        var line = new StringBuilder();
        for (int i = 0; i < cells.Length; i++)
        {
            if (i > 0)
            {
                line.Append("  ");
            }

            line.Append(_rightAligned[i] ? cells[i].PadLeft(widths[i]) : cells[i].PadRight(widths[i]));
        }

        sb.Append(line.ToString().TrimEnd()).Append('\n');
    }
}

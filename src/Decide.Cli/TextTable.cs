namespace Decide.Cli;

/// <summary>A plain-text table: columns padded to their widest cell, numbers right-aligned.</summary>
internal sealed class TextTable(params string[] headers)
{
    private readonly List<string[]> _rows = [];
    private readonly bool[] _right = new bool[headers.Length];

    /// <summary>Right-aligns the given columns (for numbers).</summary>
    public TextTable AlignRight(params int[] columns)
    {
        foreach (var column in columns)
        {
            _right[column] = true;
        }

        return this;
    }

    public void Add(params string[] cells) => _rows.Add(cells);

    public void Write(TextWriter output, string indent = "")
    {
        var widths = headers.Select((h, i) => _rows.Select(r => r[i].Length).Append(h.Length).Max()).ToArray();
        WriteRow(output, indent, headers, widths);
        foreach (var row in _rows)
        {
            WriteRow(output, indent, row, widths);
        }
    }

    private void WriteRow(TextWriter output, string indent, string[] cells, int[] widths)
    {
        var padded = cells.Select((c, i) => _right[i] ? c.PadLeft(widths[i]) : c.PadRight(widths[i]));
        output.WriteLine((indent + string.Join("  ", padded)).TrimEnd());
    }
}

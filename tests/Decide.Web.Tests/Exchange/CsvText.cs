using System.Text;

namespace Decide.Web.Tests.Exchange;

/// <summary>A strict RFC 4180 reader for checking the CSV the service writes (independent of its writer).</summary>
public static class CsvText
{
    /// <summary>Rows of cells; fails on a stray quote or a line end other than CRLF.</summary>
    public static List<string[]> Parse(string text)
    {
        var rows = new List<string[]>();
        var row = new List<string>();
        var cell = new StringBuilder();
        var i = 0;
        var quoted = false;
        while (i < text.Length)
        {
            var c = text[i];
            if (quoted)
            {
                if (c == '"' && i + 1 < text.Length && text[i + 1] == '"')
                {
                    cell.Append('"');
                    i += 2;
                }
                else if (c == '"')
                {
                    quoted = false;
                    i++;
                    Assert.True(i == text.Length || text[i] is ',' or '\r', $"a closing quote must end the cell (at {i})");
                }
                else
                {
                    cell.Append(c);
                    i++;
                }

                continue;
            }

            switch (c)
            {
                case '"':
                    Assert.True(cell.Length == 0, $"a quote inside an unquoted cell (at {i})");
                    quoted = true;
                    i++;
                    break;
                case ',':
                    row.Add(cell.ToString());
                    cell.Clear();
                    i++;
                    break;
                case '\r':
                    Assert.True(i + 1 < text.Length && text[i + 1] == '\n', $"a bare carriage return (at {i})");
                    row.Add(cell.ToString());
                    cell.Clear();
                    rows.Add([.. row]);
                    row.Clear();
                    i += 2;
                    break;
                case '\n':
                    Assert.Fail($"a bare line feed outside quotes (at {i})");
                    break;
                default:
                    cell.Append(c);
                    i++;
                    break;
            }
        }

        Assert.False(quoted, "the text ends inside a quoted cell");
        Assert.True(row.Count == 0 && cell.Length == 0, "the last row must end with CRLF");
        return rows;
    }

    /// <summary>A text cell's value as it was before the writer neutralised it: one leading single quote taken off.</summary>
    public static string Unescape(string cell) => cell.StartsWith('\'') ? cell[1..] : cell;
}

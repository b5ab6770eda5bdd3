namespace Decide.Web.Components.Pages.Inputs;

/// <summary>
/// The rating grid's keyboard, without any markup: which cell has the focus, how the arrow keys move it (skipping
/// bids that cannot be rated), and what a typed key means — a term's code (typed letter by letter, so "MG" works),
/// the n-th term by its digit, or Enter for the rationale.
/// </summary>
public sealed class GridKeyboard
{
    private readonly int _rows;
    private readonly int _columns;
    private readonly IReadOnlyList<string> _codes;
    private readonly Func<int, bool> _rateable;
    private string _typed = "";

    /// <param name="rows">Bids on the sheet.</param>
    /// <param name="columns">Criteria on the sheet.</param>
    /// <param name="codes">The rating scale's codes, least favourable first.</param>
    /// <param name="rateable">Whether a row (bid) can be rated; others are skipped.</param>
    public GridKeyboard(int rows, int columns, IReadOnlyList<string> codes, Func<int, bool> rateable)
    {
        _rows = rows;
        _columns = columns;
        _codes = codes;
        _rateable = rateable;
        Row = Enumerable.Range(0, rows).FirstOrDefault(rateable, -1);
        Column = Row < 0 || columns == 0 ? -1 : 0;
    }

    /// <summary>The focused row, or −1 when no row can be rated.</summary>
    public int Row { get; private set; }

    /// <summary>The focused column, or −1.</summary>
    public int Column { get; private set; }

    /// <summary>True when some cell can take the focus.</summary>
    public bool HasFocus => Row >= 0 && Column >= 0;

    /// <summary>Moves the focus to a cell (a click, or a link from the submission check); ignored for a row that cannot be rated.</summary>
    public bool FocusAt(int row, int column)
    {
        if (row < 0 || row >= _rows || column < 0 || column >= _columns || !_rateable(row))
        {
            return false;
        }

        if (row != Row || column != Column)
        {
            _typed = "";
        }

        (Row, Column) = (row, column);
        return true;
    }

    /// <summary>What a key pressed on the focused cell asks for. Keys with Ctrl, Alt or Meta are left to the browser.</summary>
    public GridCommand Press(string key, bool withModifier = false)
    {
        if (!HasFocus || withModifier)
        {
            return GridCommand.None;
        }

        switch (key)
        {
            case "ArrowUp":
                return Moved(Step(Row, -1), Column);
            case "ArrowDown":
                return Moved(Step(Row, +1), Column);
            case "ArrowLeft":
                return Moved(Row, Math.Max(0, Column - 1));
            case "ArrowRight":
                return Moved(Row, Math.Min(_columns - 1, Column + 1));
            case "Home":
                return Moved(Row, 0);
            case "End":
                return Moved(Row, _columns - 1);
            case "Enter":
            case "F2":
                _typed = "";
                return GridCommand.OpenEditor;
        }

        return key.Length == 1 && char.IsLetterOrDigit(key[0]) ? Typed(key) : GridCommand.None;
    }

    private GridCommand Moved(int row, int column)
    {
        if (row == Row && column == Column)
        {
            return GridCommand.None;
        }

        _typed = "";
        (Row, Column) = (row, column);
        return GridCommand.Moved;
    }

    /// <summary>The next rateable row from <paramref name="from"/> in <paramref name="direction"/>, or <paramref name="from"/> at the edge.</summary>
    private int Step(int from, int direction)
    {
        for (var r = from + direction; r >= 0 && r < _rows; r += direction)
        {
            if (_rateable(r))
            {
                return r;
            }
        }

        return from;
    }

    private GridCommand Typed(string key)
    {
        // A code is typed letter by letter: keep what was typed while it still begins some code.
        var candidate = _typed + key;
        if (!_codes.Any(c => c.StartsWith(candidate, StringComparison.OrdinalIgnoreCase)))
        {
            candidate = key;
        }

        if (_codes.Any(c => c.StartsWith(candidate, StringComparison.OrdinalIgnoreCase)))
        {
            _typed = candidate;
            var exact = _codes.FirstOrDefault(c => string.Equals(c, candidate, StringComparison.OrdinalIgnoreCase));
            return exact is null ? GridCommand.None : GridCommand.SetTerm(exact);
        }

        _typed = "";
        if (key[0] is >= '1' and <= '9' && key[0] - '1' < _codes.Count)
        {
            return GridCommand.SetTerm(_codes[key[0] - '1']);
        }

        return GridCommand.None;
    }
}

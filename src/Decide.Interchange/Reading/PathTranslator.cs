using System.Text;

namespace Decide.Interchange.Reading;

/// <summary>
/// Maps error paths from the model back into the file. When the reader leaves out an array element it cannot use
/// (an element that is not an object, a criterion without an id), the model's positions no longer match the
/// file's: the engine's <c>$.criteria[2]</c> may be the file's <c>$.criteria[3]</c>. This rewrites such indices.
/// </summary>
internal sealed class PathTranslator
{
    private readonly Dictionary<string, IReadOnlyList<int>> _maps = new(StringComparer.Ordinal);

    /// <summary>
    /// Records that element i of the model's array at <paramref name="modelPath"/> is element
    /// <paramref name="fileIndices"/>[i] in the file. Paths must be given in model terms (outer indices untranslated).
    /// </summary>
    public void Map(string modelPath, IReadOnlyList<int> fileIndices)
    {
        for (var i = 0; i < fileIndices.Count; i++)
        {
            if (fileIndices[i] != i)
            {
                _maps[modelPath] = fileIndices.ToArray();
                return;
            }
        }
    }

    /// <summary>The file's path for a path the engine reported.</summary>
    public string ToFile(string path)
    {
        if (_maps.Count == 0 || !path.StartsWith('$'))
        {
            return path;
        }

        var model = new StringBuilder("$");
        var file = new StringBuilder("$");
        var i = 1;
        while (i < path.Length)
        {
            var start = i;
            if (path[i] == '.')
            {
                i++;
                while (i < path.Length && path[i] != '.' && path[i] != '[')
                {
                    i++;
                }
            }
            else if (path[i] == '[' && i + 1 < path.Length && path[i + 1] == '\'')
            {
                i += 2;
                while (i < path.Length && path[i] != '\'')
                {
                    i += path[i] == '\\' ? 2 : 1;
                }

                i = Math.Min(path.Length, i + 2); // the closing quote and bracket
            }
            else if (path[i] == '[')
            {
                var close = path.IndexOf(']', i);
                if (close < 0 || !int.TryParse(path.AsSpan(i + 1, close - i - 1), out var index))
                {
                    return path; // not a path this class understands; leave it alone
                }

                var fileIndex = _maps.TryGetValue(model.ToString(), out var map) && index < map.Count ? map[index] : index;
                model.Append('[').Append(index).Append(']');
                file.Append('[').Append(fileIndex).Append(']');
                i = close + 1;
                continue;
            }
            else
            {
                return path;
            }

            model.Append(path, start, i - start);
            file.Append(path, start, i - start);
        }

        return file.ToString();
    }
}

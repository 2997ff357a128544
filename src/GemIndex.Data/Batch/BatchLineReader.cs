using System.Text;

namespace GemIndex.Data.Batch;

/// <summary>
/// Reads a batch input line by line without ever holding more than <see cref="MostCharacters"/> of one line: a
/// longer line is read past (not kept) and reported as too long, and the lines after it are read as usual. A byte
/// order mark at the very start is passed over (files and standard input alike).
/// </summary>
public sealed class BatchLineReader(TextReader input)
{
    /// <summary>The documented cap on one line: 1 MiB of text (1,048,576 characters; README "Batch format").</summary>
    public const int MostCharacters = 1 << 20;

    private readonly char[] _buffer = new char[16384];
    private int _start, _end;
    private bool _first = true;

    /// <summary>Characters consumed so far, line breaks included (for progress).</summary>
    public long Consumed { get; private set; }

    /// <summary>The next line, or null at the end; <paramref name="tooLong"/> is true (and the line null) when it exceeded the cap.</summary>
    public string? Next(out bool tooLong)
    {
        tooLong = false;
        var line = new StringBuilder();
        bool any = false;
        while (true)
        {
            if (_start == _end)
            {
                _end = input.Read(_buffer, 0, _buffer.Length);
                _start = 0;
                if (_end <= 0) { _end = 0; return any ? Finish(line, tooLong) : null; }
                if (_first && _buffer[0] == '\uFEFF') _start = 1;
                _first = false;
            }
            any = true;
            int newline = Array.IndexOf(_buffer, '\n', _start, _end - _start);
            int stop = newline < 0 ? _end : newline;
            int count = stop - _start;
            Consumed += count + (newline < 0 ? 0 : 1);
            if (!tooLong)
            {
                if (line.Length + count > MostCharacters) { tooLong = true; line.Clear(); }
                else line.Append(_buffer, _start, count);
            }
            _start = newline < 0 ? _end : newline + 1;
            if (newline >= 0) return Finish(line, tooLong);
        }
    }

    private static string? Finish(StringBuilder line, bool tooLong)
    {
        if (tooLong) return null;
        if (line.Length > 0 && line[^1] == '\r') line.Length--;
        return line.ToString();
    }
}

using GemIndex.Core.Bench;

namespace GemIndex.Data.Batch;

/// <summary>
/// One batch line read: the readings as given, the errors of its form (not JSON, not an object, no id, a lone
/// surrogate in a string), and the fields it holds that the format does not know and so were not read. The values
/// themselves are checked by Core's <see cref="BenchReader"/>.
/// </summary>
public sealed record BatchLine(BenchReadings Readings, IReadOnlyList<BenchFieldError> Errors)
{
    /// <summary>Fields the format does not know, in the order written; a field the user meant is lost unless they are told.</summary>
    public IReadOnlyList<UnreadField> Unread { get; init; } = [];

    /// <summary>
    /// The errors of the line's form and, read on, of every value that could be read: one pass names every fault (a
    /// refused "sg" hid an edge above the liquid limit). Empty when the line is sound.
    /// </summary>
    public IReadOnlyList<BenchFieldError> AllErrors() => Errors.Count == 0 ? [] : [.. Errors, .. BenchReader.Read(Readings).Errors];
}

/// <summary>A field of a batch line the format does not know: its path, and the known fields of that object it may have meant.</summary>
public sealed record UnreadField(string Path, IReadOnlyList<string> Meant, IReadOnlyList<string> Known)
{
    /// <summary>The warning for the answer: what was not read and what the format calls it.</summary>
    public string Message => Meant.Count > 0
        ? $"\"{Path}\" was not read: the batch format has no such field; did you mean {string.Join(" or ", Meant.Select(m => $"\"{m}\""))}?"
        : $"\"{Path}\" was not read: the batch format has no such field (here: {string.Join(", ", Known)}).";
}

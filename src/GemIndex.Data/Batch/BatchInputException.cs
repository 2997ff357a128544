namespace GemIndex.Data.Batch;

/// <summary>A batch line (or one field of it) that cannot be read; the message names the field by its path.</summary>
public sealed class BatchInputException(string field, string problem) : Exception($"{field}: {problem}")
{
    public string Field { get; } = field;
}

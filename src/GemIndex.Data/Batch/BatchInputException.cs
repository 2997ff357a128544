using GemIndex.Core.Bench;

namespace GemIndex.Data.Batch;

/// <summary>Readings (or one field of them) that cannot be read; the message names every bad field by its path.</summary>
public sealed class BatchInputException : Exception
{
    /// <summary>One bad field.</summary>
    public BatchInputException(string field, string problem) : this([new BenchFieldError(field, "", "", problem)]) { }

    /// <summary>Every bad field of one stone.</summary>
    public BatchInputException(IReadOnlyList<BenchFieldError> errors) : base(string.Join("; ", errors.Select(e => e.ToString())))
    {
        Errors = errors;
    }

    /// <summary>The bad fields, in order.</summary>
    public IReadOnlyList<BenchFieldError> Errors { get; }

    /// <summary>The first bad field's name.</summary>
    public string Field => Errors.Count > 0 ? Errors[0].Field : "";
}

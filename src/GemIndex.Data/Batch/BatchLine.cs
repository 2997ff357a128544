using GemIndex.Core.Bench;

namespace GemIndex.Data.Batch;

/// <summary>
/// One batch line read: the readings as given, and the errors of its form (not JSON, not an object, no id, a lone
/// surrogate in a string). The values themselves are checked by Core's <see cref="BenchReader"/>.
/// </summary>
public sealed record BatchLine(BenchReadings Readings, IReadOnlyList<BenchFieldError> Errors);

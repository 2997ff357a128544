namespace GemIndex.Cli.TextUi.Results;

/// <summary>
/// One row of the answer pane; <see cref="Candidate"/> is the candidate's index when the row names one (Enter opens its
/// detail). <see cref="PassedOver"/> marks a row between candidates' first rows, the rest of a candidate's name wrapped
/// under it or a species' heading: the arrows pass over it, so that each press moves one candidate.
/// </summary>
internal sealed record AnswerRow(string Text, int? Candidate = null, bool PassedOver = false);

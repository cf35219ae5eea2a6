namespace NetSolve.Model;

/// <summary>The probability that a patient finishing at <paramref name="From"/> goes next to <paramref name="To"/>.</summary>
/// <param name="From">Source unit id.</param>
/// <param name="To">Destination unit id (may equal <paramref name="From"/>: a repeat visit).</param>
/// <param name="Probability">In [0, 1]; the routes out of a unit add up to at most 1 and the rest leaves.</param>
public sealed record Route(string From, string To, double Probability);

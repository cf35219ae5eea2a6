namespace NetSolve.Rendering.Map;

/// <summary>One line of the map before layout: a route or a diversion, with its flow and the rate written on it.</summary>
/// <param name="From">Id of the unit it leaves.</param>
/// <param name="To">Id of the unit it enters.</param>
/// <param name="FromIndex">Position of <paramref name="From"/> in the file.</param>
/// <param name="ToIndex">Position of <paramref name="To"/> in the file.</param>
/// <param name="IsDiversion">True for patients diverted from a full unit.</param>
/// <param name="PerHour">Patients per hour along it.</param>
/// <param name="RateText">The rate as written on the map.</param>
internal sealed record MapFlowLine(string From, string To, int FromIndex, int ToIndex, bool IsDiversion, double PerHour, string RateText);

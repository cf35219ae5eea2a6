using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Presentation.Staffing;

/// <summary>One unit of a budget allocation, with what the budget columns read beside it.</summary>
/// <param name="Unit">Where the unit's extra servers went.</param>
/// <param name="Before">The unit solved as given.</param>
/// <param name="After">The unit solved with the servers placed; null when the budget cannot make every unit stable.</param>
/// <param name="TimeUnit">The network's time unit, named in every CSV row.</param>
public sealed record BudgetRow(UnitAllocation Unit, UnitResult Before, UnitResult? After, TimeUnit TimeUnit);

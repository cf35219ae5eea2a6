namespace NetSolve.Rendering.Map;

/// <summary>The layers of a large map: which lines return, each unit's connected group and layer, and the order within each layer.</summary>
/// <param name="IsReturn">For each line, whether it is a return route (closes a cycle of the routes, or a repeat visit).</param>
/// <param name="Component">Each unit's connected group, numbered from 0 in the order the groups were first reached.</param>
/// <param name="Layer">Each unit's layer within its group: one more than the deepest unit sending it patients along a line that is not a return.</param>
/// <param name="Layers">For each group, its layers, each the units in order across the map.</param>
internal sealed record MapLayering(
    IReadOnlyList<bool> IsReturn,
    IReadOnlyList<int> Component,
    IReadOnlyList<int> Layer,
    IReadOnlyList<IReadOnlyList<IReadOnlyList<int>>> Layers);

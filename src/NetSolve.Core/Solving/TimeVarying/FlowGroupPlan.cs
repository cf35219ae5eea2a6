using NetSolve.Model;

namespace NetSolve.Solving;

/// <summary>
/// One patient group prepared for the time-varying load: its external arrivals on the time grid, its routes and the
/// service stages of its patients at each unit. Groups share nothing but the units, so with unlimited servers their
/// loads simply add (Massey and Whitt 1993).
/// </summary>
/// <param name="ExternalByStep">Per unit, the external arrival rate per hour in each step (constant within a step), or null for none.</param>
/// <param name="Routing">The group's routes; its external rates mark the units where the group enters.</param>
/// <param name="Stages">Service stages of this group's patients at each unit.</param>
internal sealed record FlowGroupPlan(double[]?[] ExternalByStep, RoutingTable Routing, ServiceStages[] Stages);

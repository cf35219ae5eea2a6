namespace NetSolve.Solving;

/// <summary>Steady-state metrics of one unit holding at most K patients (M/M/c/K, or Erlang loss when K = c).</summary>
/// <remarks>Immutable. Every value is finite and not negative; waits and times are those of admitted patients.</remarks>
/// <param name="FullProbability">P(full) = p_K: the share of time the unit is full, which by PASTA is the share of arrivals refused.</param>
/// <param name="AdmittedPerHour">λ(1 − p_K): patients admitted per hour.</param>
/// <param name="BlockedPerHour">λ·p_K: patients per hour who find the unit full (turned away or diverted).</param>
/// <param name="Utilisation">Mean busy servers divided by the servers, in [0, 1].</param>
/// <param name="WaitProbability">The chance an admitted patient finds every server busy: Σ_{n=c}^{K−1} p_n / (1 − p_K).</param>
/// <param name="MeanQueue">Lq = Σ (n − c)⁺ p_n: mean patients waiting.</param>
/// <param name="MeanInUnit">L = Σ n p_n: mean patients in the unit, waiting and in service.</param>
/// <param name="MeanWaitHours">Wq = Lq / admitted rate (Little's law); 0 when nobody arrives.</param>
/// <param name="MeanTimeInUnitHours">W = L / admitted rate; the mean service time when nobody arrives.</param>
/// <param name="Method">How the values were computed: <see cref="FiniteCapacityFormulas.ErlangLossMethod"/> or <see cref="FiniteCapacityFormulas.MarkovianMethod"/>.</param>
public sealed record FiniteCapacityResult(
    double FullProbability,
    double AdmittedPerHour,
    double BlockedPerHour,
    double Utilisation,
    double WaitProbability,
    double MeanQueue,
    double MeanInUnit,
    double MeanWaitHours,
    double MeanTimeInUnitHours,
    string Method);

using NetSolve.Diagnostics;
using NetSolve.Model;

namespace NetSolve.Parsing;

/// <summary>The service keys of a unit or group override, read: mean, cv, and the distribution when one is named.</summary>
/// <param name="MeanHours">Mean service in hours (from <c>service</c>, or from <c>service_samples</c>).</param>
/// <param name="Cv">Coefficient of variation (from <c>service_cv</c>, the distribution's default, or the samples).</param>
/// <param name="Distribution">The distribution named by <c>service_distribution</c> or <c>service_samples</c>; null for the v1 meaning.</param>
/// <param name="KeyLocation">Where the distribution key is written, for warnings; null when there is none.</param>
internal sealed record ParsedService(double MeanHours, double Cv, ServiceDistribution? Distribution, SourceLocation? KeyLocation);

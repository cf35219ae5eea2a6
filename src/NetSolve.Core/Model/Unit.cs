namespace NetSolve.Model;

/// <summary>A hospital unit: its servers (beds, cubicles, scanners, clinicians) and its mean service time.</summary>
/// <param name="Id">The unit id from the file: letters, digits, <c>_</c> and <c>-</c>, starting with a letter.</param>
/// <param name="Label">The display name; the id when the file gives none.</param>
/// <param name="Servers">Servers working at once.</param>
/// <param name="MeanServiceHours">Mean time a patient holds a server, in hours; positive and finite.</param>
/// <param name="ServiceCv">Coefficient of variation of the service time; 1 is exponential.</param>
public sealed record Unit(string Id, string Label, Servers Servers, double MeanServiceHours, double ServiceCv = 1.0);

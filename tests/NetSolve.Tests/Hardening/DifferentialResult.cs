namespace NetSolve.Tests.Hardening;

/// <summary>What a differential run of the fast reader against YamlDotNet found.</summary>
internal sealed class DifferentialResult
{
    /// <summary>Mutated texts YamlDotNet rejected.</summary>
    public int ReferenceRejected { get; set; }

    /// <summary>Mutated texts the fast reader read itself (did not decline).</summary>
    public int FastAccepted { get; set; }

    /// <summary>Mutated texts the full reader (fast reader, checks and fallback) rejected with a located error.</summary>
    public int FullReaderRejected { get; set; }

    /// <summary>Mutated texts holding a character YAML 1.2 does not allow that YamlDotNet nevertheless read.</summary>
    public int NonPrintableYamlDotNetAccepted { get; set; }

    /// <summary>Each text where the readers part, described.</summary>
    public List<string> Disagreements { get; } = [];
}

namespace NetSolve.Diagnostics;

/// <summary>Stable diagnostic codes: NS01xx reading the file, NS02xx network rules.</summary>
public static class DiagnosticCodes
{
    /// <summary>The file is missing, a directory or unreadable.</summary>
    public const string Unreadable = "NS0101";

    /// <summary>The file is empty.</summary>
    public const string Empty = "NS0102";

    /// <summary>The text is not YAML.</summary>
    public const string NotYaml = "NS0103";

    /// <summary>A node has the wrong shape (a list where a mapping belongs, and so on).</summary>
    public const string WrongShape = "NS0104";

    /// <summary>An unknown key.</summary>
    public const string UnknownKey = "NS0105";

    /// <summary>A key given twice.</summary>
    public const string DuplicateKey = "NS0106";

    /// <summary>A required key is missing.</summary>
    public const string MissingKey = "NS0107";

    /// <summary>A value that does not parse or is out of range.</summary>
    public const string BadValue = "NS0108";

    /// <summary>The text is not valid UTF-8, or holds a control or bidirectional formatting character.</summary>
    public const string BadText = "NS0109";

    /// <summary>A reference to a unit that is not defined.</summary>
    public const string UnknownUnit = "NS0201";

    /// <summary>Routes out of a unit add up to more than 1.</summary>
    public const string RoutesOverOne = "NS0202";

    /// <summary>No positive external arrival rate.</summary>
    public const string NoArrivals = "NS0203";

    /// <summary>Reached units that patients can never leave.</summary>
    public const string NoExit = "NS0204";

    /// <summary>A unit id with characters the contract does not allow.</summary>
    public const string BadUnitId = "NS0205";

    /// <summary>Warning: a unit no patient reaches.</summary>
    public const string Unreached = "NS0251";

    /// <summary>Warning: a key the formulas do not use.</summary>
    public const string IgnoredByFormulas = "NS0252";

    /// <summary>Warning: return routes bring patients back to a unit so often that its routes apply several times per patient.</summary>
    public const string ReturnLoop = "NS0253";

    /// <summary>Warning: a service time or target written as a bare number, taken in the file's time unit.</summary>
    public const string BareNumber = "NS0254";

    /// <summary>Warning: a unit far above 100% utilisation, as a time written in the wrong unit makes it.</summary>
    public const string ImplausibleLoad = "NS0255";
}

namespace NetSolve.Scenarios;

/// <summary>Stable diagnostic codes of what-if changes and scenario files (NS04xx).</summary>
public static class ChangeCodes
{
    /// <summary>A <c>--set</c> text that does not follow the syntax.</summary>
    public const string BadOverride = "NS0401";

    /// <summary>A change names a unit that does not exist (or no longer exists).</summary>
    public const string UnknownUnit = "NS0402";

    /// <summary>A change's value is out of range (servers below 1, a negative factor, and so on).</summary>
    public const string BadValue = "NS0403";

    /// <summary>After a change, the routes out of a unit add up to more than 1.</summary>
    public const string RoutesOverOne = "NS0404";

    /// <summary>An added unit's id is taken or not valid.</summary>
    public const string BadNewUnit = "NS0405";

    /// <summary>The changed network breaks a network rule (no arrivals, a set of units with no exit).</summary>
    public const string BrokenNetwork = "NS0406";

    /// <summary>The scenario file's base network could not be read.</summary>
    public const string BadBase = "NS0407";
}

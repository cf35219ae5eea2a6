namespace NetSolve.Model;

/// <summary>The contract's key for each <see cref="TargetKind"/>: the same word in the file, on the command line and in outputs.</summary>
public static class TargetKeys
{
    /// <summary>The key written for all units at once in the file's <c>targets</c> section and on the command line.</summary>
    public const string AllUnits = "all_units";

    /// <summary>Every key, in <see cref="TargetKind"/> order.</summary>
    public static readonly IReadOnlyList<string> All = ["mean_wait", "mean_time_in_unit", "wait_over", "turned_away"];

    /// <summary>The key of <paramref name="kind"/>.</summary>
    public static string Of(TargetKind kind) => (int)kind >= 0 && (int)kind < All.Count
        ? All[(int)kind]
        : throw new ArgumentOutOfRangeException(nameof(kind), kind, "Unknown target kind.");
}

namespace NetSolve.Tests.Support;

/// <summary>The checked-out tree the tests run from.</summary>
internal static class Repository
{
    /// <summary>The folder holding NetSolve.sln, found above the test output folder.</summary>
    public static string Root { get; } = FindRoot();

    /// <summary>A path under <see cref="Root"/>, written with forward slashes.</summary>
    public static string Relative(string path) => Path.GetRelativePath(Root, path).Replace('\\', '/');

    private static string FindRoot()
    {
        var directory = new DirectoryInfo(AppContext.BaseDirectory);
        while (directory is not null && !File.Exists(Path.Combine(directory.FullName, "NetSolve.sln")))
        {
            directory = directory.Parent;
        }

        return directory?.FullName ?? throw new InvalidOperationException("NetSolve.sln not found above the test output folder");
    }
}

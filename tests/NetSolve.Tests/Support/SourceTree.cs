namespace NetSolve.Tests.Support;

/// <summary>The repository the tests were built from, for files a test reads or rewrites in place (golden files).</summary>
internal static class SourceTree
{
    /// <summary>The folder holding <c>NetSolve.sln</c>, found by walking up from the test output folder.</summary>
    /// <remarks>Found from the output folder, not the compiler's source path: CI builds map source paths to "/_/".</remarks>
    public static string Root { get; } = FindRoot();

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

namespace NetSolve.Tests.Support;

/// <summary>
/// Approved (golden) files: a test compares its output with a file in the source tree; on a mismatch the output is
/// written beside it as <c>*.received.*</c> (ignored by git) and the test fails saying how to approve it.
/// </summary>
/// <remarks>With the environment variable <c>NETSOLVE_APPROVE=1</c> the approved files are rewritten instead; review them in the diff.</remarks>
internal static class Approval
{
    /// <summary>The environment variable that, set to 1, rewrites approved files instead of comparing with them.</summary>
    public const string ApproveVariable = "NETSOLVE_APPROVE";

    /// <summary>True when this run rewrites approved files.</summary>
    public static bool IsApproving => Environment.GetEnvironmentVariable(ApproveVariable) == "1";

    /// <summary>Fails unless <paramref name="actual"/> equals the approved file; rewrites the file when approving.</summary>
    public static void Verify(string approvedPath, string actual) => AssertAll([Check(approvedPath, actual)]);

    /// <summary>Fails with every message that is not null, one paragraph each.</summary>
    public static void AssertAll(IEnumerable<string?> failures)
    {
        var messages = failures.OfType<string>().ToList();
        if (messages.Count > 0)
        {
            Assert.Fail(string.Join("\n\n", messages));
        }
    }

    /// <summary>
    /// Compares <paramref name="actual"/> with the approved file, byte for byte, and returns null when they agree or a
    /// message saying where they differ and how to approve. When approving (and <paramref name="mayApprove"/>), rewrites the file.
    /// </summary>
    /// <param name="approvedPath">The approved file in the source tree.</param>
    /// <param name="actual">What the test produced.</param>
    /// <param name="receivedTag">Added to the received file's name, so runs of one case under different settings keep apart.</param>
    /// <param name="mayApprove">False for runs that must only agree with the approved file, never write it.</param>
    public static string? Check(string approvedPath, string actual, string? receivedTag = null, bool mayApprove = true)
    {
        string received = ReceivedPath(approvedPath, receivedTag);
        if (IsApproving && mayApprove)
        {
            Directory.CreateDirectory(Path.GetDirectoryName(approvedPath)!);
            File.WriteAllText(approvedPath, actual);
            File.Delete(received);
            return null;
        }

        string? approved = File.Exists(approvedPath) ? File.ReadAllText(approvedPath) : null;
        if (approved == actual)
        {
            File.Delete(received);
            return null;
        }

        File.WriteAllText(received, actual);
        string where = approved is null ? "there is no approved file yet" : FirstDifference(approved, actual);
        return $"{Path.GetFileName(approvedPath)}: the output differs from the approved file ({where}).\n"
            + $"  approved: {approvedPath}\n"
            + $"  received: {received}\n"
            + $"If the new output is right, approve it: {ApproveVariable}=1 dotnet test, then review the approved files in the diff.";
    }

    /// <summary>The received file beside an approved one: <c>name.received.ext</c>, or <c>name.TAG.received.ext</c>.</summary>
    public static string ReceivedPath(string approvedPath, string? tag = null)
    {
        string folder = Path.GetDirectoryName(approvedPath)!;
        string stem = Path.GetFileNameWithoutExtension(approvedPath);
        string middle = tag is null ? ".received" : "." + tag + ".received";
        return Path.Combine(folder, stem + middle + Path.GetExtension(approvedPath));
    }

    private static string FirstDifference(string approved, string actual)
    {
        string[] expectedLines = approved.Split('\n');
        string[] actualLines = actual.Split('\n');
        for (int i = 0; i < Math.Min(expectedLines.Length, actualLines.Length); i++)
        {
            if (expectedLines[i] != actualLines[i])
            {
                return FormattableString.Invariant($"first at line {i + 1}: approved \"{Shorten(expectedLines[i])}\", received \"{Shorten(actualLines[i])}\"");
            }
        }

        return FormattableString.Invariant($"the approved file has {expectedLines.Length} lines, the output {actualLines.Length}");
    }

    private static string Shorten(string line) => line.Length <= 160 ? line : line[..160] + "...";
}

namespace NetSolve.Tests.Docs;

/// <summary>
/// Turns the path arguments of a documented command, written relative to the repository root, into paths the
/// in-process run can use: inputs from the work folder when an earlier command wrote them there, else from the
/// repository; outputs into the work folder (their folder made there when the repository has it, as the command
/// would find it from the root); <c>*</c> patterns expanded like the shell, in file name order.
/// </summary>
/// <param name="root">The repository root, where the documents' commands are run from.</param>
/// <param name="work">The temporary folder that stands in for the root for written files.</param>
internal sealed class PathRewriter(string root, string work)
{
    private static readonly string[] OutputOptions = ["-o", "--output"];

    /// <summary>The arguments with every path rewritten.</summary>
    public List<string> Arguments(IReadOnlyList<ShellWord> words)
    {
        var arguments = new List<string>();
        for (int index = 0; index < words.Count; index++)
        {
            string text = words[index].Text;
            if (OutputOptions.Contains(text, StringComparer.Ordinal) && index + 1 < words.Count)
            {
                arguments.Add(text);
                arguments.Add(Output(words[++index].Text));
            }
            else if (text.StartsWith("--output=", StringComparison.Ordinal))
            {
                arguments.Add(string.Concat("--output=", Output(text["--output=".Length..])));
            }
            else if (words[index].IsPattern)
            {
                arguments.AddRange(Expand(text));
            }
            else
            {
                arguments.Add(Input(text));
            }
        }

        return arguments;
    }

    /// <summary>Where a file the command writes goes: the same place under the work folder.</summary>
    public string Output(string path)
    {
        string relative = Relative(path);
        string target = Path.GetFullPath(Path.Combine(work, relative));
        if (!target.StartsWith(work + Path.DirectorySeparatorChar, StringComparison.Ordinal))
        {
            throw new FormatException(string.Concat("writes '", path, "', outside the repository"));
        }

        string folder = Path.GetDirectoryName(relative) ?? "";
        if (folder.Length > 0 && Directory.Exists(Path.Combine(root, folder)))
        {
            Directory.CreateDirectory(Path.Combine(work, folder));
        }

        return target;
    }

    private string Input(string text)
    {
        if (text.StartsWith('-') || text.Length == 0)
        {
            return text;
        }

        string relative = Relative(text);
        string written = Path.Combine(work, relative);
        string bundled = Path.Combine(root, relative);
        return File.Exists(written) ? written : File.Exists(bundled) ? bundled : text;
    }

    private List<string> Expand(string pattern)
    {
        string relative = Relative(pattern);
        string folder = Path.GetDirectoryName(relative) ?? "";
        string name = Path.GetFileName(relative);
        if (folder.Contains('*', StringComparison.Ordinal) || folder.Contains('?', StringComparison.Ordinal))
        {
            throw new FormatException(string.Concat("'", pattern, "': a pattern in a folder name is not expanded by the test"));
        }

        var matches = new[] { work, root }
            .Select(baseFolder => Path.Combine(baseFolder, folder))
            .Where(Directory.Exists)
            .SelectMany(full => Directory.EnumerateFiles(full, name))
            .DistinctBy(Path.GetFileName, StringComparer.Ordinal)
            .OrderBy(Path.GetFileName, StringComparer.Ordinal)
            .ToList();
        return matches.Count > 0 ? matches : throw new FormatException(string.Concat("'", pattern, "' matches no file"));
    }

    private string Relative(string path) => Path.IsPathRooted(path) ? Path.GetRelativePath(root, path) : path;
}

using System.Globalization;
using System.Security.Cryptography;
using System.Text;

namespace NetSolve.Tests.TreeRules;

/// <summary>Finds words of a tree whose lowercase SHA-256 is on a deny list.</summary>
/// <remarks>
/// A word is a run of letters and digits. Two neighbouring words are also checked written together, so a name split
/// by a space, hyphen or capital letter is still found. Only text files are read.
/// </remarks>
internal static class DeniedWordScanner
{
    /// <summary>The parts of the tree that must stay free of denied words.</summary>
    public static readonly string[] CheckedParts = ["src", "tests", "docs", "networks", "README.md"];

    private static readonly HashSet<string> TextExtensions = new(StringComparer.OrdinalIgnoreCase)
    {
        ".cs", ".md", ".yaml", ".yml", ".csv", ".txt", ".json", ".csproj", ".props", ".targets", ".html", ".svg",
        ".dot", ".sh", ".py", ".xml", ".editorconfig", ".sha256",
    };

    private static readonly HashSet<string> SkippedFolders = new(StringComparer.Ordinal) { "bin", "obj", "artifacts", "node_modules" };

    /// <summary>The hashes in a deny-list file: one lowercase hex SHA-256 per line, '#' comments.</summary>
    public static HashSet<string> ReadHashes(string path) =>
        new(
            File.ReadLines(path)
                .Select(line => line.Split('#')[0].Trim())
                .Where(line => line.Length > 0),
            StringComparer.Ordinal);

    /// <summary>Every text file under <paramref name="root"/> in <see cref="CheckedParts"/>.</summary>
    public static IEnumerable<string> CheckedFiles(string root)
    {
        foreach (string part in CheckedParts)
        {
            string path = Path.Combine(root, part);
            if (File.Exists(path))
            {
                yield return path;
            }
            else if (Directory.Exists(path))
            {
                foreach (string file in FilesUnder(path))
                {
                    yield return file;
                }
            }
        }
    }

    /// <summary>"file:line: denied word" for each hit in <paramref name="files"/>; empty when the files are clean.</summary>
    public static List<string> Find(IEnumerable<string> files, IReadOnlySet<string> deniedHashes)
    {
        var hits = new List<string>();
        var cleanWords = new HashSet<string>(StringComparer.Ordinal);
        foreach (string file in files)
        {
            int lineNumber = 0;
            foreach (string line in File.ReadLines(file))
            {
                lineNumber++;
                List<string> words = Words(line);
                for (int i = 0; i < words.Count; i++)
                {
                    if (IsDenied(words[i], deniedHashes, cleanWords)
                        || (i + 1 < words.Count && IsDenied(words[i] + words[i + 1], deniedHashes, cleanWords)))
                    {
                        hits.Add(string.Create(CultureInfo.InvariantCulture, $"{file}:{lineNumber}: a word on the deny list (tests/NetSolve.Tests/TreeRules/denied-words.sha256)"));
                        break;
                    }
                }
            }
        }

        return hits;
    }

    /// <summary>The lowercase SHA-256 of <paramref name="word"/>, as hex.</summary>
    public static string Hash(string word) =>
        Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(word.ToLowerInvariant())));

    private static bool IsDenied(string word, IReadOnlySet<string> deniedHashes, HashSet<string> cleanWords)
    {
        if (cleanWords.Contains(word))
        {
            return false;
        }

        if (deniedHashes.Contains(Hash(word)))
        {
            return true;
        }

        cleanWords.Add(word);
        return false;
    }

    /// <summary>Lowercase runs of letters and digits; a capital after a lowercase letter starts a new word.</summary>
    private static List<string> Words(string line)
    {
        var words = new List<string>();
        var word = new StringBuilder();
        char previous = ' ';
        foreach (char c in line)
        {
            bool startsNewWord = char.IsUpper(c) && char.IsLower(previous);
            if (!char.IsLetterOrDigit(c) || startsNewWord)
            {
                Flush(word, words);
            }

            if (char.IsLetterOrDigit(c))
            {
                word.Append(char.ToLowerInvariant(c));
            }

            previous = c;
        }

        Flush(word, words);
        return words;
    }

    private static void Flush(StringBuilder word, List<string> words)
    {
        if (word.Length > 0)
        {
            words.Add(word.ToString());
            word.Clear();
        }
    }

    private static IEnumerable<string> FilesUnder(string folder)
    {
        foreach (string file in Directory.EnumerateFiles(folder))
        {
            if (TextExtensions.Contains(Path.GetExtension(file)))
            {
                yield return file;
            }
        }

        foreach (string child in Directory.EnumerateDirectories(folder))
        {
            string name = Path.GetFileName(child);
            if (!SkippedFolders.Contains(name) && !name.StartsWith('.'))
            {
                foreach (string file in FilesUnder(child))
                {
                    yield return file;
                }
            }
        }
    }
}

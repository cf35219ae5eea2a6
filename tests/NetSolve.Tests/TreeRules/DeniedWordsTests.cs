namespace NetSolve.Tests.TreeRules;

/// <summary>
/// The project's rule on original work: no existing product made for NetSolve's job is named in the tree. The deny
/// list holds hashes only, so the planted words below are harmless stand-ins added to the list for the test.
/// </summary>
public class DeniedWordsTests
{
    private const string PlantedWord = "quokkaplanner";

    private static readonly string ListPath = Path.Combine(RepositoryRoot(), "tests", "NetSolve.Tests", "TreeRules", "denied-words.sha256");

    [Fact]
    public void No_file_of_the_tree_contains_a_denied_word()
    {
        var files = DeniedWordScanner.CheckedFiles(RepositoryRoot()).ToList();
        var hits = DeniedWordScanner.Find(files, DeniedWordScanner.ReadHashes(ListPath));

        Assert.True(files.Count > 100, $"only {files.Count} files were checked: the tree was not found");
        Assert.Empty(hits);
    }

    [Fact]
    public void The_deny_list_holds_only_lowercase_sha256_hashes()
    {
        var hashes = DeniedWordScanner.ReadHashes(ListPath);

        Assert.NotEmpty(hashes);
        Assert.All(hashes, hash => Assert.Matches("^[0-9a-f]{64}$", hash));
    }

    [Theory]
    [InlineData("Compared with quokkaplanner, the ward waits less.")]
    [InlineData("See the QuokkaPlanner manual.")]
    [InlineData("Built in Quokka Planner 7.")]
    [InlineData("a quokka-planner export")]
    public void A_word_planted_in_a_copy_of_the_readme_is_found_with_its_line(string plantedLine)
    {
        string folder = Directory.CreateTempSubdirectory("netsolve-deny-").FullName;
        try
        {
            string copy = Path.Combine(folder, "README.md");
            var lines = File.ReadAllLines(Path.Combine(RepositoryRoot(), "README.md")).ToList();
            lines.Insert(3, plantedLine);
            File.WriteAllLines(copy, lines);
            var denied = DeniedWordScanner.ReadHashes(ListPath);
            denied.Add(DeniedWordScanner.Hash(PlantedWord));

            var hits = DeniedWordScanner.Find([copy], denied);

            Assert.Equal([$"{copy}:4: a word on the deny list (tests/NetSolve.Tests/TreeRules/denied-words.sha256)"], hits);
        }
        finally
        {
            Directory.Delete(folder, recursive: true);
        }
    }

    [Fact]
    public void The_unchanged_copy_of_the_readme_passes_the_same_list()
    {
        var denied = DeniedWordScanner.ReadHashes(ListPath);
        denied.Add(DeniedWordScanner.Hash(PlantedWord));

        Assert.Empty(DeniedWordScanner.Find([Path.Combine(RepositoryRoot(), "README.md")], denied));
    }

    private static string RepositoryRoot()
    {
        var directory = new DirectoryInfo(AppContext.BaseDirectory);
        while (directory is not null && !File.Exists(Path.Combine(directory.FullName, "NetSolve.sln")))
        {
            directory = directory.Parent;
        }

        return directory?.FullName ?? throw new InvalidOperationException("NetSolve.sln not found above the test output folder");
    }
}

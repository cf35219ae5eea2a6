using System.Text;
using NetSolve.Cli;

namespace NetSolve.Tests.Hardening;

/// <summary>Output files are written whole, under a name nobody can guess, never through a planted link.</summary>
public sealed class AtomicFileTests : IDisposable
{
    private readonly DirectoryInfo _folder = Directory.CreateTempSubdirectory("netsolve-atomic-");

    private string Target => Path.Combine(_folder.FullName, "map.svg");

    public void Dispose() => _folder.Delete(recursive: true);

    [Fact]
    public void A_link_planted_at_the_old_predictable_temporary_name_is_left_untouched()
    {
        string victim = Path.Combine(_folder.FullName, "victim.txt");
        File.WriteAllText(victim, "precious");
        string planted = Path.Combine(_folder.FullName, ".map.svg.tmp");
        File.CreateSymbolicLink(planted, victim);

        AtomicFile.Write(Target, Text("new map"));

        Assert.Equal("precious", File.ReadAllText(victim));
        Assert.Equal(victim, new FileInfo(planted).LinkTarget);
        Assert.Equal("new map", File.ReadAllText(Target));
    }

    [Fact]
    public void A_link_planted_at_the_target_is_replaced_and_not_written_through()
    {
        string victim = Path.Combine(_folder.FullName, "victim.txt");
        File.WriteAllText(victim, "precious");
        File.CreateSymbolicLink(Target, victim);

        AtomicFile.Write(Target, Text("new map"));

        Assert.Equal("precious", File.ReadAllText(victim));
        Assert.Null(new FileInfo(Target).LinkTarget);
        Assert.Equal("new map", File.ReadAllText(Target));
    }

    [Fact]
    public void Each_write_uses_a_new_unpredictable_temporary_name_beside_the_target()
    {
        var names = new List<string>();
        for (int i = 0; i < 3; i++)
        {
            AtomicFile.Write(Target, stream => names.Add(((FileStream)stream).Name));
        }

        Assert.All(names, name => Assert.Equal(_folder.FullName, Path.GetDirectoryName(name)));
        Assert.All(names, name => Assert.True(AtomicFile.IsTemporaryName(Path.GetFileName(name), Target), name));
        Assert.Equal(3, names.Distinct(StringComparer.Ordinal).Count());
    }

    [Fact]
    public void The_temporary_file_is_gone_after_a_successful_write()
    {
        AtomicFile.Write(Target, Text("map"));

        Assert.Equal("map.svg", FilesInFolder());
    }

    [Fact]
    public void The_temporary_file_is_gone_and_the_old_output_kept_after_a_failed_write()
    {
        File.WriteAllText(Target, "old map");

        Assert.Throws<InvalidOperationException>(() => AtomicFile.Write(Target, stream =>
        {
            stream.Write("half a ma"u8);
            throw new InvalidOperationException("the renderer failed");
        }));

        Assert.Equal("map.svg", FilesInFolder());
        Assert.Equal("old map", File.ReadAllText(Target));
    }

    [Fact]
    public void Two_writers_of_the_same_output_both_finish_and_the_file_is_one_whole_output()
    {
        string first = new('a', 300_000);
        string second = new('b', 200_000);
        for (int round = 0; round < 10; round++)
        {
            using var start = new Barrier(2);
            var writers = new[] { first, second }.Select(content => new Thread(() =>
            {
                start.SignalAndWait();
                AtomicFile.Write(Target, Text(content));
            })).ToList();
            writers.ForEach(thread => thread.Start());
            writers.ForEach(thread => thread.Join());

            string written = File.ReadAllText(Target);
            Assert.True(written == first || written == second, "the output is neither writer's whole file");
            Assert.Equal("map.svg", FilesInFolder());
        }
    }

    [Fact]
    public void A_temporary_file_left_by_a_killed_run_is_deleted_once_an_hour_old_and_a_fresh_one_is_kept()
    {
        string stale = Path.Combine(_folder.FullName, ".map.svg.0123456789abcdef.tmp");
        string fresh = Path.Combine(_folder.FullName, ".map.svg.fedcba9876543210.tmp");
        string other = Path.Combine(_folder.FullName, ".other.svg.0123456789abcdef.tmp");
        foreach (string path in new[] { stale, fresh, other })
        {
            File.WriteAllText(path, "half a ma");
        }

        // The file system's own clock, as AtomicFile reads it: no wall clock in tests either.
        DateTime now = File.GetLastWriteTimeUtc(fresh);
        File.SetLastWriteTimeUtc(stale, now - TimeSpan.FromHours(2));
        File.SetLastWriteTimeUtc(other, now - TimeSpan.FromHours(2));

        AtomicFile.Write(Target, Text("map"));

        Assert.False(File.Exists(stale));
        Assert.True(File.Exists(fresh));
        Assert.True(File.Exists(other));
    }

    [Theory]
    [InlineData(".map.svg.0123456789abcdef.tmp", true)]
    [InlineData(".map.svg.tmp", false)]
    [InlineData(".map.svg.0123456789ABCDEF.tmp", false)]
    [InlineData(".map.svg.0123456789abcde.tmp", false)]
    [InlineData("map.svg.0123456789abcdef.tmp", false)]
    [InlineData(".other.svg.0123456789abcdef.tmp", false)]
    public void Only_our_own_temporary_names_for_the_same_output_count_as_ours(string name, bool ours) =>
        Assert.Equal(ours, AtomicFile.IsTemporaryName(name, Target));

    private string FilesInFolder() => string.Join(' ', _folder.EnumerateFiles().Select(file => file.Name).Order(StringComparer.Ordinal));

    private static Action<Stream> Text(string content) => stream => stream.Write(Encoding.UTF8.GetBytes(content));
}

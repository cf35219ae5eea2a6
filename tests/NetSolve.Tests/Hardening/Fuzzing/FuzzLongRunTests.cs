using System.Globalization;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Hardening.Fuzzing;

/// <summary>
/// The long fuzzing run: NETSOLVE_FUZZ_INPUTS inputs (100,000 unless set) from NETSOLVE_FUZZ_SEED (13 unless set);
/// NETSOLVE_FUZZ_WORKERS inputs at once (the processor count unless set), starting none after NETSOLVE_FUZZ_MINUTES
/// (no limit unless set; the summary then says how many ran); writes its summary into docs/hardening.md and each failure class's minimised input under artifacts/fuzz-findings/.
/// </summary>
public sealed class FuzzLongRunTests
{
    private const string Command = "dotnet test -- --filter-trait \"Category=Long\" --explicit only --filter-class '*FuzzLongRunTests*'";

    [Fact(Explicit = true)]
    [Trait("Category", "Long")]
    public void A_hundred_thousand_mutated_inputs_keep_the_contract()
    {
        int count = Setting("NETSOLVE_FUZZ_INPUTS", 100_000);
        int seed = Setting("NETSOLVE_FUZZ_SEED", 13);
        int minutes = Setting("NETSOLVE_FUZZ_MINUTES", 0);
        string progressFile = Path.Combine(Repository.Root, "artifacts", "fuzz-progress.log");
        Directory.CreateDirectory(Path.GetDirectoryName(progressFile)!);
        File.WriteAllText(progressFile, string.Empty);

        var report = FuzzCampaign.Run(count, seed, line =>
        {
            File.AppendAllText(progressFile, line + "\n");
            TestContext.Current.TestOutputHelper?.WriteLine(line);
        }, progressEvery: 250, minimise: true,
            workers: Setting("NETSOLVE_FUZZ_WORKERS", Environment.ProcessorCount), timeLimit: minutes > 0 ? TimeSpan.FromMinutes(minutes) : null);

        FindingStore.Save(report, Path.Combine(Repository.Root, "artifacts", "fuzz-findings"));
        string command = count == 100_000 && seed == 13 ? Command : string.Create(CultureInfo.InvariantCulture, $"NETSOLVE_FUZZ_INPUTS={count} NETSOLVE_FUZZ_SEED={seed} {Command}");
        foreach (string name in (string[])["NETSOLVE_FUZZ_MINUTES", "NETSOLVE_FUZZ_WORKERS"])
        {
            if (Environment.GetEnvironmentVariable(name) is { Length: > 0 } value)
            {
                command = name + "=" + value + " " + command;
            }
        }

        string document = Path.Combine(Repository.Root, "docs", "hardening.md");
        File.WriteAllText(document, FuzzSummary.Replace(File.ReadAllText(document), FuzzSummary.Markdown(report, command, seed)));

        Assert.True(report.Classes.Count == 0, string.Create(CultureInfo.InvariantCulture, $"{report.Classes.Count} failure classes; see docs/hardening.md and artifacts/fuzz-findings/"));
    }

    private static int Setting(string name, int fallback) =>
        int.TryParse(Environment.GetEnvironmentVariable(name), NumberStyles.Integer, CultureInfo.InvariantCulture, out int value) && value > 0 ? value : fallback;
}

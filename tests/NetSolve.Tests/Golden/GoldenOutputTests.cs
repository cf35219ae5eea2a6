using NetSolve.Tests.Support;

namespace NetSolve.Tests.Golden;

/// <summary>
/// Every command × format on the bundled examples, compared byte for byte with its approved files in
/// <c>Golden/Approved/</c>, under the invariant culture and a decimal-comma culture. DEVELOPERS.md says how to approve.
/// </summary>
[Collection(CultureSensitiveCollection.Name)]
public sealed class GoldenOutputTests
{
    private static readonly string ApprovedFolder = Path.Combine(SourceTree.Root, "tests", "NetSolve.Tests", "Golden", "Approved");

    public static TheoryData<string, string> Cases()
    {
        var data = new TheoryData<string, string>();
        foreach (var golden in GoldenCases.All)
        {
            foreach (string culture in TestCultures.All)
            {
                data.Add(golden.Id, culture);
            }
        }

        return data;
    }

    // Common practice: approved-file (golden) testing; the approved files were reviewed by eye when approved.
    [Theory]
    [MemberData(nameof(Cases))]
    public void The_output_is_the_approved_one_whatever_the_current_culture(string id, string culture)
    {
        var golden = GoldenCases.Find(id);
        GoldenOutput actual;
        using (TestCultures.Use(culture))
        {
            actual = GoldenOutput.Run(golden);
        }

        if (culture == TestCultures.Invariant)
        {
            Approval.AssertAll([
                Approval.Check(Path.Combine(ApprovedFolder, golden.ApprovedFileName), actual.Output),
                Approval.Check(Path.Combine(ApprovedFolder, golden.ConsoleFileName), actual.Console),
            ]);
        }
        else if (Approval.IsApproving)
        {
            // The invariant run may not have rewritten the approved files yet: compare with a fresh invariant run.
            GoldenOutput invariant;
            using (TestCultures.Use(TestCultures.Invariant))
            {
                invariant = GoldenOutput.Run(golden);
            }

            Assert.Equal(invariant, actual);
        }
        else
        {
            Approval.AssertAll([
                Approval.Check(Path.Combine(ApprovedFolder, golden.ApprovedFileName), actual.Output, culture, mayApprove: false),
                Approval.Check(Path.Combine(ApprovedFolder, golden.ConsoleFileName), actual.Console, culture, mayApprove: false),
            ]);
        }
    }

    [Fact]
    public void Every_approved_file_belongs_to_a_case()
    {
        var expected = GoldenCases.All.SelectMany(golden => new[] { golden.ApprovedFileName, golden.ConsoleFileName }).ToHashSet(StringComparer.Ordinal);
        var stale = Directory.EnumerateFiles(ApprovedFolder)
            .Select(Path.GetFileName)
            .Where(name => !name!.Contains(".received.", StringComparison.Ordinal) && !expected.Contains(name!))
            .Order(StringComparer.Ordinal);

        Assert.Empty(stale);
    }
}

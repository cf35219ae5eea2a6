using System.Globalization;
using System.Text.Json;

namespace NetSolve.Tests.Hardening.Fuzzing;

/// <summary>
/// Saves the example input of each failure class as a replayable case: its files, <c>command.json</c> (the arguments,
/// <c>{dir}</c> standing for the case's folder) and <c>finding.txt</c>; a fixed one becomes a test under Hardening/Corpus.
/// </summary>
internal static class FindingStore
{
    /// <summary>Writes every class of <paramref name="report"/> under <paramref name="folder"/>, emptied first.</summary>
    public static void Save(FuzzReport report, string folder)
    {
        if (Directory.Exists(folder))
        {
            Directory.Delete(folder, recursive: true);
        }

        int number = 0;
        foreach (var (failureClass, (count, example, finding)) in report.Classes)
        {
            string caseFolder = Path.Combine(folder, string.Create(CultureInfo.InvariantCulture, $"{++number:000}-{failureClass.Kind}"));
            Directory.CreateDirectory(caseFolder);
            foreach (var file in example.Files)
            {
                string path = Path.Combine(caseFolder, file.RelativePath);
                Directory.CreateDirectory(Path.GetDirectoryName(path)!);
                File.WriteAllBytes(path, file.Content);
            }

            File.WriteAllText(Path.Combine(caseFolder, "command.json"), JsonSerializer.Serialize(example.Arguments) + "\n");
            File.WriteAllText(Path.Combine(caseFolder, "finding.txt"), string.Create(CultureInfo.InvariantCulture, $"{failureClass.Kind}, seen {count} times: {finding.Detail}\n"));
        }
    }
}

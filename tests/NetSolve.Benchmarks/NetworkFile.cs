using System.Globalization;
using NetSolve.Model;
using NetSolve.Parsing;

namespace NetSolve.Benchmarks;

/// <summary>Reads a network file for a benchmark mode, which only ever runs on valid files.</summary>
internal static class NetworkFile
{
    public static Network Read(string path) =>
        NetworkReader.ReadFile(path).Network
            ?? throw new InvalidOperationException(string.Create(CultureInfo.InvariantCulture, $"{path} is not a valid network file"));
}

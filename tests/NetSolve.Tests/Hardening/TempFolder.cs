namespace NetSolve.Tests.Hardening;

/// <summary>A fresh folder under the system's temporary folder, deleted on dispose.</summary>
internal sealed class TempFolder : IDisposable
{
    public TempFolder()
    {
        Path = Directory.CreateTempSubdirectory("netsolve-input-").FullName;
    }

    public string Path { get; }

    /// <summary>Writes <paramref name="bytes"/> to <paramref name="name"/> in the folder and returns its path.</summary>
    public string Write(string name, byte[] bytes)
    {
        string path = System.IO.Path.Combine(Path, name);
        File.WriteAllBytes(path, bytes);
        return path;
    }

    public void Dispose() => Directory.Delete(Path, recursive: true);
}

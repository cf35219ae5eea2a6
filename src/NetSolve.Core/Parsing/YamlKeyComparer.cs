namespace NetSolve.Parsing;

/// <summary>Compares keys of a <see cref="YamlTree"/>, given by their indices, by their text: no string per key.</summary>
internal sealed class YamlKeyComparer(YamlTree tree) : IEqualityComparer<int>
{
    public bool Equals(int x, int y) => tree.Text(x).SequenceEqual(tree.Text(y));

    public int GetHashCode(int obj) => string.GetHashCode(tree.Text(obj), StringComparison.Ordinal);
}

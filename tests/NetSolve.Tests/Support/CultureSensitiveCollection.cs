namespace NetSolve.Tests.Support;

/// <summary>Tests that change the current culture: they run one at a time, after and apart from every other test.</summary>
[CollectionDefinition(Name, DisableParallelization = true)]
public sealed class CultureSensitiveCollection
{
    /// <summary>The collection's name, for <c>[Collection(CultureSensitiveCollection.Name)]</c>.</summary>
    public const string Name = "Culture-sensitive tests";
}

namespace NetSolve.Tests.Architecture;

/// <summary>One use of a NetSolve name by code in a NetSolve namespace.</summary>
/// <param name="FromNamespace">The namespace of the code that uses the name.</param>
/// <param name="ToName">The name used, qualified from <c>NetSolve</c> (a namespace, a type or a member).</param>
/// <param name="Where">Where the use is: <c>file:line</c> for source, the type's full name for compiled code.</param>
internal sealed record NamespaceReference(string FromNamespace, string ToName, string Where);

namespace NetSolve.Parsing.Values;

/// <summary>A value read from the text a planner wrote, or why it could not be read.</summary>
/// <typeparam name="T">The kind of value: hours, events per hour, a probability, a factor, <see cref="Model.Servers"/>.</typeparam>
/// <remarks>
/// Immutable. <c>default(ValueResult&lt;T&gt;)</c> is not valid and says that nothing was read, so it never passes
/// for a value. The error is one line, naming the text as written and, where it helps, how to write it; a caller
/// adds the field with <see cref="MessageFor"/>, so every entry point words the same mistake the same way.
/// </remarks>
public readonly record struct ValueResult<T>
    where T : struct
{
    private readonly T _value;
    private readonly string? _error;

    private ValueResult(T value, string? error, bool isValid)
    {
        _value = value;
        _error = error;
        IsValid = isValid;
    }

    /// <summary>True when the text held a value of this kind.</summary>
    public bool IsValid { get; }

    /// <summary>The value.</summary>
    /// <exception cref="InvalidOperationException">The text held no value (<see cref="IsValid"/> is false).</exception>
    public T Value => IsValid ? _value : throw new InvalidOperationException("No value was read: " + Error);

    /// <summary>Why the text held no value, without the field (e.g. <c>'45mins' is not a duration (…)</c>).</summary>
    /// <exception cref="InvalidOperationException">The text held a value.</exception>
    public string Error => IsValid
        ? throw new InvalidOperationException("The text held a value, so there is no error.")
        : _error ?? "no value was read";

    /// <summary>The one-line message for the field <paramref name="label"/>: <c>label: error</c>.</summary>
    /// <exception cref="InvalidOperationException">The text held a value.</exception>
    public string MessageFor(string label) => $"{label}: {Error}";

    internal static ValueResult<T> Valid(T value) => new(value, null, isValid: true);

    internal static ValueResult<T> Invalid(string error) => new(default, error, isValid: false);
}

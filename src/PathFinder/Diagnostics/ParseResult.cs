using System.Diagnostics.CodeAnalysis;

namespace PathFinder.Diagnostics;

/// <summary>The outcome of reading user text: a value, or a located failure. Never throws for bad input.</summary>
/// <typeparam name="T">The type of value read.</typeparam>
public sealed class ParseResult<T>
    where T : notnull
{
    private readonly T? _value;

    private ParseResult(T? value, ParseFailure? failure)
    {
        _value = value;
        Failure = failure;
    }

    /// <summary>The failure, when reading did not succeed.</summary>
    public ParseFailure? Failure { get; }

    /// <summary>Whether a value was read.</summary>
    [MemberNotNullWhen(false, nameof(Failure))]
    public bool Success => Failure is null;

    /// <summary>The value read; throws <see cref="FormatException"/> with the failure's message when reading failed.</summary>
    public T Value => Failure is null ? _value! : throw new FormatException($"{Failure.Message} (at offset {Failure.Offset})");

    /// <summary>Creates a successful result.</summary>
    public static ParseResult<T> Ok(T value) => new(value, null);

    /// <summary>Creates a failed result.</summary>
    public static ParseResult<T> Fail(ParseFailure failure) => new(default, failure);

    /// <summary>Creates a failed result from its parts.</summary>
    public static ParseResult<T> Fail(int offset, string code, string message, string hint = "") =>
        new(default, new ParseFailure(offset, message, hint, code));

    /// <summary>Gets the value when reading succeeded.</summary>
    [MemberNotNullWhen(false, nameof(Failure))]
    public bool TryGetValue([NotNullWhen(true)] out T? value)
    {
        value = _value;
        return Failure is null;
    }
}

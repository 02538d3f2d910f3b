using System.Diagnostics.CodeAnalysis;

namespace LowVisionAid.Optics.Text;

/// <summary>
/// The outcome of parsing what a user typed: a value, or an error whose message says what to type instead.
/// Parsers never throw on user input. A successful result may carry a warning (for example for approximate
/// notations) that must be shown beside the value.
/// </summary>
public sealed class ParseResult<T>
{
    private readonly T? _value;

    private ParseResult(T? value, bool success, string? error, string? warning)
    {
        _value = value;
        Success = success;
        Error = error;
        Warning = warning;
    }

    /// <summary>True when a value was read.</summary>
    [MemberNotNullWhen(false, nameof(Error))]
    public bool Success { get; }

    /// <summary>The message to show when parsing failed; null on success.</summary>
    public string? Error { get; }

    /// <summary>A caution to show beside a successfully parsed value (e.g. "approximate"), or null.</summary>
    public string? Warning { get; }

    /// <summary>The value.</summary>
    /// <exception cref="InvalidOperationException">Parsing failed; read <see cref="Error"/> instead.</exception>
    public T Value => Success ? _value! : throw new InvalidOperationException("No value was parsed: " + Error);

    /// <summary>Gets the value when parsing succeeded.</summary>
    public bool TryGetValue([MaybeNullWhen(false)] out T value)
    {
        value = _value;
        return Success;
    }

    internal static ParseResult<T> Ok(T value, string? warning) => new(value, true, null, warning);

    internal static ParseResult<T> Fail(string error) => new(default, false, error, null);

    /// <summary>Maps a successful value, keeping the warning; a failure passes through.</summary>
    public ParseResult<TOut> Map<TOut>(Func<T, TOut> map)
    {
        ArgumentNullException.ThrowIfNull(map);
        return Success ? ParseResult.Ok(map(_value!), Warning) : ParseResult.Fail<TOut>(Error);
    }
}

/// <summary>Factories for <see cref="ParseResult{T}"/>.</summary>
public static class ParseResult
{
    /// <summary>A successful result, with an optional warning to show beside the value.</summary>
    public static ParseResult<T> Ok<T>(T value, string? warning = null) => ParseResult<T>.Ok(value, warning);

    /// <summary>A failed result with a message that says what to type instead.</summary>
    public static ParseResult<T> Fail<T>(string error) => ParseResult<T>.Fail(error);
}

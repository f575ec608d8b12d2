namespace PathFinder.Diagnostics;

/// <summary>Why a piece of text could not be read, with the 0-based character offset where the problem starts.</summary>
/// <param name="Offset">0-based offset into the text that was parsed.</param>
/// <param name="Message">What is wrong.</param>
/// <param name="Hint">How to write it instead; may be empty.</param>
/// <param name="Code">A short stable identifier for scripts.</param>
public sealed record ParseFailure(int Offset, string Message, string Hint, string Code)
{
    /// <summary>The same failure with its offset moved by <paramref name="delta"/> (when the text was part of a larger field).</summary>
    public ParseFailure Shift(int delta) => this with { Offset = Offset + delta };
}

namespace PathFinder.Diagnostics;

/// <summary>One problem found in the user's data: where, what is wrong, and how to fix it.</summary>
/// <param name="Severity">Error (record unusable), warning, or note (something not read on purpose).</param>
/// <param name="Code">A short stable identifier for scripts, such as <c>unbalanced-equation</c>.</param>
/// <param name="Location">File, line and column.</param>
/// <param name="Message">What is wrong, in the trade's words.</param>
/// <param name="Hint">How to fix it; may be empty.</param>
public sealed record Diagnostic(Severity Severity, string Code, SourceLocation Location, string Message, string Hint = "")
{
    /// <summary>Creates an error.</summary>
    public static Diagnostic Error(string code, SourceLocation location, string message, string hint = "") =>
        new(Severity.Error, code, location, message, hint);

    /// <summary>Creates a warning.</summary>
    public static Diagnostic Warning(string code, SourceLocation location, string message, string hint = "") =>
        new(Severity.Warning, code, location, message, hint);

    /// <summary>Creates a note.</summary>
    public static Diagnostic Note(string code, SourceLocation location, string message, string hint = "") =>
        new(Severity.Note, code, location, message, hint);

    /// <summary>The severity as printed and in JSON: <c>error</c>, <c>warning</c> or <c>note</c>.</summary>
    public string SeverityWord => Severity switch
    {
        Severity.Error => "error",
        Severity.Warning => "warning",
        _ => "note",
    };

    /// <summary>Formats as <c>file:line:col: error code: message (hint)</c>.</summary>
    public override string ToString()
    {
        string text = $"{Location}: {SeverityWord} {Code}: {Message}";
        return Hint.Length > 0 ? $"{text} Fix: {Hint}" : text;
    }
}

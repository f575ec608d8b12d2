using System.Text;
using PathFinder.IO;

namespace PathFinder.Cli.Output;

/// <summary>
/// Wraps standard output or error so that no control character from data reaches the terminal: everything written goes
/// through <see cref="TerminalText.Visible"/> with line breaks and tabs kept.
/// </summary>
/// <remarks>
/// Every command writes through the <see cref="CommandContext"/> writers, so this one wrapper covers every text, CSV,
/// Markdown and JSON output and every message, whatever the data field (ids, sources, species, notes, file names). JSON
/// stays valid and means the same: its encoder already escapes control characters, and the <c>\uXXXX</c> written for
/// any other is a JSON escape of that same character.
/// </remarks>
public sealed class VisibleTextWriter : TextWriter
{
    private readonly TextWriter _inner;

    /// <summary>Wraps <paramref name="inner"/>.</summary>
    public VisibleTextWriter(TextWriter inner)
        : base(inner?.FormatProvider)
    {
        ArgumentNullException.ThrowIfNull(inner);
        _inner = inner;
        CoreNewLine = inner.NewLine.ToCharArray();
    }

    /// <inheritdoc/>
    public override Encoding Encoding => _inner.Encoding;

    /// <inheritdoc/>
    public override void Write(char value) => Write(new ReadOnlySpan<char>(in value));

    /// <inheritdoc/>
    public override void Write(char[] buffer, int index, int count) => Write(buffer.AsSpan(index, count));

    /// <inheritdoc/>
    public override void Write(ReadOnlySpan<char> buffer)
    {
        if (TerminalText.FirstUnsafe(buffer, keepLineBreaks: true) < 0)
        {
            _inner.Write(buffer);
            return;
        }

        var sb = new StringBuilder(buffer.Length + 16);
        TerminalText.Append(sb, buffer, keepLineBreaks: true);
        _inner.Write(sb.ToString());
    }

    /// <inheritdoc/>
    public override void Write(string? value) => Write(value.AsSpan());

    /// <inheritdoc/>
    public override void WriteLine(string? value)
    {
        Write(value.AsSpan());
        _inner.WriteLine();
    }

    /// <inheritdoc/>
    public override void WriteLine() => _inner.WriteLine();

    /// <inheritdoc/>
    public override void Flush() => _inner.Flush();

    /// <inheritdoc/>
    protected override void Dispose(bool disposing)
    {
        if (disposing)
        {
            _inner.Flush();
        }

        base.Dispose(disposing);
    }
}

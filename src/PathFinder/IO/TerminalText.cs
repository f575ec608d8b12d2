using System.Globalization;
using System.Text;

namespace PathFinder.IO;

/// <summary>
/// The one place that decides how text from data reaches a terminal: control characters are shown as <c>\uXXXX</c>,
/// never sent raw, so an id, a source or a file name cannot clear the screen, retitle the window or fake output.
/// </summary>
/// <remarks>
/// Shown visibly: every control character (C0 U+0000–U+001F, DEL U+007F, C1 U+0080–U+009F; ESC and CSI start terminal
/// sequences, CR and BS overwrite what is shown), the bidirectional embeddings, overrides and isolates
/// (U+202A–U+202E, U+2066–U+2069, which reorder what a reader sees), unpaired surrogates, and the line and paragraph
/// separators (U+2028, U+2029). The visible form <c>\u001B</c> is also what JSON would write, so JSON text passed
/// through <see cref="Visible"/> keeps its meaning.
/// </remarks>
public static class TerminalText
{
    /// <summary>Whether <paramref name="c"/> is shown as <c>\uXXXX</c> by <see cref="Visible"/> (line breaks and tabs included).</summary>
    public static bool IsUnsafe(char c) =>
        c < 0x20 || (c >= 0x7F && c <= 0x9F) || (c >= '\u202A' && c <= '\u202E') || (c >= '\u2066' && c <= '\u2069') || c is '\u2028' or '\u2029';

    /// <summary>Whether <paramref name="text"/> holds a character <see cref="Visible"/> would change (line breaks count).</summary>
    public static bool HasUnsafe(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        return FirstUnsafe(text, keepLineBreaks: false) >= 0;
    }

    /// <summary>The index of the first character <see cref="Visible"/> would change, or -1.</summary>
    /// <param name="text">The text.</param>
    /// <param name="keepLineBreaks">Whether LF, TAB and CR LF count as safe (text of several lines).</param>
    public static int FirstUnsafe(ReadOnlySpan<char> text, bool keepLineBreaks)
    {
        for (int i = 0; i < text.Length; i++)
        {
            char c = text[i];
            if (char.IsSurrogate(c))
            {
                if (char.IsHighSurrogate(c) && i + 1 < text.Length && char.IsLowSurrogate(text[i + 1]))
                {
                    i++;
                    continue;
                }

                return i;
            }

            if (IsUnsafe(c) && !(keepLineBreaks && IsLineBreak(text, i)))
            {
                return i;
            }
        }

        return -1;
    }

    /// <summary>The text with every unsafe character written as <c>\uXXXX</c> (upper-case hex); the text itself when there is none.</summary>
    /// <param name="text">Text from data: an id, a source, a species name, a note, a file name, a message.</param>
    /// <param name="keepLineBreaks">
    /// Keep LF, TAB and CR LF as they are (for text of several lines the program composed); false for a one-line field,
    /// where a line break in the data would otherwise fake a new line of output.
    /// </param>
    public static string Visible(string text, bool keepLineBreaks = false)
    {
        ArgumentNullException.ThrowIfNull(text);
        int first = FirstUnsafe(text, keepLineBreaks);
        if (first < 0)
        {
            return text;
        }

        var sb = new StringBuilder(text.Length + 16);
        sb.Append(text, 0, first);
        Append(sb, text.AsSpan(first), keepLineBreaks);
        return sb.ToString();
    }

    /// <summary>Appends <paramref name="text"/> to <paramref name="sb"/> with every unsafe character written as <c>\uXXXX</c>.</summary>
    public static void Append(StringBuilder sb, ReadOnlySpan<char> text, bool keepLineBreaks)
    {
        ArgumentNullException.ThrowIfNull(sb);
        while (text.Length > 0)
        {
            int next = FirstUnsafe(text, keepLineBreaks);
            if (next < 0)
            {
                sb.Append(text);
                return;
            }

            sb.Append(text[..next]);
            sb.Append("\\u").Append(((int)text[next]).ToString("X4", CultureInfo.InvariantCulture));
            text = text[(next + 1)..];
        }
    }

    private static bool IsLineBreak(ReadOnlySpan<char> text, int i) =>
        text[i] is '\n' or '\t' || (text[i] == '\r' && i + 1 < text.Length && text[i + 1] == '\n');
}

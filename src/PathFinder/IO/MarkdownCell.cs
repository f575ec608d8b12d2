using System.Text;

namespace PathFinder.IO;

/// <summary>The one place that decides how data text is written into Markdown (a table cell or a line of prose).</summary>
/// <remarks>
/// Every character Markdown would act on is escaped with a backslash (CommonMark allows it before any ASCII punctuation):
/// <c>|</c> (a new table column), <c>\</c>, backticks (code), <c>&lt;</c> and <c>&gt;</c> (raw HTML such as
/// <c>&lt;script&gt;</c>, autolinks), <c>*</c>, <c>_</c>, <c>~</c> (emphasis), <c>[</c>, <c>]</c> (links, images),
/// <c>&amp;</c> (entities), <c>#</c>. A line break would end the table row, so it becomes a space; other control
/// characters are shown as <c>\uXXXX</c> (<see cref="TerminalText"/>).
/// </remarks>
public static class MarkdownCell
{
    /// <summary>The text escaped for a Markdown table cell or a line of Markdown prose.</summary>
    public static string Text(string? text)
    {
        if (string.IsNullOrEmpty(text))
        {
            return "";
        }

        string flat = TerminalText.Visible(text.Replace("\r\n", " ", StringComparison.Ordinal).Replace('\n', ' ').Replace('\r', ' '));
        var sb = new StringBuilder(flat.Length + 8);
        foreach (char c in flat)
        {
            if (c is '\\' or '|' or '`' or '<' or '>' or '*' or '_' or '~' or '[' or ']' or '&' or '#')
            {
                sb.Append('\\');
            }

            sb.Append(c);
        }

        return sb.ToString();
    }
}

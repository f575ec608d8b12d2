namespace PathFinder.Curation;

/// <summary>How an existing curation file is laid out, so rows added to it follow its own header order, separator and line ends.</summary>
/// <param name="Header">The header names as written, in order.</param>
/// <param name="Delimiter">The field separator.</param>
/// <param name="NewLine">The line end the file uses (<c>\r\n</c> or <c>\n</c>).</param>
internal sealed record CurationLayout(IReadOnlyList<string> Header, char Delimiter, string NewLine);

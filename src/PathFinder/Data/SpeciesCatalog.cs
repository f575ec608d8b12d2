using System.Collections.Concurrent;
using PathFinder.Chemistry;
using PathFinder.Diagnostics;
using PathFinder.IO;

namespace PathFinder.Data;

/// <summary>Turns species text in equations into species, honouring declarations from <c>species.csv</c>.</summary>
/// <remarks>
/// A declared key (e.g. <c>DME</c>) names its species directly. A formula with state that matches exactly one
/// declared species resolves to it; one that matches several declared isomers is refused as ambiguous.
/// Undeclared species are identified by composition and state, and the catalog remembers every way each
/// was written so that silently merged spellings (<c>C2H5OH(l)</c> and <c>CH3CH2OH(l)</c>) can be reported.
/// </remarks>
public sealed class SpeciesCatalog
{
    private readonly Dictionary<string, Species> _byKey = new(StringComparer.Ordinal);
    private readonly Dictionary<string, List<Species>> _declaredByIdentity = new(StringComparer.Ordinal);
    private readonly Dictionary<string, SortedSet<string>> _spellings = new(StringComparer.Ordinal);
    private readonly Dictionary<string, Species> _firstWritten = new(StringComparer.Ordinal);
    private readonly Dictionary<string, ParseResult<Species>> _resolved = new(StringComparer.Ordinal);

    // One parse per species text, shared by the sequential resolver and by parallel pre-parsing, so both hand out
    // the same instance for the same text (thread-safe; parsing is a pure function of the text).
    private readonly ConcurrentDictionary<string, ParseResult<Species>> _parsed = new(StringComparer.Ordinal);

    /// <summary>The declared species, in file order.</summary>
    public IReadOnlyList<Species> Declared => _byKey.Values.ToArray();

    /// <summary>Reads <c>species.csv</c> (<c>key,formula,state,name</c>) into a catalog, reporting problems.</summary>
    public static SpeciesCatalog Read(string? path, string displayPath, ICollection<Diagnostic> diagnostics)
    {
        var catalog = new SpeciesCatalog();
        if (path is null || !File.Exists(path))
        {
            return catalog;
        }

        CsvTable? table = CsvTable.Read(path, displayPath, diagnostics);
        if (table is null)
        {
            return catalog;
        }

        if (table.ReportDuplicateColumns(diagnostics))
        {
            return catalog;
        }

        int keyColumn = table.IndexOf("key");
        int formulaColumn = table.IndexOf("formula");
        int stateColumn = table.IndexOf("state");
        int nameColumn = table.IndexOf("name");
        string[] missing = new[] { ("key", keyColumn), ("formula", formulaColumn), ("state", stateColumn) }
            .Where(pair => pair.Item2 < 0).Select(pair => pair.Item1).ToArray();
        if (missing.Length > 0)
        {
            diagnostics.Add(Diagnostic.Error("missing-column", new SourceLocation(displayPath, table.HeaderLine, 1), $"species file lacks column(s): {string.Join(", ", missing)}", "the header must be key,formula,state,name"));
            return catalog;
        }

        foreach (CsvRow row in table.Rows)
        {
            string key = row.FieldOrEmpty(keyColumn);
            string formulaText = row.FieldOrEmpty(formulaColumn);
            string stateText = row.FieldOrEmpty(stateColumn);
            string name = nameColumn >= 0 ? row.FieldOrEmpty(nameColumn) : "";
            if (key.Length == 0 || key.Any(char.IsWhiteSpace) || key.Contains('+', StringComparison.Ordinal) || TerminalText.HasUnsafe(key))
            {
                diagnostics.Add(Diagnostic.Error("bad-species-key", row.LocationOf(keyColumn, "key"), $"species key '{DiagnosticText.Excerpt(TerminalText.Visible(key))}' must be non-empty, without spaces, control characters or '+'", "use a short name such as DME or EtOH"));
                continue;
            }

            ParseResult<Species> species = SpeciesParser.Parse($"{formulaText}({stateText})");
            if (!species.TryGetValue(out Species? parsed))
            {
                int column = species.Failure.Offset < formulaText.Length ? formulaColumn : stateColumn;
                int offset = column == formulaColumn ? species.Failure.Offset : Math.Max(0, species.Failure.Offset - formulaText.Length - 1);
                diagnostics.Add(Diagnostic.Error(species.Failure.Code, row.LocationOf(column).Shift(offset), species.Failure.Message, species.Failure.Hint));
                continue;
            }

            Species declared = Species.Create(parsed.Formula, parsed.State, key, name: key, description: name);
            if (!catalog._byKey.TryAdd(key, declared))
            {
                diagnostics.Add(Diagnostic.Error("duplicate-species-key", row.LocationOf(keyColumn, "key"), $"species key '{DiagnosticText.Excerpt(key)}' is declared twice", "give each species its own key"));
                continue;
            }

            string identity = Species.Create(parsed.Formula, parsed.State).Key;
            if (!catalog._declaredByIdentity.TryGetValue(identity, out List<Species>? list))
            {
                list = [];
                catalog._declaredByIdentity[identity] = list;
            }

            list.Add(declared);
        }

        return catalog;
    }

    /// <summary>Resolves one species token from an equation.</summary>
    /// <remarks>
    /// The answer for a given text never changes once the catalog is read (the first spelling seen stays the name shown),
    /// so it is remembered: a large file names the same few thousand species over and over.
    /// </remarks>
    public ParseResult<Species> Resolve(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        if (_resolved.TryGetValue(text, out ParseResult<Species>? known))
        {
            return known;
        }

        ParseResult<Species> result = ResolveOnce(text);
        _resolved[text] = result;
        return result;
    }

    /// <summary>What <see cref="Resolve"/> gives for a text seen first, without recording it (safe from several threads).</summary>
    /// <remarks>
    /// Declared keys and isomers are fixed once the catalog is read, so they resolve the same way here. For any other
    /// species the shared parse is returned; <see cref="Resolve"/> returns that same instance unless an earlier,
    /// different spelling of the species came first, which a caller detects by reference comparison.
    /// </remarks>
    internal ParseResult<Species> ResolveWithoutRecording(string text)
    {
        if (_byKey.TryGetValue(text, out Species? declared))
        {
            return ParseResult<Species>.Ok(declared);
        }

        ParseResult<Species> parsed = ParseShared(text);
        if (parsed.TryGetValue(out Species? species) && _declaredByIdentity.TryGetValue(species.Key, out List<Species>? isomers))
        {
            return isomers.Count == 1
                ? ParseResult<Species>.Ok(isomers[0])
                : ParseResult<Species>.Fail(0, "ambiguous-species", $"'{DiagnosticText.Excerpt(text)}' matches several declared isomers: {string.Join(", ", isomers.Select(isomer => isomer.Label))}", "write the species key from species.csv instead of the formula");
        }

        return parsed;
    }

    private ParseResult<Species> ParseShared(string text) => _parsed.GetOrAdd(text, static key => SpeciesParser.Parse(key));

    private ParseResult<Species> ResolveOnce(string text)
    {
        // Keys, isomers and failures resolve as they are; a plain formula is also recorded as a spelling.
        ParseResult<Species> resolved = ResolveWithoutRecording(text);
        if (!resolved.TryGetValue(out Species? species) || _byKey.ContainsKey(text) || _declaredByIdentity.ContainsKey(species.Key))
        {
            return resolved;
        }

        if (!_firstWritten.TryGetValue(species.Key, out Species? first))
        {
            _firstWritten[species.Key] = species;
            first = species;
        }

        if (!_spellings.TryGetValue(species.Key, out SortedSet<string>? spellings))
        {
            spellings = new SortedSet<string>(StringComparer.Ordinal);
            _spellings[species.Key] = spellings;
        }

        spellings.Add(species.Formula.Text);

        // Every spelling of one species shows the first one seen, so reports name it consistently.
        return ParseResult<Species>.Ok(first);
    }

    /// <summary>Species that were written in more than one way (and so merged), with all their spellings.</summary>
    public IEnumerable<(Species Species, IReadOnlyCollection<string> Spellings)> MergedSpellings() =>
        _spellings.Where(pair => pair.Value.Count > 1).Select(pair => (_firstWritten[pair.Key], (IReadOnlyCollection<string>)pair.Value));
}

using System.Globalization;
using PathFinder.Diagnostics;
using PathFinder.Quantities;

namespace PathFinder.Data;

/// <summary>Reads <c>sources.csv</c>: the standard uncertainty shared by every measurement of a source.</summary>
/// <remarks>
/// <para>The header, case-insensitive and in any order: <c>source,systematic,unit</c> and an optional <c>note</c>;
/// lines starting with <c>#</c> are comments, and a semicolon-separated file is read with decimal commas as
/// <see cref="CsvTable"/> detects it.</para>
/// <code>
/// source,systematic,unit,note
/// group A,0.3,kJ/mol,bomb calibration with benzoic acid
/// group B,0.5,kcal/mol,auxiliary ΔfH°(CO2) used throughout
/// </code>
/// <para><c>source</c> is written exactly as the data's <c>source</c> column writes it (or the file name that stands
/// for it); <c>systematic</c> is a positive standard uncertainty in <c>unit</c>, an energy or an entropy unit, and is
/// kept in the canonical unit (kJ/mol or J/(mol·K)). Every problem is a located error: <c>missing-column</c>,
/// <c>duplicate-column</c>, <c>extra-fields</c>, <c>missing-source</c>, <c>unknown-source</c>, <c>duplicate-source</c>,
/// <c>missing-number</c>, <c>bad-number</c>, <c>bad-systematic</c>, <c>missing-unit</c>, <c>unknown-unit</c> and
/// <c>wrong-unit</c>; an unknown column is a warning (<c>unknown-column</c>). Rows with errors are left out.</para>
/// </remarks>
public static class SourceSystematicsReader
{
    /// <summary>How many of the data's sources an unknown-source hint lists.</summary>
    public const int ListedSources = 5;

    /// <summary>The required columns.</summary>
    public static IReadOnlyList<string> RequiredColumns { get; } = ["source", "systematic", "unit"];

    /// <summary>The optional free-text column.</summary>
    public const string NoteColumn = "note";

    private const string UnitRequired = "the unit is required: an energy unit such as kJ/mol or an entropy unit such as J/(mol·K)";

    /// <summary>Reads the declarations of <paramref name="path"/>, adding every problem to <paramref name="diagnostics"/>.</summary>
    /// <param name="path">The file; null or a missing file gives no declarations and no diagnostics. Also the file name in diagnostics.</param>
    /// <param name="dataSources">Every source the network's data names (compared exactly, case-sensitive).</param>
    /// <param name="diagnostics">Where problems are added.</param>
    /// <returns>The valid declarations, in file order.</returns>
    /// <param name="actsOn">Whether the data hold rows of a source that a systematic of the given dimension acts on (energy: ΔH, ΔU, ΔG, K; entropy: ΔS, S°); when given, a declaration acting on no row gets a warning.</param>
    public static IReadOnlyList<SourceSystematic> Read(string? path, IEnumerable<string> dataSources, ICollection<Diagnostic> diagnostics, Func<string, UnitDimension, bool>? actsOn = null)
    {
        ArgumentNullException.ThrowIfNull(dataSources);
        ArgumentNullException.ThrowIfNull(diagnostics);
        if (path is null || !File.Exists(path))
        {
            return [];
        }

        CsvTable? table = CsvTable.Read(path, path, diagnostics, string.Join(",", RequiredColumns.Append(NoteColumn)));
        if (table is null || !ReadHeader(table, diagnostics, out int sourceColumn, out int systematicColumn, out int unitColumn, out int noteColumn))
        {
            return [];
        }

        if (table.DecimalComma)
        {
            diagnostics.Add(CsvNumber.DecimalCommaWarning(table));
        }

        var known = new HashSet<string>(dataSources, StringComparer.Ordinal);
        // A source may declare one energy and one entropy systematic: they act on different rows.
        var firstBySource = new Dictionary<(string Source, UnitDimension Dimension), SourceLocation>();
        var declarations = new List<SourceSystematic>();
        foreach (CsvRow row in table.Rows)
        {
            int before = diagnostics.Count;
            if (row.Fields.Count > table.Header.Count)
            {
                diagnostics.Add(Diagnostic.Error("extra-fields", row.LocationOf(table.Header.Count), $"the row has {row.Fields.Count} fields but the header has {table.Header.Count}", "quote a field (a note, a source name) that contains the separator"));
                continue;
            }

            string source = row.FieldOrEmpty(sourceColumn);
            SourceLocation location = row.LocationOf(sourceColumn, "source");
            EnergyUnit? unit = ReadUnit(row, unitColumn, diagnostics);
            if (source.Length == 0)
            {
                diagnostics.Add(Diagnostic.Error("missing-source", location, "the declaration names no source", "write the source as the data's source column writes it (the file name for a file without that column)"));
            }
            else if (unit is not null && firstBySource.TryGetValue((source, unit.Dimension), out SourceLocation first))
            {
                diagnostics.Add(Diagnostic.Error("duplicate-source", location, $"source '{DiagnosticText.Excerpt(source)}' already has a systematic of this kind (energy or entropy) at {first}", "keep one row per source and kind; if two effects are shared, combine them into one standard uncertainty"));
            }
            else
            {
                if (unit is not null)
                {
                    firstBySource[(source, unit.Dimension)] = location;
                }

                if (!known.Contains(source))
                {
                    diagnostics.Add(Diagnostic.Error("unknown-source", location, $"no measurement has the source '{DiagnosticText.Excerpt(source)}'", UnknownSourceHint(source, known)));
                }
            }

            double? systematic = CsvNumber.Read(row, systematicColumn, "systematic", table.DecimalComma, diagnostics, example: "0.5");
            if (systematic is <= 0.0)
            {
                diagnostics.Add(Diagnostic.Error("bad-systematic", row.LocationOf(systematicColumn, "systematic"), $"the systematic must be positive, not {systematic.Value.ToString(CultureInfo.InvariantCulture)}", "give the standard uncertainty every measurement of the source shares; leave a source without one out of the file"));
            }
            else if (systematic is not null && unit is not null && !IsAccepted(unit, systematic.Value))
            {
                EnergyUnit canonical = unit.Dimension == UnitDimension.MolarEntropy ? EnergyUnit.JoulePerMoleKelvin : EnergyUnit.KilojoulePerMole;
                string range = $"{AcceptedRanges.Format(AcceptedRanges.AbsoluteUncertaintyFloor)} to {AcceptedRanges.Format(AcceptedRanges.MaxMagnitude(unit.Dimension))} {canonical.Symbol}";
                diagnostics.Add(Diagnostic.Error("bad-systematic", row.LocationOf(systematicColumn, "systematic"), $"the systematic {AcceptedRanges.Format(systematic.Value)} {unit.Symbol} is outside the accepted {range}", "check the unit and the exponent: a shared standard uncertainty of a real source lies well inside this range"));
            }

            if (diagnostics.Count > before || systematic is null || unit is null)
            {
                continue;
            }

            if (actsOn is not null && known.Contains(source) && !actsOn(source, unit.Dimension))
            {
                string rows = unit.Dimension == UnitDimension.MolarEnergy ? "energy rows (ΔH, ΔU, ΔG, K)" : "entropy rows (ΔS, S°)";
                diagnostics.Add(Diagnostic.Warning("systematic-acts-on-nothing", row.LocationOf(unitColumn, "unit"), $"source '{DiagnosticText.Excerpt(source)}' has no {rows}: this systematic acts on no measurement", "give it in the unit of the source's data (kJ/mol for energies, J/(mol·K) for entropies), or remove the row"));
            }

            string note = noteColumn >= 0 ? row.FieldOrEmpty(noteColumn) : "";
            declarations.Add(new SourceSystematic(source, unit.ToCanonicalValue(systematic.Value), unit, note, location));
        }

        return declarations;
    }

    /// <summary>Whether a systematic lies within the uncertainties <see cref="AcceptedRanges"/> accepts for its dimension (canonical unit).</summary>
    private static bool IsAccepted(EnergyUnit unit, double systematic)
    {
        double canonical = unit.ToCanonicalValue(systematic);
        return canonical >= AcceptedRanges.AbsoluteUncertaintyFloor && canonical <= AcceptedRanges.MaxMagnitude(unit.Dimension);
    }

    private static bool ReadHeader(CsvTable table, ICollection<Diagnostic> diagnostics, out int sourceColumn, out int systematicColumn, out int unitColumn, out int noteColumn)
    {
        sourceColumn = table.IndexOf("source");
        systematicColumn = table.IndexOf("systematic");
        unitColumn = table.IndexOf("unit");
        noteColumn = table.IndexOf(NoteColumn);
        int[] indexes = [sourceColumn, systematicColumn, unitColumn];
        string[] missing = RequiredColumns.Where((_, i) => indexes[i] < 0).ToArray();
        if (missing.Length > 0)
        {
            diagnostics.Add(Diagnostic.Error("missing-column", new SourceLocation(table.File, table.HeaderLine, 1), $"sources file lacks column(s): {string.Join(", ", missing)}", "the header must be source,systematic,unit (note optional), in any order"));
            return false;
        }

        bool valid = true;
        for (int i = 0; i < table.Header.Count; i++)
        {
            string name = table.Header[i];
            var location = new SourceLocation(table.File, table.HeaderLine, table.HeaderColumns[i], name);
            bool known = RequiredColumns.Contains(name, StringComparer.OrdinalIgnoreCase) || name.Equals(NoteColumn, StringComparison.OrdinalIgnoreCase);
            if (known && table.IndexOf(name) != i)
            {
                diagnostics.Add(Diagnostic.Error("duplicate-column", location, $"the column '{DiagnosticText.Excerpt(name)}' appears twice", "keep one of them"));
                valid = false;
            }
            else if (!known)
            {
                diagnostics.Add(Diagnostic.Warning("unknown-column", location, $"the column '{DiagnosticText.Excerpt(name)}' is not part of the sources file and is ignored", $"remove it, or rename it to '{NoteColumn}'"));
            }
        }

        return valid;
    }

    private static EnergyUnit? ReadUnit(CsvRow row, int column, ICollection<Diagnostic> diagnostics)
    {
        string text = row.FieldOrEmpty(column);
        SourceLocation location = row.LocationOf(column, "unit");
        if (text.Length == 0)
        {
            diagnostics.Add(Diagnostic.Error("missing-unit", location, "the unit is empty", UnitRequired));
            return null;
        }

        if (!EnergyUnit.TryParse(text, out EnergyUnit unit))
        {
            string[] accepted = EnergyUnit.AcceptedSymbols
                .Where(symbol => EnergyUnit.TryParse(symbol, out EnergyUnit candidate) && candidate.Dimension != UnitDimension.Dimensionless)
                .ToArray();
            diagnostics.Add(Diagnostic.Error("unknown-unit", location, $"unknown unit '{DiagnosticText.Excerpt(text)}'", $"use one of {string.Join(", ", accepted)}"));
            return null;
        }

        if (unit.Dimension == UnitDimension.Dimensionless)
        {
            diagnostics.Add(Diagnostic.Error("wrong-unit", location, $"a systematic cannot be a pure number (unit {unit.Symbol})", UnitRequired));
            return null;
        }

        return unit;
    }

    /// <summary>Names a near spelling when there is one, and the data's first few sources.</summary>
    private static string UnknownSourceHint(string source, HashSet<string> known)
    {
        if (known.Count == 0)
        {
            return "no source appears in the data; fix the measurement files first";
        }

        string[] sorted = known.Order(StringComparer.Ordinal).ToArray();
        string listed = string.Join(", ", sorted.Take(ListedSources).Select(name => $"'{DiagnosticText.Excerpt(name)}'"));
        string sources = sorted.Length > ListedSources
            ? string.Create(CultureInfo.InvariantCulture, $"the data's sources include {listed} and {sorted.Length - ListedSources} more")
            : $"the data's sources are {listed}";
        string? near = NearSpelling(source, sorted);
        if (near is null)
        {
            return $"write the source exactly as the data does; {sources}";
        }

        string rule = near.Equals(source, StringComparison.OrdinalIgnoreCase) ? "source names are case-sensitive" : "source names must match the data exactly";
        return $"did you mean '{DiagnosticText.Excerpt(near)}'? {char.ToUpperInvariant(rule[0])}{rule[1..]}; {sources}";
    }

    /// <summary>The data source closest to <paramref name="source"/> ignoring case, when it is a likely misspelling.</summary>
    /// <remarks>
    /// A case-insensitive match wins; otherwise the one source at the smallest edit distance, up to about a third of the
    /// name's length (at least 1, at most 3). Several sources at that distance (<c>group-e</c> against <c>group-a</c> …
    /// <c>group-d</c>) are no suggestion: naming one of them would be a guess.
    /// </remarks>
    private static string? NearSpelling(string source, IReadOnlyList<string> sorted)
    {
        string? caseOnly = sorted.FirstOrDefault(name => name.Equals(source, StringComparison.OrdinalIgnoreCase));
        if (caseOnly is not null)
        {
            return caseOnly;
        }

        int limit = Math.Clamp((source.Length + 1) / 3, 1, 3);
        string? best = null;
        int bestDistance = limit + 1;
        bool tied = false;
        string lower = source.ToLowerInvariant();
        foreach (string name in sorted)
        {
            int distance = EditDistance(lower, name.ToLowerInvariant());
            if (distance < bestDistance)
            {
                best = name;
                bestDistance = distance;
                tied = false;
            }
            else if (distance == bestDistance)
            {
                tied = true;
            }
        }

        return tied ? null : best;
    }

    /// <summary>The Levenshtein distance: the fewest insertions, deletions and substitutions turning one text into the other.</summary>
    private static int EditDistance(string a, string b)
    {
        var previous = new int[b.Length + 1];
        var current = new int[b.Length + 1];
        for (int j = 0; j <= b.Length; j++)
        {
            previous[j] = j;
        }

        for (int i = 1; i <= a.Length; i++)
        {
            current[0] = i;
            for (int j = 1; j <= b.Length; j++)
            {
                int substitution = previous[j - 1] + (a[i - 1] == b[j - 1] ? 0 : 1);
                current[j] = Math.Min(substitution, Math.Min(previous[j] + 1, current[j - 1] + 1));
            }

            (previous, current) = (current, previous);
        }

        return previous[b.Length];
    }
}

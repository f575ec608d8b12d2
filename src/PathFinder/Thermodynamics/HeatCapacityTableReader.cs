using System.Globalization;
using CsvHelper;
using CsvHelper.Configuration;
using PathFinder.Diagnostics;
using PathFinder.Quantities;

namespace PathFinder.Thermodynamics;

/// <summary>Reads a network's heat-capacity table, <c>heat-capacity.csv</c>, into a model per species with located diagnostics.</summary>
/// <remarks>
/// <para>Format (also in <c>HEAT-CAPACITY-FORMAT.md</c>): comma-separated, UTF-8, one header row, then one row per
/// temperature range of a species; lines starting with <c>#</c> and blank lines are ignored; fields may be quoted.
/// Numbers use a dot as decimal separator (invariant culture) whatever the machine's culture.</para>
/// <code>
/// species,form,tmin,tmax,c1,c2,c3,c4,c5,c6,c7,c8,source
/// N2(g),shomate,100,500,28.98641,1.853978,-9.647459,16.63537,0.000117,-8.671914,226.4168,0
/// </code>
/// <para>Required columns (any order, names case-insensitive): <c>species</c> (the species as the network writes it),
/// <c>form</c>, <c>tmin</c> and <c>tmax</c> (K), and <c>c1</c>, <c>c2</c>, … (as many as the longest form used needs).
/// Optional free-text columns <c>source</c> and <c>note</c> are ignored; other columns draw a warning.</para>
/// <para>Forms and their coefficients (filled from <c>c1</c> on, no holes):</para>
/// <list type="bullet">
/// <item><c>nasa7</c>: 7 coefficients a1…a7 of the NASA polynomial, T in K (see <see cref="Nasa7Polynomial"/>).</item>
/// <item><c>shomate</c>: 5 coefficients A…E, or 8 with F, G, H (see <see cref="ShomateEquation"/>); Cp in J/(mol·K), t = T/1000.</item>
/// <item><c>constant</c>: 1 coefficient, Cp in J/(mol·K).</item>
/// <item><c>linear</c>: 2 coefficients a, b of Cp = a + b·T, in J/(mol·K) and J/(mol·K²).</item>
/// </list>
/// <para>Several rows of one species give its ranges; they must meet end to start (within
/// <see cref="HeatCapacityTableOptions.RangeTolerance"/>), in any row order. The reader never throws on bad input: it
/// collects every problem as a <see cref="Diagnostic"/> with file, line and column (codes <c>heat-capacity-…</c>:
/// <c>empty-file</c>, <c>unreadable-file</c>, <c>missing-column</c>, <c>duplicate-column</c>, <c>unknown-column</c>,
/// <c>bad-csv</c>, <c>missing-species</c>, <c>unknown-form</c>, <c>bad-number</c>, <c>bad-range</c>,
/// <c>missing-coefficient</c>, <c>coefficient-count</c>, <c>range-overlap</c>, <c>range-gap</c>,
/// <c>nonpositive-cp</c> and <c>discontinuity</c> (the last two are warnings)).</para>
/// </remarks>
public static class HeatCapacityTableReader
{
    private static readonly string[] _requiredColumns = ["species", "form", "tmin", "tmax"];
    private static readonly string[] _ignoredColumns = ["source", "note"];

    /// <summary>Reads the file at <paramref name="path"/>; an unreadable file gives an error diagnostic, not an exception.</summary>
    /// <param name="path">Path of the CSV file; used as the file name in diagnostics.</param>
    /// <param name="options">Tolerances; <see cref="HeatCapacityTableOptions.Default"/> when omitted.</param>
    public static HeatCapacityTable ReadFile(string path, HeatCapacityTableOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(path);
        try
        {
            using var reader = new StreamReader(path, System.Text.Encoding.UTF8, detectEncodingFromByteOrderMarks: true);
            return Read(reader, path, options);
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException or NotSupportedException or ArgumentException)
        {
            return new HeatCapacityTable([], [Diagnostic.Error("heat-capacity-unreadable-file", new SourceLocation(path), $"cannot read the heat-capacity table: {ex.Message}")]);
        }
    }

    /// <summary>Reads a heat-capacity table from <paramref name="reader"/>.</summary>
    /// <param name="reader">The CSV text.</param>
    /// <param name="fileName">The name used in diagnostics.</param>
    /// <param name="options">Tolerances; <see cref="HeatCapacityTableOptions.Default"/> when omitted.</param>
    public static HeatCapacityTable Read(TextReader reader, string fileName, HeatCapacityTableOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(reader);
        ArgumentNullException.ThrowIfNull(fileName);
        options ??= HeatCapacityTableOptions.Default;
        var diagnostics = new List<Diagnostic>();
        bool malformed = false;
        var config = new CsvConfiguration(CultureInfo.InvariantCulture)
        {
            AllowComments = true,
            Comment = '#',
            IgnoreBlankLines = true,
            DetectColumnCountChanges = false,
            MissingFieldFound = null,
            BadDataFound = args =>
            {
                malformed = true;
                diagnostics.Add(Diagnostic.Error(
                    "heat-capacity-bad-csv",
                    new SourceLocation(fileName, args.Context.Parser?.RawRow ?? 0),
                    $"malformed CSV field '{DiagnosticText.Excerpt(args.Field)}'",
                    "quote fields that contain quotes, and double the quotes inside them"));
            },
        };

        using var parser = new CsvParser(reader, config);
        if (!parser.Read())
        {
            diagnostics.Add(Diagnostic.Error("heat-capacity-empty-file", new SourceLocation(fileName), "the heat-capacity table is empty", "start with the header row species,form,tmin,tmax,c1,..."));
            return new HeatCapacityTable([], diagnostics);
        }

        Header? header = ReadHeader(parser, fileName, diagnostics);
        if (header is null)
        {
            return new HeatCapacityTable([], diagnostics);
        }

        var rows = new List<RangeRow>();
        var failedSpecies = new HashSet<string>(StringComparer.Ordinal);
        while (parser.Read())
        {
            RecordCells cells = RecordCells.From(parser, fileName);
            RangeRow? row = ReadRow(cells, header, diagnostics, out string? species);
            if (malformed)
            {
                // The fields of a malformed record cannot be trusted even when they parse.
                malformed = false;
                row = null;
            }

            if (row is not null)
            {
                rows.Add(row);
            }
            else if (species is not null)
            {
                failedSpecies.Add(species);
            }
        }

        List<HeatCapacityEntry> entries = BuildEntries(rows, failedSpecies, options, diagnostics);
        return new HeatCapacityTable(entries, [.. diagnostics.OrderBy(d => d.Location.Line).ThenBy(d => d.Location.Column)]);
    }

    private static Header? ReadHeader(CsvParser parser, string fileName, List<Diagnostic> diagnostics)
    {
        RecordCells cells = RecordCells.From(parser, fileName);
        var columns = new Dictionary<string, int>(StringComparer.OrdinalIgnoreCase);
        var coefficientColumns = new SortedDictionary<int, int>();
        for (int i = 0; i < cells.Count; i++)
        {
            string name = cells.Text(i).Trim();
            if (!columns.TryAdd(name, i))
            {
                diagnostics.Add(Diagnostic.Error("heat-capacity-duplicate-column", cells.Location(i, name), $"the column '{DiagnosticText.Excerpt(name)}' appears twice", "keep one of them"));
                continue;
            }

            bool known = _requiredColumns.Contains(name, StringComparer.OrdinalIgnoreCase) || _ignoredColumns.Contains(name, StringComparer.OrdinalIgnoreCase);
            if (name.Length > 1 && (name[0] == 'c' || name[0] == 'C')
                && int.TryParse(name.AsSpan(1), NumberStyles.None, CultureInfo.InvariantCulture, out int index) && index >= 1)
            {
                coefficientColumns[index] = i;
                known = true;
            }

            if (!known)
            {
                diagnostics.Add(Diagnostic.Warning("heat-capacity-unknown-column", cells.Location(i, name), $"the column '{DiagnosticText.Excerpt(name)}' is not part of the heat-capacity format and is ignored", "remove it, or rename it to 'note'"));
            }
        }

        var missing = _requiredColumns.Where(c => !columns.ContainsKey(c)).ToList();
        if (coefficientColumns.Count == 0)
        {
            missing.Add("c1");
        }

        // Coefficient columns must be c1..cN without holes, so that "the k-th coefficient" is unambiguous.
        int expected = 1;
        var coefficients = new List<(int Column, string Name)>();
        foreach ((int index, int column) in coefficientColumns)
        {
            if (index != expected)
            {
                missing.Add(string.Create(CultureInfo.InvariantCulture, $"c{expected}"));
                break;
            }

            coefficients.Add((column, cells.Text(column).Trim()));
            expected++;
        }

        foreach (string name in missing)
        {
            diagnostics.Add(Diagnostic.Error("heat-capacity-missing-column", new SourceLocation(fileName, cells.FirstLine, 1), $"the header lacks the column '{DiagnosticText.Excerpt(name)}'", "the header must name species,form,tmin,tmax,c1,c2,... (c1 to c8 cover every form)"));
        }

        return missing.Count > 0 || diagnostics.Any(d => d.Severity == Severity.Error)
            ? null
            : new Header(columns["species"], columns["form"], columns["tmin"], columns["tmax"], coefficients);
    }

    private static RangeRow? ReadRow(RecordCells cells, Header header, List<Diagnostic> diagnostics, out string? species)
    {
        int errorsBefore = diagnostics.Count(d => d.Severity == Severity.Error);
        species = cells.Text(header.Species).Trim();
        SourceLocation speciesLocation = cells.Location(header.Species, "species");
        if (species.Length == 0)
        {
            diagnostics.Add(Diagnostic.Error("heat-capacity-missing-species", speciesLocation, "the row names no species", "write the species as the network writes it, e.g. N2(g)"));
            species = null;
        }

        string form = cells.Text(header.Form).Trim().ToLowerInvariant();
        SourceLocation formLocation = cells.Location(header.Form, "form");
        int[]? allowedCounts = form switch
        {
            "nasa7" => [7],
            "shomate" => [5, 8],
            "constant" => [1],
            "linear" => [2],
            _ => null,
        };
        if (allowedCounts is null)
        {
            diagnostics.Add(Diagnostic.Error("heat-capacity-unknown-form", formLocation, $"unknown heat-capacity form '{DiagnosticText.Excerpt(cells.Text(header.Form).Trim())}'", "use nasa7, shomate, constant or linear"));
        }

        double? tmin = ParseNumber(cells, header.TMin, "tmin", diagnostics);
        double? tmax = ParseNumber(cells, header.TMax, "tmax", diagnostics);
        if (tmin is double low && tmax is double high && (low < 0.0 || !(high > low)))
        {
            diagnostics.Add(Diagnostic.Error("heat-capacity-bad-range", cells.Location(header.TMin, "tmin"), string.Create(CultureInfo.InvariantCulture, $"the range {low:G}–{high:G} K is empty or negative"), "tmin must be at least 0 K and tmax greater than tmin"));
        }
        else if (tmax is > AcceptedRanges.MaxHeatCapacityTemperature)
        {
            diagnostics.Add(Diagnostic.Error("heat-capacity-bad-range", cells.Location(header.TMax, "tmax"), $"tmax {AcceptedRanges.Format(tmax.Value)} K is beyond the accepted 20000 K", "give the range in kelvin; no fit in use reaches further"));
        }

        // Coefficients: filled from c1 on; count them, then parse each (reporting every bad one).
        var coefficients = new List<double>();
        int filled = 0;
        int firstEmpty = -1;
        for (int k = 0; k < header.Coefficients.Count; k++)
        {
            (int column, string name) = header.Coefficients[k];
            if (cells.Text(column).Trim().Length == 0)
            {
                if (firstEmpty < 0)
                {
                    firstEmpty = k;
                }

                continue;
            }

            if (firstEmpty >= 0)
            {
                (int emptyColumn, string emptyName) = header.Coefficients[firstEmpty];
                diagnostics.Add(Diagnostic.Error("heat-capacity-missing-coefficient", cells.Location(emptyColumn, emptyName), $"{emptyName} is empty but {name} is filled", "fill the coefficients from c1 on without gaps"));
                firstEmpty = int.MaxValue; // report the hole once per row
            }

            filled = k + 1;
            if (ParseNumber(cells, column, name, diagnostics) is double value)
            {
                coefficients.Add(value);
            }
        }

        if (allowedCounts is not null && firstEmpty != int.MaxValue && !allowedCounts.Contains(filled))
        {
            string expected = string.Join(" or ", allowedCounts);
            SourceLocation where = filled > allowedCounts.Max()
                ? cells.Location(header.Coefficients[allowedCounts.Max()].Column, header.Coefficients[allowedCounts.Max()].Name)
                : cells.Location(header.Coefficients[0].Column, header.Coefficients[0].Name);
            diagnostics.Add(Diagnostic.Error("heat-capacity-coefficient-count", where, $"the form '{DiagnosticText.Excerpt(form)}' needs {expected} coefficients, the row has {filled}", CountHint(form)));
        }

        int errorsAfter = diagnostics.Count(d => d.Severity == Severity.Error);
        if (errorsAfter > errorsBefore || species is null || tmin is null || tmax is null)
        {
            return null;
        }

        var range = new TemperatureRange(tmin.Value, tmax.Value);
        IHeatCapacity model = form switch
        {
            "nasa7" => new Nasa7Polynomial(coefficients, range),
            "shomate" when coefficients.Count == 8 => new ShomateEquation(coefficients[0], coefficients[1], coefficients[2], coefficients[3], coefficients[4], range, coefficients[5], coefficients[6], coefficients[7]),
            "shomate" => new ShomateEquation(coefficients[0], coefficients[1], coefficients[2], coefficients[3], coefficients[4], range),
            "constant" => new ConstantHeatCapacity(coefficients[0], range),
            _ => new LinearHeatCapacity(coefficients[0], coefficients[1], range),
        };
        if (!IsPlausible(model, out double at, out double cp))
        {
            diagnostics.Add(Diagnostic.Error("heat-capacity-out-of-range", cells.Location(header.Coefficients[0].Column, header.Coefficients[0].Name), $"Cp is {AcceptedRanges.Format(cp)} J/(mol·K) at {AcceptedRanges.Format(at)} K, beyond the accepted ±1e5 J/(mol·K)", "check the coefficients' exponents and order, and the form (nasa7 gives Cp/R, the others J/(mol·K))"));
            return null;
        }

        return new RangeRow(species, model, speciesLocation, cells.Location(header.TMin, "tmin"));
    }

    /// <summary>Whether Cp stays finite and within ±<see cref="AcceptedRanges.MaxHeatCapacity"/> at 17 evenly spaced temperatures of the range (from 1 K at least).</summary>
    /// <remarks>Huge coefficients would otherwise overflow the Kirchhoff integrals the analyses take.</remarks>
    private static bool IsPlausible(IHeatCapacity model, out double at, out double cp)
    {
        TemperatureRange range = model.ValidRange;
        for (int k = 0; k <= 16; k++)
        {
            // Measurements start at 1 K: a range from 0 K is sampled from there.
            at = Math.Max(range.Minimum + ((range.Maximum - range.Minimum) * k / 16.0), AcceptedRanges.MinTemperature);

            cp = model.HeatCapacity(at);
            if (!double.IsFinite(cp) || Math.Abs(cp) > AcceptedRanges.MaxHeatCapacity)
            {
                return false;
            }
        }

        at = 0.0;
        cp = 0.0;
        return true;
    }

    private static string CountHint(string form) => form switch
    {
        "nasa7" => "give a1 to a7 in c1 to c7, one row per temperature range",
        "shomate" => "give A to E in c1 to c5, optionally F, G, H in c6 to c8",
        "constant" => "give Cp in J/(mol K) in c1",
        _ => "give a and b of Cp = a + b T in c1 and c2",
    };

    private static double? ParseNumber(RecordCells cells, int column, string name, List<Diagnostic> diagnostics)
    {
        string text = cells.Text(column).Trim();
        if (double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out double value) && double.IsFinite(value))
        {
            return value;
        }

        string hint = text.Contains(',', StringComparison.Ordinal) ? "use a dot as the decimal separator" : "write a finite number such as 1000 or -8.671914 or 1.5e-3";
        string shown = text.Length == 0 ? "an empty field" : $"'{DiagnosticText.Excerpt(text)}'";
        diagnostics.Add(Diagnostic.Error("heat-capacity-bad-number", cells.Location(column, name), $"{name} is {shown}, not a number", hint));
        return null;
    }

    private static List<HeatCapacityEntry> BuildEntries(List<RangeRow> rows, HashSet<string> failedSpecies, HeatCapacityTableOptions options, List<Diagnostic> diagnostics)
    {
        var entries = new List<HeatCapacityEntry>();
        foreach (IGrouping<string, RangeRow> group in rows.GroupBy(r => r.Species, StringComparer.Ordinal))
        {
            if (failedSpecies.Contains(group.Key))
            {
                // A rejected row would show up as a spurious gap; its own error is enough.
                continue;
            }

            RangeRow[] ranges = [.. group.OrderBy(r => r.Model.ValidRange.Minimum)];
            bool ok = true;
            for (int i = 1; i < ranges.Length; i++)
            {
                RangeRow previous = ranges[i - 1];
                RangeRow current = ranges[i];
                double end = previous.Model.ValidRange.Maximum;
                double start = current.Model.ValidRange.Minimum;
                if (Math.Abs(start - end) <= options.RangeTolerance)
                {
                    CheckContinuity(previous, current, (start + end) / 2.0, options, diagnostics);
                    continue;
                }

                ok = false;
                bool gap = start > end;
                string message = string.Create(CultureInfo.InvariantCulture, $"the ranges of '{DiagnosticText.Excerpt(group.Key)}' {(gap ? "leave a gap" : "overlap")}: {previous.Model.ValidRange} (line {previous.SpeciesLocation.Line}) and {current.Model.ValidRange} (line {current.SpeciesLocation.Line})");
                diagnostics.Add(Diagnostic.Error(gap ? "heat-capacity-range-gap" : "heat-capacity-range-overlap", current.TMinLocation, message, "each range must start where the previous one ends"));
            }

            foreach (RangeRow range in ranges)
            {
                CheckPositive(range, diagnostics);
            }

            if (ok)
            {
                IHeatCapacity model = ranges.Length == 1
                    ? ranges[0].Model
                    : new PiecewiseHeatCapacity(ranges.Select(r => r.Model), options.RangeTolerance);
                entries.Add(new HeatCapacityEntry(group.Key, model, ranges.MinBy(r => r.SpeciesLocation.Line)!.SpeciesLocation));
            }
        }

        return entries;
    }

    private static void CheckContinuity(RangeRow lower, RangeRow upper, double joint, HeatCapacityTableOptions options, List<Diagnostic> diagnostics)
    {
        double below = lower.Model.HeatCapacity(joint);
        double above = upper.Model.HeatCapacity(joint);
        double scale = Math.Max(Math.Abs(below), Math.Abs(above));
        if (scale > 0.0 && Math.Abs(above - below) > options.ContinuityTolerance * scale)
        {
            diagnostics.Add(Diagnostic.Warning(
                "heat-capacity-discontinuity",
                upper.TMinLocation,
                string.Create(CultureInfo.InvariantCulture, $"Cp of '{DiagnosticText.Excerpt(upper.Species)}' jumps from {below:F3} to {above:F3} J/(mol K) at {joint:G} K"),
                "check the coefficients of both ranges (order, signs, exponents)"));
        }
    }

    private static void CheckPositive(RangeRow row, List<Diagnostic> diagnostics)
    {
        TemperatureRange range = row.Model.ValidRange;
        double high = double.IsFinite(range.Maximum) ? range.Maximum : range.Minimum;
        foreach (double t in new[] { range.Minimum, (range.Minimum + high) / 2.0, high })
        {
            if (t > 0.0 && !(row.Model.HeatCapacity(t) > 0.0))
            {
                diagnostics.Add(Diagnostic.Warning(
                    "heat-capacity-nonpositive-cp",
                    row.TMinLocation,
                    string.Create(CultureInfo.InvariantCulture, $"Cp of '{DiagnosticText.Excerpt(row.Species)}' is not positive at {t:G} K ({row.Model.HeatCapacity(t):G4} J/(mol K))"),
                    "check the coefficients (order, signs, exponents)"));
                return;
            }
        }
    }

    private sealed record Header(int Species, int Form, int TMin, int TMax, IReadOnlyList<(int Column, string Name)> Coefficients);

    private sealed record RangeRow(string Species, IHeatCapacity Model, SourceLocation SpeciesLocation, SourceLocation TMinLocation);
}

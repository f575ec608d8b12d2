using System.Globalization;
using System.Runtime.CompilerServices;
using System.Text;
using Fractions;
using PathFinder.Analysis;
using PathFinder.Chemistry;
using PathFinder.Diagnostics;
using PathFinder.IO;
using PathFinder.Quantities;
using PathFinder.Thermodynamics;

namespace PathFinder.Data;

/// <summary>Reads a network (one CSV file or a folder of them) and validates every row, collecting all problems.</summary>
/// <remarks>
/// <para>The header contract, case-insensitive and in any order: <c>id,equation,property,value,uncertainty,unit,temperature,source</c>.
/// <c>unit</c>, <c>temperature</c> and <c>source</c> may be blank or absent (defaults: kJ/mol or J/(mol·K), 298.15 K,
/// the file name). An optional <c>coverage</c> column (k) turns an expanded uncertainty into a standard one.
/// Other columns are kept as notes.</para>
/// <para>Rows with errors are left out of the network; the rest is usable even when some rows are bad.</para>
/// </remarks>
public static class NetworkReader
{
    /// <summary>Below this many distinct equations in a file, parsing them ahead on several threads does not pay.</summary>
    private const int PreparseMinimum = 2000;

    /// <summary>The required columns.</summary>
    public static IReadOnlyList<string> RequiredColumns { get; } = ["id", "equation", "property", "value", "uncertainty"];

    /// <summary>The optional columns with a meaning.</summary>
    public static IReadOnlyList<string> OptionalColumns { get; } = ["unit", "temperature", "source", "coverage"];

    /// <summary>The code of the warning on a row that only checks a convention (<c>H+(aq) + e- -> 1/2 H2(g)</c>) and that no analysis uses.</summary>
    public const string ConventionalOnlyCode = "conventional-only";

    /// <summary>Beyond this distance from 298.15 K (in K) a measurement without heat-capacity data is warned about.</summary>
    public const double TemperatureWarningDistance = 10.0;

    /// <summary>Reads and validates a network file or folder.</summary>
    /// <param name="path">A CSV file or a folder of CSV files.</param>
    public static NetworkReadResult Read(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        var diagnostics = new List<Diagnostic>();
        string name = Path.GetFileNameWithoutExtension(Path.TrimEndingDirectorySeparator(path));
        if (!File.Exists(path) && !Directory.Exists(path))
        {
            diagnostics.Add(Diagnostic.Error("not-found", new SourceLocation(path), "no such file or folder", "give a CSV file or a folder of CSV files"));
            return new NetworkReadResult(new ReactionNetwork(name, []), diagnostics, [], null, null, NoHeatCapacities);
        }

        if (File.Exists(path) && !FileKinds.IsRegularFile(path))
        {
            diagnostics.Add(Diagnostic.Error("not-a-regular-file", new SourceLocation(path), "not a regular file (a FIFO, a device or a socket): it is not read", "give a CSV file or a folder of CSV files"));
            return new NetworkReadResult(new ReactionNetwork(name, []), diagnostics, [], null, null, NoHeatCapacities);
        }

        IReadOnlyList<string> files = NetworkFiles.MeasurementFiles(path, out IReadOnlyList<SkippedEntry> skipped);
        foreach (SkippedEntry entry in skipped)
        {
            diagnostics.Add(Diagnostic.Note("skipped-file", new SourceLocation(entry.Path), $"not read: {entry.Reason}", entry.Hint));
        }

        if (files.Count == 0)
        {
            diagnostics.Add(Diagnostic.Error("empty-network", new SourceLocation(path), "the folder holds no measurement CSV files", "put one or more CSV files with the header id,equation,property,value,uncertainty in it"));
            return new NetworkReadResult(new ReactionNetwork(name, []), diagnostics, files, null, null, NoHeatCapacities);
        }

        string? speciesFile = CompanionFile(path, NetworkFiles.SpeciesFileName, diagnostics);
        SpeciesCatalog catalog = SpeciesCatalog.Read(speciesFile, speciesFile ?? "", diagnostics);
        string? heatCapacityFile = CompanionFile(path, NetworkFiles.HeatCapacityFileName, diagnostics);
        Dictionary<Species, IHeatCapacity> heatCapacities = ReadHeatCapacities(heatCapacityFile, catalog, diagnostics);

        var measurements = new List<Measurement>();
        var firstById = new Dictionary<string, SourceLocation>(StringComparer.Ordinal);
        var equations = new EquationCache();
        var sources = new HashSet<string>(StringComparer.Ordinal);
        foreach (string file in files)
        {
            ReadFile(file, catalog, equations, measurements, firstById, sources, diagnostics);
        }

        // After the measurements: a declaration must name a source of the data (before any curation exclusion).
        string? sourcesFile = CompanionFile(path, NetworkFiles.SourcesFileName, diagnostics);
        var dimensions = measurements
            .Select(measurement => (measurement.Source, Dimension: measurement.Property.Dimension() == UnitDimension.MolarEntropy ? UnitDimension.MolarEntropy : UnitDimension.MolarEnergy))
            .ToHashSet();
        IReadOnlyList<SourceSystematic> systematics = SourceSystematicsReader.Read(sourcesFile, sources, diagnostics, (source, dimension) => dimensions.Contains((source, dimension)));

        var network = new ReactionNetwork(name, measurements);
        return new NetworkReadResult(
            network,
            diagnostics,
            () =>
            {
                var warnings = new List<Diagnostic>();
                AddNetworkWarnings(measurements, catalog, heatCapacities, warnings);
                return warnings;
            },
            files,
            speciesFile,
            heatCapacityFile,
            heatCapacities,
            sourcesFile,
            systematics);
    }

    /// <summary>The companion table's path when it exists as a regular file; an error when something else has its name.</summary>
    private static string? CompanionFile(string networkPath, string fileName, List<Diagnostic> diagnostics)
    {
        string path = NetworkFiles.Companion(networkPath, fileName);
        if (!File.Exists(path))
        {
            return null;
        }

        if (!FileKinds.IsRegularFile(path))
        {
            diagnostics.Add(Diagnostic.Error("not-a-regular-file", new SourceLocation(path), "not a regular file (a FIFO, a device or a socket): it is not read", $"make {fileName} a CSV file, or remove it"));
            return null;
        }

        return path;
    }

    private static readonly IReadOnlyDictionary<Species, IHeatCapacity> NoHeatCapacities = new Dictionary<Species, IHeatCapacity>();

    private static Dictionary<Species, IHeatCapacity> ReadHeatCapacities(string? path, SpeciesCatalog catalog, List<Diagnostic> diagnostics)
    {
        var models = new Dictionary<Species, IHeatCapacity>();
        if (path is null)
        {
            return models;
        }

        HeatCapacityTable table = HeatCapacityTableReader.ReadFile(path);
        diagnostics.AddRange(table.Diagnostics);
        foreach (HeatCapacityEntry entry in table.Entries)
        {
            ParseResult<Species> species = catalog.Resolve(entry.SpeciesText);
            if (!species.TryGetValue(out Species? resolved))
            {
                diagnostics.Add(Diagnostic.Error(species.Failure.Code, entry.Location.Shift(species.Failure.Offset), species.Failure.Message, species.Failure.Hint));
                continue;
            }

            if (!models.TryAdd(resolved, entry.Model))
            {
                diagnostics.Add(Diagnostic.Warning("repeated-heat-capacity", entry.Location, $"{resolved.Name} has heat-capacity rows under two spellings; the first is used", "keep one spelling per species"));
            }
        }

        return models;
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static void ReadFile(string file, SpeciesCatalog catalog, EquationCache equations, List<Measurement> measurements, Dictionary<string, SourceLocation> firstById, HashSet<string> sources, List<Diagnostic> diagnostics)
    {
        CsvTable? table = CsvTable.Read(file, file, diagnostics);
        if (table is null)
        {
            return;
        }

        // Every row's source counts, valid or not, so that a bad row or header is not echoed by sources.csv as an unknown source.
        string defaultSource = Path.GetFileNameWithoutExtension(file);
        int sourceColumn = table.IndexOf("source");
        foreach (CsvRow row in table.Rows)
        {
            sources.Add(SourceOf(row, sourceColumn, defaultSource));
        }

        if (table.ReportDuplicateColumns(diagnostics))
        {
            return;
        }

        var columns = RequiredColumns.Concat(OptionalColumns).ToDictionary(column => column, table.IndexOf, StringComparer.Ordinal);
        string[] missing = RequiredColumns.Where(column => columns[column] < 0).ToArray();
        if (missing.Length > 0)
        {
            string hint = table.Header.Count == 1 && table.Header[0].Contains(';', StringComparison.Ordinal)
                ? "the header is one field: the file seems to use another separator"
                : "the header must contain id,equation,property,value,uncertainty (unit,temperature,source optional), in any order";
            diagnostics.Add(Diagnostic.Error("missing-column", new SourceLocation(file, table.HeaderLine, 1), $"missing required column(s): {string.Join(", ", missing)}", hint));
            return;
        }

        if (table.DecimalComma)
        {
            diagnostics.Add(CsvNumber.DecimalCommaWarning(table));
        }

        var map = new ColumnMap(columns, table.Header.Count);
        PreparseEquations(table, map, catalog, equations);
        foreach (CsvRow row in table.Rows)
        {
            // Ids are checked on every row, valid or not, so a clash is reported even when the first row is bad.
            string id = row.FieldOrEmpty(map.Id);
            bool duplicate = false;
            if (id.Length > 0 && !firstById.TryAdd(id, row.LocationOf(map.Id, "id")))
            {
                diagnostics.Add(Diagnostic.Error("duplicate-id", row.LocationOf(map.Id, "id"), $"measurement id '{DiagnosticText.Excerpt(id)}' was already used at {firstById[id]}", "give every measurement its own id"));
                duplicate = true;
            }

            Measurement? measurement = ReadRow(row, table, map, catalog, equations, defaultSource, diagnostics);
            if (measurement is not null && !duplicate)
            {
                measurements.Add(measurement);
                if (ValuePlausibility.Check(measurement, row.LocationOf(map.Value, "value")) is { } implausible)
                {
                    diagnostics.Add(implausible);
                }

                if (ThermoModel.MeasuresOnlyConventions(measurement))
                {
                    diagnostics.Add(Diagnostic.Warning(ConventionalOnlyCode, measurement.Location, $"'{DiagnosticText.Excerpt(measurement.Id)}' involves only species whose contributions are zero by convention (elements in their reference states, H+(aq), e-): it only checks that convention and is not used by any analysis", "its value should be 0 within its uncertainty; drop the row, or check the equation"));
                }
            }
        }
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static Measurement? ReadRow(CsvRow row, CsvTable table, ColumnMap columns, SpeciesCatalog catalog, EquationCache equations, string defaultSource, List<Diagnostic> diagnostics)
    {
        int before = diagnostics.Count;
        if (row.Fields.Count > table.Header.Count)
        {
            string hint = row.Fields.Any(field => field.Contains(',', StringComparison.Ordinal)) || table.Delimiter != ','
                ? "quote fields that contain the separator"
                : "a decimal comma (1,5) splits a number in two in a comma-separated file: write 1.5, or quote the field";
            diagnostics.Add(Diagnostic.Error("extra-fields", row.LocationOf(table.Header.Count), $"the row has {row.Fields.Count} fields but the header has {table.Header.Count}", hint));
            return null;
        }

        string id = row.FieldOrEmpty(columns.Id);
        if (id.Length == 0)
        {
            diagnostics.Add(Diagnostic.Error("missing-id", row.LocationOf(columns.Id, "id"), "the measurement has no id", "give every row a unique id such as m1"));
        }
        else if (TerminalText.FirstUnsafe(id, keepLineBreaks: false) is >= 0 and int at)
        {
            // Ids are printed in every report and terminal: an ESC would run there, a line break would fake a line.
            string field = row.Fields[columns.Id];
            int offset = field.Length - field.TrimStart().Length + at;
            diagnostics.Add(Diagnostic.Error("control-character-in-id", row.LocationOf(columns.Id, "id").Shift(offset), $"the id '{DiagnosticText.Excerpt(TerminalText.Visible(id))}' holds the control character U+{(int)id[at]:X4}", "ids are printed in reports and terminals: write them without control characters, line breaks or tabs"));
        }

        ThermoProperty property = ThermoProperty.Enthalpy;
        string propertyText = row.FieldOrEmpty(columns.Property);
        bool propertyKnown = ThermoProperties.TryParse(propertyText, out property);
        if (!propertyKnown)
        {
            diagnostics.Add(Diagnostic.Error("unknown-property", row.LocationOf(columns.Property, "property"), $"unknown property '{DiagnosticText.Excerpt(propertyText)}'", $"use one of {string.Join(", ", ThermoProperties.Codes)}"));
        }

        ChemicalEquation? equation = ReadEquation(row, columns.Equation, catalog, equations, propertyKnown ? property : null, diagnostics);

        EnergyUnit unit = propertyKnown ? property.CanonicalUnit() : EnergyUnit.KilojoulePerMole;
        string unitText = row.FieldOrEmpty(columns.Unit);
        bool unitAccepted = true;
        if (unitText.Length > 0)
        {
            unitAccepted = false;
            if (!EnergyUnit.TryParse(unitText, out EnergyUnit parsedUnit))
            {
                diagnostics.Add(Diagnostic.Error("unknown-unit", row.LocationOf(columns.Unit, "unit"), $"unknown unit '{DiagnosticText.Excerpt(unitText)}'", $"use one of {string.Join(", ", EnergyUnit.AcceptedSymbols)}"));
            }
            else if (propertyKnown && parsedUnit.Dimension != property.Dimension())
            {
                string expected = property.Dimension() switch
                {
                    UnitDimension.MolarEnergy => "an energy unit such as kJ/mol",
                    UnitDimension.MolarEntropy => "an entropy unit such as J/(mol·K)",
                    _ => "no unit (leave the cell empty or write 1): an equilibrium constant's logarithm is a pure number",
                };
                diagnostics.Add(Diagnostic.Error("wrong-unit", row.LocationOf(columns.Unit, "unit"), $"{property.Code()} cannot be in {parsedUnit.Symbol}", $"use {expected}"));
            }
            else
            {
                unit = parsedUnit;
                unitAccepted = true;
            }
        }

        double? value = CsvNumber.Read(row, columns.Value, "value", table.DecimalComma, diagnostics);
        double? uncertainty = CsvNumber.Read(row, columns.Uncertainty, "uncertainty", table.DecimalComma, diagnostics);
        if (uncertainty is <= 0.0)
        {
            diagnostics.Add(Diagnostic.Error("bad-uncertainty", row.LocationOf(columns.Uncertainty, "uncertainty"), $"the uncertainty must be positive, not {uncertainty.Value.ToString(CultureInfo.InvariantCulture)}", "give the standard uncertainty of the value (a zero uncertainty would make it exact)"));
            uncertainty = null;
        }

        double coverage = 1.0;
        if (columns.Coverage >= 0 && row.FieldOrEmpty(columns.Coverage).Length > 0)
        {
            double? k = CsvNumber.Read(row, columns.Coverage, "coverage", table.DecimalComma, diagnostics);
            if (k is < 1.0 or > 10.0)
            {
                diagnostics.Add(Diagnostic.Error("bad-coverage", row.LocationOf(columns.Coverage, "coverage"), $"the coverage factor k = {k.Value.ToString(CultureInfo.InvariantCulture)} is outside 1..10", "k is usually 2 (about 95 %); leave the field blank for a standard uncertainty"));
            }
            else if (k is not null)
            {
                coverage = k.Value;
            }
        }

        if (propertyKnown && unitAccepted && value is not null && uncertainty is not null)
        {
            CheckMagnitudes(row, columns, property, unit, value.Value, uncertainty.Value, coverage, diagnostics);
        }

        double temperature = PhysicalConstants.StandardTemperature;
        if (columns.Temperature >= 0 && row.FieldOrEmpty(columns.Temperature).Length > 0)
        {
            double? t = CsvNumber.Read(row, columns.Temperature, "temperature", table.DecimalComma, diagnostics);
            if (t is not null && !AcceptedRanges.IsTemperatureAccepted(t.Value))
            {
                diagnostics.Add(Diagnostic.Error("bad-temperature", row.LocationOf(columns.Temperature, "temperature"), $"the temperature {AcceptedRanges.Format(t.Value)} K is outside the accepted 1–10000 K", "give the temperature in kelvin, from 1 to 10000 K (298.15 for 25 °C)"));
            }
            else if (t is not null)
            {
                temperature = t.Value;
            }
        }

        string source = SourceOf(row, columns.Source, defaultSource);

        if (diagnostics.Count > before || equation is null || value is null || uncertainty is null || id.Length == 0)
        {
            return null;
        }

        Dictionary<string, string>? notes = null;
        for (int i = 0; i < table.Header.Count; i++)
        {
            if (!columns.IsKnown(i) && row.FieldOrEmpty(i).Length > 0)
            {
                notes ??= new Dictionary<string, string>(StringComparer.Ordinal);
                notes[table.Header[i]] = row.FieldOrEmpty(i);
            }
        }

        return new Measurement
        {
            Id = id,
            Equation = equation,
            EquationText = row.FieldOrEmpty(columns.Equation),
            Property = property,
            Value = unit.ToCanonicalValue(value.Value),
            Uncertainty = unit.ToCanonicalValue(uncertainty.Value / coverage),
            Unit = unit,
            Temperature = temperature,
            Source = source,
            Location = row.LocationOf(columns.Equation, "equation"),
            Notes = notes ?? NoNotes,
        };
    }

    /// <summary>Refuses a value or a standard uncertainty outside <see cref="AcceptedRanges"/> once converted to the canonical unit.</summary>
    /// <remarks>Beyond these magnitudes the analyses' sums, squares and weights overflow or vanish (1e300 kcal/mol, an uncertainty of 1e-300).</remarks>
    private static void CheckMagnitudes(CsvRow row, ColumnMap columns, ThermoProperty property, EnergyUnit unit, double value, double uncertainty, double coverage, List<Diagnostic> diagnostics)
    {
        EnergyUnit canonical = property.CanonicalUnit();
        double bound = AcceptedRanges.MaxMagnitude(property);
        string boundText = WithUnit(bound, canonical);
        double canonicalValue = unit.ToCanonicalValue(value);
        string Shown(double number, double inCanonical) => unit == canonical || property.IsEquilibriumConstant()
            ? WithUnit(number, unit)
            : $"{WithUnit(number, unit)} ({WithUnit(inCanonical, canonical)})";
        if (!AcceptedRanges.IsValueAccepted(property, canonicalValue))
        {
            string hint = property.Dimension() switch
            {
                UnitDimension.MolarEnergy => "an energy per mole of reaction as written must lie within ±1e5 kJ/mol (the largest real ones are about 2e4): check the unit and the exponent",
                UnitDimension.MolarEntropy => "an entropy must lie within ±1e5 J/(mol·K) (real ones stay below about 1e4): check the unit and the exponent",
                _ => "ln K must lie within ±1000 (log10 K within ±434.29): check the exponent, or whether K itself was written instead of its logarithm",
            };
            diagnostics.Add(Diagnostic.Error("value-out-of-range", row.LocationOf(columns.Value, "value"), $"the {property.Symbol()} value {Shown(value, canonicalValue)} is beyond the accepted ±{boundText}", hint));
            return;
        }

        double canonicalUncertainty = unit.ToCanonicalValue(uncertainty / coverage);
        double floor = AcceptedRanges.MinUncertainty(canonicalValue);
        if (canonicalUncertainty > bound)
        {
            diagnostics.Add(Diagnostic.Error("uncertainty-out-of-range", row.LocationOf(columns.Uncertainty, "uncertainty"), $"the standard uncertainty {Shown(uncertainty / coverage, canonicalUncertainty)} is beyond the accepted {boundText}", "check the unit and the exponent; a datum known that poorly says nothing: leave the row out"));
        }
        else if (!(canonicalUncertainty >= floor))
        {
            diagnostics.Add(Diagnostic.Error("uncertainty-out-of-range", row.LocationOf(columns.Uncertainty, "uncertainty"), $"the standard uncertainty {Shown(uncertainty / coverage, canonicalUncertainty)} is below the accepted floor {WithUnit(floor, canonical)}", "no measurement is that precise (the floor is the larger of 1e-6 and 1e-9 × |value| in the canonical unit): give the real standard uncertainty"));
        }
    }

    /// <summary>A number with its unit for messages (a pure number without one).</summary>
    private static string WithUnit(double number, EnergyUnit unit) =>
        unit.Dimension == UnitDimension.Dimensionless ? AcceptedRanges.Format(number) : $"{AcceptedRanges.Format(number)} {unit.Symbol}";

    /// <summary>The row's source: its <c>source</c> field, or the file's default when the column is absent or the field blank.</summary>
    private static string SourceOf(CsvRow row, int column, string defaultSource)
    {
        string source = column >= 0 ? row.FieldOrEmpty(column) : "";
        return source.Length == 0 ? defaultSource : source;
    }

    /// <summary>Parses and balance-checks every distinct equation text of a file on all cores, ahead of the row loop.</summary>
    /// <remarks>
    /// Parsing equations (exact rational coefficients) is most of the reading time of a large file, and each text
    /// parses the same way on any thread. What must stay in row order is the catalog's bookkeeping (which spelling
    /// of a species came first): the row loop replays each pre-parsed equation's species texts through the catalog
    /// in order, and uses the pre-parsed equation only when every species resolves to the very instance used in it;
    /// otherwise it parses the text again in order. The result is the same as parsing row by row.
    /// </remarks>
    private static void PreparseEquations(CsvTable table, ColumnMap map, SpeciesCatalog catalog, EquationCache equations)
    {
        var texts = new List<string>();
        var seen = new HashSet<string>(StringComparer.Ordinal);
        foreach (CsvRow row in table.Rows)
        {
            // S rows name one species, not an equation; they are resolved in the row loop.
            if (ThermoProperties.TryParse(row.FieldOrEmpty(map.Property), out ThermoProperty property) && property == ThermoProperty.AbsoluteEntropy)
            {
                continue;
            }

            string text = row.FieldOrEmpty(map.Equation);
            if (text.Length > 0 && !equations.ByText.ContainsKey(text) && seen.Add(text))
            {
                texts.Add(text);
            }
        }

        if (texts.Count < PreparseMinimum || Environment.ProcessorCount < 2)
        {
            return;
        }

        var results = new PreparsedEquation[texts.Count];
        Parallel.For(0, texts.Count, i =>
        {
            var resolved = new List<(string Text, Species? Species)>();
            (ParseResult<ChemicalEquation> result, IReadOnlyList<string> imbalances) = ParseChecked(texts[i], text =>
            {
                ParseResult<Species> species = catalog.ResolveWithoutRecording(text);
                resolved.Add((text, species.TryGetValue(out Species? value) ? value : null));
                return species;
            });
            results[i] = new PreparsedEquation(result, imbalances, resolved.ToArray());
        });

        for (int i = 0; i < texts.Count; i++)
        {
            equations.Preparsed[texts[i]] = results[i];
        }
    }

    /// <summary>Parses one equation and checks its balance.</summary>
    /// <returns>The parse and its imbalances.</returns>
    private static (ParseResult<ChemicalEquation> Result, IReadOnlyList<string> Imbalances) ParseChecked(string text, Func<string, ParseResult<Species>> resolveSpecies)
    {
        ParseResult<ChemicalEquation> result = EquationParser.Parse(text, resolveSpecies);
        return (result, result.TryGetValue(out ChemicalEquation? value) ? value.FindImbalances() : []);
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static ChemicalEquation? ReadEquation(CsvRow row, int column, SpeciesCatalog catalog, EquationCache equations, ThermoProperty? property, List<Diagnostic> diagnostics)
    {
        string raw = column < row.Fields.Count ? row.Fields[column] : "";
        int leading = raw.Length - raw.TrimStart().Length;
        string text = raw.Trim();
        SourceLocation location = row.LocationOf(column, "equation");
        if (text.Length == 0)
        {
            diagnostics.Add(Diagnostic.Error("missing-equation", location, "the equation is empty", "write reactants -> products, or one species for its formation"));
            return null;
        }

        if (property == ThermoProperty.AbsoluteEntropy)
        {
            // S° belongs to one species: the shorthand here means the species itself, not its formation.
            ParseResult<Species> species = catalog.Resolve(text);
            if (!species.TryGetValue(out Species? value))
            {
                string hint = text.Contains("->", StringComparison.Ordinal) || text.Contains('=', StringComparison.Ordinal)
                    ? "S is the absolute entropy of one species; use dS for a reaction entropy"
                    : species.Failure.Hint;
                diagnostics.Add(Diagnostic.Error(species.Failure.Code, location.Shift(leading + species.Failure.Offset), species.Failure.Message, hint));
                return null;
            }

            return ChemicalEquation.FromTerms([new EquationTerm(value, Fraction.One)]);
        }

        // Repeated determinations repeat the equation text word for word; parse and balance-check each text once.
        if (!equations.ByText.TryGetValue(text, out ParsedEquation? known))
        {
            (ParseResult<ChemicalEquation> result, IReadOnlyList<string> found) = equations.TakePreparsed(text, catalog) ?? ParseChecked(text, catalog.Resolve);
            known = new ParsedEquation(result, found);
            equations.ByText[text] = known;
        }

        ParseResult<ChemicalEquation> equation = known.Result;
        if (!equation.TryGetValue(out ChemicalEquation? parsed))
        {
            diagnostics.Add(Diagnostic.Error(equation.Failure.Code, location.Shift(leading + equation.Failure.Offset), equation.Failure.Message, equation.Failure.Hint));
            return null;
        }

        IReadOnlyList<string> imbalances = known.Imbalances;
        if (imbalances.Count > 0)
        {
            diagnostics.Add(Diagnostic.Error("unbalanced-equation", location.Shift(leading), $"the equation is not balanced: {string.Join("; ", imbalances)}", "correct the coefficients or formulas so every element and the charge balance"));
            return null;
        }

        return parsed;
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static void AddNetworkWarnings(List<Measurement> measurements, SpeciesCatalog catalog, IReadOnlyDictionary<Species, IHeatCapacity> heatCapacities, List<Diagnostic> diagnostics)
    {
        // Measurements at different temperatures are different determinations (a K series, a ΔH at 500 K).
        var seen = new Dictionary<(string Source, ThermoProperty Property, string Reaction, double Temperature), Measurement>();

        // Rows that repeat an equation text share its parsed equation: work its signature out once.
        var signatures = new Dictionary<ChemicalEquation, string>(ReferenceEqualityComparer.Instance);
        var uses = new Dictionary<Species, List<Measurement>>();
        for (int i = 0; i < measurements.Count; i++)
        {
            Measurement measurement = measurements[i];
            if (!signatures.TryGetValue(measurement.Equation, out string? signature))
            {
                signature = ReactionSignature(measurement.Equation);
                signatures[measurement.Equation] = signature;
            }

            var key = (measurement.Source, measurement.Property, signature, Math.Round(measurement.Temperature, 2));
            if (seen.TryGetValue(key, out Measurement? first))
            {
                diagnostics.Add(Diagnostic.Warning("repeated-measurement", measurement.Location with { Field = "equation" }, $"'{DiagnosticText.Excerpt(measurement.Id)}' measures the same reaction at the same temperature as '{DiagnosticText.Excerpt(first.Id)}' in source '{measurement.Source}'", "if both are independent determinations keep them; if one is a copy, drop it"));
            }
            else
            {
                seen[key] = measurement;
            }

            if (Math.Abs(measurement.Temperature - PhysicalConstants.StandardTemperature) > TemperatureWarningDistance)
            {
                string[] lacking = measurement.Equation.Terms
                    .Where(term => !heatCapacities.ContainsKey(term.Species) && !term.Species.Formula.IsElectron)
                    .Select(term => term.Species.Name)
                    .ToArray();
                if (lacking.Length > 0)
                {
                    diagnostics.Add(Diagnostic.Warning("no-heat-capacity", measurement.Location with { Field = "temperature" }, $"'{DiagnosticText.Excerpt(measurement.Id)}' was measured at {measurement.Temperature.ToString("0.##", CultureInfo.InvariantCulture)} K and there are no heat-capacity data for {string.Join(", ", lacking)} to correct it to 298.15 K", $"add those species to {NetworkFiles.HeatCapacityFileName} beside the data; until then the value is used uncorrected"));
                }
            }

            foreach (EquationTerm term in measurement.Equation.Terms)
            {
                if (!uses.TryGetValue(term.Species, out List<Measurement>? list))
                {
                    list = [];
                    uses[term.Species] = list;
                }

                list.Add(measurement);
            }
        }

        TypoWarnings.Add(measurements, catalog, uses.Keys.ToHashSet(), diagnostics);
        foreach ((Species species, List<Measurement> list) in uses)
        {
            if (list.Count == 1 && !ReferenceStates.HasZeroFormationProperties(species))
            {
                Measurement only = list[0];
                diagnostics.Add(Diagnostic.Warning("single-use-species", only.Location with { Field = "equation" }, $"{species.Name} appears only in '{DiagnosticText.Excerpt(only.Id)}': nothing can check that value", "add another measurement involving this species to make it checkable"));
            }
        }

        foreach ((Species species, IReadOnlyCollection<string> spellings) in catalog.MergedSpellings())
        {
            Measurement? first = uses.TryGetValue(species, out List<Measurement>? list) ? list[0] : null;
            SourceLocation location = first?.Location ?? new SourceLocation("");
            diagnostics.Add(Diagnostic.Warning("merged-spellings", location, $"{string.Join(", ", spellings)} in state {species.State} have the same composition and are treated as one species", "if they are different isomers, declare each in species.csv with its own key and use the keys"));
        }
    }

    /// <summary>An identity of a reaction up to a positive scale factor (2 H2 + O2 = 2 H2O is H2 + ½ O2 = H2O).</summary>
    private static string ReactionSignature(ChemicalEquation equation)
    {
        if (equation.Terms.Count == 0)
        {
            return "";
        }

        EquationTerm[] sorted = [.. equation.Terms];
        Array.Sort(sorted, static (a, b) => string.CompareOrdinal(a.Species.Key, b.Species.Key));
        return QuickSignature(sorted) ?? ExactSignature(sorted);
    }

    /// <summary>The signature in checked 64-bit rationals, or null when a number does not fit.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static string? QuickSignature(EquationTerm[] sorted)
    {
        if (!SmallRational.TryFrom(sorted[0].Coefficient, out long scaleNumerator, out long scaleDenominator))
        {
            return null;
        }

        var text = new StringBuilder();
        try
        {
            scaleNumerator = Math.Abs(scaleNumerator);
            foreach (EquationTerm term in sorted)
            {
                if (!SmallRational.TryFrom(term.Coefficient, out long n, out long d))
                {
                    return null;
                }

                (long numerator, long denominator) = SmallRational.Divide(n, d, scaleNumerator, scaleDenominator);
                if (text.Length > 0)
                {
                    text.Append(';');
                }

                text.Append(term.Species.Key).Append(':').Append(numerator.ToString(CultureInfo.InvariantCulture));
                if (denominator != 1)
                {
                    text.Append('/').Append(denominator.ToString(CultureInfo.InvariantCulture));
                }
            }
        }
        catch (OverflowException)
        {
            return null;
        }

        return text.ToString();
    }

    private static string ExactSignature(EquationTerm[] sorted)
    {
        EquationTerm pivot = sorted[0];
        Fraction scale = pivot.Coefficient < Fraction.Zero ? -pivot.Coefficient : pivot.Coefficient;
        return string.Join(";", sorted.Select(term => $"{term.Species.Key}:{RationalText.Format(term.Coefficient / scale)}"));
    }

    private static readonly IReadOnlyDictionary<string, string> NoNotes = new Dictionary<string, string>(StringComparer.Ordinal);

    /// <summary>The column index of each known field in one file (-1 when absent).</summary>
    private sealed class ColumnMap(Dictionary<string, int> columns, int headerCount)
    {
        private readonly bool[] _known = Known(columns, headerCount);

        public int Id { get; } = columns["id"];

        public int Equation { get; } = columns["equation"];

        public int Property { get; } = columns["property"];

        public int Value { get; } = columns["value"];

        public int Uncertainty { get; } = columns["uncertainty"];

        public int Unit { get; } = columns["unit"];

        public int Temperature { get; } = columns["temperature"];

        public int Source { get; } = columns["source"];

        public int Coverage { get; } = columns["coverage"];

        public bool IsKnown(int index) => index < _known.Length && _known[index];

        private static bool[] Known(Dictionary<string, int> columns, int headerCount)
        {
            var known = new bool[headerCount];
            foreach (int index in columns.Values)
            {
                if (index >= 0 && index < headerCount)
                {
                    known[index] = true;
                }
            }

            return known;
        }
    }

    /// <summary>The parse of one equation text and its element/charge imbalances, kept for texts that recur.</summary>
    /// <param name="Result">The parse.</param>
    /// <param name="Imbalances">The element and charge imbalances, empty when balanced.</param>
    private sealed record ParsedEquation(ParseResult<ChemicalEquation> Result, IReadOnlyList<string> Imbalances);

    /// <summary>An equation parsed ahead of the row loop, with the species texts it resolved and the instances they gave, in order.</summary>
    private sealed record PreparsedEquation(ParseResult<ChemicalEquation> Result, IReadOnlyList<string> Imbalances, (string Text, Species? Species)[] Resolved);

    /// <summary>Equation texts already read, and those parsed ahead.</summary>
    private sealed class EquationCache
    {
        public Dictionary<string, ParsedEquation> ByText { get; } = new(StringComparer.Ordinal);

        /// <summary>Equations parsed on all cores before the row loop (see <see cref="PreparseEquations"/>).</summary>
        public Dictionary<string, PreparsedEquation> Preparsed { get; } = new(StringComparer.Ordinal);

        /// <summary>The pre-parsed equation of a text, valid in row order, or null (parse it in order then).</summary>
        /// <remarks>Replays the species texts through the catalog, as a parse in row order would, and checks every species is the instance the pre-parse used.</remarks>
        public (ParseResult<ChemicalEquation> Result, IReadOnlyList<string> Imbalances)? TakePreparsed(string text, SpeciesCatalog catalog)
        {
            if (!Preparsed.Remove(text, out PreparsedEquation? preparsed) || !preparsed.Result.TryGetValue(out _))
            {
                return null;
            }

            bool same = true;
            foreach ((string speciesText, Species? ahead) in preparsed.Resolved)
            {
                same &= catalog.Resolve(speciesText).TryGetValue(out Species? inOrder) && ReferenceEquals(inOrder, ahead);
            }

            return same ? (preparsed.Result, preparsed.Imbalances) : null;
        }
    }
}

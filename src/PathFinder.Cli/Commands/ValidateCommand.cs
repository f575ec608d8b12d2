using System.CommandLine;
using System.Globalization;
using PathFinder.Cli.Output;
using PathFinder.Data;
using PathFinder.Diagnostics;
using PathFinder.Quantities;

namespace PathFinder.Cli.Commands;

/// <summary><c>pathfinder validate &lt;network&gt;</c>: reads the data, checks every row, prints a summary and every problem.</summary>
public sealed class ValidateCommand
{
    private readonly Argument<string> _network = CommonOptions.Network();
    private readonly Option<bool> _json = new("--json") { Description = "Write the summary and diagnostics as JSON." };

    /// <summary>Builds the command bound to <paramref name="context"/>.</summary>
    public Command Build(CommandContext context)
    {
        var command = new Command("validate", "Check every equation (element and charge balance), unit, number and uncertainty; list every problem with file:line:column.")
        {
            _network,
            _json,
        };
        command.SetAction(parse => Run(parse.GetValue(_network)!, parse.GetValue(_json), context));
        return command;
    }

    /// <summary>Runs the validation and returns the exit code: 0 valid (warnings allowed), 2 errors found.</summary>
    public static int Run(string path, bool json, CommandContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        NetworkReadResult result = NetworkReader.Read(path);
        NetworkSummary summary = NetworkSummary.Of(result.Network);
        // The curation file is read as every analysis command reads it, so its problems show here first.
        CurationLoading curation = CurationLoading.Of(path, result.Network);
        Diagnostic[] diagnostics = [.. result.Diagnostics, .. curation.Diagnostics];
        bool hasErrors = result.HasErrors || curation.File.HasErrors;
        int errors = diagnostics.Count(diagnostic => diagnostic.Severity == Severity.Error);
        int warnings = diagnostics.Count(diagnostic => diagnostic.Severity == Severity.Warning);
        int notes = diagnostics.Count(diagnostic => diagnostic.Severity == Severity.Note);
        int exitCode = hasErrors ? ExitCodes.InvalidInput : ExitCodes.Success;
        if (json)
        {
            Json.Write(context.Out, new
            {
                network = path,
                valid = !hasErrors,
                files = result.Files,
                speciesFile = result.SpeciesFile,
                heatCapacityFile = result.HeatCapacityFile,
                heatCapacitySpecies = result.HeatCapacities.Keys.Select(species => species.Name),
                sourcesFile = result.SourcesFile,
                curationFile = curation.Exists ? curation.Path : null,
                curation = new
                {
                    decisions = curation.File.Set.Decisions.Count,
                    excluded = curation.Applied.Excluded.Select(item => item.Measurement.Id),
                    notApplied = curation.File.Unapplied.Count,
                    unknownIds = curation.Applied.UnknownIds,
                },
                sourceSystematics = result.SourceSystematics.Select(declared => new
                {
                    source = declared.Source,
                    systematic = declared.Systematic,
                    unit = declared.IsEnergy ? EnergyUnit.KilojoulePerMole.Symbol : EnergyUnit.JoulePerMoleKelvin.Symbol,
                }),
                summary = new
                {
                    measurements = summary.MeasurementCount,
                    species = summary.SpeciesCount,
                    sources = summary.MeasurementsBySource.Select(pair => new { name = pair.Key, measurements = pair.Value }),
                    properties = summary.MeasurementsByProperty.Select(pair => new { property = pair.Key.Code(), measurements = pair.Value }),
                    elements = summary.Elements,
                    referenceStates = summary.ReferenceStatesUsed.Select(species => species.Name),
                },
                errors,
                warnings,
                notes,
                diagnostics = diagnostics.Select(Json.Of),
            });
            return exitCode;
        }

        TextWriter output = context.Out;
        output.WriteLine($"Network {path}: {summary.MeasurementCount} usable measurement(s) in {result.Files.Count} file(s)");
        if (result.SpeciesFile is not null)
        {
            output.WriteLine($"  species file   {result.SpeciesFile}");
        }

        if (result.HeatCapacityFile is not null)
        {
            output.WriteLine($"  heat capacity  {result.HeatCapacityFile} ({result.HeatCapacities.Count} species)");
        }

        if (result.SourcesFile is not null)
        {
            output.WriteLine($"  systematics    {result.SourcesFile} ({result.SourceSystematics.Count} source(s) declared)");
        }

        if (curation.Exists)
        {
            output.WriteLine($"  curation       {curation.Path}: {curation.Summary}");
        }

        output.WriteLine($"  species        {summary.SpeciesCount}");
        output.WriteLine($"  sources        {summary.MeasurementsBySource.Count}: {string.Join(", ", summary.MeasurementsBySource.Select(pair => $"{pair.Key} ({pair.Value})"))}");
        output.WriteLine($"  properties     {string.Join(", ", summary.MeasurementsByProperty.Select(pair => $"{pair.Key.Code()} ({pair.Value})"))}");
        output.WriteLine($"  elements       {string.Join(", ", summary.Elements)}");
        output.WriteLine($"  reference      {string.Join(", ", summary.ReferenceStatesUsed.Select(species => species.Name))}");
        output.WriteLine();
        string noteCount = notes > 0 ? string.Create(CultureInfo.InvariantCulture, $", {notes} note(s) on entries not read") : "";
        output.WriteLine(string.Create(CultureInfo.InvariantCulture, $"{errors} error(s), {warnings} warning(s){noteCount}"));
        if (errors > 0)
        {
            foreach (FileProblemCount file in result.ProblemsByFile)
            {
                output.WriteLine(string.Create(CultureInfo.InvariantCulture, $"  {file.File}: {file.Errors} error(s), {file.Warnings} warning(s)"));
            }

            output.WriteLine();
        }

        foreach (Diagnostic diagnostic in diagnostics)
        {
            output.WriteLine($"  {diagnostic}");
        }

        output.WriteLine();
        output.WriteLine(hasErrors
            ? "Result: INVALID. Rows with errors are left out of every analysis until fixed (exit code 2)."
            : warnings > 0 ? "Result: valid, with warnings." : "Result: valid.");
        return exitCode;
    }
}

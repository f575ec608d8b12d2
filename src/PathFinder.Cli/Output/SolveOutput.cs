using System.Globalization;
using System.Text;
using PathFinder.Analysis;
using PathFinder.IO;
using PathFinder.Quantities;

namespace PathFinder.Cli.Output;

/// <summary>Writes a solve report as a text table, CSV, Markdown or JSON.</summary>
public static class SolveOutput
{
    /// <summary>Writes the report in <paramref name="format"/> (table, csv, json, markdown), with the values at another temperature when given.</summary>
    public static void Write(TextWriter output, SolveReport report, string format, TemperatureTable? atTemperature = null)
    {
        ArgumentNullException.ThrowIfNull(output);
        ArgumentNullException.ThrowIfNull(report);
        string unit = report.Family.Unit().Symbol;
        string quantity = report.Family.SpeciesQuantity();
        SpeciesEstimate[] determined = report.Species.Where(estimate => estimate.IsDetermined).ToArray();
        switch (format)
        {
            case "json":
                Json.Write(output, new
                {
                    property = report.Family.ResultProperty().Code(),
                    quantity,
                    unit,
                    temperature = report.Model.ReferenceTemperature,
                    adjusted = report.Adjusted,
                    measurements = report.Model.Measurements.Count,
                    rank = report.Solution.Rank,
                    chiSquared = report.Solution.ChiSquared,
                    degreesOfFreedom = report.Solution.DegreesOfFreedom,
                    birgeRatio = Json.Number(report.Solution.BirgeRatio),
                    species = determined.Select(estimate => new { name = estimate.Species.Name, value = estimate.Value, uncertainty = estimate.Uncertainty, measurements = estimate.Measurements }),
                    undetermined = report.Undetermined.Select(estimate => estimate.Species.Name),
                    relativeOnly = report.RelativeGroups,
                    suspects = report.SuspectIds,
                    adjustments = report.Adjustments.Count,
                    atTemperature = atTemperature is null ? null : TemperatureOutput.Json(atTemperature, atTemperature.Family.Unit().Symbol),
                    caution = Text.Caution,
                });
                return;
            case "csv":
                var csv = new StringBuilder();
                string extraHeader = atTemperature is null ? "" : $",{CsvCode(atTemperature.Family)}_at_T,T";
                csv.AppendLine(CultureInfo.InvariantCulture, $"species,{Code(report)},uncertainty,unit,measurements{extraHeader}");
                foreach (SpeciesEstimate estimate in determined)
                {
                    var cells = new List<string>
                    {
                        CsvCell.Text(estimate.Species.Name),
                        CsvCell.Number(estimate.Value),
                        CsvCell.Number(estimate.Uncertainty),
                        CsvCell.Text(unit),
                        CsvCell.Number(estimate.Measurements),
                    };
                    if (atTemperature is not null)
                    {
                        double? moved = atTemperature.Species.FirstOrDefault(row => row.Species.Equals(estimate.Species))?.AtTemperature?.Value;
                        cells.Add(moved is { } value ? CsvCell.Number(value) : "");
                        cells.Add(CsvCell.Number(atTemperature.Temperature));
                    }

                    csv.AppendLine(CsvCell.Line(cells));
                }

                output.Write(csv.ToString());
                return;
            case "markdown":
                output.WriteLine($"| species | {quantity} / ({unit}) | u / ({unit}) | measurements |");
                output.WriteLine("|---|---:|---:|---:|");
                foreach (SpeciesEstimate estimate in determined)
                {
                    output.WriteLine($"| {MarkdownCell.Text(estimate.Species.Name)} | {Text.Number(estimate.Value)} | {Text.Number(estimate.Uncertainty)} | {estimate.Measurements} |");
                }

                output.WriteLine();
                WriteAtTemperature(output, atTemperature, MarkdownCell.Text);
                WriteFooter(output, report, MarkdownCell.Text);
                return;
            default:
                output.WriteLine($"{quantity} at 298.15 K in {unit}, joint weighted least squares over {report.Model.Measurements.Count} measurements{(report.Adjusted ? $" after the suspect procedure ({report.Adjustments.Count} adjustments, {report.Suspects.Count} suspects)" : " as given")}");
                output.WriteLine(Derivation(report));
                output.WriteLine($"χ² = {Text.Number(report.Solution.ChiSquared)}, {report.Solution.DegreesOfFreedom} degrees of freedom, Birge ratio {Text.Number(report.Solution.BirgeRatio)}");
                output.WriteLine();
                int width = Math.Max(12, determined.Select(estimate => estimate.Species.Name.Length).DefaultIfEmpty(12).Max());
                output.WriteLine($"  {"species".PadRight(width)}  {quantity,12}  {"±u",8}  measurements");
                foreach (SpeciesEstimate estimate in determined)
                {
                    output.WriteLine($"  {estimate.Species.Name.PadRight(width)}  {Text.Number(estimate.Value),12}  {Text.Number(estimate.Uncertainty),8}  {estimate.Measurements,12}");
                }

                output.WriteLine();
                WriteAtTemperature(output, atTemperature, name => name);
                WriteFooter(output, report, name => name);
                return;
        }
    }

    /// <summary>Writes the covariance of the view's determined quantities to <paramref name="path"/> as CSV (<c>row,column,covariance</c>), atomically.</summary>
    /// <param name="path">The output file.</param>
    /// <param name="report">The solution.</param>
    /// <param name="force">Whether a read-only file may be replaced.</param>
    public static void WriteCovariance(string path, SolveReport report, bool force = false)
    {
        ArgumentNullException.ThrowIfNull(report);
        AtomicFile.Write(path, stream =>
        {
            using var writer = new StreamWriter(stream, new UTF8Encoding(encoderShouldEmitUTF8Identifier: false), leaveOpen: true);
            writer.Write("row,column,covariance\n");
            foreach (CovarianceEntry entry in report.Covariances())
            {
                writer.Write(CsvCell.Line([CsvCell.Text(entry.Row), CsvCell.Text(entry.Column), CsvCell.Number(entry.Covariance)]));
                writer.Write('\n');
            }
        },
        force);
    }

    /// <summary>What the quantity is made of in the joint model, in one line.</summary>
    private static string Derivation(SolveReport report) => report.Family switch
    {
        PropertyFamily.GibbsEnergy => "ΔfG° = ΔfH° − T·(S° − Σν·S° of the elements), from the one solution of ΔfH° and S° (covariances included)",
        PropertyFamily.Entropy => "S° from S°, ΔS, ΔG and K data, solved together with ΔfH°",
        _ => "ΔfH° from ΔH, ΔU, ΔG and K data, solved together with S°",
    };

    private static void WriteAtTemperature(TextWriter output, TemperatureTable? table, Func<string, string> name)
    {
        if (table is not null)
        {
            TemperatureOutput.WriteText(output, table, table.Family.Unit().Symbol, name);
            output.WriteLine();
        }
    }

    private static string CsvCode(PropertyFamily family) => family switch
    {
        PropertyFamily.Enthalpy => "dfH",
        PropertyFamily.GibbsEnergy => "dfG",
        _ => "S",
    };

    /// <param name="output">Where to write.</param>
    /// <param name="report">The report.</param>
    /// <param name="name">How a name from the data is written (escaped in Markdown, as it is in text).</param>
    private static void WriteFooter(TextWriter output, SolveReport report, Func<string, string> name)
    {
        if (report.Undetermined.Count > 0)
        {
            output.WriteLine($"Not determined by the data ({report.Undetermined.Count}): {string.Join(", ", report.Undetermined.Select(estimate => name(estimate.Species.Name)))}");
            foreach (string group in report.RelativeGroups)
            {
                output.WriteLine($"  known only relative to each other: {name(group)}");
            }
        }

        if (report.Suspects.Count > 0)
        {
            output.WriteLine($"Suspects down-weighted: {string.Join(", ", report.SuspectIds.Select(name))} (see 'pathfinder check')");
        }

        output.WriteLine(Text.Caution);
    }

    private static string Code(SolveReport report) => report.Family switch
    {
        PropertyFamily.Enthalpy => "dfH",
        PropertyFamily.GibbsEnergy => "dfG",
        _ => "S",
    };
}

using System.Globalization;
using PathFinder.Analysis;
using PathFinder.Quantities;

namespace PathFinder.Cli.Output;

/// <summary>Writes a value provenance as text or JSON.</summary>
public static class TraceOutput
{
    /// <summary>Writes <paramref name="provenance"/>; with <paramref name="property"/> dU the value is shown as ΔU = ΔH − Δn(gas)·R·T.</summary>
    public static void Write(TextWriter output, ValueProvenance provenance, ThermoProperty property, bool adjusted, int top, bool json)
    {
        ArgumentNullException.ThrowIfNull(output);
        ArgumentNullException.ThrowIfNull(provenance);
        string unit = provenance.Family.Unit().Symbol;
        double gasTerm = GasTerm(provenance, property);
        if (json)
        {
            Json.Write(output, new
            {
                target = provenance.Target.ToString(),
                property = property.Code(),
                unit,
                temperature = provenance.Model.ReferenceTemperature,
                adjusted,
                determined = provenance.IsDetermined,
                reason = provenance.Reason,
                value = Json.Number(provenance.Value - gasTerm),
                uncertainty = Json.Number(provenance.StandardUncertainty),
                variance = Json.Number(provenance.Variance),
                sources = provenance.Sources.Select(source => new { source = source.Source, measurements = source.Measurements, varianceContribution = source.VarianceContribution, share = source.Share }),
                systematics = provenance.Systematics.Select(source => new { source = source.Source, varianceContribution = source.VarianceContribution, share = source.Share }),
                measurements = provenance.Contributions.Select(item => new
                {
                    id = item.Measurement.Id,
                    source = item.Measurement.Source,
                    equation = item.Measurement.Equation.ToString(),
                    value = item.Measurement.Value,
                    uncertaintyUsed = item.UsedUncertainty,
                    sensitivity = item.Sensitivity,
                    varianceContribution = item.VarianceContribution,
                    share = item.Share,
                    adjustments = item.Measurement.Adjustments,
                }),
                caution = Text.Caution,
            });
            return;
        }

        output.WriteLine($"Target    {provenance.Target}");
        output.WriteLine($"Property  {property.Symbol()}, {unit}, 298.15 K, weighted least squares{(adjusted ? " after the suspect procedure" : " of the data as given")}");
        if (!provenance.IsDetermined)
        {
            output.WriteLine($"Network estimate  — not determined: {provenance.Reason}");
            return;
        }

        output.WriteLine($"Network estimate  {Text.WithUncertainty(provenance.Value - gasTerm, provenance.StandardUncertainty, unit)}{(property == ThermoProperty.InternalEnergy ? " (ΔU = ΔH − Δn(gas)·R·T)" : "")}");
        if (provenance.Reason is not null)
        {
            output.WriteLine($"  ({provenance.Reason})");
        }

        if (provenance.Contributions.Count == 0)
        {
            output.WriteLine();
            output.WriteLine(Text.Caution);
            return;
        }

        output.WriteLine("The estimate is Σ sᵢ·vᵢ over the measurements; each adds sᵢ²·uᵢ² to the variance.");
        output.WriteLine();
        output.WriteLine("Sources by share of the variance:");
        int sourceWidth = Math.Max(8, provenance.Sources.Max(source => source.Source.Length));
        foreach (SourceContribution source in provenance.Sources)
        {
            output.WriteLine($"  {source.Source.PadRight(sourceWidth)}  {Percent(source.Share),7}  {Bar(source.Share)}  ({source.Measurements} measurement{(source.Measurements == 1 ? "" : "s")})");
        }

        foreach (SourceContribution systematic in provenance.Systematics)
        {
            output.WriteLine($"  of which {Percent(systematic.Share)} from the declared systematic of {systematic.Source} (sources.csv)");
        }

        output.WriteLine();
        int shown = Math.Min(top, provenance.Contributions.Count);
        output.WriteLine($"Measurements by share of the variance ({shown} of {provenance.Contributions.Count}):");
        int idWidth = Math.Max(4, provenance.Contributions.Take(shown).Max(item => item.Measurement.Id.Length));
        output.WriteLine($"  {"id".PadRight(idWidth)}  {"source".PadRight(sourceWidth)}  {"sᵢ",8}  {"uᵢ used",8}  {"share",7}  {"cumul.",7}  equation");
        double cumulative = 0.0;
        foreach (MeasurementContribution item in provenance.Contributions.Take(shown))
        {
            cumulative += item.Share;
            output.WriteLine($"  {item.Measurement.Id.PadRight(idWidth)}  {item.Measurement.Source.PadRight(sourceWidth)}  {Signed(item.Sensitivity),8}  {Text.Number(item.UsedUncertainty),8}  {Percent(item.Share),7}  {Percent(cumulative),7}  {item.Measurement.Equation}");
            foreach (string adjustment in item.Measurement.Adjustments)
            {
                output.WriteLine($"  {new string(' ', idWidth)}  ({adjustment})");
            }
        }

        output.WriteLine();
        output.WriteLine(Text.Caution);
    }

    /// <summary>A share as a percentage with one decimal.</summary>
    public static string Percent(double share) => (share * 100.0).ToString("0.0", CultureInfo.InvariantCulture) + " %";

    private static string Signed(double value) => value.ToString("+0.000;-0.000", CultureInfo.InvariantCulture);

    private static string Bar(double share) => new string('█', (int)Math.Round(Math.Clamp(share, 0.0, 1.0) * 20)).PadRight(20, '·');

    private static double GasTerm(ValueProvenance provenance, ThermoProperty property) =>
        property == ThermoProperty.InternalEnergy
            ? PropertyModel.EnthalpyMinusInternalEnergy(provenance.Target)
            : 0.0;
}

using System.Globalization;
using PathFinder.Analysis;
using PathFinder.Thermodynamics;

namespace PathFinder.Cli.Output;

/// <summary>Writes a table of species values moved to another temperature (text block or JSON object).</summary>
public static class TemperatureOutput
{
    /// <summary>What the table holds, e.g. "ΔfH°".</summary>
    public static string Quantity(TemperatureTable table)
    {
        ArgumentNullException.ThrowIfNull(table);
        return table.Family.SpeciesQuantity();
    }

    /// <summary>The temperature as text, e.g. "500".</summary>
    public static string Kelvin(double temperature) => temperature.ToString("0.##", CultureInfo.InvariantCulture);

    /// <summary>Writes the text block.</summary>
    /// <param name="output">Where to write.</param>
    /// <param name="table">The species at the temperature.</param>
    /// <param name="unit">The unit symbol.</param>
    /// <param name="name">How names and notes from the data are written (Markdown escapes them); as they are when null.</param>
    public static void WriteText(TextWriter output, TemperatureTable table, string unit, Func<string, string>? name = null)
    {
        ArgumentNullException.ThrowIfNull(output);
        ArgumentNullException.ThrowIfNull(table);
        name ??= text => text;
        string quantity = Quantity(table);
        string at = Kelvin(table.Temperature);
        string how = table.Family switch
        {
            PropertyFamily.Enthalpy => "ΔfH°(T) = ΔfH°(298.15 K) + ∫ΔfCp dT, Cp of the species and its elements",
            PropertyFamily.Entropy => "S°(T) = S°(298.15 K) + ∫Cp/T dT",
            _ => "ΔfG°(T) = ΔfH°(T) − T·ΔfS°(T), one combination of the joint solution's ΔfH° and S° moved with Cp",
        };
        string uncertainties = table.Family == PropertyFamily.GibbsEnergy
            ? $"uncertainties at {at} K from the joint covariance (Cp taken as exact)"
            : "uncertainties as at 298.15 K (Cp taken as exact)";
        output.WriteLine($"{quantity} at {at} K in {unit}: {how}; {uncertainties}");
        SpeciesAtTemperature[] moved = table.Species.Where(row => row.AtTemperature is not null).ToArray();
        if (moved.Length == 0)
        {
            output.WriteLine("  (no species could be moved)");
        }
        else
        {
            int width = Math.Max(12, moved.Max(row => name(row.Species.Name).Length));
            output.WriteLine($"  {"species".PadRight(width)}  {quantity + "(298.15 K)",16}  {quantity + $"({at} K)",16}  {"±u",8}");
            foreach (SpeciesAtTemperature row in moved)
            {
                UncertainValue value = row.AtTemperature!.Value;
                output.WriteLine($"  {name(row.Species.Name).PadRight(width)}  {Text.Number(row.AtReference!.Value.Value),16}  {Text.Number(value.Value),16}  {Text.Number(value.StandardUncertainty),8}");
            }
        }

        SpeciesAtTemperature[] lacking = table.LackingHeatCapacities.ToArray();
        if (lacking.Length > 0)
        {
            output.WriteLine($"Not moved, heat capacities missing ({lacking.Length}): {string.Join("; ", lacking.Select(row => $"{name(row.Species.Name)} (needs {string.Join(", ", row.MissingHeatCapacities.Select(species => name(species.Name)))})"))}");
        }

        foreach (string note in moved.SelectMany(row => row.Notes).Distinct(StringComparer.Ordinal))
        {
            output.WriteLine($"  note: {name(note)}");
        }
    }

    /// <summary>The table as a JSON-ready object.</summary>
    public static object Json(TemperatureTable table, string unit)
    {
        ArgumentNullException.ThrowIfNull(table);
        return new
        {
            temperature = table.Temperature,
            quantity = Quantity(table),
            unit,
            species = table.Species.Where(row => row.AtReference is not null).Select(row => new
            {
                name = row.Species.Name,
                atReference = row.AtReference!.Value.Value,
                value = row.AtTemperature?.Value,
                uncertainty = row.AtTemperature?.StandardUncertainty ?? row.AtReference!.Value.StandardUncertainty,
                missingHeatCapacities = row.MissingHeatCapacities.Select(species => species.Name),
                notes = row.Notes,
            }),
        };
    }
}

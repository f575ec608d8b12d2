using System.Globalization;
using System.Text;
using PathFinder.Data;
using PathFinder.Tests.TestSupport;

namespace PathFinder.Tests.Analysis;

/// <summary>A tabulated value with its standard uncertainty.</summary>
/// <param name="Value">The value.</param>
/// <param name="Uncertainty">Its standard uncertainty.</param>
internal readonly record struct Tabulated(double Value, double Uncertainty);

/// <summary>Handbook values used as outside references, and small CSV networks built from them.</summary>
/// <remarks>
/// Every value here is from CODATA Key Values for Thermodynamics (Cox, Wagman and Medvedev, Hemisphere 1989),
/// at 298.15 K and 0.1 MPa, from memory. ΔfH° in kJ/mol, S° in J/(mol·K).
/// </remarks>
internal static class HandbookData
{
    /// <summary>ΔfH°(CO2, g) = −393.51 ± 0.13 kJ/mol; CODATA Key Values 1989, from memory.</summary>
    public static readonly Tabulated CarbonDioxide = new(-393.51, 0.13);

    /// <summary>ΔfH°(CO, g) = −110.53 ± 0.17 kJ/mol; CODATA Key Values 1989, from memory.</summary>
    public static readonly Tabulated CarbonMonoxide = new(-110.53, 0.17);

    /// <summary>ΔfH°(H2O, l) = −285.830 ± 0.040 kJ/mol; CODATA Key Values 1989, from memory.</summary>
    public static readonly Tabulated LiquidWater = new(-285.830, 0.040);

    /// <summary>ΔfH°(H2O, g) = −241.826 ± 0.040 kJ/mol; CODATA Key Values 1989, from memory.</summary>
    public static readonly Tabulated WaterVapour = new(-241.826, 0.040);

    /// <summary>ΔfH°(HCl, g) = −92.31 ± 0.10 kJ/mol; CODATA Key Values 1989, from memory.</summary>
    public static readonly Tabulated HydrogenChloride = new(-92.31, 0.10);

    /// <summary>ΔfH°(NH3, g) = −45.94 ± 0.35 kJ/mol; CODATA Key Values 1989, from memory.</summary>
    public static readonly Tabulated Ammonia = new(-45.94, 0.35);

    /// <summary>S°(H2O, l) = 69.95 ± 0.03 J/(mol·K); CODATA Key Values 1989, from memory.</summary>
    public static readonly Tabulated LiquidWaterEntropy = new(69.95, 0.03);

    /// <summary>S°(H2, g) = 130.680 ± 0.003 J/(mol·K); CODATA Key Values 1989, from memory.</summary>
    public static readonly Tabulated HydrogenEntropy = new(130.680, 0.003);

    /// <summary>S°(O2, g) = 205.152 ± 0.005 J/(mol·K); CODATA Key Values 1989, from memory.</summary>
    public static readonly Tabulated OxygenEntropy = new(205.152, 0.005);

    /// <summary>The CSV header every network here uses.</summary>
    public const string Header = "id,equation,property,value,uncertainty,unit,temperature,source";

    /// <summary>
    /// A consistent enthalpy network of 11 measurements: the tabulated formation enthalpies (one twice, as a
    /// graphite combustion) and four reactions whose values are combinations of the tabulated ones, each
    /// with the root-sum-square of the tabulated uncertainties involved (rounded up).
    /// </summary>
    /// <param name="shiftedId">A measurement id whose value is moved by <paramref name="sigmas"/> of its uncertainty, or null.</param>
    /// <param name="sigmas">The shift in standard uncertainties.</param>
    public static string ConsistentEnthalpyCsv(string? shiftedId = null, double sigmas = 0.0)
    {
        (string Id, string Equation, double Value, double Uncertainty, string Source)[] rows =
        [
            ("F1", "CO2(g)", CarbonDioxide.Value, CarbonDioxide.Uncertainty, "table"),
            ("F1b", "C(graphite) + O2(g) -> CO2(g)", CarbonDioxide.Value, 0.20, "bomb"),
            ("F2", "H2O(l)", LiquidWater.Value, LiquidWater.Uncertainty, "table"),
            ("F3", "H2O(g)", WaterVapour.Value, WaterVapour.Uncertainty, "table"),
            ("F4", "CO(g)", CarbonMonoxide.Value, CarbonMonoxide.Uncertainty, "table"),
            ("F5", "HCl(g)", HydrogenChloride.Value, HydrogenChloride.Uncertainty, "table"),
            ("F6", "NH3(g)", Ammonia.Value, Ammonia.Uncertainty, "table"),
            ("R1", "H2O(l) -> H2O(g)", WaterVapour.Value - LiquidWater.Value, 0.057, "flow"),
            ("R2", "CO(g) + 1/2 O2(g) -> CO2(g)", CarbonDioxide.Value - CarbonMonoxide.Value, 0.22, "bomb"),
            ("R3", "CO(g) + H2O(g) -> CO2(g) + H2(g)", CarbonDioxide.Value - CarbonMonoxide.Value - WaterVapour.Value, 0.22, "flow"),
            ("R4", "2 H2O(g) -> 2 H2(g) + O2(g)", -2 * WaterVapour.Value, 0.08, "flow"),
        ];
        var csv = new StringBuilder().AppendLine(Header);
        foreach (var row in rows)
        {
            double value = row.Id == shiftedId ? row.Value + (sigmas * row.Uncertainty) : row.Value;
            csv.AppendLine(CultureInfo.InvariantCulture, $"{row.Id},{row.Equation},dH,{value:R},{row.Uncertainty:R},kJ/mol,,{row.Source}");
        }

        return csv.ToString();
    }

    /// <summary>Writes <paramref name="csv"/> as <c>network.csv</c> into <paramref name="folder"/> and reads it; the data must be valid.</summary>
    public static ReactionNetwork Read(TempFolder folder, string csv, string name = "network.csv")
    {
        string path = folder.Write(name, csv);
        NetworkReadResult result = NetworkReader.Read(path);
        Assert.Empty(result.Errors);
        return result.Network;
    }

    /// <summary>Writes and reads a network of the given rows (id, equation, property, value, uncertainty, unit, source).</summary>
    public static ReactionNetwork ReadRows(TempFolder folder, params string[] rows) =>
        Read(folder, Header + "\n" + string.Join("\n", rows) + "\n");
}

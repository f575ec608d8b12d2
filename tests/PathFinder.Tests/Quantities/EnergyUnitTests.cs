using PathFinder.Quantities;

namespace PathFinder.Tests.Quantities;

public sealed class EnergyUnitTests
{
    [Fact]
    public void ElectronVolt_IsTheFaradayConstantInKilojoulesPerMole()
    {
        // CODATA 2018 (Tiesinga et al. 2021): e·N_A = F = 96 485.332 12 C/mol, so 1 eV per particle = 96.485 332 12 kJ/mol
        Assert.Equal(96.48533212, EnergyUnit.ElectronVolt.ToCanonicalValue(1.0), 1e-8);
        Assert.Equal(96.4853321, EnergyUnit.ElectronVolt.ToCanonical, 7);
    }

    [Fact]
    public void Wavenumber_IsHcNaPerCentimetre()
    {
        // CODATA 2018: 1 cm⁻¹ = 0.011 962 657 kJ/mol (h·c·N_A·100 m⁻¹)
        Assert.Equal(0.011962657, EnergyUnit.Wavenumber.ToCanonicalValue(1.0), 9);

        // The exact product of the SI 2019 defining constants h, c and N_A, worked out in 30-digit decimal arithmetic
        Assert.Equal(0.0119626565638697, EnergyUnit.Wavenumber.ToCanonical, 15);
    }

    [Fact]
    public void KilocaloriePerMole_IsTheThermochemicalCalorieExactly()
    {
        // NIST SP 811 (2008), B.8: 1 cal_th = 4.184 J exactly
        Assert.Equal(4.184, EnergyUnit.KilocaloriePerMole.ToCanonicalValue(1.0), 15);
        Assert.Equal(0.004184, EnergyUnit.CaloriePerMole.ToCanonicalValue(1.0), 15);
        Assert.Equal(4.184, EnergyUnit.CaloriePerMoleKelvin.ToCanonicalValue(1.0), 15);
    }

    [Fact]
    public void KilocaloriePerMole_ConvertsATypicalValue()
    {
        // NIST SP 811: -94.05 kcal/mol × 4.184 kJ/kcal = -393.5052 kJ/mol (arithmetic, no table)
        Assert.Equal(-393.5052, EnergyUnit.KilocaloriePerMole.ToCanonicalValue(-94.05), 10);
    }

    [Theory]
    [InlineData("J/mol", 1e-3)]
    [InlineData("kJ/mol", 1.0)]
    [InlineData("kJ/(mol·K)", 1000.0)]
    [InlineData("J/(mol·K)", 1.0)]
    public void ToCanonical_ForSiUnitsIsAPowerOfTen(string symbol, double factor)
    {
        // SI prefixes (BIPM SI Brochure, 9th ed.)
        Assert.True(EnergyUnit.TryParse(symbol, out EnergyUnit unit));
        Assert.Equal(factor, unit.ToCanonical, 15);
    }

    [Theory]
    [InlineData("kJ/mol", "kJ/mol")]
    [InlineData("kj/mol", "kJ/mol")]
    [InlineData("KJ/MOL", "kJ/mol")]
    [InlineData(" kJ mol-1 ", "kJ/mol")]
    [InlineData("kJ·mol⁻¹", "kJ/mol")]
    [InlineData("kJmol-1", "kJ/mol")]
    [InlineData("J mol-1", "J/mol")]
    [InlineData("kcal/mol", "kcal/mol")]
    [InlineData("cal mol-1", "cal/mol")]
    [InlineData("eV", "eV")]
    [InlineData("cm-1", "cm-1")]
    [InlineData("cm^-1", "cm-1")]
    [InlineData("cm⁻¹", "cm-1")]
    [InlineData("1/cm", "cm-1")]
    [InlineData("J/(mol·K)", "J/(mol·K)")]
    [InlineData("J/(mol*K)", "J/(mol·K)")]
    [InlineData("J/mol/K", "J/(mol·K)")]
    [InlineData("J/K/mol", "J/(mol·K)")]
    [InlineData("J mol-1 K-1", "J/(mol·K)")]
    [InlineData("J/(mol K)", "J/(mol·K)")]
    [InlineData("cal/(mol·K)", "cal/(mol·K)")]
    [InlineData("e.u.", "cal/(mol·K)")]
    [InlineData("kJ/(mol·K)", "kJ/(mol·K)")]
    [InlineData("kJ/mol/K", "kJ/(mol·K)")]
    public void TryParse_AcceptsAliases(string text, string symbol)
    {
        Assert.True(EnergyUnit.TryParse(text, out EnergyUnit unit));
        Assert.Equal(symbol, unit.Symbol);
    }

    [Theory]
    [InlineData("kJ/fortnight")]
    [InlineData("")]
    [InlineData("W")]
    [InlineData("kJ")]
    [InlineData("K")]
    [InlineData("MJ/mol")]
    public void TryParse_RefusesUnknownUnits(string text)
    {
        Assert.False(EnergyUnit.TryParse(text, out _));
    }

    [Fact]
    public void AcceptedSymbols_AllParseToThemselves()
    {
        foreach (string symbol in EnergyUnit.AcceptedSymbols)
        {
            Assert.True(EnergyUnit.TryParse(symbol, out EnergyUnit unit));
            Assert.Equal(symbol, unit.Symbol);
        }
    }

    [Theory]
    [InlineData("kJ/mol", UnitDimension.MolarEnergy)]
    [InlineData("eV", UnitDimension.MolarEnergy)]
    [InlineData("cm-1", UnitDimension.MolarEnergy)]
    [InlineData("J/(mol·K)", UnitDimension.MolarEntropy)]
    [InlineData("e.u.", UnitDimension.MolarEntropy)]
    public void Dimension_SeparatesEnergyFromEntropy(string text, UnitDimension dimension)
    {
        Assert.True(EnergyUnit.TryParse(text, out EnergyUnit unit));
        Assert.Equal(dimension, unit.Dimension);
    }

    [Theory]
    [InlineData(-393.51)]
    [InlineData(0.0)]
    [InlineData(1.5e-3)]
    public void FromCanonicalValue_InvertsToCanonicalValue(double value)
    {
        foreach (string symbol in EnergyUnit.AcceptedSymbols)
        {
            Assert.True(EnergyUnit.TryParse(symbol, out EnergyUnit unit));
            Assert.Equal(value, unit.FromCanonicalValue(unit.ToCanonicalValue(value)), 12);
        }
    }
}

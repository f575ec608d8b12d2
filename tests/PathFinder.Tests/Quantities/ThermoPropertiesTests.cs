using PathFinder.Quantities;

namespace PathFinder.Tests.Quantities;

public sealed class ThermoPropertiesTests
{
    [Theory]
    [InlineData("dH", ThermoProperty.Enthalpy)]
    [InlineData("DH", ThermoProperty.Enthalpy)]
    [InlineData(" dh ", ThermoProperty.Enthalpy)]
    [InlineData("dG", ThermoProperty.GibbsEnergy)]
    [InlineData("dS", ThermoProperty.Entropy)]
    [InlineData("dU", ThermoProperty.InternalEnergy)]
    [InlineData("S", ThermoProperty.AbsoluteEntropy)]
    [InlineData("s", ThermoProperty.AbsoluteEntropy)]
    public void TryParse_ReadsTheDataCodes(string code, ThermoProperty property)
    {
        Assert.True(ThermoProperties.TryParse(code, out ThermoProperty parsed));
        Assert.Equal(property, parsed);
    }

    [Theory]
    [InlineData("H")]
    [InlineData("dA")]
    [InlineData("")]
    [InlineData("enthalpy")]
    public void TryParse_RefusesOtherCodes(string code)
    {
        Assert.False(ThermoProperties.TryParse(code, out _));
    }

    [Fact]
    public void Code_RoundTripsForEveryProperty()
    {
        foreach (ThermoProperty property in Enum.GetValues<ThermoProperty>())
        {
            Assert.True(ThermoProperties.TryParse(property.Code(), out ThermoProperty parsed));
            Assert.Equal(property, parsed);
        }

        Assert.Equal(ThermoProperties.Codes, Enum.GetValues<ThermoProperty>().Select(property => property.Code()));
    }

    [Theory]
    [InlineData(ThermoProperty.Enthalpy, "ΔH", true, "kJ/mol")]
    [InlineData(ThermoProperty.GibbsEnergy, "ΔG", true, "kJ/mol")]
    [InlineData(ThermoProperty.InternalEnergy, "ΔU", true, "kJ/mol")]
    [InlineData(ThermoProperty.Entropy, "ΔS", false, "J/(mol·K)")]
    [InlineData(ThermoProperty.AbsoluteEntropy, "S°", false, "J/(mol·K)")]
    public void SymbolDimensionAndUnit_FollowTheProperty(ThermoProperty property, string symbol, bool isEnergy, string unit)
    {
        Assert.Equal(symbol, property.Symbol());
        Assert.Equal(isEnergy, property.IsEnergy());
        Assert.Equal(unit, property.CanonicalUnit().Symbol);
    }
}

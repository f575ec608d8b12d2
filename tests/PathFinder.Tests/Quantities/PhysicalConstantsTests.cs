using PathFinder.Quantities;

namespace PathFinder.Tests.Quantities;

public sealed class PhysicalConstantsTests
{
    [Fact]
    public void DefiningConstants_AreTheExactSiValues()
    {
        // CODATA 2018 / SI 2019 exact defining constants (Tiesinga et al., Rev. Mod. Phys. 93, 025010 (2021))
        Assert.Equal(6.02214076e23, PhysicalConstants.Avogadro);
        Assert.Equal(1.602176634e-19, PhysicalConstants.ElementaryCharge);
        Assert.Equal(6.62607015e-34, PhysicalConstants.Planck);
        Assert.Equal(299792458.0, PhysicalConstants.SpeedOfLight);
        Assert.Equal(1.380649e-23, PhysicalConstants.Boltzmann);
    }

    [Fact]
    public void GasConstant_MatchesCodata2018()
    {
        // CODATA 2018: R = 8.314 462 618... J/(mol·K) (exact product N_A·k)
        Assert.Equal(8.314462618, PhysicalConstants.GasConstant, 9);
    }

    [Fact]
    public void Faraday_MatchesCodata2018()
    {
        // CODATA 2018: F = 96 485.332 12... C/mol (exact product N_A·e)
        Assert.Equal(96485.33212, PhysicalConstants.Faraday, 5);
    }

    [Fact]
    public void ThermochemicalCalorie_IsExactly4184MillijoulesPerNistSp811()
    {
        // NIST SP 811 (2008), appendix B.8: cal_th = 4.184 J exactly
        Assert.Equal(4.184, PhysicalConstants.ThermochemicalCalorie);
    }

    [Fact]
    public void StandardConditions_Are298Point15KelvinAndOneBar()
    {
        // IUPAC standard state pressure 1 bar = 10^5 Pa (since 1982); tables at 298.15 K (IUPAC Green Book, from memory)
        Assert.Equal(298.15, PhysicalConstants.StandardTemperature);
        Assert.Equal(100000.0, PhysicalConstants.StandardPressure);
    }
}

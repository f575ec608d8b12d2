using PathFinder.Quantities;
using PathFinder.Thermodynamics;

namespace PathFinder.Tests.Thermodynamics;

public class GibbsRelationsTests
{
    // H2 + ½O2 → H2O(g) at 298.15 K. ΔfH° = −241.826 ± 0.040 kJ/mol (CODATA Key Values, Cox, Wagman, Medvedev 1989,
    // from memory); S°: H2O(g) 188.834, H2 130.680, O2 205.147 J/(mol K) (NIST-JANAF 4th ed. 1998, from memory).
    private static readonly UncertainValue _waterEnthalpy = new(-241_826, 40);
    private static readonly UncertainValue _waterEntropy = new(188.834 - 130.680 - (0.5 * 205.147), 0.05);

    [Fact]
    public void WaterFormation_GibbsEnergyAndLogK_MatchJanaf()
    {
        // When ΔG and K are computed at 298.15 K
        UncertainValue g = GibbsRelations.GibbsEnergy(_waterEnthalpy, _waterEntropy, 298.15);
        EquilibriumConstant k = GibbsRelations.EquilibriumConstant(g, 298.15);

        // Then ΔfG° = −228.582 kJ/mol and log Kf = 40.048 (NIST-JANAF 4th ed. 1998, from memory)
        Assert.InRange(g.Value / 1000, -228.582 - 0.01, -228.582 + 0.01);
        Assert.InRange(k.Log10K, 40.048 - 0.01, 40.048 + 0.01);
    }

    [Fact]
    public void WaterFormation_TabulatedTriple_IsConsistent()
    {
        // Given ΔfG° = −228.582 kJ/mol (NIST-JANAF 4th ed. 1998, from memory) with an assumed u of 0.040 kJ/mol
        var gibbs = new UncertainValue(-228_582, 40);

        // When the triple is checked
        GibbsConsistency check = GibbsRelations.CheckConsistency(_waterEnthalpy, _waterEntropy, gibbs, 298.15);

        // Then it closes within its uncertainty
        Assert.True(check.IsConsistent());
        Assert.InRange(check.ZScore, -1, 1);
    }

    [Fact]
    public void WrongSignOfEntropy_IsInconsistent()
    {
        var gibbs = new UncertainValue(-228_582, 40);
        UncertainValue flipped = _waterEntropy with { Value = -_waterEntropy.Value };

        GibbsConsistency check = GibbsRelations.CheckConsistency(_waterEnthalpy, flipped, gibbs, 298.15);

        Assert.False(check.IsConsistent());
        Assert.True(check.ZScore > 100);
    }

    [Fact]
    public void AmmoniaSynthesis_EquilibriumConstantFromGibbsEnergy()
    {
        // Given N2 + 3H2 ⇌ 2NH3, ΔrG° = 2·(−16.45) kJ/mol at 298.15 K (NBS Tables of Chemical Thermodynamic Properties,
        // Wagman et al. 1982, from memory), quoted to ±0.05 kJ/mol
        var gibbs = new UncertainValue(-32_900, 50);

        // When K is computed
        EquilibriumConstant k = GibbsRelations.EquilibriumConstant(gibbs, 298.15);

        // Then K ≈ 5.8e5 (same source, from memory) and u(ln K) = u(ΔG)/(RT)
        Assert.InRange(k.K, 5.7e5, 5.9e5);
        Assert.Equal(50 / (PhysicalConstants.GasConstant * 298.15), k.LnKUncertainty, 1e-15);
        Assert.Equal(k.LnKUncertainty / Math.Log(10), k.Log10KUncertainty, 1e-15);
        UncertainValue back = k.GibbsEnergy();
        Assert.Equal(gibbs.Value, back.Value, 1e-6);
        Assert.Equal(gibbs.StandardUncertainty, back.StandardUncertainty, 1e-9);
    }

    [Fact]
    public void AmmoniaSynthesis_NbsTriple_IsConsistent()
    {
        // Given NBS 1982 values (Wagman et al., from memory): ΔfH°(NH3) = −46.11 kJ/mol; S°: NH3 192.45, N2 191.61,
        // H2 130.684 J/(mol K); ΔfG°(NH3) = −16.45 kJ/mol; uncertainties assumed from the quoted digits
        var enthalpy = new UncertainValue(2 * -46_110, 100);
        var entropy = new UncertainValue((2 * 192.45) - 191.61 - (3 * 130.684), 0.1);
        var gibbs = new UncertainValue(2 * -16_450, 50);

        GibbsConsistency check = GibbsRelations.CheckConsistency(enthalpy, entropy, gibbs, 298.15);

        Assert.True(check.IsConsistent(2.0));
    }

    [Fact]
    public void EntropyFromEnthalpyAndGibbs_RoundTrips()
    {
        UncertainValue g = GibbsRelations.GibbsEnergy(_waterEnthalpy, _waterEntropy, 298.15);
        UncertainValue s = GibbsRelations.Entropy(_waterEnthalpy, g with { StandardUncertainty = 0 }, 298.15);
        UncertainValue h = GibbsRelations.Enthalpy(g, _waterEntropy, 298.15);

        Assert.Equal(_waterEntropy.Value, s.Value, 1e-9);
        Assert.Equal(_waterEnthalpy.Value, h.Value, 1e-6);
        Assert.Equal(_waterEnthalpy.StandardUncertainty / 298.15, s.StandardUncertainty, 1e-12);
    }

    [Fact]
    public void FullyCorrelatedInputs_CancelAsExpected()
    {
        // Given u(ΔH) = 300 J/mol, u(ΔS) = 1 J/(mol K), T = 300 K, correlation +1: cov = 300·1
        var h = new UncertainValue(-50_000, 300);
        var s = new UncertainValue(-100, 1);

        // Then u(ΔG) = |u(ΔH) − T u(ΔS)| = 0, and with correlation −1 it is u(ΔH) + T u(ΔS) = 600
        Assert.Equal(0, GibbsRelations.GibbsEnergy(h, s, 300, covariance: 300).StandardUncertainty, 1e-6);
        Assert.Equal(600, GibbsRelations.GibbsEnergy(h, s, 300, covariance: -300).StandardUncertainty, 1e-9);
    }

    [Fact]
    public void GibbsUncertainty_AgreesWithMonteCarlo()
    {
        // Given correlated ΔH and ΔS (correlation 0.6) and a seeded normal sampler
        var h = new UncertainValue(-90_000, 500);
        var s = new UncertainValue(-200, 2);
        const double rho = 0.6;
        const double t = 700;
        double covariance = rho * h.StandardUncertainty * s.StandardUncertainty;
        var random = new Random(20240611);
        const int n = 200_000;
        double sum = 0;
        double sumSquares = 0;
        for (int i = 0; i < n; i++)
        {
            (double z1, double z2) = StandardNormalPair(random);
            double dh = h.Value + (h.StandardUncertainty * z1);
            double ds = s.Value + (s.StandardUncertainty * ((rho * z1) + (Math.Sqrt(1 - (rho * rho)) * z2)));
            double g = dh - (t * ds);
            sum += g;
            sumSquares += g * g;
        }

        double mean = sum / n;
        double sd = Math.Sqrt((sumSquares / n) - (mean * mean));

        // When propagated analytically
        UncertainValue analytic = GibbsRelations.GibbsEnergy(h, s, t, covariance);

        // Then the sample standard deviation agrees within 2 % (linear model, so first order is exact)
        Assert.Equal(analytic.StandardUncertainty, sd, analytic.StandardUncertainty * 0.02);
        Assert.Equal(analytic.Value, mean, analytic.StandardUncertainty * 0.02);
    }

    [Fact]
    public void Consistency_WithNoUncertainty_HasUndefinedZ()
    {
        GibbsConsistency check = GibbsRelations.CheckConsistency(new(-1000), new(-1), new(-700), 300);

        Assert.True(double.IsNaN(check.ZScore));
        Assert.False(check.IsConsistent());
        Assert.Equal(0, check.Residual, 1e-9);
    }

    private static (double, double) StandardNormalPair(Random random)
    {
        // Box–Muller transform.
        double u1 = 1.0 - random.NextDouble();
        double u2 = random.NextDouble();
        double r = Math.Sqrt(-2.0 * Math.Log(u1));
        return (r * Math.Cos(2 * Math.PI * u2), r * Math.Sin(2 * Math.PI * u2));
    }
}

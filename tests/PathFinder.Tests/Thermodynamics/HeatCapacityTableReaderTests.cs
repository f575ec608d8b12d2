using System.Globalization;
using PathFinder.Diagnostics;
using PathFinder.Thermodynamics;

namespace PathFinder.Tests.Thermodynamics;

public class HeatCapacityTableReaderTests
{
    // N2 Shomate rows and N2 NASA rows: the coefficient sets of ReferenceHeatCapacities (sources named there).
    private const string ValidTable =
        "species,form,tmin,tmax,c1,c2,c3,c4,c5,c6,c7,c8,source\n" +
        "# nitrogen, three Shomate ranges (rows in any order)\n" +
        "N2(g),shomate,500,2000,19.50583,19.88705,-8.598535,1.369784,0.527601,-4.935202,212.3900,0.0,Shomate fit to the JANAF tables (from memory)\n" +
        "N2(g),shomate,100,500,28.98641,1.853978,-9.647459,16.63537,0.000117,-8.671914,226.4168,0.0,Shomate fit to the JANAF tables (from memory)\n" +
        "N2(g),shomate,2000,6000,35.51872,1.128728,-0.196103,0.014662,-4.553760,-18.97091,224.9810,0.0,Shomate fit to the JANAF tables (from memory)\n" +
        "\n" +
        "N2 nasa,nasa7,300,1000,3.298677,1.4082404E-03,-3.963222E-06,5.641515E-09,-2.444854E-12,-1020.8999,3.950372,,GRI-Mech 3.0\n" +
        "N2 nasa,NASA7,1000,5000,2.926640,1.4879768E-03,-5.684760E-07,1.0097038E-10,-6.753351E-15,-922.7977,5.980528,,GRI-Mech 3.0\n" +
        "\"Ar(g)\",constant,100,6000,20.786\n" +
        "X(cr),linear,200,400,20,0.05\n";

    [Fact]
    public void ValidTable_GivesOneModelPerSpecies_WithoutDiagnostics()
    {
        // When the table is read
        HeatCapacityTable table = HeatCapacityTableReader.Read(new StringReader(ValidTable), "heat-capacity.csv");

        // Then there are no diagnostics and four species in order of appearance
        Assert.Empty(table.Diagnostics);
        Assert.False(table.HasErrors);
        Assert.Equal(["N2(g)", "N2 nasa", "Ar(g)", "X(cr)"], table.Entries.Select(e => e.SpeciesText));
        Assert.Equal(new SourceLocation("heat-capacity.csv", 3, 1, "species"), table.Entries[0].Location);

        // And the models equal the ones built in code
        Assert.True(table.TryGetModel("N2(g)", out IHeatCapacity? shomate));
        Assert.True(table.TryGetModel("N2 nasa", out IHeatCapacity? nasa));
        PiecewiseHeatCapacity reference = ReferenceHeatCapacities.NitrogenShomate();
        PiecewiseHeatCapacity referenceNasa = ReferenceHeatCapacities.NitrogenNasa7();
        foreach (double t in new[] { 150.0, 298.15, 500.0, 1000.0, 2500.0 })
        {
            Assert.Equal(reference.HeatCapacity(t), shomate.HeatCapacity(t), 1e-12);
            Assert.Equal(referenceNasa.HeatCapacity(t), nasa.HeatCapacity(t), 1e-12);
        }

        Assert.Equal(new TemperatureRange(100, 6000), shomate.ValidRange);
        Assert.True(table.TryGetModel("Ar(g)", out IHeatCapacity? argon));
        Assert.Equal(20.786, argon.HeatCapacity(1000), 1e-12);
        Assert.False(table.TryGetModel("CO(g)", out _));
    }

    [Fact]
    public void BadRows_AreAllReported_WithExactLineAndColumn()
    {
        // Given one problem per row (columns counted from 1; the comment line still counts as a line)
        const string text =
            "species,form,tmin,tmax,c1,c2,c3,c4,c5,c6,c7,c8\n" + // 1
            "# comment\n" + //                                     2
            "A,constant,300,1000,29.1\n" + //                      3 fine
            "B,shomat,300,1000,1,2,3,4,5\n" + //                   4 unknown form at col 3
            "C,constant,300,abc,29.1\n" + //                       5 bad number at col 16
            "D,nasa7,300,1000,1,2,3\n" + //                        6 3 coefficients, c1 at col 18
            "E,constant,300,600,20\n" + //                         7
            "E,constant,700,1000,20\n" + //                        8 gap, tmin at col 12
            "F,constant,300,600,20\n" + //                         9
            "F,constant,500,1000,20\n" + //                        10 overlap, tmin at col 12
            "G,linear,300,1000,1,,3\n" + //                        11 hole in c2 at col 21
            "H,constant,900,300,20\n" + //                         12 empty range, tmin at col 12
            ",constant,300,1000,20\n" + //                         13 no species at col 1
            "\"I\",constant,300,1e400,20\n"; //                    14 overflow (not finite) at col 18

        // When read
        HeatCapacityTable table = HeatCapacityTableReader.Read(new StringReader(text), "net/heat-capacity.csv");

        // Then every problem is reported where it is, and only A survives
        var found = table.Diagnostics.Select(d => (d.Code, d.Location.Line, d.Location.Column)).ToList();
        Assert.Equal(
            [
                ("heat-capacity-unknown-form", 4, 3),
                ("heat-capacity-bad-number", 5, 16),
                ("heat-capacity-coefficient-count", 6, 18),
                ("heat-capacity-range-gap", 8, 12),
                ("heat-capacity-range-overlap", 10, 12),
                ("heat-capacity-missing-coefficient", 11, 21),
                ("heat-capacity-bad-range", 12, 12),
                ("heat-capacity-missing-species", 13, 1),
                ("heat-capacity-bad-number", 14, 18),
            ],
            found);
        Assert.All(table.Diagnostics, d => Assert.Equal(Severity.Error, d.Severity));
        Assert.Equal(["A"], table.Entries.Select(e => e.SpeciesText));
        Assert.Equal("net/heat-capacity.csv:5:16: error heat-capacity-bad-number: tmax is 'abc', not a number Fix: write a finite number such as 1000 or -8.671914 or 1.5e-3", table.Diagnostics[1].ToString());
        Assert.Equal("tmax", table.Diagnostics[1].Location.Field);
    }

    [Fact]
    public void RejectedMiddleRange_DoesNotAlsoReportAGap()
    {
        const string text = "species,form,tmin,tmax,c1\nP,constant,300,500,20\nP,constant,500,700,zz\nP,constant,700,900,20\n";

        HeatCapacityTable table = HeatCapacityTableReader.Read(new StringReader(text), "t.csv");

        Assert.Equal("heat-capacity-bad-number", Assert.Single(table.Diagnostics).Code);
        Assert.Empty(table.Entries);
    }

    [Theory]
    [InlineData("species,form,tmin,tmax,c1\nQ,constant,300,1000,\"20\n")]
    [InlineData("species,form,tmin,tmax,c1\nQ,cons\"tant,300,1000,20\n")]
    [InlineData("\"species\"\"\n")]
    public void MalformedCsv_GivesDiagnosticsNotExceptions(string text)
    {
        HeatCapacityTable table = HeatCapacityTableReader.Read(new StringReader(text), "t.csv");

        Assert.True(table.HasErrors);
        Assert.Empty(table.Entries);
    }

    [Fact]
    public void TooManyCoefficients_PointsAtTheFirstExtraOne()
    {
        // "K,constant,300,1000,20,5": c2 starts at column 24
        const string text = "species,form,tmin,tmax,c1,c2\nK,constant,300,1000,20,5\n";

        HeatCapacityTable table = HeatCapacityTableReader.Read(new StringReader(text), "t.csv");

        Diagnostic d = Assert.Single(table.Diagnostics);
        Assert.Equal(("heat-capacity-coefficient-count", 2, 24), (d.Code, d.Location.Line, d.Location.Column));
    }

    [Fact]
    public void QuotedFieldSpanningLines_KeepsLineNumbersOfLaterFields()
    {
        // Given a quoted species with a line break (lines 2–3), then a bad number on line 4
        const string text = "species,form,tmin,tmax,c1\n\"odd\nname\",constant,300,1000,x\nL,constant,300,1000,y\n";

        HeatCapacityTable table = HeatCapacityTableReader.Read(new StringReader(text), "t.csv");

        // Then "x" is on line 3 at column 25 and "y" on line 4 at column 21
        Assert.Equal([(3, 25), (4, 21)], table.Diagnostics.Select(d => (d.Location.Line, d.Location.Column)));
    }

    [Fact]
    public void MissingAndUnknownColumns_AreReportedOnTheHeader()
    {
        const string text = "species,form,tmin,colour,c1\nA,constant,300,red,20\n";

        HeatCapacityTable table = HeatCapacityTableReader.Read(new StringReader(text), "t.csv");

        Assert.Contains(table.Diagnostics, d => d is { Code: "heat-capacity-unknown-column", Severity: Severity.Warning, Location.Line: 1, Location.Column: 19 });
        Assert.Contains(table.Diagnostics, d => d.Code == "heat-capacity-missing-column" && d.Message.Contains("'tmax'", StringComparison.Ordinal));
        Assert.Empty(table.Entries);
        Assert.True(table.HasErrors);
    }

    [Fact]
    public void EmptyOrMissingFile_GivesAnErrorNotAnException()
    {
        HeatCapacityTable empty = HeatCapacityTableReader.Read(new StringReader(string.Empty), "t.csv");
        HeatCapacityTable missing = HeatCapacityTableReader.ReadFile(Path.Combine(Path.GetTempPath(), Guid.NewGuid().ToString("N"), "heat-capacity.csv"));

        Assert.Equal("heat-capacity-empty-file", Assert.Single(empty.Diagnostics).Code);
        Assert.Equal("heat-capacity-unreadable-file", Assert.Single(missing.Diagnostics).Code);
    }

    [Fact]
    public void DiscontinuousOrNegativeCp_GivesWarnings_ButKeepsTheModel()
    {
        // Given Cp jumping from 20 to 30 at 600 K, and a linear Cp that turns negative
        const string text =
            "species,form,tmin,tmax,c1,c2\n" +
            "J,constant,300,600,20\n" +
            "J,constant,600,1000,30\n" +
            "M,linear,300,1000,10,-0.02\n";

        HeatCapacityTable table = HeatCapacityTableReader.Read(new StringReader(text), "t.csv");

        Assert.Equal(
            [("heat-capacity-discontinuity", 3, 12), ("heat-capacity-nonpositive-cp", 4, 10)],
            table.Diagnostics.Select(d => (d.Code, d.Location.Line, d.Location.Column)));
        Assert.All(table.Diagnostics, d => Assert.Equal(Severity.Warning, d.Severity));
        Assert.Equal(["J", "M"], table.Entries.Select(e => e.SpeciesText));
    }

    [Fact]
    public void CommaDecimalCulture_GivesIdenticalResults()
    {
        // Given the same tables read under the invariant culture and under de-DE (comma decimal separator)
        const string bad = "species,form,tmin,tmax,c1\nA,constant,300,1000,\"29,1\"\nB,constant,300.5,1000,29.1\n";
        (string[] Diagnostics, double[] Values) Run()
        {
            HeatCapacityTable valid = HeatCapacityTableReader.Read(new StringReader(ValidTable), "t.csv");
            HeatCapacityTable invalid = HeatCapacityTableReader.Read(new StringReader(bad), "t.csv");
            valid.TryGetModel("N2(g)", out IHeatCapacity? n2);
            invalid.TryGetModel("B", out IHeatCapacity? b);
            return (
                [.. invalid.Diagnostics.Select(d => d.ToString())],
                [n2!.HeatCapacity(1000), n2.IntegrateHeatCapacity(298.15, 1000), b!.ValidRange.Minimum]);
        }

        CultureInfo original = CultureInfo.CurrentCulture;
        (string[] Diagnostics, double[] Values) invariant;
        (string[] Diagnostics, double[] Values) german;
        try
        {
            CultureInfo.CurrentCulture = CultureInfo.InvariantCulture;
            invariant = Run();
            CultureInfo.CurrentCulture = new CultureInfo("de-DE");
            german = Run();
        }
        finally
        {
            CultureInfo.CurrentCulture = original;
        }

        // Then values and messages are identical, and "29,1" is rejected with a hint about the decimal point
        Assert.Equal(invariant.Values, german.Values);
        Assert.Equal(invariant.Diagnostics, german.Diagnostics);
        Assert.Equal(300.5, german.Values[2]);
        Assert.Contains("decimal separator", Assert.Single(german.Diagnostics), StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("A,constant,300,1000,1e300", "heat-capacity-out-of-range", 21)]
    [InlineData("A,nasa7,300,1000,3.5,1e200,0,0,0,0,0", "heat-capacity-out-of-range", 18)]
    [InlineData("A,shomate,0,1000,29,0,0,0,1", "heat-capacity-out-of-range", 18)]
    [InlineData("A,constant,300,1e6,29", "heat-capacity-bad-range", 16)]
    public void Read_RefusesNonPhysicalHeatCapacitiesAtTheRow(string row, string code, int column)
    {
        // Given a range whose Cp is beyond ±1e5 J/(mol·K) somewhere (E/t² at 1 K), or ends beyond 20000 K
        string text = "species,form,tmin,tmax,c1,c2,c3,c4,c5,c6,c7\n" + row + "\n";

        // When read
        HeatCapacityTable table = HeatCapacityTableReader.Read(new StringReader(text), "heat-capacity.csv");

        // Then one located error, and the species is not used
        Diagnostic error = Assert.Single(table.Diagnostics);
        Assert.Equal((Severity.Error, code, 2, column), (error.Severity, error.Code, error.Location.Line, error.Location.Column));
        Assert.Empty(table.Entries);
    }
}

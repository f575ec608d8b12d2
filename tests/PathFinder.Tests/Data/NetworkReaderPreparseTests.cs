using PathFinder.Data;
using PathFinder.Synthetic;
using PathFinder.Tests.TestSupport;

namespace PathFinder.Tests.Data;

/// <summary>Large files parse their equations ahead on several threads; the result must equal reading row by row.</summary>
public sealed class NetworkReaderPreparseTests : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    [Fact]
    public void Read_LargeFile_GivesTheSameNetworkAsTheSameRowsInSmallFiles()
    {
        // 3000 rows in one file take the parallel route (at least 2000 distinct equations); the same rows split into
        // files of 500 are each read row by row. Every 7th graphite is spelled the short way and every 11th row is
        // made unbalanced, so spelling merges (the fallback to in-order parsing) and errors occur in both.
        SyntheticNetwork synthetic = SyntheticNetworkGenerator.Generate(new SyntheticNetworkOptions { SpeciesCount = 300, MeasurementCount = 3000, Seed = 5 });
        string generated = Path.Combine(_folder.Path, "generated");
        SyntheticNetworkGenerator.Write(synthetic, generated);
        string[] lines = File.ReadAllLines(Path.Combine(generated, "measurements.csv"));
        string header = lines.First(line => line.StartsWith("id,", StringComparison.Ordinal));
        string[] rows = lines.Where(line => line.Length > 0 && !line.StartsWith('#') && line != header).ToArray();
        int graphite = 0;
        for (int r = 0; r < rows.Length; r++)
        {
            rows[r] = ReplaceEvery(rows[r], "C(cr,graphite)", "C(graphite)", ref graphite, 7);
            if (r % 11 == 5)
            {
                rows[r] = rows[r].Replace(" -> ", " + H2(g) -> ", StringComparison.Ordinal);
            }
        }

        string whole = Path.Combine(_folder.Path, "whole");
        Directory.CreateDirectory(whole);
        File.WriteAllLines(Path.Combine(whole, "measurements.csv"), [header, .. rows]);
        string split = Path.Combine(_folder.Path, "split");
        Directory.CreateDirectory(split);
        for (int part = 0; part * 500 < rows.Length; part++)
        {
            File.WriteAllLines(Path.Combine(split, $"part{part:D2}.csv"), [header, .. rows.Skip(part * 500).Take(500)]);
        }

        NetworkReadResult parallel = NetworkReader.Read(whole);
        NetworkReadResult inOrder = NetworkReader.Read(split);

        Assert.True(parallel.Network.Measurements.Count > 2000);
        Assert.Equal(Describe(inOrder), Describe(parallel));
        Assert.Equal(
            inOrder.Diagnostics.Select(d => $"{d.Code}: {d.Message}").Order(StringComparer.Ordinal),
            parallel.Diagnostics.Select(d => $"{d.Code}: {d.Message}").Order(StringComparer.Ordinal));
        Assert.Contains(parallel.Diagnostics, d => d.Code == "unbalanced-equation");
        Assert.Contains(parallel.Network.Measurements, m => m.Equation.ToString().Contains("C(cr,graphite)", StringComparison.Ordinal));
    }

    private static string ReplaceEvery(string row, string from, string to, ref int seen, int every)
    {
        int at = row.IndexOf(from, StringComparison.Ordinal);
        while (at >= 0)
        {
            seen++;
            if (seen % every == 0)
            {
                row = string.Concat(row.AsSpan(0, at), to, row.AsSpan(at + from.Length));
            }

            at = row.IndexOf(from, at + 1, StringComparison.Ordinal);
        }

        return row;
    }

    private static string[] Describe(NetworkReadResult read) =>
        read.Network.Measurements
            .Select(m => $"{m.Id}|{m.Equation}|{string.Join(",", m.Equation.Terms.Select(t => $"{t.Species.Key}:{t.Species.Name}:{t.Coefficient}"))}|{m.Value}|{m.Uncertainty}")
            .ToArray();
}

using PathFinder.Algebra;

namespace PathFinder.Tests.Algebra;

public class IndexedEntriesTests
{
    [Theory]
    [InlineData(5)]
    [InlineData(32)]
    [InlineData(33)]
    [InlineData(400)]
    public void SortAndSum_EqualsASortedDictionaryThatAddsInArrivalOrder(int length)
    {
        // Given entries with repeated indices and values whose sums depend on the order of addition
        var random = new Random(length);
        (int Index, double Value)[] entries = [.. Enumerable.Range(0, length).Select(_ => (random.Next(0, Math.Max(2, length / 3)), (random.NextDouble() - 0.5) * Math.Pow(10, random.Next(-8, 9))))];
        var reference = new SortedDictionary<int, double>();
        foreach ((int index, double value) in entries)
        {
            reference[index] = reference.TryGetValue(index, out double sum) ? sum + value : value;
        }

        // When sorted and summed in place
        int distinct = IndexedEntries.SortAndSum(entries.AsSpan(), static (a, b) => a + b);

        // Then the indices ascend and every sum equals the reference to the last bit (same order of addition)
        Assert.Equal(reference.Keys, entries.Take(distinct).Select(e => e.Index));
        Assert.Equal(reference.Values.Select(BitConverter.DoubleToInt64Bits), entries.Take(distinct).Select(e => BitConverter.DoubleToInt64Bits(e.Value)));
    }
}

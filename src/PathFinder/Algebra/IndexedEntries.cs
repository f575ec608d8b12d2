namespace PathFinder.Algebra;

/// <summary>Sorting and netting (index, value) entries of a sparse vector or row.</summary>
/// <remarks>
/// Vectors here have a handful of entries and there are tens of thousands of them, so a sorted dictionary per vector
/// (what this replaces) cost more in allocation than the work itself. Entries of one index are summed in the order
/// they were given, as the dictionary did, so floating-point sums round the same way.
/// </remarks>
internal static class IndexedEntries
{
    /// <summary>Sorts <paramref name="entries"/> by index (stable) and sums each index's values in place; returns the number of distinct indices now at the front.</summary>
    public static int SortAndSum<T>(Span<(int Index, T Value)> entries, Func<T, T, T> add)
    {
        if (entries.Length > 32)
        {
            // Stable for longer inputs too: ties keep their original order through the position key.
            var keys = new (int Index, int Position)[entries.Length];
            for (int i = 0; i < keys.Length; i++)
            {
                keys[i] = (entries[i].Index, i);
            }

            keys.AsSpan().Sort(entries);
        }
        else
        {
            for (int i = 1; i < entries.Length; i++)
            {
                (int Index, T Value) moving = entries[i];
                int j = i - 1;
                while (j >= 0 && entries[j].Index > moving.Index)
                {
                    entries[j + 1] = entries[j];
                    j--;
                }

                entries[j + 1] = moving;
            }
        }

        int count = 0;
        for (int i = 0; i < entries.Length; i++)
        {
            if (count > 0 && entries[count - 1].Index == entries[i].Index)
            {
                entries[count - 1] = (entries[i].Index, add(entries[count - 1].Value, entries[i].Value));
            }
            else
            {
                entries[count++] = entries[i];
            }
        }

        return count;
    }
}

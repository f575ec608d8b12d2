using System.Runtime.InteropServices;

namespace PathFinder.Solving;

/// <summary>A zero-initialised array of doubles whose first element sits on a 64-byte boundary for its whole lifetime.</summary>
/// <remarks>
/// The storage is a pinned (never moved) over-allocated array used from an offset, so native code can work on it in
/// place: no copy into an aligned scratch buffer and back is needed, and the address seen by OpenBLAS is always
/// 64-byte aligned, which keeps its results repeatable to the last bit (see <see cref="AlignedCopy"/>).
/// </remarks>
internal sealed class AlignedBuffer
{
    private const int Alignment = 64;
    private readonly double[] _storage;
    private readonly int _offset;

    public AlignedBuffer(int length)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(length);
        Length = length;
        _storage = GC.AllocateArray<double>(length + (Alignment / sizeof(double)), pinned: true);
        long address = Marshal.UnsafeAddrOfPinnedArrayElement(_storage, 0).ToInt64();
        _offset = (int)((Alignment - (address % Alignment)) % Alignment) / sizeof(double);
    }

    /// <summary>The number of elements.</summary>
    public int Length { get; }

    /// <summary>All elements.</summary>
    public Span<double> Span => _storage.AsSpan(_offset, Length);

    /// <summary>The aligned first element, to pass by reference to native code (the storage is pinned).</summary>
    public ref double First => ref _storage[_offset];

    /// <summary>Element i.</summary>
    public ref double this[int i] => ref _storage[_offset + CheckIndex(i)];

    /// <summary>Elements start .. start + length − 1.</summary>
    public Span<double> AsSpan(int start, int length) => Span.Slice(start, length);

    /// <summary>Sets every element to zero.</summary>
    public void Clear() => Span.Clear();

    private int CheckIndex(int i) => (uint)i < (uint)Length ? i : throw new IndexOutOfRangeException();
}

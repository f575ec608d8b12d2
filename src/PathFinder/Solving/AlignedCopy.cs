using System.Runtime.InteropServices;

namespace PathFinder.Solving;

/// <summary>A pinned copy of a matrix whose first element sits on a 64-byte boundary; written back on dispose.</summary>
/// <remarks>
/// OpenBLAS picks kernels and loop peeling by the address of the data, so the same matrix at two addresses can be
/// factored with different rounding. Copying into an aligned buffer makes results repeatable to the last bit,
/// which users expect of a re-run command; the copy costs far less than the factorization.
/// </remarks>
internal sealed class AlignedCopy : IDisposable
{
    private const int Alignment = 64;
    private readonly double[] _target;
    private readonly double[] _buffer;
    private readonly int _offset;
    private readonly int _length;

    public AlignedCopy(double[] target, int length)
    {
        _target = target;
        _length = length;
        _buffer = GC.AllocateUninitializedArray<double>(length + (Alignment / sizeof(double)), pinned: true);
        long address = Marshal.UnsafeAddrOfPinnedArrayElement(_buffer, 0).ToInt64();
        _offset = (int)((Alignment - (address % Alignment)) % Alignment) / sizeof(double);
        Array.Copy(target, 0, _buffer, _offset, length);
    }

    /// <summary>The aligned first element, to pass by reference to native code.</summary>
    public ref double First => ref _buffer[_offset];

    public void Dispose() => Array.Copy(_buffer, _offset, _target, 0, _length);
}

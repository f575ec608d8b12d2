namespace PathFinder.Solving;

/// <summary>Disjoint sets over 0..n−1 with path halving and union by size.</summary>
internal sealed class UnionFind
{
    private readonly int[] _parent;
    private readonly int[] _size;

    public UnionFind(int count)
    {
        _parent = new int[count];
        _size = new int[count];
        for (int k = 0; k < count; k++)
        {
            _parent[k] = k;
            _size[k] = 1;
        }
    }

    public int Find(int x)
    {
        while (_parent[x] != x)
        {
            _parent[x] = _parent[_parent[x]];
            x = _parent[x];
        }

        return x;
    }

    public void Union(int x, int y)
    {
        int rx = Find(x);
        int ry = Find(y);
        if (rx == ry)
        {
            return;
        }

        if (_size[rx] < _size[ry])
        {
            (rx, ry) = (ry, rx);
        }

        _parent[ry] = rx;
        _size[rx] += _size[ry];
    }
}

using System.Globalization;

namespace OutputForge.Layout;

/// <summary>
/// Orders table numbers the way a reader counts them: part by part at the dots, digit parts as
/// numbers (14.2.1.9 before 14.2.1.10, 14.2 before 14.2.1), other parts by ordinal text.
/// </summary>
public sealed class TableIdOrder : IComparer<string>
{
    public static readonly TableIdOrder Instance = new();

    public int Compare(string? x, string? y)
    {
        if (ReferenceEquals(x, y))
            return 0;
        if (x is null)
            return -1;
        if (y is null)
            return 1;
        var a = x.Split('.');
        var b = y.Split('.');
        for (int i = 0; i < Math.Min(a.Length, b.Length); i++)
        {
            int order = ComparePart(a[i], b[i]);
            if (order != 0)
                return order;
        }
        int byLength = a.Length.CompareTo(b.Length);
        return byLength != 0 ? byLength : string.CompareOrdinal(x, y);
    }

    private static int ComparePart(string a, string b)
    {
        bool aNumber = a.Length > 0 && a.All(char.IsAsciiDigit);
        bool bNumber = b.Length > 0 && b.All(char.IsAsciiDigit);
        if (aNumber && bNumber)
        {
            var x = System.Numerics.BigInteger.Parse(a, CultureInfo.InvariantCulture);
            var y = System.Numerics.BigInteger.Parse(b, CultureInfo.InvariantCulture);
            return x != y ? x.CompareTo(y) : a.Length.CompareTo(b.Length);
        }
        if (aNumber != bNumber)
            return aNumber ? -1 : 1;
        return string.CompareOrdinal(a, b);
    }
}

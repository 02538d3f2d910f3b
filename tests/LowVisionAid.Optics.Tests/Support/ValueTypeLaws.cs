namespace LowVisionAid.Optics.Tests.Support;

/// <summary>
/// Checks the equality and ordering laws once, for any value type, over a set of sample values (the way NodaTime's
/// TestHelper does): equality is reflexive and symmetric, agrees with == and != and with the hash code; ordering is
/// antisymmetric and transitive, agrees with equality, and with the four comparison operators.
/// </summary>
public static class ValueTypeLaws
{
    /// <summary>Equality laws for <paramref name="values"/>, all pairs.</summary>
    public static void Equality<T>(IReadOnlyList<T> values, Func<T, T, bool> equalOperator, Func<T, T, bool> notEqualOperator)
        where T : struct, IEquatable<T>
    {
        foreach (var a in values)
        {
            Assert.True(a.Equals(a), $"{a} equals itself");
            Assert.True(equalOperator(a, a), $"{a} == itself");
            Assert.False(a.Equals((object?)null), $"{a} is not null");
            Assert.False(a.Equals((object)"not a value"), $"{a} is not a string");
            foreach (var b in values)
            {
                var equal = a.Equals(b);
                Assert.Equal(equal, b.Equals(a));
                Assert.Equal(equal, a.Equals((object)b));
                Assert.Equal(equal, equalOperator(a, b));
                Assert.Equal(!equal, notEqualOperator(a, b));
                if (equal)
                {
                    Assert.Equal(a.GetHashCode(), b.GetHashCode());
                }
            }
        }
    }

    /// <summary>Equality and ordering laws for <paramref name="values"/>, all pairs and triples.</summary>
    public static void Ordering<T>(
        IReadOnlyList<T> values,
        Func<T, T, bool> equalOperator,
        Func<T, T, bool> notEqualOperator,
        Func<T, T, bool> less,
        Func<T, T, bool> lessOrEqual,
        Func<T, T, bool> greater,
        Func<T, T, bool> greaterOrEqual)
        where T : struct, IEquatable<T>, IComparable<T>
    {
        Equality(values, equalOperator, notEqualOperator);
        foreach (var a in values)
        {
            Assert.Equal(0, a.CompareTo(a));
            foreach (var b in values)
            {
                var order = Math.Sign(a.CompareTo(b));
                Assert.Equal(-order, Math.Sign(b.CompareTo(a)));
                Assert.Equal(order == 0, a.Equals(b));
                Assert.Equal(order < 0, less(a, b));
                Assert.Equal(order <= 0, lessOrEqual(a, b));
                Assert.Equal(order > 0, greater(a, b));
                Assert.Equal(order >= 0, greaterOrEqual(a, b));
                foreach (var c in values)
                {
                    if (a.CompareTo(b) <= 0 && b.CompareTo(c) <= 0)
                    {
                        Assert.True(a.CompareTo(c) <= 0, $"{a} ≤ {b} ≤ {c}");
                    }
                }
            }
        }
    }
}

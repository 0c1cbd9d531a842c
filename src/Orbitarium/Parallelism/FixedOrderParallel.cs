namespace Orbitarium.Parallelism;

/// <summary>
/// Parallel sums that repeat to the last bit: the index range is split into a fixed number of interleaved sets
/// (set s takes s, s + S, s + 2S, …), each set is summed sequentially into its own state, and the caller reduces the
/// states in set order. Floating-point addition is not associative, so summing per thread in whatever order the
/// scheduler picks would make the same calculation differ in its last digits from run to run, and an SCF that is
/// sensitive to such noise (soft orbital rotations) could then take different paths.
/// </summary>
internal static class FixedOrderParallel
{
    /// <summary>Most sets used (divisible by 2, 3, 4 and 6, so common core counts share the work evenly).</summary>
    public const int MaxSets = 12;

    /// <summary>Memory all per-set states of one call may take together, bytes.</summary>
    public const long StateBudgetBytes = 256L << 20;

    /// <summary>The number of sets for states of <paramref name="bytesPerState"/> bytes: at most <see cref="MaxSets"/>,
    /// at least 2, and within <see cref="StateBudgetBytes"/> where possible. Depends only on the problem size, never on
    /// the machine, so results are the same everywhere.</summary>
    public static int SetCount(long bytesPerState) =>
        (int)Math.Clamp(StateBudgetBytes / Math.Max(bytesPerState, 1), 2, MaxSets);

    /// <summary>Runs <paramref name="body"/> for every index in [0, <paramref name="count"/>) and returns the per-set
    /// states in set order.</summary>
    public static T[] For<T>(int count, int sets, Func<T> createState, Action<int, T> body, CancellationToken cancellationToken)
    {
        sets = Math.Max(1, Math.Min(sets, count));
        var states = new T[sets];
        Parallel.For(0, sets, new ParallelOptions { CancellationToken = cancellationToken }, set =>
        {
            var state = createState();
            for (int index = set; index < count; index += sets)
            {
                cancellationToken.ThrowIfCancellationRequested();
                body(index, state);
            }
            states[set] = state;
        });
        return states;
    }
}

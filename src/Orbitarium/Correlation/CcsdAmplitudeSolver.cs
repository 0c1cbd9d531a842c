namespace Orbitarium.Correlation;

/// <summary>
/// The spin-orbital CCSD amplitude iterations (Stanton–Gauss intermediates) on a <see cref="SpinOrbitalSystem"/>.
/// Keeps the converged amplitudes for the (T) correction.
/// </summary>
internal sealed class CcsdAmplitudeSolver
{
    private readonly int _n, _o, _v;
    private readonly double[] _f;
    private readonly double[] _g;
    private readonly int[] _spinOcc;
    private readonly int[] _spinVir;
    private readonly int _virtualAlpha;

    public CcsdAmplitudeSolver(SpinOrbitalSystem system)
    {
        // Spin of each occupied and virtual spin orbital (0 α, 1 β); virtual α come first, so a spin is a contiguous range.
        _spinOcc = new int[system.Occupied];
        for (int i = 0; i < system.Occupied; i++) _spinOcc[i] = system.IsBeta[i] ? 1 : 0;
        _spinVir = new int[system.Virtual];
        for (int a = 0; a < system.Virtual; a++)
        {
            _spinVir[a] = system.IsBeta[system.Occupied + a] ? 1 : 0;
            if (_spinVir[a] == 0) _virtualAlpha++;
        }
        _n = system.Count;
        _o = system.Occupied;
        _v = system.Virtual;
        _f = system.Fock;
        _g = system.Antisymmetrized;
        T1 = new double[_o * _v];
        T2 = new double[_o * _o * _v * _v];
    }

    /// <summary>Singles amplitudes t_i^a at [i·v + a].</summary>
    public double[] T1 { get; internal set; }

    /// <summary>Doubles amplitudes t_ij^ab at [((i·o + j)·v + a)·v + b].</summary>
    public double[] T2 { get; internal set; }

    public sealed record Outcome(double Energy, double Mp2Energy, int Iterations, bool Converged, string StopReason,
        List<double> EnergyHistory, List<double> ResidualHistory, double T1Diagnostic);

    /// <summary>The virtual range (start, length) of the given spin (0 α, 1 β); empty for any other value.</summary>
    private (int Start, int Length) PartnerRange(int spin) => spin switch
    {
        0 => (0, _virtualAlpha),
        1 => (_virtualAlpha, _v - _virtualAlpha),
        _ => (0, 0),
    };

    private double G(int p, int q, int r, int s) => _g[((p * _n + q) * _n + r) * _n + s];
    private int T2i(int i, int j, int a, int b) => ((i * _o + j) * _v + a) * _v + b;

    public Outcome Solve(CorrelationOptions options, IProgress<CorrelationProgress>? progress, CancellationToken ct)
    {
        int o = _o, v = _v, n = _n;
        var d1 = new double[o * v];
        for (int i = 0; i < o; i++)
            for (int a = 0; a < v; a++)
                d1[i * v + a] = _f[i * n + i] - _f[(o + a) * n + o + a];
        // First-order guess: t_ij^ab = ⟨ij||ab⟩ / D, t_i^a = f_ia / D.
        for (int i = 0; i < o; i++)
            for (int a = 0; a < v; a++)
                T1[i * v + a] = _f[i * n + o + a] / d1[i * v + a];
        for (int i = 0; i < o; i++)
            for (int j = 0; j < o; j++)
                for (int a = 0; a < v; a++)
                    for (int b = 0; b < v; b++)
                        T2[T2i(i, j, a, b)] = G(i, j, o + a, o + b) / (d1[i * v + a] + d1[j * v + b]);
        double mp2 = Energy(new double[T1.Length], T2);
        var diis = new AmplitudeDiis(options.DiisVectors);
        var convergence = new AmplitudeConvergence(options, progress, "CCSD", mp2);
        int iteration = 0;
        if (o == 0 || v == 0)
        {
            return new Outcome(0, 0, 0, true, "no excitations possible", [], [], 0);
        }
        while (iteration < options.MaxIterations)
        {
            ct.ThrowIfCancellationRequested();
            iteration++;
            var (t1New, t2New) = Iterate(d1, ct);
            var vec = new double[t1New.Length + t2New.Length];
            var err = new double[vec.Length];
            double sumSq = 0;
            for (int k = 0; k < t1New.Length; k++)
            {
                vec[k] = t1New[k];
                err[k] = t1New[k] - T1[k];
                sumSq += err[k] * err[k];
            }
            for (int k = 0; k < t2New.Length; k++)
            {
                vec[t1New.Length + k] = t2New[k];
                err[t1New.Length + k] = t2New[k] - T2[k];
                sumSq += err[t1New.Length + k] * err[t1New.Length + k];
            }
            double rms = Math.Sqrt(sumSq / vec.Length);
            diis.Extrapolate(vec, err);
            Array.Copy(vec, 0, t1New, 0, t1New.Length);
            Array.Copy(vec, t1New.Length, t2New, 0, t2New.Length);
            T1 = t1New;
            T2 = t2New;
            if (convergence.Record(iteration, Energy(T1, T2), rms)) break;
        }
        double t1Norm = 0;
        foreach (var t in T1) t1Norm += t * t;
        double t1Diagnostic = o > 0 ? Math.Sqrt(t1Norm / (2.0 * o)) : 0;
        return new Outcome(convergence.Energy, mp2, iteration, convergence.Converged, convergence.Reason, convergence.Energies,
            convergence.Residuals, t1Diagnostic);
    }

    private double Energy(double[] t1, double[] t2)
    {
        int o = _o, v = _v, n = _n;
        double e = 0;
        for (int i = 0; i < o; i++)
            for (int a = 0; a < v; a++)
                e += _f[i * n + o + a] * t1[i * v + a];
        for (int i = 0; i < o; i++)
            for (int j = 0; j < o; j++)
                for (int a = 0; a < v; a++)
                    for (int b = 0; b < v; b++)
                    {
                        double g = G(i, j, o + a, o + b);
                        if (g == 0) continue;
                        e += 0.25 * g * t2[T2i(i, j, a, b)] + 0.5 * g * t1[i * v + a] * t1[j * v + b];
                    }
        return e;
    }

    internal (double[] T1, double[] T2) Iterate(double[] d1, CancellationToken ct)
    {
        int o = _o, v = _v, n = _n;
        var t1 = T1;
        var t2 = T2;
        var f = _f;
        var tau = new double[t2.Length];
        var taut = new double[t2.Length];
        for (int i = 0; i < o; i++)
            for (int j = 0; j < o; j++)
                for (int a = 0; a < v; a++)
                    for (int b = 0; b < v; b++)
                    {
                        int k = T2i(i, j, a, b);
                        double s = t1[i * v + a] * t1[j * v + b] - t1[i * v + b] * t1[j * v + a];
                        tau[k] = t2[k] + s;
                        taut[k] = t2[k] + 0.5 * s;
                    }

        // F_ae
        var fae = new double[v * v];
        Parallel.For(0, v, a =>
        {
            for (int e = 0; e < v; e++)
            {
                double val = a == e ? 0 : f[(o + a) * n + o + e];
                for (int m = 0; m < o; m++)
                {
                    val -= 0.5 * f[m * n + o + e] * t1[m * v + a];
                    for (int ff = 0; ff < v; ff++)
                        val += t1[m * v + ff] * G(m, o + a, o + ff, o + e);
                    for (int nn = 0; nn < o; nn++)
                        for (int ff = 0; ff < v; ff++)
                            val -= 0.5 * taut[T2i(m, nn, a, ff)] * G(m, nn, o + e, o + ff);
                }
                fae[a * v + e] = val;
            }
        });
        // F_mi
        var fmi = new double[o * o];
        for (int m = 0; m < o; m++)
            for (int i = 0; i < o; i++)
            {
                double val = m == i ? 0 : f[m * n + i];
                for (int e = 0; e < v; e++)
                    val += 0.5 * t1[i * v + e] * f[m * n + o + e];
                for (int nn = 0; nn < o; nn++)
                    for (int e = 0; e < v; e++)
                    {
                        val += t1[nn * v + e] * G(m, nn, i, o + e);
                        for (int ff = 0; ff < v; ff++)
                            val += 0.5 * taut[T2i(i, nn, e, ff)] * G(m, nn, o + e, o + ff);
                    }
                fmi[m * o + i] = val;
            }
        // F_me
        var fme = new double[o * v];
        for (int m = 0; m < o; m++)
            for (int e = 0; e < v; e++)
            {
                double val = f[m * n + o + e];
                for (int nn = 0; nn < o; nn++)
                    for (int ff = 0; ff < v; ff++)
                        val += t1[nn * v + ff] * G(m, nn, o + e, o + ff);
                fme[m * v + e] = val;
            }
        // W_mnij with ½ τ⟨mn||ef⟩ (¼ of its own plus ¼ from the factorised W_abef ladder term).
        var wmnij = new double[o * o * o * o];
        Parallel.For(0, o, m =>
        {
            for (int nn = 0; nn < o; nn++)
                for (int i = 0; i < o; i++)
                    for (int j = 0; j < o; j++)
                    {
                        double val = G(m, nn, i, j);
                        for (int e = 0; e < v; e++)
                            val += t1[j * v + e] * G(m, nn, i, o + e) - t1[i * v + e] * G(m, nn, j, o + e);
                        int tb = T2i(i, j, 0, 0);
                        int gb = ((m * n + nn) * n + o) * n + o;
                        for (int e = 0; e < v; e++)
                            val += 0.5 * MolecularIntegralTransformation.Dot(tau.AsSpan(tb + e * v, v), _g.AsSpan(gb + e * n, v));
                        wmnij[((m * o + nn) * o + i) * o + j] = val;
                    }
        });
        // W_mbej at [((m·v + b)·v + e)·o + j]
        var wmbej = new double[o * v * v * o];
        Parallel.For(0, o, m =>
        {
            for (int b = 0; b < v; b++)
                for (int e = 0; e < v; e++)
                    for (int j = 0; j < o; j++)
                    {
                        if (_spinOcc[m] + _spinVir[b] != _spinVir[e] + _spinOcc[j]) continue;
                        double val = G(m, o + b, o + e, j);
                        for (int ff = 0; ff < v; ff++)
                            val += t1[j * v + ff] * G(m, o + b, o + e, o + ff);
                        for (int nn = 0; nn < o; nn++)
                        {
                            val -= t1[nn * v + b] * G(m, nn, o + e, j);
                            double tnb = t1[nn * v + b];
                            for (int ff = 0; ff < v; ff++)
                                val -= (0.5 * t2[T2i(j, nn, ff, b)] + t1[j * v + ff] * tnb) * G(m, nn, o + e, o + ff);
                        }
                        wmbej[((m * v + b) * v + e) * o + j] = val;
                    }
        });
        // Intermediates with the singles folded in.
        var faeT = new double[v * v];
        for (int b = 0; b < v; b++)
            for (int e = 0; e < v; e++)
            {
                double val = fae[b * v + e];
                for (int m = 0; m < o; m++) val -= 0.5 * t1[m * v + b] * fme[m * v + e];
                faeT[b * v + e] = val;
            }
        var fmiT = new double[o * o];
        for (int m = 0; m < o; m++)
            for (int j = 0; j < o; j++)
            {
                double val = fmi[m * o + j];
                for (int e = 0; e < v; e++) val += 0.5 * t1[j * v + e] * fme[m * v + e];
                fmiT[m * o + j] = val;
            }
        ct.ThrowIfCancellationRequested();

        // T1
        var t1New = new double[o * v];
        Parallel.For(0, o, i =>
        {
            for (int a = 0; a < v; a++)
            {
                if (_spinOcc[i] != _spinVir[a]) continue;
                double num = f[i * n + o + a];
                for (int e = 0; e < v; e++) num += t1[i * v + e] * fae[a * v + e];
                for (int m = 0; m < o; m++) num -= t1[m * v + a] * fmi[m * o + i];
                for (int m = 0; m < o; m++)
                    for (int e = 0; e < v; e++)
                    {
                        num += t2[T2i(i, m, a, e)] * fme[m * v + e];
                        num -= t1[m * v + e] * G(m, o + a, i, o + e);
                        int tb = T2i(i, m, e, 0);
                        int gb = ((m * n + o + a) * n + o + e) * n + o;
                        num -= 0.5 * MolecularIntegralTransformation.Dot(t2.AsSpan(tb, v), _g.AsSpan(gb, v));
                        for (int nn = 0; nn < o; nn++)
                            num -= 0.5 * t2[T2i(m, nn, a, e)] * G(nn, m, o + e, i);
                    }
                t1New[i * v + a] = num / d1[i * v + a];
            }
        });

        // T2 over pairs i < j.
        var pairs = new List<(int I, int J)>();
        for (int i = 0; i < o; i++)
            for (int j = i + 1; j < o; j++)
                pairs.Add((i, j));
        var t2New = new double[t2.Length];
        Parallel.For(0, pairs.Count, new ParallelOptions { CancellationToken = ct }, pij =>
        {
            var (i, j) = pairs[pij];
            // Z[a, m] = Σ_ef τ_ij^ef ⟨am||ef⟩
            var z = new double[v * o];
            int tbij = T2i(i, j, 0, 0);
            int sij = _spinOcc[i] + _spinOcc[j];
            for (int a = 0; a < v; a++)
                for (int m = 0; m < o; m++)
                {
                    if (_spinVir[a] + _spinOcc[m] != sij) continue;
                    double s = 0;
                    int gb = ((o + a) * n + m) * n * n;
                    for (int e = 0; e < v; e++)
                    {
                        var (f0, fl) = PartnerRange(sij - _spinVir[e]);
                        if (fl > 0)
                            s += MolecularIntegralTransformation.Dot(tau.AsSpan(tbij + e * v + f0, fl), _g.AsSpan(gb + (o + e) * n + o + f0, fl));
                    }
                    z[a * o + m] = s;
                }
            for (int a = 0; a < v; a++)
                for (int b = a + 1; b < v; b++)
                {
                    if (_spinVir[a] + _spinVir[b] != sij) continue;
                    double num = G(i, j, o + a, o + b);
                    for (int e = 0; e < v; e++)
                        num += t2[T2i(i, j, a, e)] * faeT[b * v + e] - t2[T2i(i, j, b, e)] * faeT[a * v + e];
                    for (int m = 0; m < o; m++)
                        num -= t2[T2i(i, m, a, b)] * fmiT[m * o + j] - t2[T2i(j, m, a, b)] * fmiT[m * o + i];
                    for (int m = 0; m < o; m++)
                        for (int nn = 0; nn < o; nn++)
                            num += 0.5 * tau[T2i(m, nn, a, b)] * wmnij[((m * o + nn) * o + i) * o + j];
                    int gab = ((o + a) * n + o + b) * n * n;
                    double ladder = 0;
                    for (int e = 0; e < v; e++)
                    {
                        var (f0, fl) = PartnerRange(sij - _spinVir[e]);
                        if (fl > 0)
                            ladder += MolecularIntegralTransformation.Dot(tau.AsSpan(tbij + e * v + f0, fl), _g.AsSpan(gab + (o + e) * n + o + f0, fl));
                    }
                    num += 0.5 * ladder;
                    for (int m = 0; m < o; m++)
                        num -= 0.5 * (t1[m * v + b] * z[a * o + m] - t1[m * v + a] * z[b * o + m]);
                    num += Ring(i, j, a, b) - Ring(j, i, a, b) - Ring(i, j, b, a) + Ring(j, i, b, a);
                    for (int e = 0; e < v; e++)
                        num += t1[i * v + e] * G(o + a, o + b, o + e, j) - t1[j * v + e] * G(o + a, o + b, o + e, i);
                    for (int m = 0; m < o; m++)
                        num -= t1[m * v + a] * G(m, o + b, i, j) - t1[m * v + b] * G(m, o + a, i, j);
                    double val = num / (d1[i * v + a] + d1[j * v + b]);
                    t2New[T2i(i, j, a, b)] = val;
                    t2New[T2i(j, i, a, b)] = -val;
                    t2New[T2i(i, j, b, a)] = -val;
                    t2New[T2i(j, i, b, a)] = val;
                }
        });
        return (t1New, t2New);

        // Σ_me t_im^ae W_mbej − t_i^e t_m^a ⟨mb||ej⟩
        double Ring(int i, int j, int a, int b)
        {
            double s = 0;
            for (int m = 0; m < o; m++)
            {
                double tma = t1[m * v + a];
                int tb = T2i(i, m, a, 0);
                int wb = (m * v + b) * v * o + j;
                for (int e = 0; e < v; e++)
                    s += t2[tb + e] * wmbej[wb + e * o] - t1[i * v + e] * tma * G(m, o + b, o + e, j);
            }
            return s;
        }
    }
}

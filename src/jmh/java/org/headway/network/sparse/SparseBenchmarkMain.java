package org.headway.network.sparse;

import java.util.Locale;
import java.util.Random;

/**
 * Timing and fill of the sparse solver on k × k grid networks (the densest near-planar case: every
 * node a loop junction) and on a 10⁶-node looped network with tree branches. Not a unit test and
 * not JMH: each phase of a 10⁶-row problem runs for seconds, so each is timed once with {@code
 * System.nanoTime} after a warm-up on the small grid, and the numeric factorization (the part
 * repeated every Newton iteration) several times.
 *
 * <p>Values: conductances uniform in [0.5, 2]; one node in a thousand is tied to a fixed head
 * (diagonal + its conductance), as in A = B G⁻¹ Bᵀ with the fixed-head nodes eliminated. The
 * residual ‖Ax − b‖/‖b‖ is printed as a check. Columns: nnz(L) with its diagonal, over n log₂ n;
 * supernodes; megabytes of factor values; flops of one factorization; then seconds for building the
 * pattern, the ordering, the symbolic analysis, the numeric factorization (best of several, as in
 * later Newton iterations) and one solve.
 *
 * <p>Run (2 GB heap, as the brief requires):
 *
 * <pre>
 * mvn -B -q -Pjmh test-compile dependency:build-classpath -Dmdep.outputFile=target/cp.txt
 * java -Xmx2g -cp target/classes:target/test-classes:$(cat target/cp.txt) \
 *     org.headway.network.sparse.SparseBenchmarkMain [k ...]
 * </pre>
 *
 * Default sizes: k = 100, 316, 1000 (10⁴, ≈10⁵, 10⁶ nodes), then the 10⁶-node branched network.
 */
public final class SparseBenchmarkMain {

    private SparseBenchmarkMain() {}

    public static void main(String[] args) {
        int[] sizes = args.length == 0 ? new int[] {100, 316, 1000} : new int[args.length];
        for (int i = 0; i < args.length; i++) {
            sizes[i] = Integer.parseInt(args[i]);
        }
        System.out.println("warm-up (k = 100, not reported)");
        for (int i = 0; i < 3; i++) {
            run("warm-up", grid(100), 1, false);
        }
        System.out.println(String.format(
                Locale.ROOT,
                "%-22s %9s %9s %11s %7s %8s %7s %9s %8s %8s %8s %8s %8s %9s",
                "network",
                "n",
                "pairs",
                "nnz(L)",
                "L/nlgn",
                "supers",
                "MB(L)",
                "flops",
                "pattern",
                "order",
                "symbol",
                "numeric",
                "solve",
                "residual"));
        for (int k : sizes) {
            run(k + "x" + k + " grid", grid(k), k >= 1000 ? 3 : 5, true);
        }
        if (args.length == 0) {
            run("branched 10^6", branched(1_000_000, new Random(42)), 3, true);
        }
    }

    /** An edge list with its node count. */
    private record Network(int n, int[] a, int[] b) {}

    private static Network grid(int k) {
        int n = k * k;
        int m = 2 * k * (k - 1);
        int[] a = new int[m];
        int[] b = new int[m];
        int e = 0;
        for (int r = 0; r < k; r++) {
            for (int c = 0; c < k; c++) {
                int i = r * k + c;
                if (c + 1 < k) {
                    a[e] = i;
                    b[e++] = i + 1;
                }
                if (r + 1 < k) {
                    a[e] = i;
                    b[e++] = i + k;
                }
            }
        }
        return new Network(n, a, b);
    }

    /**
     * A looped main (a 400 × 400 grid with a sixth of its pipes missing, a spanning comb kept)
     * carrying random tree branches up to n nodes: the shape of a city water network (invented).
     */
    private static Network branched(int n, Random random) {
        int k = 400;
        int core = k * k;
        int[] a = new int[2 * k * (k - 1) + n];
        int[] b = new int[a.length];
        int e = 0;
        for (int r = 0; r < k; r++) {
            for (int c = 0; c < k; c++) {
                int i = r * k + c;
                // Every row's links and the first column's (a comb: spanning), a third of the other
                // vertical links dropped.
                if (c + 1 < k) {
                    a[e] = i;
                    b[e++] = i + 1;
                }
                if (r + 1 < k && (c == 0 || random.nextInt(3) != 0)) {
                    a[e] = i;
                    b[e++] = i + k;
                }
            }
        }
        for (int i = core; i < n; i++) {
            a[e] = i;
            b[e++] = random.nextInt(i); // a branch off the main or off an earlier branch
        }
        return new Network(n, java.util.Arrays.copyOf(a, e), java.util.Arrays.copyOf(b, e));
    }

    private static void run(String name, Network net, int numericRepeats, boolean report) {
        int n = net.n();
        Random random = new Random(n);
        double[] off = new double[net.a().length];
        double[] diag = new double[n];
        for (int e = 0; e < off.length; e++) {
            double g = 0.5 + 1.5 * random.nextDouble();
            off[e] = -g;
            diag[net.a()[e]] += g;
            diag[net.b()[e]] += g;
        }
        for (int i = 0; i < n; i += 1000) {
            diag[i] += 0.5 + 1.5 * random.nextDouble();
        }
        double[] rhs = new double[n];
        for (int i = 0; i < n; i++) {
            rhs[i] = random.nextGaussian();
        }

        long t0 = System.nanoTime();
        SparsePattern pattern = SparsePattern.fromEdges(n, net.a(), net.b());
        long t1 = System.nanoTime();
        int[] perm = MinimumDegreeOrdering.order(pattern);
        long t2 = System.nanoTime();
        SymbolicCholesky symbolic = SymbolicCholesky.analyse(pattern, perm);
        long t3 = System.nanoTime();
        NumericCholesky factor = symbolic.factor(diag, off);
        long best = System.nanoTime() - t3;
        for (int r = 1; r < numericRepeats; r++) {
            long s = System.nanoTime();
            factor.refactor(diag, off);
            best = Math.min(best, System.nanoTime() - s);
        }
        double[] x = rhs.clone();
        long t4 = System.nanoTime();
        factor.solveInPlace(x);
        long solve = System.nanoTime() - t4;

        double[] r = new double[n];
        for (int i = 0; i < n; i++) {
            r[i] = diag[i] * x[i] - rhs[i];
        }
        for (int e = 0; e < off.length; e++) {
            r[net.a()[e]] += off[e] * x[net.b()[e]];
            r[net.b()[e]] += off[e] * x[net.a()[e]];
        }
        double rn = 0;
        double bn = 0;
        for (int i = 0; i < n; i++) {
            rn += r[i] * r[i];
            bn += rhs[i] * rhs[i];
        }
        if (!report) {
            return;
        }
        long nnz = symbolic.nonZerosInL();
        System.out.println(String.format(
                Locale.ROOT,
                "%-22s %9d %9d %11d %7.2f %8d %7.0f %9.2e %7.3fs %7.3fs %7.3fs %7.3fs %7.3fs %9.1e",
                name,
                n,
                pattern.distinctPairs(),
                nnz,
                nnz / (n * Math.log(n) / Math.log(2)),
                symbolic.supernodeCount(),
                symbolic.storedValues() * 8 / 1e6,
                symbolic.factorFlops(),
                (t1 - t0) / 1e9,
                (t2 - t1) / 1e9,
                (t3 - t2) / 1e9,
                best / 1e9,
                solve / 1e9,
                Math.sqrt(rn / bn)));
    }
}

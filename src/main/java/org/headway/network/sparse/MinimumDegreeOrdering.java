package org.headway.network.sparse;

import java.util.Arrays;

/**
 * Approximate minimum degree (AMD) fill-reducing ordering of a symmetric pattern.
 *
 * <p>Written from the published descriptions, not from any library's code:
 *
 * <ul>
 *   <li>the quotient graph of variables and elements, element absorption and mass elimination:
 *       George &amp; Liu, <i>Computer Solution of Large Sparse Positive Definite Systems</i>,
 *       Prentice-Hall 1981, ch. 5, and George &amp; Liu, "The evolution of the minimum degree
 *       ordering algorithm", SIAM Review 31(1):1–19, 1989 (supervariables of indistinguishable
 *       nodes, multiple elimination, external degree);
 *   <li>the approximate external degree d̄ᵢ = min(n − k, d̄ᵢ + |Lₚ \ i|, |Aᵢ \ i| + |Lₚ \ i| + Σ
 *       |Lₑ \ Lₚ|), computed with the |Lₑ \ Lₚ| counts of one extra pass over the new element, and
 *       aggressive absorption of every element e with Lₑ ⊆ Lₚ: Amestoy, Davis &amp; Duff, "An
 *       approximate minimum degree ordering algorithm", SIAM J. Matrix Anal. Appl. 17(4):886–905,
 *       1996 (Algorithms 1–2, §§3–4);
 *   <li>supervariable detection by hashing the quotient-graph adjacency of the variables of the
 *       new element, as described in the same two papers;
 *   <li>the final order is a postorder of the assembly (absorption) tree, which keeps the fill of
 *       the order found (Davis, <i>Direct Methods for Sparse Linear Systems</i>, SIAM 2006, §7.1).
 * </ul>
 *
 * <p>Rows with more than max(16, 10√n) neighbours are taken out before the ordering and placed
 * last, the safeguard the same authors' AMD software documents for dense rows; pipe networks rarely
 * have any.
 *
 * <p>All state is held in int arrays (a single workspace holds every adjacency and element list and
 * is compacted in place when full), so 10⁶ nodes need about 100 MB and 0.5–1.5 s.
 */
public final class MinimumDegreeOrdering {

    private MinimumDegreeOrdering() {}

    /**
     * A fill-reducing order of the rows of {@code pattern}, with aggressive absorption.
     *
     * @param pattern symmetric pattern
     * @return {@code perm} with {@code perm[k]} the original row eliminated k-th (new → old)
     */
    public static int[] order(SparsePattern pattern) {
        return order(pattern, true);
    }

    /**
     * A fill-reducing order of the rows of {@code pattern}.
     *
     * @param pattern symmetric pattern
     * @param aggressiveAbsorption also absorb elements that are subsets of the new element but not
     *     adjacent to the pivot (ADD 1996 §4); {@code false} gives plain element absorption
     * @return {@code perm} with {@code perm[k]} the original row eliminated k-th (new → old)
     */
    public static int[] order(SparsePattern pattern, boolean aggressiveAbsorption) {
        int n = pattern.size();
        if (n == 0) {
            return new int[0];
        }
        return new Worker(pattern, aggressiveAbsorption).run();
    }

    /** The inverse of a permutation: {@code inverse[perm[k]] = k}. */
    public static int[] inverse(int[] perm) {
        int[] inv = new int[perm.length];
        Arrays.fill(inv, -1);
        for (int k = 0; k < perm.length; k++) {
            int i = perm[k];
            if (i < 0 || i >= perm.length || inv[i] != -1) {
                throw new IllegalArgumentException("not a permutation of 0.." + (perm.length - 1) + ": entry " + k
                        + " is " + i + (i >= 0 && i < perm.length ? ", repeated" : ""));
            }
            inv[i] = k;
        }
        return inv;
    }

    /** The elimination, with its state in int arrays indexed by node (variable or element). */
    private static final class Worker {
        /** A principal variable (uneliminated, represents its supervariable). */
        static final byte VARIABLE = 0;
        /** A variable merged into a supervariable or eliminated with a pivot (mass elimination). */
        static final byte MERGED = 1;
        /** An eliminated pivot whose element is alive. */
        static final byte ELEMENT = 2;
        /** An eliminated pivot whose element was absorbed into a later one. */
        static final byte ABSORBED = 3;
        /** A dense row, ordered last. */
        static final byte DENSE = 4;

        final int n;
        final boolean aggressive;
        /** Rows not dense: the number of variables the elimination has to take. */
        int active;

        /** Workspace: every live list lives in iw[pe[i] .. pe[i] + len[i]). */
        int[] iw;

        int pfree;
        final int[] pe;
        final int[] len;
        /** For a variable: how many leading entries of its list are elements (Eᵢ; the rest is Aᵢ). */
        final int[] elen;
        /** Weight: original variables in a supervariable; pivot's eliminated count for an element. */
        final int[] nv;

        final byte[] status;
        /** Variable: approximate external degree. Element: weighted size of Lₑ. */
        final int[] degree;

        final int[] head;
        final int[] next;
        final int[] prev;
        /** w[e] − wflg = |Lₑ \ Lₚ| (weighted) while the current pivot is processed. */
        final int[] w;

        int wflg = 1;
        /** Merged variable → its principal or pivot; absorbed element → the absorbing element. */
        final int[] parent;
        /** lpMark[i] == lpStamp: variable i is in the new element. */
        final int[] lpMark;

        int lpStamp = 0;
        final int[] hashHead;
        final int[] hashNext;
        final int[] hashOf;
        final int[] cmpMark;
        int cmpStamp = 0;

        Worker(SparsePattern pattern, boolean aggressive) {
            this.n = pattern.size();
            this.aggressive = aggressive;
            pe = new int[n];
            len = new int[n];
            elen = new int[n];
            nv = new int[n];
            status = new byte[n];
            degree = new int[n];
            head = new int[n + 1];
            next = new int[n];
            prev = new int[n];
            w = new int[n];
            parent = new int[n];
            lpMark = new int[n];
            hashHead = new int[n];
            hashNext = new int[n];
            hashOf = new int[n];
            cmpMark = new int[n];
            load(pattern);
        }

        private void load(SparsePattern pattern) {
            int[] rowStart = pattern.rowStartArray();
            int[] adj = pattern.adjacencyArray();
            long denseLimit = Math.max(16L, (long) Math.floor(10.0 * Math.sqrt(n)));
            int dense = 0;
            for (int i = 0; i < n; i++) {
                if (rowStart[i + 1] - rowStart[i] > denseLimit) {
                    status[i] = DENSE;
                    dense++;
                }
            }
            active = n - dense;
            long kept = 0;
            for (int i = 0; i < n; i++) {
                if (status[i] == DENSE) {
                    continue;
                }
                for (int q = rowStart[i]; q < rowStart[i + 1]; q++) {
                    if (status[adj[q]] != DENSE) {
                        kept++;
                    }
                }
            }
            // Elbow room: every new element is built at the end; the live total never exceeds the
            // initial lists, so kept + n is always enough after a compaction.
            long size = kept + kept / 5 + 2L * n + 16;
            if (size > Integer.MAX_VALUE - 16) {
                throw new IllegalArgumentException("pattern too large for the ordering: " + kept + " entries");
            }
            iw = new int[(int) size];
            int pos = 0;
            for (int i = 0; i < n; i++) {
                pe[i] = pos;
                parent[i] = -1;
                nv[i] = 1;
                if (status[i] == DENSE) {
                    continue;
                }
                for (int q = rowStart[i]; q < rowStart[i + 1]; q++) {
                    int j = adj[q];
                    if (status[j] != DENSE) {
                        iw[pos++] = j;
                    }
                }
                len[i] = pos - pe[i];
                degree[i] = len[i];
            }
            pfree = pos;
            Arrays.fill(head, -1);
            Arrays.fill(hashHead, -1);
            for (int i = n - 1; i >= 0; i--) {
                if (status[i] == VARIABLE) {
                    listInsert(i, degree[i]);
                }
            }
        }

        private void listInsert(int i, int d) {
            int h = head[d];
            next[i] = h;
            prev[i] = -1;
            if (h != -1) {
                prev[h] = i;
            }
            head[d] = i;
        }

        private void listRemove(int i) {
            int p = prev[i];
            int q = next[i];
            if (p != -1) {
                next[p] = q;
            } else {
                head[degree[i]] = q;
            }
            if (q != -1) {
                prev[q] = p;
            }
        }

        /** Lowest degree given to a variable in the last elimination step (n when none). */
        private int lastMinimum;

        int[] run() {
            int eliminated = 0;
            int mindeg = 0;
            while (eliminated < active) {
                while (head[mindeg] == -1) {
                    mindeg++;
                }
                int p = head[mindeg];
                listRemove(p);
                eliminated += nv[p];
                eliminated = eliminate(p, eliminated);
                // The new degrees may be lower than the old minimum.
                mindeg = Math.min(mindeg, lastMinimum);
            }
            return postorder();
        }

        /**
         * Eliminates pivot p: forms the new element Lₚ, updates the approximate degrees of its
         * variables, absorbs elements, detects supervariables and mass-eliminates.
         *
         * @return the number of original variables eliminated so far
         */
        private int eliminate(int p, int eliminatedSoFar) {
            int eliminated = eliminatedSoFar;
            int nvp = nv[p];
            lpStamp++;
            final int stamp = lpStamp;
            int elenp = elen[p];
            status[p] = ELEMENT;
            int start;
            int end;
            if (elenp == 0) {
                // Lₚ = Aₚ (filtered): built in place over p's own list.
                start = pe[p];
                int wpos = start;
                int stop = start + len[p];
                for (int q = start; q < stop; q++) {
                    int j = iw[q];
                    if (status[j] == VARIABLE && lpMark[j] != stamp) {
                        lpMark[j] = stamp;
                        listRemove(j);
                        iw[wpos++] = j;
                    }
                }
                end = wpos;
            } else {
                long bound = len[p] - elenp;
                int ps = pe[p];
                for (int q = ps; q < ps + elenp; q++) {
                    int e = iw[q];
                    if (status[e] == ELEMENT) {
                        bound += len[e];
                    }
                }
                bound = Math.min(bound, active - eliminated);
                ensureRoom(bound);
                start = pfree;
                int wpos = start;
                ps = pe[p];
                for (int q = ps; q < ps + elenp; q++) {
                    int e = iw[q];
                    if (status[e] != ELEMENT) {
                        continue;
                    }
                    int es = pe[e];
                    int ee = es + len[e];
                    for (int r = es; r < ee; r++) {
                        int j = iw[r];
                        if (status[j] == VARIABLE && lpMark[j] != stamp) {
                            lpMark[j] = stamp;
                            listRemove(j);
                            iw[wpos++] = j;
                        }
                    }
                    // Standard element absorption: Lₑ \ {p} ⊆ Lₚ.
                    status[e] = ABSORBED;
                    parent[e] = p;
                    len[e] = 0;
                }
                for (int q = ps + elenp; q < ps + len[p]; q++) {
                    int j = iw[q];
                    if (status[j] == VARIABLE && lpMark[j] != stamp) {
                        lpMark[j] = stamp;
                        listRemove(j);
                        iw[wpos++] = j;
                    }
                }
                end = wpos;
                pfree = wpos;
            }
            pe[p] = start;
            len[p] = end - start;
            elen[p] = 0;

            // Pass 1 (ADD 1996 Algorithm 2): w(e) − wflg = |Lₑ \ Lₚ| for every element next to Lₚ.
            if (wflg > Integer.MAX_VALUE - n - 2) {
                Arrays.fill(w, 0);
                wflg = 1;
            }
            int wmax = 0;
            for (int t = start; t < end; t++) {
                int i = iw[t];
                int nvi = nv[i];
                int is = pe[i];
                int ie = is + elen[i];
                for (int q = is; q < ie; q++) {
                    int e = iw[q];
                    if (status[e] != ELEMENT) {
                        continue;
                    }
                    if (w[e] >= wflg) {
                        w[e] -= nvi;
                    } else {
                        int de = degree[e];
                        w[e] = wflg + de - nvi;
                        if (de > wmax) {
                            wmax = de;
                        }
                    }
                }
            }

            // Pass 2: prune lists, absorb, partial degrees, hashes, mass elimination.
            for (int t = start; t < end; t++) {
                int i = iw[t];
                int is = pe[i];
                int ie = is + len[i];
                int eEnd = is + elen[i];
                int pn = is;
                long hash = p;
                int deg = 0;
                for (int q = is; q < eEnd; q++) {
                    int e = iw[q];
                    if (status[e] != ELEMENT) {
                        continue;
                    }
                    int dext = w[e] - wflg;
                    if (dext > 0) {
                        deg += dext;
                        iw[pn++] = e;
                        hash += e;
                    } else if (aggressive) {
                        // Lₑ ⊆ Lₚ: e carries no information beyond p (ADD 1996 §4).
                        status[e] = ABSORBED;
                        parent[e] = p;
                        len[e] = 0;
                    } else {
                        iw[pn++] = e;
                        hash += e;
                    }
                }
                int ne = pn - is;
                for (int q = eEnd; q < ie; q++) {
                    int j = iw[q];
                    // A variable also in Lₚ is now reached through element p: drop the edge.
                    if (status[j] == VARIABLE && lpMark[j] != stamp) {
                        deg += nv[j];
                        iw[pn++] = j;
                        hash += j;
                    }
                }
                int kept = pn - is;
                if (kept == 0) {
                    // Only p is left next to i: i is indistinguishable from p and goes with it.
                    status[i] = MERGED;
                    parent[i] = p;
                    eliminated += nv[i];
                    nvp += nv[i];
                    nv[i] = 0;
                    len[i] = 0;
                    elen[i] = 0;
                    continue;
                }
                // At least one entry was dropped (p itself from Aᵢ, or an element of Eₚ from Eᵢ),
                // so p fits at the front of the element part without moving the list.
                if (kept >= len[i]) {
                    throw new IllegalStateException("minimum degree: no room to add element " + p + " to " + i);
                }
                if (kept > ne) {
                    iw[is + kept] = iw[is + ne];
                }
                if (ne > 0) {
                    iw[is + ne] = iw[is];
                }
                iw[is] = p;
                len[i] = kept + 1;
                elen[i] = ne + 1;
                degree[i] = Math.min(degree[i], deg);
                int h = (int) Long.remainderUnsigned(hash, active);
                hashOf[i] = h;
                hashNext[i] = hashHead[h];
                hashHead[h] = i;
            }

            // Supervariables: variables of Lₚ with identical quotient-graph lists merge.
            for (int t = start; t < end; t++) {
                int i = iw[t];
                if (status[i] != VARIABLE) {
                    continue;
                }
                int h = hashOf[i];
                int first = hashHead[h];
                if (first == -1) {
                    continue;
                }
                hashHead[h] = -1;
                if (hashNext[first] == -1) {
                    continue;
                }
                for (int a = first; a != -1; a = hashNext[a]) {
                    if (status[a] != VARIABLE) {
                        continue;
                    }
                    boolean marked = false;
                    for (int b = hashNext[a]; b != -1; b = hashNext[b]) {
                        if (status[b] != VARIABLE || len[b] != len[a] || elen[b] != elen[a]) {
                            continue;
                        }
                        if (!marked) {
                            nextCompareStamp();
                            for (int q = pe[a]; q < pe[a] + len[a]; q++) {
                                cmpMark[iw[q]] = cmpStamp;
                            }
                            marked = true;
                        }
                        boolean same = true;
                        for (int q = pe[b]; q < pe[b] + len[b]; q++) {
                            if (cmpMark[iw[q]] != cmpStamp) {
                                same = false;
                                break;
                            }
                        }
                        if (same) {
                            nv[a] += nv[b];
                            nv[b] = 0;
                            status[b] = MERGED;
                            parent[b] = a;
                            degree[a] = Math.min(degree[a], degree[b]);
                            len[b] = 0;
                            elen[b] = 0;
                        }
                    }
                }
            }

            // Finalize: compact Lₚ to its principal variables, complete the degrees, relist.
            int wpos = start;
            int degme = 0;
            for (int t = start; t < end; t++) {
                int i = iw[t];
                if (status[i] == VARIABLE) {
                    degme += nv[i];
                    iw[wpos++] = i;
                }
            }
            int lowest = Integer.MAX_VALUE;
            int remaining = active - eliminated;
            for (int t = start; t < wpos; t++) {
                int i = iw[t];
                int nvi = nv[i];
                int d = Math.min(degree[i] + degme - nvi, remaining - nvi);
                if (d < 0) {
                    d = 0;
                }
                degree[i] = d;
                listInsert(i, d);
                if (d < lowest) {
                    lowest = d;
                }
            }
            lastMinimum = lowest == Integer.MAX_VALUE ? n : lowest;
            len[p] = wpos - start;
            if (end == pfree) {
                pfree = wpos;
            }
            degree[p] = degme;
            nv[p] = nvp;
            wflg += wmax + 1;
            return eliminated;
        }

        private void nextCompareStamp() {
            if (cmpStamp == Integer.MAX_VALUE) {
                Arrays.fill(cmpMark, 0);
                cmpStamp = 0;
            }
            cmpStamp++;
        }

        /** Makes room for {@code need} more entries at pfree, compacting (and if must, growing). */
        private void ensureRoom(long need) {
            if (pfree + need <= iw.length) {
                return;
            }
            compact();
            if (pfree + need > iw.length) {
                long grown = Math.max(pfree + need + n, (long) iw.length * 3 / 2);
                if (grown > Integer.MAX_VALUE - 16) {
                    throw new IllegalStateException("minimum degree: workspace would exceed 2³¹ entries");
                }
                iw = Arrays.copyOf(iw, (int) grown);
            }
        }

        /**
         * Garbage collection of the workspace (George &amp; Liu 1981 §5.4 "compaction"): each live
         * list's first entry is replaced by a negative tag naming its owner, then one sweep slides the
         * live lists down in address order. Garbage entries are node numbers, never negative.
         */
        private void compact() {
            for (int i = 0; i < n; i++) {
                if ((status[i] == VARIABLE || status[i] == ELEMENT) && len[i] > 0) {
                    int q = pe[i];
                    pe[i] = iw[q];
                    iw[q] = -(i + 1);
                }
            }
            int dst = 0;
            int q = 0;
            while (q < pfree) {
                int v = iw[q];
                if (v < 0) {
                    int i = -v - 1;
                    int l = len[i];
                    iw[dst] = pe[i];
                    pe[i] = dst;
                    System.arraycopy(iw, q + 1, iw, dst + 1, l - 1);
                    dst += l;
                    q += l;
                } else {
                    q++;
                }
            }
            pfree = dst;
        }

        /**
         * The final order: pivots in a postorder of the absorption tree, each followed by the
         * variables merged into it, dense rows last.
         */
        private int[] postorder() {
            int[] childHead = new int[n];
            int[] sibling = new int[n];
            Arrays.fill(childHead, -1);
            // Children in descending index so that the walk meets them ascending (deterministic).
            for (int e = n - 1; e >= 0; e--) {
                if (status[e] == ABSORBED) {
                    int pa = parent[e];
                    sibling[e] = childHead[pa];
                    childHead[pa] = e;
                }
            }
            // Merged variables: find the pivot each one went out with (path compression).
            int[] memberHead = new int[n];
            Arrays.fill(memberHead, -1);
            int[] memberNext = new int[n];
            for (int i = 0; i < n; i++) {
                if (status[i] != MERGED) {
                    continue;
                }
                int r = i;
                while (status[r] == MERGED) {
                    r = parent[r];
                }
                int s = i;
                while (status[s] == MERGED) {
                    int up = parent[s];
                    parent[s] = r;
                    s = up;
                }
                memberNext[i] = memberHead[r];
                memberHead[r] = i;
            }
            int[] perm = new int[n];
            int k = 0;
            int[] stack = new int[n];
            int[] cursor = new int[n];
            for (int root = 0; root < n; root++) {
                if (status[root] != ELEMENT) {
                    continue;
                }
                int top = 0;
                stack[0] = root;
                cursor[root] = childHead[root];
                while (top >= 0) {
                    int e = stack[top];
                    int c = cursor[e];
                    if (c != -1) {
                        cursor[e] = sibling[c];
                        stack[++top] = c;
                        cursor[c] = childHead[c];
                    } else {
                        top--;
                        perm[k++] = e;
                        for (int j = memberHead[e]; j != -1; j = memberNext[j]) {
                            perm[k++] = j;
                        }
                    }
                }
            }
            for (int i = 0; i < n; i++) {
                if (status[i] == DENSE) {
                    perm[k++] = i;
                }
            }
            if (k != n) {
                throw new IllegalStateException("minimum degree ordered " + k + " of " + n + " rows");
            }
            return perm;
        }
    }
}

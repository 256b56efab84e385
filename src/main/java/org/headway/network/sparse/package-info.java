/**
 * Sparse symmetric positive-definite direct solver for the global-gradient network solver.
 *
 * <p>Each Newton iteration of the global-gradient method (Todini &amp; Pilati 1988) solves
 * A Δh = r with A = B G⁻¹ Bᵀ: a weighted graph Laplacian of the network with the fixed-head nodes
 * eliminated, symmetric positive definite when every part of the network reaches a fixed head.
 * Networks reach 10⁶ nodes with 2–4 neighbours per node, near-planar (looped grids with tree-like
 * branches). The pattern never changes during a solve; only the values do.
 *
 * <p>Use:
 *
 * <pre>{@code
 * SparsePattern pattern = SparsePattern.fromEdges(n, rowA, rowB);      // once per topology
 * SymbolicCholesky symbolic = SymbolicCholesky.analyse(pattern);       // AMD order, tree, pattern of L
 * NumericCholesky factor = symbolic.factor(diagonal, offDiagonal);     // first Newton iteration
 * double[] x = factor.solve(b);
 * factor.refactor(diagonal2, offDiagonal2).solveInPlace(b2);          // later iterations, no allocation
 * }</pre>
 *
 * <h2>Decision: a direct L D Lᵀ factorization with our own minimum-degree ordering</h2>
 *
 * <ul>
 *   <li><b>Direct, not iterative.</b> Conductances in one network span many decades (a nearly
 *       closed valve next to a trunk main), so A is badly conditioned and conjugate gradients need a
 *       strong preconditioner to converge in a bounded number of steps; a direct factor has a cost
 *       fixed by the pattern alone, is accurate to rounding whatever the conditioning, and detects a
 *       singular or indefinite matrix (a part of the network with no fixed head) at a named row
 *       instead of failing to converge.
 *   <li><b>Symbolic once, numeric per iteration.</b> Ordering, elimination tree and the pattern of L
 *       depend only on the topology, so they are computed once; each iteration then costs one
 *       numeric factorization into the same arrays and two triangular solves.
 *   <li><b>Fill stays small on these graphs.</b> For planar graphs nested dissection bounds the fill
 *       by O(n log n) and the work by O(n^{3/2}) (Lipton, Rose &amp; Tarjan, "Generalized nested
 *       dissection", SIAM J. Numer. Anal. 16(2), 1979; George &amp; Liu 1981 ch. 8 for grids); the
 *       minimum-degree fill measured on k × k grids is 1.2–2.4 n log₂ n for n = 10³ … 10⁶, and a tree
 *       has no fill at all. {@code SparseBenchmarkMain} (src/jmh/java) prints fill and times.
 *   <li><b>Own code, no library.</b> Commons Math, already a dependency, has only dense
 *       decompositions (10⁶ rows would need 8 TB) and a hash-map sparse matrix with no sparse
 *       factorization. A sparse direct library would be a new dependency (or native code breaking
 *       the single portable jar) for a part small enough to own and test in full: about 1,200
 *       lines, each algorithm written from its publication (cited in each class) and checked against
 *       Commons Math's dense Cholesky, exact fill counts and residuals.
 *   <li><b>Pivot test before the square root.</b> The factor is L Lᵀ; the pivot dₖ = A(k, k) −
 *       Σ L(k, j)² is tested against a tolerance relative to the largest diagonal entry before its
 *       square root is taken, and the failing row is named in the caller's numbering.
 *   <li><b>Approximate minimum degree</b> (Amestoy, Davis &amp; Duff 1996) on a quotient graph, with
 *       element absorption, aggressive absorption, supervariables and mass elimination (George &amp;
 *       Liu, SIAM Review 31(1), 1989): orders 10⁶ nodes in 0.5–1.5 s, in int arrays only.
 *   <li><b>Supernodal left-looking factorization</b> (Ng &amp; Peyton 1993). On grids minimum
 *       degree leaves 98 % of the work in supernodes wider than 16 columns (the separators), where
 *       dense inner loops run several times faster than column-by-column sparse updates: on a 10⁶-node
 *       grid a simplicial up-looking version of this code took 18 s per factorization, the
 *       supernodal one 3.6–5 s (2.2 × 10¹⁰ flops, on a shared two-core machine). The row structure is stored once per supernode.
 * </ul>
 *
 * <p>Depends on nothing outside the JDK; never prints.
 */
package org.headway.network.sparse;

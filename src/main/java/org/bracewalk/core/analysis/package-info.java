/**
 * The analysis engine: whether a brace plane holds its shape, what can sway, which braces are
 * critical, how many losses it tolerates and the least set of braces that restores it.
 *
 * <p>The method is the brace graph of E. D. Bolker and H. Crapo, "Bracing rectangular frameworks
 * I", SIAM J. Appl. Math. 36 (1979): one vertex per lift, one per bay, one edge per effective
 * diagonal; a pinned base adds a ground vertex joined to every bay; tension-only members become arcs
 * and rigidity needs strong connectivity (J. Baglivo, J. Graver, "Incidence and Symmetry in Design
 * and Architecture", 1983). See {@code shared/design/analysis.md}.
 *
 * <p>Depends on {@code core.model} and JGraphT; no JGraphT type appears in a public signature.
 */
package org.bracewalk.core.analysis;

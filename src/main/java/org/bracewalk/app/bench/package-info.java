/**
 * {@code bracewalk bench}: times the engine on seeded random planes from 10 x 10 to 1000 x 1000
 * panels, and a general-purpose baseline on the small ones: the rank of the bar-and-joint rigidity
 * matrix (L. Asimow, B. Roth, "The rigidity of graphs", Trans. AMS 245 (1978)) by a dense SVD from
 * EJML. The baseline's freedoms are compared with the engine's on every plane it sees, so the bench
 * doubles as an outside check.
 *
 * <p>Depends on {@code core.analysis}, {@code core.model}, EJML and {@code java.lang.management}.
 * The clock and the memory beans are passed in.
 */
package org.bracewalk.app.bench;

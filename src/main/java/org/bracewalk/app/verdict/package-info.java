/**
 * Verdicts for people and for programs: {@link org.bracewalk.app.verdict.VerdictJson} writes the
 * JSON of {@code shared/design/check-contract.md} (its fields and names are a public contract:
 * only ever add), {@link org.bracewalk.app.verdict.VerdictText} the readable verdict with an
 * elevation picture, and {@link org.bracewalk.app.verdict.Cautions} the standing caution every
 * output carries ({@code shared/design/trade-facts.md}, restated in the project's words).
 *
 * <p>Depends on {@code core.analysis}, {@code core.model} and Jackson.
 */
package org.bracewalk.app.verdict;

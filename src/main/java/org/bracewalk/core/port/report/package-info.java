/**
 * What a report or a repair order says, as plain values: the particulars, each plane's design,
 * as-built state and analysis, the findings, the ordered repair actions, the fingerprint of the
 * records and the draft flag. The application gathers these; a renderer behind {@link
 * org.bracewalk.core.port.ReportRenderer} or {@link org.bracewalk.core.port.RepairOrderRenderer}
 * words and draws them from its templates. No wording lives here: only codes, numbers and the
 * inspector's own text.
 *
 * <p>Depends on {@code core.model} and {@code core.analysis} only.
 */
package org.bracewalk.core.port.report;

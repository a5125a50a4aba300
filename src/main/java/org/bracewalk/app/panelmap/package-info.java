/**
 * Panel maps: the plain-text picture of one brace plane that {@code bracewalk check} reads (see
 * {@code shared/design/check-contract.md}). {@link org.bracewalk.app.panelmap.PanelMapParser} turns
 * text into a {@link org.bracewalk.app.panelmap.PanelMap} with every token's line and column, so
 * any error names the file, line and column; {@link org.bracewalk.app.panelmap.PanelMapWriter}
 * writes designs and as-built states back in the same format.
 *
 * <p>Depends on {@code core.model} only.
 */
package org.bracewalk.app.panelmap;

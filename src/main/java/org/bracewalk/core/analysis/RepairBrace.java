package org.bracewalk.core.analysis;

import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.PanelRef;

/**
 * One member of a proposed repair. {@code inDesign} false marks a panel the design leaves empty: a
 * deviation from the design that needs engineering approval.
 */
public record RepairBrace(PanelRef panel, Brace brace, boolean inDesign) {}

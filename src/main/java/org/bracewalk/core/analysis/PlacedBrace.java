package org.bracewalk.core.analysis;

import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.PanelRef;

/** A member in a panel, as listed among extra braces. */
public record PlacedBrace(PanelRef panel, Brace brace) {}

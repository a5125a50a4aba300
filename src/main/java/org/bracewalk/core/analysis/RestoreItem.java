package org.bracewalk.core.analysis;

import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.PanelRef;

/**
 * A design member missing from the as-built state (or in a panel not inspected). {@code missing}
 * names only the missing member(s); {@code neededForRigidity} says it is in the minimal repair set.
 */
public record RestoreItem(PanelRef panel, Brace missing, boolean neededForRigidity) {}

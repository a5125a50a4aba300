package org.bracewalk.core.analysis;

import org.bracewalk.core.model.FrameRef;

/**
 * A design frame member missing, damaged beyond use or not inspected as built. {@code
 * neededForRigidity} says it is in the least repair set.
 */
public record RestoreFrameItem(FrameRef member, boolean neededForRigidity) {}

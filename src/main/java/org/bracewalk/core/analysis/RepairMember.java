package org.bracewalk.core.analysis;

import org.bracewalk.core.model.FrameRef;

/**
 * A frame member of a proposed repair: a design member to refit or replace. {@code inDesign} is
 * always true (a repair never places a frame member the design leaves out); kept for the contract's
 * JSON.
 */
public record RepairMember(FrameRef member, boolean inDesign) {}

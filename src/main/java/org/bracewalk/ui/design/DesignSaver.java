package org.bracewalk.ui.design;

import org.bracewalk.core.model.PlaneDesign;

/** Saves a plane's design as a new revision. */
public interface DesignSaver {
  /**
   * Saves {@code design} by {@code author}; {@code note} says what changed and who approved it (and,
   * for a design that is not rigid, that the warning was seen). Returns the saved revision's label
   * for the status line.
   */
  String save(PlaneDesign design, String author, String note);
}

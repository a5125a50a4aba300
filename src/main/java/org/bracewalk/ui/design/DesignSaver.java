package org.bracewalk.ui.design;

import org.bracewalk.core.model.PlaneRole;
import org.bracewalk.core.model.PlaneDesign;

/** Saves a plane's design as a new revision. */
public interface DesignSaver {
  /**
   * Saves {@code design} by {@code author}; {@code note} says what changed and who approved it (and,
   * for a design that is not rigid, that the warning was seen). Returns the saved revision's label
   * for the status line.
   */
  String save(PlaneDesign design, String author, String note);

  /**
   * As {@link #save(PlaneDesign, String, String)}, with the role the person chose: it is the role
   * of a new plane (a stored plane's role is fixed).
   */
  default String save(PlaneDesign design, String author, String note, PlaneRole role) {
    return save(design, author, note);
  }

  /**
   * Does on the calling (toolkit) thread what must be done there before saving — asking the person
   * anything, refusing what cannot be saved — and returns the database work, to be run on a
   * background thread, which answers the saved revision's label. By default it only defers {@link
   * #save(PlaneDesign, String, String, PlaneRole)}.
   *
   * @throws SaveDeclined when the person declined a question (nothing saved, nothing wrong)
   * @throws IllegalStateException (or another runtime exception) saying why nothing will be saved
   */
  default java.util.function.Supplier<String> prepare(PlaneDesign design, String author, String note, PlaneRole role) {
    return () -> save(design, author, note, role);
  }

  /**
   * The plane being edited as the editor should name it (its name and current revision), read
   * after each save: a design saved as a new plane goes on as an edit of that new plane. Null:
   * the title given at the start stands.
   */
  default String title() {
    return null;
  }

  /** The id of the plane being edited (after a save as a new plane, the new one); 0 when not stored. */
  default long planeId() {
    return 0;
  }

  /** The role of the plane being edited (the choice box starts there). */
  default PlaneRole role() {
    return PlaneRole.OTHER;
  }
}

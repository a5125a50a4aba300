package org.bracewalk.ui.common;

/**
 * The records-changed signal: told after a write to the record, so that what is shown (the header,
 * the screen) is read again. The shell passes it on to the screen shown; a screen reads again what
 * a change it did not make itself may have made stale.
 */
public interface RecordsChanged {
  /** Nobody listens. */
  RecordsChanged NONE = source -> { };

  /** The record has changed; {@code source} (a view model, say) made the change. Call on the JavaFX thread. */
  void changed(Object source);
}

package org.bracewalk.core.model;

import java.util.Objects;

/**
 * Small checks shared by the site records' compact constructors.
 *
 * <p>Text is kept exactly as given, never trimmed here: a record read back from the store must
 * show what the store holds, so that text edited outside the program (a blank added at the end
 * of a note) is seen, fingerprinted and reported as it is. The application trims what people
 * type before it builds the record it stores ({@code app.StoredText}), and the database refuses
 * untrimmed text on insert.
 */
final class Text {
  private Text() {}

  /** An optional text field: {@code null} becomes the empty string; otherwise kept as given. */
  static String optional(String value) {
    return value == null ? "" : value;
  }

  /**
   * A required text field: must be present and not blank; names the field when it is not. Kept
   * as given.
   */
  static String required(String value, String field) {
    Objects.requireNonNull(value, field);
    if (value.isBlank()) {
      throw new IllegalArgumentException(field + " must not be empty");
    }
    return value;
  }

  /** A stored id: 0 means "not stored yet", anything else is positive. */
  static long id(long id, String field) {
    if (id < 0) {
      throw new IllegalArgumentException(field + " must be 0 (new) or positive, got " + id);
    }
    return id;
  }

  /** A reference to another stored record: positive. */
  static long ref(long id, String field) {
    if (id <= 0) {
      throw new IllegalArgumentException(field + " must name a stored record, got " + id);
    }
    return id;
  }
}

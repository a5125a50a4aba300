package org.bracewalk.core.model;

import java.util.Objects;

/** Small checks shared by the site records' compact constructors. */
final class Text {
  private Text() {}

  /** An optional text field: {@code null} becomes the empty string, surrounding blanks go. */
  static String optional(String value) {
    return value == null ? "" : value.strip();
  }

  /** A required text field: must be present and not blank; names the field when it is not. */
  static String required(String value, String field) {
    Objects.requireNonNull(value, field);
    String s = value.strip();
    if (s.isEmpty()) {
      throw new IllegalArgumentException(field + " must not be empty");
    }
    return s;
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

package org.bracewalk.app.report;

import java.nio.charset.StandardCharsets;

/**
 * The canonical text of records: one {@code [type]} line per record, then one line per field in
 * a fixed order, {@code name=value}, or {@code name!} when the value is absent. Values are written
 * with backslash, newline and carriage return escaped as {@code \\}, {@code \n}, {@code \r}, so
 * every field is one line and no value can pass for another field. Encoded as UTF-8.
 */
final class Canonical {
  private final StringBuilder sb = new StringBuilder(256);

  Canonical record(String type) {
    sb.append('[').append(type).append("]\n");
    return this;
  }

  Canonical field(String name, Object value) {
    sb.append(name);
    if (value == null) {
      sb.append("!\n");
      return this;
    }
    sb.append('=');
    String s = value.toString();
    for (int i = 0; i < s.length(); i++) {
      char c = s.charAt(i);
      switch (c) {
        case '\\' -> sb.append("\\\\");
        case '\n' -> sb.append("\\n");
        case '\r' -> sb.append("\\r");
        default -> sb.append(c);
      }
    }
    sb.append('\n');
    return this;
  }

  byte[] bytes() {
    return sb.toString().getBytes(StandardCharsets.UTF_8);
  }

  @Override
  public String toString() {
    return sb.toString();
  }
}

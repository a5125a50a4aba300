package org.bracewalk.app.check;

import java.util.Objects;

/** The text of one panel map and the name its messages use (the file name as given). */
public record MapSource(String name, String text) {
  public MapSource {
    Objects.requireNonNull(name, "name");
    Objects.requireNonNull(text, "text");
  }
}

package org.bracewalk.ui.common;

import java.util.List;

/**
 * One line of the keyboard help: the keys and what they do. Each screen lists its own; the help
 * overlay and the README show them.
 *
 * @param keys as written on the keyboard, e.g. {@code "S or Space"}
 * @param action what happens
 */
public record KeyHelp(String keys, String action) {

  /** A titled group of key lines. */
  public record Section(String title, List<KeyHelp> lines) {
    public Section {
      lines = List.copyOf(lines);
    }
  }

  public static KeyHelp of(String keys, String action) {
    return new KeyHelp(keys, action);
  }
}

package org.bracewalk.ui.common;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.TreeSet;

/** Writes sets of lift or bay numbers as short ranges: {@code 1, 3–5, 8}. */
public final class Ranges {
  private Ranges() {}

  /** {@code "lift 3"}, {@code "lifts 3–5"}, {@code "bays 1, 4–6"}; empty gives an empty string. */
  public static String named(String singular, String plural, Collection<Integer> numbers) {
    TreeSet<Integer> sorted = new TreeSet<>(numbers);
    if (sorted.isEmpty()) {
      return "";
    }
    String list = compact(sorted);
    return (sorted.size() == 1 ? singular : plural) + " " + list;
  }

  /** {@code 1, 3–5, 8} (en dash between the ends of a run of three or more; two stay apart). */
  public static String compact(Collection<Integer> numbers) {
    TreeSet<Integer> sorted = new TreeSet<>(numbers);
    List<String> parts = new ArrayList<>();
    Integer start = null;
    Integer prev = null;
    for (int x : sorted) {
      if (start == null) {
        start = x;
      } else if (x != prev + 1) {
        parts.add(run(start, prev));
        start = x;
      }
      prev = x;
    }
    if (start != null) {
      parts.add(run(start, prev));
    }
    return String.join(", ", parts);
  }

  private static String run(int a, int b) {
    if (a == b) {
      return Integer.toString(a);
    }
    if (b == a + 1) {
      return a + ", " + b;
    }
    return a + "\u2013" + b;
  }
}

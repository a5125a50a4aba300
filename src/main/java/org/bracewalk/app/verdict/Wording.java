package org.bracewalk.app.verdict;

import java.util.ArrayList;
import java.util.List;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.PanelRef;

/** Small pieces of wording shared by the text verdict and the cautions. */
final class Wording {
  private Wording() {}

  /** {@code lift 3}, {@code lifts 1, 2, 4}, {@code bays 1-5}, {@code no bays}. */
  static String numbered(String noun, List<Integer> sorted) {
    if (sorted.isEmpty()) {
      return "no " + noun + "s";
    }
    return (sorted.size() == 1 ? noun : noun + "s") + " " + ranges(sorted);
  }

  /** {@code 1-5}, {@code 1, 2, 4}, {@code 1-3, 7}: runs of three or more become ranges. */
  static String ranges(List<Integer> sorted) {
    List<String> parts = new ArrayList<>();
    int i = 0;
    while (i < sorted.size()) {
      int j = i;
      while (j + 1 < sorted.size() && sorted.get(j + 1) == sorted.get(j) + 1) {
        j++;
      }
      if (j - i >= 2) {
        parts.add(sorted.get(i) + "-" + sorted.get(j));
      } else {
        for (int k = i; k <= j; k++) {
          parts.add(String.valueOf(sorted.get(k)));
        }
      }
      i = j + 1;
    }
    return String.join(", ", parts);
  }

  /** {@code lift 3 bay 2}. */
  static String panel(PanelRef p) {
    return "lift " + p.lift() + " bay " + p.bay();
  }

  /** {@code / rigid}, {@code ~X tension-only}. */
  static String member(Brace b) {
    return b.token() + " " + b.kind().label();
  }

  static String plural(int n, String one, String many) {
    return n + " " + (n == 1 ? one : many);
  }
}

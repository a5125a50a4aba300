package org.bracewalk.report;

import java.time.Instant;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import org.bracewalk.core.analysis.Freedom;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Joint;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneRole;
import org.bracewalk.core.port.report.LengthUnits;
import org.bracewalk.core.port.report.ReportHeader;

/** The templates bound to one document's units and time zone: words, lengths, dates. */
final class Wording {
  private static final double METRES_PER_INCH = 0.0254;
  private static final int LIST_LIMIT = 40;

  private final Templates t;
  private final ReportHeader header;

  Wording(Templates t, ReportHeader header) {
    this.t = t;
    this.header = header;
  }

  String text(String key) {
    return t.text(key);
  }

  String format(String key, Object... namesAndValues) {
    return t.format(key, namesAndValues);
  }

  /** A length in metres shown in the site's units (feet and inches to the nearest tenth). */
  String length(double metres) {
    if (header.units() == LengthUnits.METRIC) {
      return t.format("unit.length.metric", "metres", t.number("format.metres", metres));
    }
    double inchesTotal = Math.round(metres / METRES_PER_INCH * 10.0) / 10.0;
    long feet = (long) Math.floor(inchesTotal / 12.0);
    double inches = inchesTotal - feet * 12.0;
    if (inches >= 11.95) {
      feet++;
      inches = 0;
    }
    return t.format(
        "unit.length.imperial", "feet", feet, "inches", t.number("format.inches", inches));
  }

  /** A small measured length (a bow, a gauge) given in millimetres. */
  String small(double mm) {
    String metric = t.number("format.millimetres", mm);
    if (header.units() == LengthUnits.METRIC) {
      return t.format("unit.bow.metric", "mm", metric);
    }
    return t.format(
        "unit.bow.imperial",
        "inches",
        t.number("format.metres", mm / 1000.0 / METRES_PER_INCH),
        "mm",
        metric);
  }

  /** The scale bar's label for {@code n} display units (metres or feet). */
  String scaleBar(double n) {
    String key = header.units() == LengthUnits.METRIC ? "unit.scalebar.metric" : "unit.scalebar.imperial";
    return t.format(key, "n", n == Math.rint(n) ? String.valueOf((long) n) : String.valueOf(n));
  }

  /** Metres in one display unit (1 for metric, a foot for imperial). */
  double metresPerDisplayUnit() {
    return header.units() == LengthUnits.METRIC ? 1.0 : 12 * METRES_PER_INCH;
  }

  String date(LocalDate d) {
    return t.date(d);
  }

  String dateTime(Instant at) {
    return t.dateTime(at, header.zone());
  }

  String panel(PanelRef p) {
    return t.format("panel.short", "lift", p.lift(), "bay", p.bay());
  }

  /** Panels in short form, cut after a reasonable number with "and N more". */
  String panels(List<PanelRef> panels) {
    if (panels.isEmpty()) {
      return t.text("list.none");
    }
    StringBuilder sb = new StringBuilder();
    int shown = Math.min(panels.size(), LIST_LIMIT);
    for (int i = 0; i < shown; i++) {
      if (i > 0) {
        sb.append(", ");
      }
      sb.append(panel(panels.get(i)));
    }
    if (panels.size() > shown) {
      sb.append(", ").append(t.format("list.and-more", "n", panels.size() - shown));
    }
    return sb.toString();
  }

  /** Numbers as a compact list: 1-3, 5. */
  static String ranges(List<Integer> numbers) {
    if (numbers.isEmpty()) {
      return "-";
    }
    List<Integer> sorted = numbers.stream().sorted().distinct().toList();
    StringBuilder sb = new StringBuilder();
    int start = sorted.get(0);
    int prev = start;
    for (int i = 1; i <= sorted.size(); i++) {
      Integer cur = i < sorted.size() ? sorted.get(i) : null;
      if (cur != null && cur == prev + 1) {
        prev = cur;
        continue;
      }
      if (sb.length() > 0) {
        sb.append(", ");
      }
      sb.append(start == prev ? String.valueOf(start) : start + "-" + prev);
      if (cur != null) {
        start = cur;
        prev = cur;
      }
    }
    return sb.toString();
  }

  /**
   * Numbers as plain English: runs of three or more as a range, the last joined with "and"
   * ({@code 1, 3-5 and 8}; {@code 1 and 2}; {@code 4}); the joining word from the templates.
   */
  String series(List<Integer> numbers) {
    List<Integer> sorted = numbers.stream().sorted().distinct().toList();
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
    if (parts.isEmpty()) {
      return t.text("list.none");
    }
    if (parts.size() == 1) {
      return parts.get(0);
    }
    return t.format("words.series", "first", String.join(", ", parts.subList(0, parts.size() - 1)),
        "last", parts.get(parts.size() - 1));
  }

  /**
   * Lifts, bays, levels, lines or actions by number in plain English, singular or plural: {@code
   * lift 3}, {@code lifts 3-5}, {@code action 2}; for lifts and bays {@code every lift} / {@code
   * every bay} when the numbers are empty or are all {@code every} of them.
   *
   * @param noun {@code lift}, {@code bay}, {@code level}, {@code line} or {@code action}
   * @param every how many there are in all (lifts or bays of the plane); 0 when not counted
   */
  String numbered(String noun, List<Integer> numbers, int every) {
    List<Integer> sorted = numbers.stream().sorted().distinct().toList();
    boolean all = every > 0 && (sorted.isEmpty()
        || (sorted.size() == every && sorted.get(0) == 1 && sorted.get(every - 1) == every));
    if (all) {
      return t.text("words." + noun + ".every");
    }
    if (sorted.isEmpty()) {
      return t.text("list.none");
    }
    return t.format("words." + noun + (sorted.size() == 1 ? ".one" : ".many"), "n", series(sorted));
  }

  /**
   * A count with its noun, singular or plural ({@code 1 action}, {@code 5 actions}); where the
   * templates have a {@code .none} form ({@code none is needed at once}) zero takes it.
   */
  String count(String noun, long n) {
    if (n == 0 && t.has("count." + noun + ".none")) {
      return t.text("count." + noun + ".none");
    }
    return t.format("count." + noun + (n == 1 ? ".one" : ".many"), "n", n);
  }

  /** The {@code .one} or {@code .many} form of {@code key} as {@code n} is 1 or not. */
  String plural(String key, long n, Object... namesAndValues) {
    return t.format(key + (n == 1 ? ".one" : ".many"), namesAndValues);
  }

  String member(Brace b) {
    if (b == null) {
      return t.text("member.none");
    }
    return t.text("member." + b.diagonal().name().toLowerCase(java.util.Locale.ROOT) + "." + b.kind().label());
  }

  /**
   * The frame vocabulary of a plane: scaffold words (ledger, standard) unless the structure is
   * racking (beam, upright; an upright frame's horizontals are horizontals).
   */
  String frameWords(PlaneRole role) {
    if (!header.racking()) {
      return "scaffold";
    }
    return role == PlaneRole.UPRIGHT_FRAME ? "upright-frame" : "racking";
  }

  /** "ledger at level 3, bay 2", "upright of lift 2 on line 1", in the plane's vocabulary. */
  String frameMember(FrameRef f, PlaneRole role) {
    String word = t.text("frame." + f.type().label() + "." + frameWords(role));
    return f.isLedger()
        ? t.format("frame.place.ledger", "member", word, "level", f.first(), "bay", f.second())
        : t.format("frame.place.standard", "member", word, "lift", f.first(), "line", f.second());
  }

  /** Frame members in words, cut after a reasonable number with "and N more". */
  String frameMembers(List<FrameRef> members, PlaneRole role) {
    return cut(members.stream().map(f -> frameMember(f, role)).toList());
  }

  String joint(Joint j) {
    return t.format("frame.joint", "level", j.level(), "line", j.line());
  }

  /** Joints in words ("level 1, line 0; level 2, line 3"), cut after a reasonable number. */
  String joints(List<Joint> joints) {
    if (joints.isEmpty()) {
      return t.text("list.none");
    }
    List<String> words = joints.stream().map(this::joint).toList();
    int shown = Math.min(words.size(), LIST_LIMIT);
    String out = String.join("; ", words.subList(0, shown));
    return words.size() > shown
        ? out + "; " + t.format("list.and-more", "n", words.size() - shown) : out;
  }

  /** The members a freedom names (frame members, then diagonals), joined with "and". */
  String freedomMembers(Freedom f, PlaneRole role) {
    List<String> parts = new ArrayList<>();
    f.members().forEach(m -> parts.add(frameMember(m, role)));
    f.diagonals().forEach(p -> parts.add(t.format("frame.diagonal", "panel", panel(p))));
    if (parts.isEmpty()) {
      return t.text("list.none");
    }
    String out = parts.get(0);
    for (int i = 1; i < parts.size(); i++) {
      out = t.format("frame.and", "first", out, "second", parts.get(i));
    }
    return out;
  }

  private String cut(List<String> words) {
    if (words.isEmpty()) {
      return t.text("list.none");
    }
    int shown = Math.min(words.size(), LIST_LIMIT);
    String out = String.join(", ", words.subList(0, shown));
    return words.size() > shown
        ? out + ", " + t.format("list.and-more", "n", words.size() - shown) : out;
  }

  /** A code's wording ({@code prefix.code}); a code the file lacks is an error naming the key. */
  String code(String prefix, String code) {
    return t.text(prefix + "." + code);
  }
}

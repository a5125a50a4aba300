package org.bracewalk.app.panelmap;

import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Pattern;
import org.bracewalk.app.panelmap.PanelMap.FrameLine;
import org.bracewalk.app.panelmap.PanelMap.GridRow;
import org.bracewalk.app.panelmap.PanelMap.HeaderEntry;
import org.bracewalk.app.text.TextInput;
import org.bracewalk.app.text.TextInputException;
import org.bracewalk.core.model.FrameMemberType;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Support;

/**
 * Reads the panel-map format of {@code shared/design/check-contract.md}: optional {@code key:
 * value} header lines, then one line per lift, <b>top lift first</b>, one whitespace-separated
 * token per bay, bay 1 on the left, then optional frame lines ({@code ledger LEVEL BAY STATE},
 * {@code standard LIFT LINE STATE}, {@code beam} and {@code upright} for them); {@code #} starts a
 * comment line, blank lines are skipped.
 * Lines end in LF, CRLF or a bare CR alike; other separators (VT, FF, NUL, U+2028, U+2029) are
 * refused where they stand ({@link TextInput}).
 *
 * <p>Every problem is a {@link PanelMapException} naming the file, the 1-based line and column, and
 * what to do. Stateless; safe to share.
 */
public final class PanelMapParser {

  /** The header keys a panel map may use. */
  public static final List<String> HEADER_KEYS = List.of("support", "widths", "heights");

  /**
   * The bounds of a panel-map file: 64 MiB (a 1000 x 1000 map is about 2 MB) and 100,000
   * characters a line (over 30,000 bays of the widest token).
   */
  public static final TextInput.Limits LIMITS =
      new TextInput.Limits("a panel map", 64L * 1024 * 1024, 100_000);

  /**
   * The most panels a map may hold: 4,000,000 (2000 x 2000), four times the largest plane the
   * engine is measured on (1000 x 1000, a few hundred milliseconds). Counted as grid lines are read,
   * so a huge map is refused at the line that passes the limit instead of filling the memory.
   */
  public static final long MAX_PANELS = 4_000_000;

  private static final Pattern NUMBER = Pattern.compile("[+-]?(\\d+(\\.\\d*)?|\\.\\d+)([eE][+-]?\\d+)?");
  private static final Pattern WORD = Pattern.compile("[A-Za-z][A-Za-z_-]+");
  private static final Map<String, String> LOOK_ALIKES =
      Map.of("x", "X", "~x", "~X", "O", "o", "0", "o", "|", "/ or \\", "-", ".");

  /** Parses {@code text}, read from the file {@code source}, as a map of the given kind. */
  public PanelMap parse(String source, String text, MapKind kind) {
    return new Run(source, kind).parse(text);
  }

  private record Word(String text, int column) {}

  /** The state of one parse: kept off the parser so the parser stays shareable. */
  private static final class Run {
    private final String source;
    private final MapKind kind;
    private final Map<String, HeaderEntry> header = new HashMap<>();
    private final List<GridRow> rowsTopFirst = new ArrayList<>();
    private Support support;
    private List<Double> widths;
    private List<Double> heights;
    private List<Word> widthWords;
    private List<Word> heightWords;

    Run(String source, MapKind kind) {
      this.source = source;
      this.kind = kind;
    }

    PanelMap parse(String text) {
      List<TextInput.Line> lines;
      try {
        lines = TextInput.lines(source, text, LIMITS);
      } catch (TextInputException e) {
        throw PanelMapException.of(e);
      }
      int lastLine = lines.size();
      int lastLength = 0;
      for (int i = 0; i < lines.size(); i++) {
        String line = lines.get(i).text();
        if (i == 0 && line.startsWith("\uFEFF")) {
          line = " " + line.substring(1); // keep the columns of the rest of the line
        }
        int number = lines.get(i).number();
        String trimmed = line.strip();
        if (!trimmed.isEmpty()) {
          lastLine = number;
          lastLength = line.length();
        }
        if (trimmed.isEmpty() || trimmed.startsWith("#")) {
          continue;
        }
        if (looksLikeHeader(line)) {
          headerLine(number, line);
        } else if (looksLikeFrameLine(line)) {
          frameLine(number, line);
        } else {
          gridLine(number, line);
        }
      }
      if (rowsTopFirst.isEmpty()) {
        throw error(
            Math.max(1, lastLine),
            lastLength + 1,
            "the map has no grid: after the header, give one line of panel tokens per lift, top"
                + " lift first, one token per bay (. / \\ X ~/ ~\\ ~X"
                + (kind == MapKind.DESIGN ? " o" : " ?")
                + ")");
      }
      int lifts = rowsTopFirst.size();
      int bays = rowsTopFirst.get(0).tokens().size();
      checkCount("widths", widths, widthWords, bays, "bays", "one width in metres per bay, bay 1 first");
      checkCount(
          "heights", heights, heightWords, lifts, "lifts", "one height in metres per lift, bottom lift first");
      List<GridRow> bottomFirst = new ArrayList<>(rowsTopFirst);
      Collections.reverse(bottomFirst);
      return new PanelMap(source, kind, support, widths, heights, bottomFirst, header, frameLines);
    }

    private final List<FrameLine> frameLines = new ArrayList<>();
    private final Map<FrameRef, FrameLine> frameSeen = new HashMap<>();

    /**
     * {@code ledger LEVEL BAY STATE} or {@code standard LIFT LINE STATE} ({@code beam}, {@code
     * upright} for them): after the last grid row, inside the plane, each member once, a state of
     * this kind of map.
     */
    private void frameLine(int number, String line) {
      List<Word> words = words(line, 0);
      Word first = words.get(0);
      if (rowsTopFirst.isEmpty()) {
        throw error(number, first.column(), "frame line before the grid: frame lines ("
            + first.text() + " ...) come after the last grid row; move it below the grid");
      }
      FrameMemberType type = memberType(first.text());
      if (type == null) {
        throw error(number, first.column(), "unknown frame member '" + first.text() + "': a frame"
            + " line starts with ledger or standard (beam or upright for racking), e.g. 'ledger 1 2 "
            + (kind == MapKind.DESIGN ? "none" : "missing") + "'");
      }
      boolean ledger = type == FrameMemberType.LEDGER;
      String shape = ledger ? "ledger LEVEL BAY STATE" : "standard LIFT LINE STATE";
      if (words.size() < 4) {
        Word last = words.get(words.size() - 1);
        String missing = words.size() == 1 ? (ledger ? "LEVEL" : "LIFT")
            : words.size() == 2 ? (ledger ? "BAY" : "LINE") : "STATE";
        throw error(number, last.column() + last.text().length(), "too few fields: a frame line is '"
            + shape + "' and " + missing + " is missing here; states: " + FrameState.choices(kind));
      }
      if (words.size() > 4) {
        throw error(number, words.get(4).column(), "too many fields: a frame line is '" + shape
            + "'; remove '" + words.get(4).text() + "' and what follows (a comment goes on its own"
            + " line, starting with #)");
      }
      int lifts = rowsTopFirst.size();
      int bays = rowsTopFirst.get(0).tokens().size();
      int a = frameNumber(number, words.get(1), ledger ? "LEVEL" : "LIFT", ledger ? 0 : 1, lifts,
          ledger ? "the levels are 0 (the base) to " + lifts + " (the top of lift " + lifts + ")"
              : "the lifts are 1 (the bottom) to " + lifts);
      int b = frameNumber(number, words.get(2), ledger ? "BAY" : "LINE", ledger ? 1 : 0, bays,
          ledger ? "the bays are 1 (the left) to " + bays
              : "the lines are 0 (the left end) to " + bays + " (the right side of bay " + bays + ")");
      Word stateWord = words.get(3);
      FrameState state = FrameState.fromText(stateWord.text());
      if (state == null) {
        throw error(number, stateWord.column(), "unknown state '" + stateWord.text() + "' of a "
            + type.label() + ": in " + (kind == MapKind.DESIGN ? "a design" : "an as-built")
            + " map use " + FrameState.choices(kind));
      }
      if (state.kind() != kind) {
        throw error(number, stateWord.column(), kind == MapKind.DESIGN
            ? "'" + stateWord.text() + "' is an as-built state: a design map says only which"
                + " members the design leaves out, with 'none' (a member not listed is in the design)"
            : "'" + stateWord.text() + "' is a design state: an as-built map records what is there,"
                + " with " + FrameState.choices(kind) + " (a member not listed is sound)");
      }
      FrameRef member = new FrameRef(type, a, b);
      FrameLine earlier = frameSeen.get(member);
      if (earlier != null) {
        throw error(number, first.column(), "the " + member + " is given twice (first on line "
            + earlier.line() + "): keep one of the two lines");
      }
      FrameLine f = new FrameLine(number, first.column(), member, state);
      frameSeen.put(member, f);
      frameLines.add(f);
    }

    private int frameNumber(int number, Word w, String field, int low, int high, String range) {
      if (!w.text().matches("[+-]?\\d{1,9}")) {
        throw error(number, w.column(), field + " must be a whole number, got '" + w.text() + "': "
            + range);
      }
      int v = Integer.parseInt(w.text());
      if (v < low || v > high) {
        throw error(number, w.column(), field + " " + v + " is outside the plane: " + range);
      }
      return v;
    }

    private void headerLine(int number, String line) {
      int keyColumn = firstNonBlank(line) + 1;
      if (!rowsTopFirst.isEmpty()) {
        throw error(
            number,
            keyColumn,
            "header line after the grid has started (grid from line "
                + rowsTopFirst.get(0).line()
                + "): move '"
                + line.strip()
                + "' above the first grid line");
      }
      int colon = line.indexOf(':');
      String rawKey = line.substring(0, colon).strip();
      String key = rawKey.toLowerCase(Locale.ROOT);
      if (!HEADER_KEYS.contains(key)) {
        throw error(
            number,
            keyColumn,
            "unknown header key '"
                + rawKey
                + "': the known keys are "
                + String.join(", ", HEADER_KEYS)
                + " (write 'key: value'); remove the line or correct the key");
      }
      HeaderEntry earlier = header.get(key);
      if (earlier != null) {
        throw error(
            number,
            keyColumn,
            "'" + key + "' is given twice (first on line " + earlier.line() + "): keep one of them");
      }
      List<Word> words = words(line, colon + 1);
      int valueColumn = words.isEmpty() ? colon + 2 : words.get(0).column();
      header.put(key, new HeaderEntry(key, number, valueColumn));
      switch (key) {
        case "support" -> support = supportValue(number, valueColumn, words);
        case "widths" -> {
          widths = lengths(number, valueColumn, words, "widths", "one width in metres per bay, e.g. 2.4");
          widthWords = words;
        }
        default -> {
          heights =
              lengths(number, valueColumn, words, "heights", "one height in metres per lift, e.g. 2.0");
          heightWords = words;
        }
      }
    }

    private Support supportValue(int number, int valueColumn, List<Word> words) {
      String value = words.isEmpty() ? "" : words.get(0).text();
      Support s = Support.fromLabel(value);
      if (s == null || words.size() > 1) {
        String got =
            words.isEmpty()
                ? "nothing"
                : "'" + String.join(" ", words.stream().map(Word::text).toList()) + "'";
        throw error(
            number,
            valueColumn,
            "support must be pinned-base (every base joint held) or free (nothing holds the plane),"
                + " got "
                + got);
      }
      return s;
    }

    private List<Double> lengths(int number, int valueColumn, List<Word> words, String key, String hint) {
      if (words.isEmpty()) {
        throw error(number, valueColumn, key + ": no values: give " + hint + ", or remove the line");
      }
      List<Double> values = new ArrayList<>();
      for (Word w : words) {
        String t = w.text();
        if (!NUMBER.matcher(t).matches()) {
          String comma = t.matches("[+-]?\\d+,\\d+") ? " (use a point for decimals)" : "";
          throw error(number, w.column(), key + ": '" + t + "' is not a number" + comma + ": give " + hint);
        }
        double v = Double.parseDouble(t);
        if (!(v > 0) || Double.isInfinite(v)) {
          throw error(
              number,
              w.column(),
              key + ": every value must be a positive length in metres, got " + t + ": give " + hint);
        }
        values.add(v);
      }
      return values;
    }

    private void checkCount(
        String key, List<Double> values, List<Word> words, int wanted, String what, String hint) {
      if (values == null || values.size() == wanted) {
        return;
      }
      HeaderEntry entry = header.get(key);
      int column =
          values.size() > wanted
              ? words.get(wanted).column()
              : words.get(words.size() - 1).column() + words.get(words.size() - 1).text().length();
      throw error(
          entry.line(),
          column,
          key
              + ": "
              + values.size()
              + (values.size() == 1 ? " value" : " values")
              + " for "
              + wanted
              + " "
              + what
              + " in the grid: give "
              + hint);
    }

    private long panels;

    private void gridLine(int number, String line) {
      List<Word> words = words(line, 0);
      if (!frameLines.isEmpty()) {
        FrameLine f = frameLines.get(0);
        throw error(f.line(), f.column(), "frame line between grid rows (the grid goes on at line "
            + number + "): frame lines come after the last grid row; move it below the grid");
      }
      List<PanelToken> tokens = new ArrayList<>(words.size());
      List<Integer> columns = new ArrayList<>(words.size());
      for (int k = 0; k < words.size(); k++) {
        Word w = words.get(k);
        PanelToken t = PanelToken.fromText(w.text());
        if (t == null) {
          throw error(number, w.column(), unknownToken(w.text(), k == 0 && rowsTopFirst.isEmpty()));
        }
        if (!kind.allows(t)) {
          throw error(number, w.column(), forbidden(t));
        }
        tokens.add(t);
        columns.add(w.column());
      }
      if (!rowsTopFirst.isEmpty()) {
        GridRow first = rowsTopFirst.get(0);
        int bays = first.tokens().size();
        if (tokens.size() != bays) {
          int column =
              tokens.size() > bays
                  ? words.get(bays).column()
                  : words.get(words.size() - 1).column() + words.get(words.size() - 1).text().length();
          throw error(
              number,
              column,
              "this grid line has "
                  + tokens.size()
                  + (tokens.size() == 1 ? " panel" : " panels")
                  + " but the first grid line (line "
                  + first.line()
                  + ") has "
                  + bays
                  + ": give every lift one token per bay (use . for a panel with no diagonal)");
        }
      }
      panels += tokens.size();
      if (panels > MAX_PANELS) {
        throw error(number, 1, "the map holds more than " + MAX_PANELS + " panels by this line,"
            + " the most a panel map may hold: check the file (a plane of 2000 lifts x 2000 bays"
            + " is the largest)");
      }
      rowsTopFirst.add(new GridRow(number, tokens, columns));
    }

    private String unknownToken(String text, boolean couldBeHeader) {
      StringBuilder sb = new StringBuilder("unknown panel token '").append(text).append("'");
      String alike = LOOK_ALIKES.get(text);
      if (alike != null) {
        sb.append(" (did you mean ").append(alike).append("?)");
      } else if (couldBeHeader && WORD.matcher(text).matches()) {
        sb.append(" (a header line is written 'key: value')");
      }
      sb.append(": use . / \\ X for none or rigid diagonals, ~/ ~\\ ~X for tension-only members");
      sb.append(kind == MapKind.DESIGN ? ", o for an opening" : ", ? for a panel not inspected");
      return sb.toString();
    }

    private String forbidden(PanelToken t) {
      if (t == PanelToken.UNKNOWN) {
        return "'?' (not inspected) belongs in as-built maps only: a design says what should be"
            + " there; use . for a panel with no diagonal";
      }
      return "'o' (opening) belongs in design maps only: an as-built map records what is there;"
          + " use . for a panel with no diagonal or ? for one not inspected";
    }

    private PanelMapException error(int line, int column, String problem) {
      return new PanelMapException(source, line, column, problem);
    }
  }

  /** The member word of a frame line, in any case, or {@code null}. */
  private static FrameMemberType memberType(String word) {
    String w = word.toLowerCase(Locale.ROOT);
    for (FrameMemberType t : FrameMemberType.values()) {
      if (t.label().equals(w) || t.rackingLabel().equals(w)) {
        return t;
      }
    }
    return null;
  }

  /**
   * A frame line starts with a member word ({@code ledger}, {@code beam}, {@code standard}, {@code
   * upright}), or with another word of letters followed by a whole number (a misspelt member word,
   * told as such rather than as an unknown panel token).
   */
  private static boolean looksLikeFrameLine(String line) {
    List<Word> words = words(line, 0);
    String first = words.get(0).text();
    if (memberType(first) != null) {
      return true;
    }
    return first.length() > 1 && first.matches("[A-Za-z]+") && words.size() > 1
        && words.get(1).text().matches("[+-]?\\d+");
  }

  /** A header line's first word holds the colon: {@code support: free}, {@code widths:2.4 2.4}. */
  private static boolean looksLikeHeader(String line) {
    int start = firstNonBlank(line);
    int colon = line.indexOf(':', start);
    if (colon < 0) {
      return false;
    }
    for (int i = start; i < colon; i++) {
      if (Character.isWhitespace(line.charAt(i))) {
        return false;
      }
    }
    return true;
  }

  private static int firstNonBlank(String line) {
    for (int i = 0; i < line.length(); i++) {
      if (!Character.isWhitespace(line.charAt(i))) {
        return i;
      }
    }
    return line.length();
  }

  /** The whitespace-separated words of {@code line} from index {@code from}, with 1-based columns. */
  private static List<Word> words(String line, int from) {
    List<Word> out = new ArrayList<>();
    int i = from;
    while (i < line.length()) {
      while (i < line.length() && Character.isWhitespace(line.charAt(i))) {
        i++;
      }
      int start = i;
      while (i < line.length() && !Character.isWhitespace(line.charAt(i))) {
        i++;
      }
      if (i > start) {
        out.add(new Word(line.substring(start, i), start + 1));
      }
    }
    return out;
  }
}

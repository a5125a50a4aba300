package org.bracewalk.app.sitefile;

import java.time.DateTimeException;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.function.Function;
import org.bracewalk.app.text.TextInput;
import org.bracewalk.app.text.TextInputException;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.DefectType;
import org.bracewalk.core.model.FrameMemberType;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneGrid;

/**
 * The CSV of one inspection's observations (RFC 4180: comma-separated, double quotes around a
 * value holding a comma, quote or line break, quotes doubled; UTF-8; header row first). Columns,
 * in the order written (README.md documents them):
 *
 * <pre>
 * plane, lift, bay, state, member, bow_mm, gauge_length_mm, defect, note, recorded_at,
 * recorded_by, supersedes_row, correction_reason[, frame, level, line]
 * </pre>
 *
 * The last three are written only when a row records a frame member: {@code frame} is {@code
 * ledger} or {@code standard} ({@code beam} and {@code upright} are read too), a ledger is named
 * by {@code level} (0..lifts) and {@code bay}, a standard by {@code lift} and {@code line}
 * (0..bays); a row of a panel's diagonals leaves {@code frame}, {@code level} and {@code line}
 * empty. On reading, {@code plane} and {@code state} are required, and {@code lift} and {@code
 * bay} unless the file has a {@code frame} column; the others optional and in any order; an
 * unknown column is an error. {@code supersedes_row} is the 1-based data row (header not counted)
 * of an earlier row of the same file that this row corrects.
 */
public final class ObservationCsv {
  /** The columns in the order written. */
  public static final List<String> COLUMNS =
      List.of("plane", "lift", "bay", "state", "member", "bow_mm", "gauge_length_mm", "defect",
          "note", "recorded_at", "recorded_by", "supersedes_row", "correction_reason");

  /** The columns naming a frame member, written after {@link #COLUMNS} when a row has one. */
  public static final List<String> FRAME_COLUMNS = List.of("frame", "level", "line");

  private static final List<String> ALL_COLUMNS = java.util.stream.Stream.concat(
      COLUMNS.stream(), FRAME_COLUMNS.stream()).toList();

  private static final Set<String> REQUIRED = Set.of("plane", "state");

  /**
   * The bounds of an observation CSV: 64 MiB (a 5,000-row file is about half a megabyte) and
   * 100,000 characters a line.
   */
  public static final TextInput.Limits LIMITS =
      new TextInput.Limits("an observation CSV", 64L * 1024 * 1024, 100_000);

  private ObservationCsv() {}

  /**
   * One row.
   *
   * @param line the file line the row starts on (0 for rows made in memory)
   * @param recordedAt {@code null} when the column is empty: the time of recording is used
   * @param supersedesRow 1-based data row of the corrected row, or {@code null}
   */
  public record Row(
      int line,
      String plane,
      PanelRef panel,
      PanelState state,
      Brace member,
      Double bowMm,
      Integer gaugeLengthMm,
      DefectType defect,
      String note,
      Instant recordedAt,
      String recordedBy,
      Integer supersedesRow,
      String correctionReason,
      FrameRef frameMember) {

    /** A row of one panel's diagonals. */
    public Row(int line, String plane, PanelRef panel, PanelState state, Brace member,
        Double bowMm, Integer gaugeLengthMm, DefectType defect, String note, Instant recordedAt,
        String recordedBy, Integer supersedesRow, String correctionReason) {
      this(line, plane, panel, state, member, bowMm, gaugeLengthMm, defect, note, recordedAt,
          recordedBy, supersedesRow, correctionReason, null);
    }
  }

  /** The CSV text of the rows, header first, each line ending in a line feed. */
  public static String write(List<Row> rows) {
    boolean frame = rows.stream().anyMatch(r -> r.frameMember() != null);
    StringBuilder b = new StringBuilder(String.join(",", frame ? ALL_COLUMNS : COLUMNS))
        .append('\n');
    for (Row r : rows) {
      List<String> v = new ArrayList<>();
      FrameRef f = r.frameMember();
      v.add(r.plane());
      if (f == null) {
        v.add(String.valueOf(r.panel().lift()));
        v.add(String.valueOf(r.panel().bay()));
      } else {
        v.add(f.isLedger() ? "" : String.valueOf(f.first()));
        v.add(f.isLedger() ? String.valueOf(f.second()) : "");
      }
      v.add(r.state().label());
      v.add(r.member() == null ? "" : r.member().token());
      v.add(r.bowMm() == null ? "" : r.bowMm().toString());
      v.add(r.gaugeLengthMm() == null ? "" : r.gaugeLengthMm().toString());
      v.add(r.defect() == null ? "" : r.defect().label());
      v.add(r.note());
      v.add(r.recordedAt() == null ? "" : SiteFileReader.instantText(r.recordedAt()));
      v.add(r.recordedBy());
      v.add(r.supersedesRow() == null ? "" : r.supersedesRow().toString());
      v.add(r.correctionReason());
      if (frame) {
        v.add(f == null ? "" : f.type().label());
        v.add(f == null || !f.isLedger() ? "" : String.valueOf(f.first()));
        v.add(f == null || f.isLedger() ? "" : String.valueOf(f.second()));
      }
      for (int i = 0; i < v.size(); i++) {
        if (i > 0) {
          b.append(',');
        }
        b.append(quote(v.get(i)));
      }
      b.append('\n');
    }
    return b.toString();
  }

  private static String quote(String s) {
    if (s == null) {
      return "";
    }
    boolean needs = s.indexOf(',') >= 0 || s.indexOf('"') >= 0 || s.indexOf('\n') >= 0
        || s.indexOf('\r') >= 0 || !s.equals(s.strip());
    return needs ? '"' + s.replace("\"", "\"\"") + '"' : s;
  }

  /**
   * Reads and validates the rows against the planes of the inspected structure.
   *
   * @param fileName the name to show in errors
   * @param text the file's text
   * @param planes the grids of the structure's planes, by name
   * @throws FileFormatException naming file, line and column of the first problem
   */
  public static List<Row> read(String fileName, String text, Map<String, PlaneGrid> planes) {
    return read(fileName, text, planes, Map.of());
  }

  /**
   * As {@link #read(String, String, Map)}, also refusing {@code extra} on a frame member the
   * plane's design has.
   *
   * @param omittedFrame the frame members each plane's design in force leaves out, by plane name
   *     (a plane not named leaves none out)
   */
  public static List<Row> read(String fileName, String text, Map<String, PlaneGrid> planes,
      Map<String, Set<FrameRef>> omittedFrame) {
    List<Record> records = split(fileName, text);
    if (records.isEmpty()) {
      throw new FileFormatException(fileName, 1, "", "", "the file is empty; the first line names"
          + " the columns: " + String.join(",", COLUMNS));
    }
    Record header = records.get(0);
    Map<String, Integer> index = new HashMap<>();
    for (int i = 0; i < header.values.size(); i++) {
      String name = header.values.get(i).strip().toLowerCase(Locale.ROOT);
      if (i == 0 && name.startsWith("\uFEFF")) {
        name = name.substring(1);
      }
      if (!ALL_COLUMNS.contains(name)) {
        throw new FileFormatException(fileName, header.line, "header", name,
            "unknown column; the columns are " + String.join(", ", ALL_COLUMNS));
      }
      if (index.put(name, i) != null) {
        throw new FileFormatException(fileName, header.line, "header", name, "column given twice");
      }
    }
    for (String r : COLUMNS) {
      boolean required = REQUIRED.contains(r)
          || (!index.containsKey("frame") && (r.equals("lift") || r.equals("bay")));
      if (required && !index.containsKey(r)) {
        throw new FileFormatException(fileName, header.line, "header", r,
            "required column missing; plane, lift, bay and state are required (lift and bay may"
                + " be left out when a frame column names frame members)");
      }
    }
    List<Row> rows = new ArrayList<>();
    Set<Integer> corrected = new HashSet<>();
    for (int k = 1; k < records.size(); k++) {
      Record rec = records.get(k);
      if (rec.values.size() == 1 && rec.values.get(0).isBlank()) {
        continue;
      }
      if (rec.values.size() != header.values.size()) {
        throw new FileFormatException(fileName, rec.line, "", "", rec.values.size()
            + " values for " + header.values.size() + " columns");
      }
      rows.add(row(fileName, rec, rows.size() + 1, index, planes, corrected, omittedFrame));
    }
    return rows;
  }

  private static Row row(String file, Record rec, int rowNumber, Map<String, Integer> index,
      Map<String, PlaneGrid> planes, Set<Integer> corrected,
      Map<String, Set<FrameRef>> omittedFrame) {
    Cells c = new Cells(file, rec, index);
    String plane = c.text("plane");
    PlaneGrid grid = planes.get(plane);
    if (plane.isEmpty()) {
      throw c.error("plane", "missing; name the plane");
    }
    if (grid == null) {
      throw c.error("plane", "no plane named \"" + plane + "\" in the inspected structure; its"
          + " planes are " + String.join(", ", new java.util.TreeSet<>(planes.keySet())));
    }
    FrameRef frame = c.text("frame").isEmpty() ? null : frameMember(c, grid);
    if (frame == null) {
      for (String column : List.of("level", "line")) {
        if (!c.text(column).isEmpty()) {
          throw c.error(column, "a " + column + " names a frame member: give the frame column"
              + " (ledger or standard) too, or lift and bay for a panel");
        }
      }
    }
    PanelRef panel = frame != null ? null
        : PanelRef.of(c.integer("lift", 1, grid.lifts()), c.integer("bay", 1, grid.bays()));
    PanelState state = c.label("state", PanelState::fromLabel);
    if (frame != null && state == PanelState.EXTRA
        && !omittedFrame.getOrDefault(plane, Set.of()).contains(frame)) {
      throw c.error("state", "the " + frame + " is in the design of plane \"" + plane
          + "\", so it cannot be extra (there although the design leaves it out)");
    }
    Brace member = null;
    if (frame != null && !c.text("member").isEmpty()) {
      throw c.error("member", "a frame member names no diagonal found (the member column is for"
          + " a panel's diagonals)");
    }
    if (!c.text("member").isEmpty()) {
      member = SiteFileReader.braceToken(c.text("member"));
      if (member == null) {
        throw c.error("member", "unknown member \"" + c.text("member")
            + "\"; use / \\ X ~/ ~\\ or ~X");
      }
    }
    Double bow = c.text("bow_mm").isEmpty() ? null : c.decimal("bow_mm", 0, Observation.MAX_LENGTH_MM);
    Integer gauge = c.text("gauge_length_mm").isEmpty() ? null
        : c.integer("gauge_length_mm", 1, Observation.MAX_LENGTH_MM);
    DefectType defect = c.text("defect").isEmpty() ? null : c.label("defect", DefectType::fromLabel);
    Instant at = null;
    if (!c.text("recorded_at").isEmpty()) {
      try {
        at = Instant.parse(c.text("recorded_at")).truncatedTo(ChronoUnit.MILLIS);
      } catch (DateTimeException e) {
        throw c.error("recorded_at", "\"" + c.text("recorded_at")
            + "\" is not a UTC time such as 2025-03-04T07:30:00Z; leave it empty for now");
      }
    }
    Integer supersedes = null;
    if (!c.text("supersedes_row").isEmpty()) {
      supersedes = c.integer("supersedes_row", 1, Integer.MAX_VALUE);
      if (supersedes >= rowNumber) {
        throw c.error("supersedes_row", "row " + rowNumber + " can only correct an earlier row"
            + " of this file (1 to " + (rowNumber - 1) + ")");
      }
      if (!corrected.add(supersedes)) {
        throw c.error("supersedes_row", "row " + supersedes + " is already corrected; correct"
            + " the correction instead");
      }
    }
    Integer sup = supersedes;
    Brace m = member;
    String field = bow != null && gauge == null ? "gauge_length_mm"
        : state == PanelState.EXTRA && member == null && frame == null ? "member"
        : sup != null || !c.text("correction_reason").isEmpty() ? "correction_reason" : "state";
    try {
      new Observation(0, 1, 1, panel, state, m, bow, gauge, defect,
          c.text("note"), Instant.EPOCH, c.text("recorded_by"), sup == null ? null : (long) sup,
          c.text("correction_reason"), frame);
    } catch (IllegalArgumentException e) {
      throw c.error(field, e.getMessage());
    }
    return new Row(rec.line, plane, panel, state, member, bow, gauge, defect,
        c.text("note"), at, c.text("recorded_by"), supersedes, c.text("correction_reason"), frame);
  }

  /**
   * The frame member of a row: a ledger by level (0..lifts) and bay, a standard by lift and line
   * (0..bays); the columns of the other kind stay empty.
   */
  private static FrameRef frameMember(Cells c, PlaneGrid grid) {
    FrameMemberType type = c.label("frame", w -> {
      try {
        return FrameMemberType.fromWord(w.toLowerCase(Locale.ROOT));
      } catch (IllegalArgumentException e) {
        throw new IllegalArgumentException("unknown frame member \"" + w
            + "\"; use ledger (beam) or standard (upright)", e);
      }
    });
    boolean ledger = type == FrameMemberType.LEDGER;
    for (String wrong : ledger ? List.of("lift", "line") : List.of("level", "bay")) {
      if (!c.text(wrong).isEmpty()) {
        throw c.error(wrong, ledger ? "a ledger is named by level and bay; leave " + wrong
            + " empty" : "a standard is named by lift and line; leave " + wrong + " empty");
      }
    }
    return ledger
        ? FrameRef.ledger(c.integer("level", 0, grid.lifts()), c.integer("bay", 1, grid.bays()))
        : FrameRef.standard(c.integer("lift", 1, grid.lifts()), c.integer("line", 0, grid.bays()));
  }

  /** One CSV record: its values and the line it starts on. */
  private record Record(int line, List<String> values) {}

  /**
   * The records of the text. Line ends are those of every text file ({@link TextInput}): LF, CRLF
   * or a bare CR, inside a quoted value too (where each is kept as one LF); other separators and
   * controls are refused at their line and column first.
   */
  private static List<Record> split(String file, String text) {
    try {
      TextInput.checkCharacters(file, text, LIMITS);
    } catch (TextInputException e) {
      throw FileFormatException.of(e);
    }
    List<Record> out = new ArrayList<>();
    List<String> values = new ArrayList<>();
    StringBuilder cell = new StringBuilder();
    int line = 1;
    int start = 1;
    boolean quoted = false;
    boolean any = false;
    int i = 0;
    int n = text.length();
    while (i < n) {
      char ch = text.charAt(i);
      if (quoted) {
        if (ch == '"') {
          if (i + 1 < n && text.charAt(i + 1) == '"') {
            cell.append('"');
            i += 2;
            continue;
          }
          quoted = false;
        } else if (ch == '\n' || ch == '\r') {
          // a line break inside a value: LF, CRLF and CR alike, kept as one LF, so the same file
          // saved with other line ends gives the same values
          if (ch == '\r' && i + 1 < n && text.charAt(i + 1) == '\n') {
            i++;
          }
          line++;
          cell.append('\n');
        } else {
          cell.append(ch);
        }
        i++;
        continue;
      }
      if (ch == '"') {
        if (cell.length() > 0 && !cell.toString().isBlank()) {
          throw new FileFormatException(file, line, "", "", "a quote inside an unquoted value;"
              + " put the whole value in quotes and double the quote");
        }
        cell.setLength(0);
        quoted = true;
        any = true;
      } else if (ch == ',') {
        values.add(cell.toString());
        cell.setLength(0);
        any = true;
      } else if (ch == '\n' || ch == '\r') {
        if (ch == '\r' && i + 1 < n && text.charAt(i + 1) == '\n') {
          i++;
        }
        values.add(cell.toString());
        out.add(new Record(start, List.copyOf(values)));
        values.clear();
        cell.setLength(0);
        any = false;
        line++;
        start = line;
      } else {
        cell.append(ch);
        any = true;
      }
      i++;
    }
    if (quoted) {
      throw new FileFormatException(file, start, "", "", "a quoted value is not closed");
    }
    if (any || cell.length() > 0) {
      values.add(cell.toString());
      out.add(new Record(start, List.copyOf(values)));
    }
    return out;
  }

  /** The cells of one record by column name. */
  private static final class Cells {
    private final String file;
    private final Record rec;
    private final Map<String, Integer> index;

    Cells(String file, Record rec, Map<String, Integer> index) {
      this.file = file;
      this.rec = rec;
      this.index = index;
    }

    String text(String column) {
      Integer i = index.get(column);
      return i == null ? "" : rec.values.get(i).strip();
    }

    FileFormatException error(String column, String problem) {
      return new FileFormatException(file, rec.line, "column " + column, column, problem);
    }

    int integer(String column, int min, int max) {
      String s = text(column);
      int v;
      try {
        v = Integer.parseInt(s);
      } catch (NumberFormatException e) {
        throw error(column, s.isEmpty() ? "missing; give a whole number"
            : "\"" + s + "\" is not a whole number");
      }
      if (v < min || v > max) {
        throw error(column, v + " is out of range: use " + min
            + (max == Integer.MAX_VALUE ? " or more" : " to " + max));
      }
      return v;
    }

    double decimal(String column, double min, double max) {
      String s = text(column);
      double v;
      try {
        v = Double.parseDouble(s);
      } catch (NumberFormatException e) {
        throw error(column, "\"" + s + "\" is not a number (use a point for decimals: 6.5)");
      }
      if (!(v >= min && v <= max)) {
        throw error(column, s + " is out of range: use " + (int) min + " to " + (int) max);
      }
      return v;
    }

    <T> T label(String column, Function<String, T> parse) {
      String s = text(column);
      if (s.isEmpty()) {
        throw error(column, "missing");
      }
      try {
        return parse.apply(s);
      } catch (IllegalArgumentException e) {
        throw error(column, e.getMessage());
      }
    }
  }
}

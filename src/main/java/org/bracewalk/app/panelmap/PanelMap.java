package org.bracewalk.app.panelmap;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;

/**
 * A parsed panel map: its header, and its grid with the line and column of every token so that
 * later checks (an as-built map that does not fit its design, say) can still point into the file.
 *
 * @param source the file name as the user gave it
 * @param kind design or as-built
 * @param support the header's support, or {@code null} when the header states none
 * @param widths the header's bay widths in metres (bay 1 first), or {@code null} when absent
 * @param heights the header's lift heights in metres (lift 1, the bottom, first), or {@code null}
 * @param rows the grid lines, <b>lift 1 (the bottom, the last line in the text) first</b>
 * @param header where each header key stood
 * @param frameLines the frame lines after the grid, in the order of the text (none: the frame is as
 *     designed, or sound as built)
 */
public record PanelMap(
    String source,
    MapKind kind,
    Support support,
    List<Double> widths,
    List<Double> heights,
    List<GridRow> rows,
    Map<String, HeaderEntry> header,
    List<FrameLine> frameLines) {

  /** A map without frame lines. */
  public PanelMap(
      String source,
      MapKind kind,
      Support support,
      List<Double> widths,
      List<Double> heights,
      List<GridRow> rows,
      Map<String, HeaderEntry> header) {
    this(source, kind, support, widths, heights, rows, header, List.of());
  }

  /**
   * One frame line: {@code ledger LEVEL BAY STATE} or {@code standard LIFT LINE STATE} (or the
   * racking words {@code beam}, {@code upright}), with its text line and the column of its first
   * word.
   */
  public record FrameLine(int line, int column, FrameRef member, FrameState state) {
    public FrameLine {
      Objects.requireNonNull(member, "member");
      Objects.requireNonNull(state, "state");
    }
  }

  /** One grid line: the tokens of one lift, bay 1 first, with their 1-based columns. */
  public record GridRow(int line, List<PanelToken> tokens, List<Integer> columns) {
    public GridRow {
      tokens = List.copyOf(tokens);
      columns = List.copyOf(columns);
      if (tokens.size() != columns.size()) {
        throw new IllegalArgumentException("one column per token");
      }
    }
  }

  /** Where a header key stood: its line, and the column where its value starts. */
  public record HeaderEntry(String key, int line, int valueColumn) {}

  public PanelMap {
    Objects.requireNonNull(source, "source");
    Objects.requireNonNull(kind, "kind");
    widths = widths == null ? null : List.copyOf(widths);
    heights = heights == null ? null : List.copyOf(heights);
    rows = List.copyOf(rows);
    header = Map.copyOf(header);
    frameLines = List.copyOf(frameLines);
    if (rows.isEmpty()) {
      throw new IllegalArgumentException("a panel map has at least one grid line");
    }
  }

  public int lifts() {
    return rows.size();
  }

  public int bays() {
    return rows.get(0).tokens().size();
  }

  /** The header's support, if it states one. */
  public Optional<Support> statedSupport() {
    return Optional.ofNullable(support);
  }

  /** Where the header gave {@code key}, if it did. */
  public Optional<HeaderEntry> headerEntry(String key) {
    return Optional.ofNullable(header.get(key));
  }

  public GridRow row(int lift) {
    return rows.get(lift - 1);
  }

  public PanelToken tokenAt(PanelRef p) {
    return row(p.lift()).tokens().get(p.bay() - 1);
  }

  /** The text line of lift {@code lift}. */
  public int lineOf(int lift) {
    return row(lift).line();
  }

  /** The column of the token of panel {@code p}. */
  public int columnOf(PanelRef p) {
    return row(p.lift()).columns().get(p.bay() - 1);
  }

  /** The grid this map describes, held as {@code support} says. */
  public PlaneGrid grid(Support support) {
    return new PlaneGrid(lifts(), bays(), widths, heights, support);
  }

  /** This design map as a design on {@code grid} (which must have its lifts and bays). */
  public PlaneDesign toDesign(PlaneGrid grid) {
    requireKind(MapKind.DESIGN);
    requireFits(grid);
    Map<PanelRef, Brace> braces = new HashMap<>();
    Set<PanelRef> openings = new HashSet<>();
    for (PanelRef p : panels()) {
      PanelToken t = tokenAt(p);
      if (t == PanelToken.OPENING) {
        openings.add(p);
      } else if (t.brace() != null) {
        braces.put(p, t.brace());
      }
    }
    Set<FrameRef> omitted = new HashSet<>();
    for (FrameLine f : frameLines) {
      if (f.state() == FrameState.NONE) {
        omitted.add(f.member());
      }
    }
    return new PlaneDesign(grid, braces, openings, omitted);
  }

  /**
   * This as-built map as an as-built state on {@code grid} (the design's grid). A frame member not
   * listed is sound (there, even where the design leaves it out); {@code missing} and {@code
   * ineffective} members are absent, {@code ?} members not inspected.
   */
  public AsBuiltPlane toAsBuilt(PlaneGrid grid) {
    requireKind(MapKind.AS_BUILT);
    requireFits(grid);
    Map<PanelRef, Brace> members = new HashMap<>();
    Set<PanelRef> unknown = new HashSet<>();
    for (PanelRef p : panels()) {
      PanelToken t = tokenAt(p);
      if (t == PanelToken.UNKNOWN) {
        unknown.add(p);
      } else if (t.brace() != null) {
        members.put(p, t.brace());
      }
    }
    Set<FrameRef> absentFrame = new HashSet<>();
    Set<FrameRef> unknownFrame = new HashSet<>();
    for (FrameLine f : frameLines) {
      if (f.state() == FrameState.UNKNOWN) {
        unknownFrame.add(f.member());
      } else if (!f.state().effective()) {
        absentFrame.add(f.member());
      }
    }
    return new AsBuiltPlane(grid, members, unknown, absentFrame, unknownFrame);
  }

  private List<PanelRef> panels() {
    List<PanelRef> all = new ArrayList<>(lifts() * bays());
    for (int lift = 1; lift <= lifts(); lift++) {
      for (int bay = 1; bay <= bays(); bay++) {
        all.add(new PanelRef(lift, bay));
      }
    }
    return all;
  }

  private void requireKind(MapKind wanted) {
    if (kind != wanted) {
      throw new IllegalStateException(source + " is a " + kind.label() + " map, not a " + wanted.label() + " map");
    }
  }

  private void requireFits(PlaneGrid grid) {
    if (grid.lifts() != lifts() || grid.bays() != bays()) {
      throw new IllegalArgumentException(
          source + " has " + lifts() + " lifts x " + bays() + " bays, the grid "
              + grid.lifts() + " x " + grid.bays());
    }
  }
}

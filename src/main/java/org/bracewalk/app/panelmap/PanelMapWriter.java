package org.bracewalk.app.panelmap;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.TreeMap;
import java.util.function.Function;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;

/**
 * Writes designs and as-built states as panel maps, in the format {@link PanelMapParser} reads: an
 * optional comment, the full header (support, widths, heights), then the grid, top lift first, its
 * columns aligned, then one frame line per frame member that is not as designed or sound ({@code
 * ledger LEVEL BAY none} in a design; {@code missing} or {@code ?} as built: a member damaged beyond
 * use is written missing, as both count alike). Parsing the text again gives back the same design
 * or as-built state. Stateless.
 */
public final class PanelMapWriter {

  /** A design map: braces, openings as {@code o}, {@code .} elsewhere. */
  public String write(PlaneDesign design) {
    return write(design, "");
  }

  /**
   * A design map headed by {@code comment} (each of its lines becomes a {@code #} line; empty for
   * none).
   */
  public String write(PlaneDesign design, String comment) {
    StringBuilder sb = render(
        design.grid(),
        comment,
        p -> design.isOpening(p) ? PanelToken.OPENING : PanelToken.of(design.braceAt(p)));
    for (FrameRef f : design.sortedOmittedFrame()) {
      frameLine(sb, f, FrameState.NONE);
    }
    return sb.toString();
  }

  /** An as-built map: members, {@code ?} for panels not inspected, {@code .} elsewhere. */
  public String write(AsBuiltPlane asBuilt) {
    return write(asBuilt, "");
  }

  /** An as-built map headed by {@code comment}. */
  public String write(AsBuiltPlane asBuilt, String comment) {
    StringBuilder sb = render(
        asBuilt.grid(),
        comment,
        p -> asBuilt.isUninspected(p) ? PanelToken.UNKNOWN : PanelToken.of(asBuilt.memberAt(p)));
    TreeMap<FrameRef, FrameState> frame = new TreeMap<>();
    asBuilt.absentFrame().forEach(f -> frame.put(f, FrameState.MISSING));
    asBuilt.unknownFrame().forEach(f -> frame.put(f, FrameState.UNKNOWN));
    frame.forEach((f, state) -> frameLine(sb, f, state));
    return sb.toString();
  }

  /** {@code ledger 1 2 missing}: the scaffold words, the spelling stored and exported. */
  private static void frameLine(StringBuilder sb, FrameRef f, FrameState state) {
    sb.append(f.type().label()).append(' ').append(f.first()).append(' ').append(f.second())
        .append(' ').append(state.text()).append('\n');
  }

  private static StringBuilder render(
      PlaneGrid grid, String comment, Function<PanelRef, PanelToken> tokens) {
    StringBuilder sb = new StringBuilder();
    if (comment != null && !comment.isEmpty()) {
      // line breaks of any kind start a comment line; other controls, which the reader refuses,
      // are written as '?' so the map always reads back
      for (String raw : comment.split("\\R", -1)) {
        String line = raw.replaceAll("[\\x00-\\x08\\x0E-\\x1F]", "?");
        sb.append(line.isEmpty() ? "#" : "# " + line).append('\n');
      }
    }
    sb.append("support: ").append(grid.support().label()).append('\n');
    sb.append("widths: ").append(numbers(grid.bayWidths())).append('\n');
    sb.append("heights: ").append(numbers(grid.liftHeights())).append('\n');
    int[] width = new int[grid.bays() + 1];
    List<String[]> rows = new ArrayList<>();
    for (int lift = grid.lifts(); lift >= 1; lift--) {
      String[] row = new String[grid.bays() + 1];
      for (int bay = 1; bay <= grid.bays(); bay++) {
        row[bay] = tokens.apply(new PanelRef(lift, bay)).text();
        width[bay] = Math.max(width[bay], row[bay].length());
      }
      rows.add(row);
    }
    for (String[] row : rows) {
      StringBuilder line = new StringBuilder();
      for (int bay = 1; bay <= grid.bays(); bay++) {
        line.append(row[bay]);
        if (bay < grid.bays()) {
          line.append(" ".repeat(width[bay] - row[bay].length() + 1));
        }
      }
      sb.append(line).append('\n');
    }
    return sb;
  }

  /** Shortest decimal that reads back as the same double: 2.4, 1, 0.73. */
  private static String numbers(List<Double> values) {
    List<String> out = new ArrayList<>(values.size());
    for (double v : values) {
      out.add(BigDecimal.valueOf(v).stripTrailingZeros().toPlainString());
    }
    return String.join(" ", out);
  }
}

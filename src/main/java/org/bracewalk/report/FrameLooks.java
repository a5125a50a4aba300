package org.bracewalk.report;

import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.bracewalk.core.analysis.Freedom;
import org.bracewalk.core.analysis.FreedomKind;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.port.report.PlaneSection;

/**
 * How each frame member of a plane is drawn: only members that differ from "there, as designed"
 * are listed, so a plane whose frame is whole draws its grid as plain lines.
 */
final class FrameLooks {
  /** The drawn state of one frame member. */
  enum Look {
    /** Damaged, still counts. */
    DAMAGED(Glyphs.Stroke.DAMAGED, Glyphs.Mark.DAMAGED),
    /** Damaged beyond use: counts as missing. */
    INEFFECTIVE(Glyphs.Stroke.INEFFECTIVE, Glyphs.Mark.BEYOND_USE),
    /** A design member not there. */
    MISSING(Glyphs.Stroke.MISSING, Glyphs.Mark.MISSING),
    /** The design leaves it out. */
    OMITTED(Glyphs.Stroke.OMITTED, Glyphs.Mark.NONE),
    /** There although the design leaves it out. */
    EXTRA(Glyphs.Stroke.EXTRA, Glyphs.Mark.EXTRA),
    /** Recorded as not inspected, or nothing recorded where the map asks: counts as missing. */
    NOT_INSPECTED(Glyphs.Stroke.UNSEEN, Glyphs.Mark.NOT_SEEN),
    /** Looked for but not reachable: counts as not inspected. */
    NOT_REACHABLE(Glyphs.Stroke.UNSEEN, Glyphs.Mark.NOT_REACHABLE);

    final Glyphs.Stroke stroke;
    final Glyphs.Mark mark;

    Look(Glyphs.Stroke stroke, Glyphs.Mark mark) {
      this.stroke = stroke;
      this.mark = mark;
    }
  }

  private FrameLooks() {}

  /** The members drawn other than plain, in output order. */
  static Map<FrameRef, Look> of(PlaneSection plane) {
    PlaneDesign design = plane.design();
    Map<FrameRef, Look> out = new TreeMap<>();
    for (FrameRef f : design.omittedFrame()) {
      PanelState s = plane.frameFindings().get(f);
      out.put(f, s != null && s.inspected() && s.effective() ? Look.EXTRA : Look.OMITTED);
    }
    for (Map.Entry<FrameRef, PanelState> e : plane.frameFindings().entrySet()) {
      if (!design.hasFrameMember(e.getKey())) {
        continue;
      }
      Look look = switch (e.getValue()) {
        case SOUND, EXTRA -> null;
        case DAMAGED_EFFECTIVE -> Look.DAMAGED;
        case DAMAGED_INEFFECTIVE -> Look.INEFFECTIVE;
        case MISSING -> Look.MISSING;
        case NOT_INSPECTED -> Look.NOT_INSPECTED;
        case NOT_REACHABLE -> Look.NOT_REACHABLE;
      };
      if (look != null) {
        out.put(e.getKey(), look);
      }
    }
    // absent as built with nothing recorded on it (a hand-made state): drawn missing
    for (FrameRef f : plane.asBuilt().absentFrame()) {
      out.putIfAbsent(f, Look.MISSING);
    }
    for (FrameRef f : plane.asBuilt().unknownFrame()) {
      out.putIfAbsent(f, Look.NOT_INSPECTED);
    }
    return out;
  }

  /** The analysed state's freedoms of one kind. */
  static List<Freedom> freedoms(PlaneSection plane, FreedomKind kind) {
    return plane.analysis().analysedState().freedoms().stream().filter(f -> f.kind() == kind)
        .toList();
  }

  /** Whether the members through a joint without restraint stand upright (standards). */
  static boolean vertical(Freedom f) {
    if (!f.members().isEmpty()) {
      return f.members().stream().noneMatch(FrameRef::isLedger);
    }
    return false;
  }
}

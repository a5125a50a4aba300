package org.bracewalk.ui.walk;

import java.nio.file.Path;
import java.util.List;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.DefectType;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.MemberKind;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneDesign;

/**
 * The details the inspector enters for the next mark (defect, bow, note, the member actually seen
 * and its kind), the bow hint, and building the mark from them. One job: the detail fields.
 */
final class MarkDetails {
  private final PlaneDesign design;
  private final boolean racking;
  private final ObjectProperty<DefectType> defect = new SimpleObjectProperty<>(this, "defect");
  private final StringProperty bowMm = new SimpleStringProperty(this, "bowMm", "");
  private final StringProperty note = new SimpleStringProperty(this, "note", "");
  /** The member actually seen, when it differs from what the state implies; null = follows state. */
  private final ObjectProperty<Diagonal> memberSeen = new SimpleObjectProperty<>(this, "memberSeen");
  private final ObjectProperty<MemberKind> memberKind =
      new SimpleObjectProperty<>(this, "memberKind", MemberKind.RIGID);
  private final ReadOnlyStringWrapper bowHint = new ReadOnlyStringWrapper(this, "bowHint", "");

  /**
   * @param design the plane's design (an extra member must be where the design has none)
   * @param racking true for storage racking (bow hints use the EN 15635 limits)
   */
  MarkDetails(PlaneDesign design, boolean racking) {
    this.design = design;
    this.racking = racking;
    bowMm.addListener((obs, a, b) -> updateBowHint());
  }

  /**
   * The mark of {@code state} at {@code p} with the details entered and {@code photos}.
   *
   * @throws IllegalArgumentException naming the field or panel when the details do not make a mark
   */
  Mark build(PanelState state, PanelRef p, List<Path> photos) {
    Double bow = parseBow(bowMm.get());
    Brace seen = memberSeen.get() == null ? null : new Brace(memberSeen.get(), memberKind.get());
    if (state == PanelState.EXTRA && seen == null) {
      Brace d = design.braceAt(p);
      if (d != null) {
        throw new IllegalArgumentException(
            p + " has a " + d.token() + " brace in the design, so a member there is not extra."
                + " Mark it S (sound), or choose the member seen with / \\ or X first.");
      }
      seen = new Brace(Diagonal.RISING, memberKind.get());
    }
    if (design.isOpening(p) && seen != null) {
      // an opening carries no design member; a member there is extra whatever the state says
      state = PanelState.EXTRA;
    }
    return new Mark(state, seen, defect.get(), bow, bow == null ? null : Mark.STANDARD_GAUGE_MM, note.get(),
        List.copyOf(photos));
  }

  /**
   * The mark of {@code state} on the frame member {@code f} with the details entered and {@code
   * photos}. A member the design leaves out found sound is recorded as there although not designed
   * (extra).
   *
   * @throws IllegalArgumentException naming the member or field when the details do not make a mark
   */
  Mark buildMember(PanelState state, FrameRef f, List<Path> photos) {
    Double bow = parseBow(bowMm.get());
    if (memberSeen.get() != null) {
      throw new IllegalArgumentException("Member seen (" + memberSeen.get().symbol() + ") names a panel's diagonal,"
          + " not the " + f + ": press . to clear it, then mark again. Nothing was recorded.");
    }
    boolean designed = design.hasFrameMember(f);
    if (state == PanelState.EXTRA && designed) {
      throw new IllegalArgumentException("The " + f + " is in the design, so one there is not extra."
          + " Mark it S (sound). Nothing was recorded.");
    }
    if (state == PanelState.MISSING && !designed) {
      throw new IllegalArgumentException("The " + f + " is left out of the design, so it cannot be missing;"
          + " mark E if one is there. Nothing was recorded.");
    }
    if (state == PanelState.SOUND && !designed) {
      state = PanelState.EXTRA;
    }
    return new Mark(state, null, defect.get(), bow, bow == null ? null : Mark.STANDARD_GAUGE_MM, note.get(),
        List.copyOf(photos));
  }

  /** Parses the bow field (millimetres over a 1 m straight edge, to 0.1 mm); empty is none. */
  static Double parseBow(String text) {
    String t = text == null ? "" : text.strip().replace(',', '.');
    if (t.isEmpty()) {
      return null;
    }
    double v;
    try {
      v = Double.parseDouble(t);
    } catch (NumberFormatException e) {
      throw new IllegalArgumentException(
          "Bow: '" + t + "' is not a number of millimetres. Type a number such as 12 or 10.5, or"
              + " leave the field empty. Nothing was recorded.");
    }
    if (!(v >= 0) || v > 2000) {
      throw new IllegalArgumentException(
          "Bow: " + t + " mm is out of range. Type the bow in millimetres (0 to 2000), or"
              + " leave the field empty. Nothing was recorded.");
    }
    return Math.round(v * 10) / 10.0;
  }

  private void updateBowHint() {
    Double bow;
    try {
      bow = parseBow(bowMm.get());
    } catch (IllegalArgumentException e) {
      bowHint.set(e.getMessage());
      return;
    }
    if (bow == null || !racking) {
      bowHint.set("");
      return;
    }
    // Bracing member over a 1 m gauge: 10 mm limit; over twice the limit, offload and isolate
    // (EN 15635 as reproduced in DGUV Information 208-043, see trade-facts.md).
    if (bow <= 10.0) {
      bowHint.set("Within 10 mm over 1 m: record and monitor (D).");
    } else if (bow <= 20.0) {
      bowHint.set("Over 10 mm: offload, repair within 4 weeks; counts as beyond use (U).");
    } else {
      bowHint.set("Over 20 mm: offload at once and isolate until repaired (U).");
    }
  }

  /** Empties every field for the next mark. */
  void clear() {
    defect.set(null);
    bowMm.set("");
    note.set("");
    memberSeen.set(null);
    memberKind.set(MemberKind.RIGID);
  }

  /** Switches the member seen between rigid and tension-only. */
  void toggleMemberKind() {
    memberKind.set(memberKind.get() == MemberKind.RIGID ? MemberKind.TENSION_ONLY : MemberKind.RIGID);
  }

  ObjectProperty<DefectType> defectProperty() {
    return defect;
  }

  StringProperty bowMmProperty() {
    return bowMm;
  }

  StringProperty noteProperty() {
    return note;
  }

  ObjectProperty<Diagonal> memberSeenProperty() {
    return memberSeen;
  }

  ObjectProperty<MemberKind> memberKindProperty() {
    return memberKind;
  }

  ReadOnlyStringProperty bowHintProperty() {
    return bowHint.getReadOnlyProperty();
  }
}

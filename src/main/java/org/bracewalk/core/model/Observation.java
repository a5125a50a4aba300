package org.bracewalk.core.model;

import java.time.Instant;
import java.util.Objects;

/**
 * One thing the inspector recorded about one panel's diagonals, or about one frame member (a ledger
 * or standard segment), during an inspection. Observations are
 * append-only: a correction is a new observation that names the one it {@code supersedes} and
 * says why. Optional values are {@code null} (numbers, member, defect) or empty (text).
 *
 * @param id stored id; 0 when new
 * @param inspectionId the inspection
 * @param planeId the plane (of the inspected structure)
 * @param panel lift and bay of the diagonals recorded; {@code null} for a frame member
 * @param state what was found
 * @param memberFound the member found where it differs from the design or where the design has
 *     none; {@code null} means "as designed" (for sound and damaged-effective) or "nothing left"
 *     (for missing and damaged-ineffective); required for {@link PanelState#EXTRA}
 * @param bowMm measured bow in millimetres, to 0.1 mm (the store keeps tenths: EN 15635 limits
 *     fall on whole millimetres, so 10.0 and 10.1 must stay apart); {@code null} when not measured
 * @param gaugeLengthMm the straight-edge length the bow was measured over, whole millimetres;
 *     required with a bow
 * @param defect what is wrong; {@code null} when nothing is
 * @param note free text
 * @param recordedAt when it was recorded (UTC)
 * @param recordedBy who recorded it
 * @param supersedes the id of the observation this one corrects; {@code null} for a first record
 * @param correctionReason why the superseded record was wrong; required with {@code supersedes}
 * @param frameMember the frame member recorded; {@code null} for diagonals. Exactly one of {@code
 *     panel} and {@code frameMember} is given; a frame member names no {@code memberFound}
 *     ({@link PanelState#EXTRA} then means "there although the design leaves it out")
 */
public record Observation(
    long id,
    long inspectionId,
    long planeId,
    PanelRef panel,
    PanelState state,
    Brace memberFound,
    Double bowMm,
    Integer gaugeLengthMm,
    DefectType defect,
    String note,
    Instant recordedAt,
    String recordedBy,
    Long supersedes,
    String correctionReason,
    FrameRef frameMember) {

  /** The largest bow or gauge length accepted, in millimetres (10 m: anything above is a typo). */
  public static final int MAX_LENGTH_MM = 10_000;

  /** An observation of one panel's diagonals. */
  public Observation(
      long id,
      long inspectionId,
      long planeId,
      PanelRef panel,
      PanelState state,
      Brace memberFound,
      Double bowMm,
      Integer gaugeLengthMm,
      DefectType defect,
      String note,
      Instant recordedAt,
      String recordedBy,
      Long supersedes,
      String correctionReason) {
    this(id, inspectionId, planeId, panel, state, memberFound, bowMm, gaugeLengthMm, defect, note,
        recordedAt, recordedBy, supersedes, correctionReason, null);
  }

  public Observation {
    Text.id(id, "observation id");
    Text.ref(inspectionId, "inspection");
    Text.ref(planeId, "plane");
    Objects.requireNonNull(state, "state");
    if ((panel == null) == (frameMember == null)) {
      throw new IllegalArgumentException(
          "an observation is of one panel's diagonals or of one frame member, not "
              + (panel == null ? "neither" : "both"));
    }
    if (frameMember != null && memberFound != null) {
      throw new IllegalArgumentException(
          "a record of the " + frameMember + " cannot name a diagonal found");
    }
    if (panel != null) {
      new PanelFinding(state, memberFound); // same rule: an extra member must be named
    }
    if (bowMm != null) {
      if (!(bowMm >= 0) || bowMm > MAX_LENGTH_MM) {
        throw new IllegalArgumentException(
            "bow must be 0 to " + MAX_LENGTH_MM + " mm, got " + bowMm);
      }
      if (gaugeLengthMm == null) {
        throw new IllegalArgumentException(
            "a bow of " + bowMm + " mm needs the gauge length it was measured over");
      }
    }
    if (gaugeLengthMm != null && (gaugeLengthMm < 1 || gaugeLengthMm > MAX_LENGTH_MM)) {
      throw new IllegalArgumentException(
          "gauge length must be 1 to " + MAX_LENGTH_MM + " mm, got " + gaugeLengthMm);
    }
    note = Text.optional(note);
    Objects.requireNonNull(recordedAt, "recorded at");
    recordedBy = Text.optional(recordedBy);
    correctionReason = Text.optional(correctionReason);
    if (supersedes != null) {
      Text.ref(supersedes, "superseded observation");
      if (correctionReason.isBlank()) {
        throw new IllegalArgumentException(
            "a correction of observation " + supersedes + " must say why it is made");
      }
    } else if (!correctionReason.isBlank()) {
      throw new IllegalArgumentException(
          "a correction reason was given but no observation to supersede");
    }
  }

  /** Whether this records a frame member (else one panel's diagonals). */
  public boolean isFrameMember() {
    return frameMember != null;
  }

  /** The finding this observation gives for its panel (observations of diagonals only). */
  public PanelFinding finding() {
    return new PanelFinding(state, memberFound);
  }

  public Observation withId(long newId) {
    return new Observation(
        newId, inspectionId, planeId, panel, state, memberFound, bowMm, gaugeLengthMm, defect,
        note, recordedAt, recordedBy, supersedes, correctionReason, frameMember);
  }
}

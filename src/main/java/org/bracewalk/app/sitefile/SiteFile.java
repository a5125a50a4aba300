package org.bracewalk.app.sitefile;

import java.time.Instant;
import java.time.LocalDate;
import java.util.Arrays;
import java.util.List;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.DefectType;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.InspectionStatus;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.PlaneRole;
import org.bracewalk.core.model.RepairActionKind;
import org.bracewalk.core.model.Site;
import org.bracewalk.core.model.StructureKind;

/**
 * The content of a site file, validated: records refer to each other by name (planes) and by
 * number (inspections, 1-based in file order) or position (observations, 1-based within their
 * inspection), never by database id, so a file moves between databases unchanged.
 *
 * @param site the site (id 0)
 * @param structures its structures, in file order
 */
public record SiteFile(Site site, List<StructureData> structures) {

  /** The format name every site file declares. */
  public static final String FORMAT = "bracewalk-site";

  /** The version this program writes and the newest it reads. */
  public static final int VERSION = 1;

  public SiteFile {
    structures = List.copyOf(structures);
  }

  /** A structure with its planes and inspections. */
  public record StructureData(
      String name,
      StructureKind kind,
      String description,
      String designReference,
      int inspectionIntervalDays,
      List<PlaneData> planes,
      List<InspectionData> inspections) {
    public StructureData {
      planes = List.copyOf(planes);
      inspections = List.copyOf(inspections);
    }
  }

  /**
   * A plane with its design revisions (by number) and, when it has been retired, its retirement
   * (field {@code retired}: {@code at}, {@code by}, {@code reason}; absent for a plane in use).
   */
  public record PlaneData(
      String name, PlaneGrid grid, List<DesignData> designs, RetirementData retired, PlaneRole role) {
    public PlaneData {
      designs = List.copyOf(designs);
      role = role == null ? PlaneRole.OTHER : role;
    }

    /** A plane of no particular role. */
    public PlaneData(String name, PlaneGrid grid, List<DesignData> designs, RetirementData retired) {
      this(name, grid, designs, retired, PlaneRole.OTHER);
    }

    /** A plane in use (not retired). */
    public PlaneData(String name, PlaneGrid grid, List<DesignData> designs) {
      this(name, grid, designs, null);
    }
  }

  /**
   * A plane's retirement: inspections started at or after {@code at} leave the plane out.
   *
   * @param at when it was retired
   * @param by who retired it ("" when not known)
   * @param reason why (required)
   */
  public record RetirementData(Instant at, String by, String reason) {}

  /** One design revision. */
  public record DesignData(
      int number,
      String author,
      LocalDate date,
      String approvalNote,
      Instant recordedAt,
      PlaneDesign design) {}

  /**
   * One plane an inspection covers, with the number of the design revision it is checked against
   * (field {@code scope} of an inspection: {@code plane}, {@code design}).
   */
  public record ScopeData(String plane, int design) {}

  /**
   * One inspection; {@code number} is its 1-based place among all inspections of the file. {@code
   * scope} is the planes it covers, fixed when it started, each with its design revision number;
   * {@code null} when the file does not say (a file written before the scope was recorded): the
   * importer then gives it the planes that existed at its start (see {@code
   * ImportExportService}).
   */
  public record InspectionData(
      int number,
      Instant startedAt,
      Instant finishedAt,
      InspectionStatus status,
      InspectionReason reason,
      String inspectorName,
      String inspectorPosition,
      String competentPerson,
      String shift,
      String storageSafetyPerson,
      String carriedOutForName,
      String carriedOutForAddress,
      List<ObservationData> observations,
      List<RepairOrderData> repairOrders,
      List<IssuedReportData> issuedReports,
      List<ScopeData> scope) {
    public InspectionData {
      observations = List.copyOf(observations);
      repairOrders = List.copyOf(repairOrders);
      issuedReports = List.copyOf(issuedReports);
      scope = scope == null ? null : List.copyOf(scope);
    }

    /** An inspection whose scope the file does not state. */
    public InspectionData(int number, Instant startedAt, Instant finishedAt,
        InspectionStatus status, InspectionReason reason, String inspectorName,
        String inspectorPosition, String competentPerson, String shift,
        String storageSafetyPerson, String carriedOutForName, String carriedOutForAddress,
        List<ObservationData> observations, List<RepairOrderData> repairOrders,
        List<IssuedReportData> issuedReports) {
      this(number, startedAt, finishedAt, status, reason, inspectorName, inspectorPosition,
          competentPerson, shift, storageSafetyPerson, carriedOutForName, carriedOutForAddress,
          observations, repairOrders, issuedReports, null);
    }
  }

  /**
   * One observation, of one panel's diagonals ({@code panel}) or of one frame member ({@code
   * frameMember}, {@code panel} null); {@code supersedes} is the 1-based position of the corrected
   * observation in the same inspection's list, or {@code null}.
   */
  public record ObservationData(
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
      Integer supersedes,
      String correctionReason,
      List<PhotoData> photos,
      FrameRef frameMember) {

    /** An observation of one panel's diagonals. */
    public ObservationData(String plane, PanelRef panel, PanelState state, Brace member,
        Double bowMm, Integer gaugeLengthMm, DefectType defect, String note, Instant recordedAt,
        String recordedBy, Integer supersedes, String correctionReason, List<PhotoData> photos) {
      this(plane, panel, state, member, bowMm, gaugeLengthMm, defect, note, recordedAt,
          recordedBy, supersedes, correctionReason, photos, null);
    }

    public ObservationData {
      photos = List.copyOf(photos);
    }
  }

  /** One photo of an observation. */
  public record PhotoData(String fileName, String mediaType, Instant attachedAt, byte[] data) {
    public PhotoData {
      data = data.clone();
    }

    @Override
    public byte[] data() {
      return data.clone();
    }

    @Override
    public boolean equals(Object o) {
      return o instanceof PhotoData p
          && fileName.equals(p.fileName)
          && mediaType.equals(p.mediaType)
          && attachedAt.equals(p.attachedAt)
          && Arrays.equals(data, p.data);
    }

    @Override
    public int hashCode() {
      return fileName.hashCode() * 31 + Arrays.hashCode(data);
    }

    @Override
    public String toString() {
      return "PhotoData[" + fileName + ", " + data.length + " bytes]";
    }
  }

  /** A repair order raised from an inspection. */
  public record RepairOrderData(
      Instant createdAt, String createdBy, String note, List<RepairActionData> actions) {
    public RepairOrderData {
      actions = List.copyOf(actions);
    }
  }

  /**
   * One repair action; {@code panel} is {@code null} for the whole plane or a frame member;
   * {@code frameMember} names the ledger or standard the action is on, or is {@code null}; {@code
   * verifiedByInspection} is an inspection number of this file, or {@code null}.
   */
  public record RepairActionData(
      String plane,
      PanelRef panel,
      RepairActionKind action,
      Brace brace,
      String description,
      LocalDate dueDate,
      String assignee,
      Instant doneAt,
      String doneBy,
      Integer verifiedByInspection,
      FrameRef frameMember) {

    /** An action on a panel, or on the whole plane when {@code panel} is null. */
    public RepairActionData(String plane, PanelRef panel, RepairActionKind action, Brace brace,
        String description, LocalDate dueDate, String assignee, Instant doneAt, String doneBy,
        Integer verifiedByInspection) {
      this(plane, panel, action, brace, description, dueDate, assignee, doneAt, doneBy,
          verifiedByInspection, null);
    }
  }

  /** A report issued for an inspection. */
  public record IssuedReportData(String fileName, String fingerprint, Instant issuedAt) {}
}

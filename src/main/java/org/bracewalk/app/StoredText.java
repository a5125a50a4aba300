package org.bracewalk.app;

import org.bracewalk.core.model.DesignRevision;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.Photo;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.RepairAction;
import org.bracewalk.core.model.RepairOrder;
import org.bracewalk.core.model.Site;
import org.bracewalk.core.model.Structure;

/**
 * Text as people type it, made fit to store: blanks at the ends go, control characters other than
 * a line break are refused. Every record the application stores passes through here first, once;
 * what the store gives back is never trimmed again, so a record edited outside the program is
 * seen (and fingerprinted) as it is. The database refuses untrimmed text on insert too.
 */
public final class StoredText {
  private StoredText() {}

  /**
   * {@code value} without blanks at its ends; {@code null} becomes empty.
   *
   * @throws UserInputException naming {@code field} when it holds a control character other than
   *     a line break (a tab, a carriage return, a NUL...)
   */
  public static String clean(String value, String field) {
    if (value == null) {
      return "";
    }
    String s = value.strip();
    for (int i = 0; i < s.length(); i++) {
      char c = s.charAt(i);
      if (c != '\n' && Character.isISOControl(c)) {
        throw new UserInputException(field + ": holds a control character (code "
            + (int) c + ") at position " + (i + 1) + "; type plain text");
      }
    }
    return s;
  }

  static Site site(Site s) {
    return new Site(s.id(), clean(s.name(), "site name"), clean(s.clientName(), "client name"),
        clean(s.clientAddress(), "client address"), clean(s.location(), "site location"),
        s.timeZone(), s.units(), s.jurisdiction());
  }

  static Structure structure(Structure s) {
    return new Structure(s.id(), s.siteId(), clean(s.name(), "structure name"), s.kind(),
        clean(s.description(), "structure description"),
        clean(s.designReference(), "design reference"), s.inspectionIntervalDays());
  }

  static PlaneRecord plane(PlaneRecord p) {
    return new PlaneRecord(p.id(), p.structureId(), clean(p.name(), "plane name"), p.grid(), p.role());
  }

  static DesignRevision revision(DesignRevision d) {
    return new DesignRevision(d.id(), d.planeId(), d.number(), clean(d.author(), "design author"),
        d.date(), clean(d.approvalNote(), "approval note"), d.recordedAt(), d.design());
  }

  static Inspection inspection(Inspection i) {
    return new Inspection(i.id(), i.structureId(), i.startedAt(), i.finishedAt(),
        clean(i.inspectorName(), "inspector name"),
        clean(i.inspectorPosition(), "inspector position"),
        clean(i.competentPerson(), "competent person"), clean(i.shift(), "shift"),
        clean(i.storageSafetyPerson(), "person responsible for storage safety"), i.reason(),
        i.status(), clean(i.carriedOutForName(), "carried out for (name)"),
        clean(i.carriedOutForAddress(), "carried out for (address)"));
  }

  static Observation observation(Observation o) {
    return new Observation(o.id(), o.inspectionId(), o.planeId(), o.panel(), o.state(),
        o.memberFound(), o.bowMm(), o.gaugeLengthMm(), o.defect(), clean(o.note(), "note"),
        o.recordedAt(), clean(o.recordedBy(), "recorded by"), o.supersedes(),
        clean(o.correctionReason(), "correction reason"), o.frameMember());
  }

  static Photo photo(Photo p) {
    return new Photo(p.id(), p.observationId(), clean(p.fileName(), "photo file name"),
        clean(p.mediaType(), "photo media type"), p.data(), p.attachedAt());
  }

  static RepairOrder order(RepairOrder o) {
    return new RepairOrder(o.id(), o.inspectionId(), o.createdAt(),
        clean(o.createdBy(), "order raised by"), clean(o.note(), "order note"));
  }

  static RepairAction action(RepairAction a) {
    return new RepairAction(a.id(), a.orderId(), a.planeId(), a.panel(), a.action(), a.brace(),
        clean(a.description(), "action description"), a.dueDate(),
        clean(a.assignee(), "assignee"), a.doneAt(), clean(a.doneBy(), "done by"),
        a.verifiedByInspectionId(), a.frameMember());
  }
}

package org.bracewalk.app.report;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.bracewalk.core.model.DesignRevision;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.Photo;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.RepairAction;
import org.bracewalk.core.model.RepairOrder;
import org.bracewalk.core.model.Site;
import org.bracewalk.core.model.Structure;
import org.bracewalk.core.port.GlobalIdentities.Kind;
import org.bracewalk.core.port.report.RecordFingerprint;
import org.bracewalk.core.port.report.SectionDigest;
import org.junit.jupiter.api.Test;

/**
 * The second canonical form, {@code bracewalk-records-2}: records named by their global
 * identities, so two copies of the same records with different local ids (a field file and the
 * team server) give the same fingerprint; the first form stays as it was. The digest is SHA-256 as
 * published (FIPS 180-4; {@code RecordFingerprinterTest} checks it against the standard's example).
 */
class RecordFingerprintV2Test {
  private static final String SITE = "00000000-0000-4000-8000-000000000001";
  private static final String STRUCTURE = "00000000-0000-4000-8000-000000000002";
  private static final String INSPECTION = "00000000-0000-4000-8000-000000000003";
  private static final String PLANE = "00000000-0000-4000-8000-000000000004";
  private static final String DESIGN = "00000000-0000-4000-8000-000000000005";
  // observation 12 sorts first by identity, 10 last: the second form does not follow local ids
  private static final String OBS_10 = "cccccccc-0000-4000-8000-000000000010";
  private static final String OBS_11 = "bbbbbbbb-0000-4000-8000-000000000011";
  private static final String OBS_12 = "aaaaaaaa-0000-4000-8000-000000000012";
  private static final String PHOTO = "00000000-0000-4000-8000-000000000020";
  private static final String ORDER = "00000000-0000-4000-8000-000000000030";
  private static final String ACTION = "00000000-0000-4000-8000-000000000031";

  /** The identities of {@link RecordFingerprinterTest#records()}'s ids shifted by {@code shift}. */
  private static InspectionRecords.Identities identities(long shift) {
    Map<Kind, Map<Long, String>> m = new EnumMap<>(Kind.class);
    m.put(Kind.SITE, Map.of(1 + shift, SITE));
    m.put(Kind.STRUCTURE, Map.of(2 + shift, STRUCTURE));
    m.put(Kind.INSPECTION, Map.of(3 + shift, INSPECTION));
    m.put(Kind.PLANE, Map.of(4 + shift, PLANE));
    m.put(Kind.DESIGN_REVISION, Map.of(5 + shift, DESIGN));
    m.put(Kind.OBSERVATION, Map.of(10 + shift, OBS_10, 11 + shift, OBS_11, 12 + shift, OBS_12));
    m.put(Kind.PHOTO, Map.of(20 + shift, PHOTO));
    m.put(Kind.REPAIR_ORDER, Map.of(30 + shift, ORDER));
    m.put(Kind.REPAIR_ACTION, Map.of(31 + shift, ACTION));
    return new InspectionRecords.Identities(m);
  }

  /**
   * The same records as another database holds them: every local id shifted, observations listed
   * in another order, the same global identities.
   */
  private static InspectionRecords copy(long shift) {
    InspectionRecords r = RecordFingerprinterTest.records();
    Site site = r.site().withId(1 + shift);
    Structure structure = new Structure(2 + shift, 1 + shift, r.structure().name(),
        r.structure().kind(), r.structure().description(), r.structure().designReference(),
        r.structure().inspectionIntervalDays());
    Inspection i = r.inspection();
    Inspection inspection = new Inspection(3 + shift, 2 + shift, i.startedAt(), i.finishedAt(),
        i.inspectorName(), i.inspectorPosition(), i.competentPerson(), i.shift(),
        i.storageSafetyPerson(), i.reason(), i.status(), i.carriedOutForName(),
        i.carriedOutForAddress());
    InspectionRecords.PlaneRecords p = r.planes().get(0);
    PlaneRecord plane = new PlaneRecord(4 + shift, 2 + shift, p.plane().name(), p.plane().grid());
    List<Observation> rows = new ArrayList<>(p.observations().stream().map(o -> new Observation(
        o.id() + shift, 3 + shift, 4 + shift, o.panel(), o.state(), o.memberFound(), o.bowMm(),
        o.gaugeLengthMm(), o.defect(), o.note(), o.recordedAt(), o.recordedBy(), null,
        o.correctionReason())).toList());
    Collections.reverse(rows);
    DesignRevision d = p.design();
    DesignRevision design = new DesignRevision(5 + shift, 4 + shift, d.number(), d.author(),
        d.date(), d.approvalNote(), d.recordedAt(), d.design());
    Photo ph = p.photos().get(11L).get(0);
    Photo photo = new Photo(20 + shift, 11 + shift, ph.fileName(), ph.mediaType(), ph.data(),
        ph.attachedAt());
    RepairOrder o = r.orders().get(0).order();
    RepairOrder order = new RepairOrder(30 + shift, 3 + shift, o.createdAt(), o.createdBy(),
        o.note());
    RepairAction a = r.orders().get(0).actions().get(0);
    RepairAction action = new RepairAction(31 + shift, 30 + shift, 4 + shift, a.panel(),
        a.action(), a.brace(), a.description(), a.dueDate(), a.assignee(), a.doneAt(), a.doneBy(),
        null);
    return new InspectionRecords(site, structure, inspection,
        List.of(new InspectionRecords.PlaneRecords(plane, design, rows, Map.of(11 + shift, List.of(photo)))),
        List.of(new InspectionRecords.OrderRecords(order, List.of(action))),
        identities(shift));
  }

  @Test
  void twoCopiesWithOtherLocalIdsGiveOneFingerprintInTheSecondFormOnly() {
    InspectionRecords field = copy(0);
    InspectionRecords server = copy(1000);
    RecordFingerprint a = RecordFingerprinter.fingerprint(field, RecordFingerprinter.SCHEME_2);
    RecordFingerprint b = RecordFingerprinter.fingerprint(server, RecordFingerprinter.SCHEME_2);
    assertThat(b).isEqualTo(a);
    assertThat(a.scheme()).isEqualTo("bracewalk-records-2");
    // the first form names local ids: the copies differ there
    assertThat(RecordFingerprinter.fingerprint(server, RecordFingerprinter.SCHEME_1).sha256())
        .isNotEqualTo(RecordFingerprinter.fingerprint(field, RecordFingerprinter.SCHEME_1)
            .sha256());
  }

  @Test
  void theFirstFormIsUnchangedByTheIdentitiesRecordsCarry() {
    InspectionRecords plain = RecordFingerprinterTest.records();
    InspectionRecords withIds = new InspectionRecords(plain.site(), plain.structure(),
        plain.inspection(), plain.planes(), plain.orders(), identities(0));
    assertThat(RecordFingerprinter.fingerprint(withIds, RecordFingerprinter.SCHEME_1))
        .isEqualTo(RecordFingerprinter.fingerprint(plain))
        .isEqualTo(RecordFingerprinter.fingerprint(plain, RecordFingerprinter.SCHEME_1));
    assertThat(RecordFingerprinter.fingerprint(plain).scheme()).isEqualTo("bracewalk-records-1");
  }

  @Test
  void sectionsNameTheInspectionAndPlanesByIdentityAndTheSchemeLineIsTheSecond() {
    RecordFingerprint f = RecordFingerprinter.fingerprint(copy(7), RecordFingerprinter.SCHEME_2);
    assertThat(f.sections()).extracting(SectionDigest::name).containsExactly("site", "structure",
        "inspection " + INSPECTION, "plane " + PLANE + " grid", "plane " + PLANE + " design",
        "plane " + PLANE + " observations", "plane " + PLANE + " photos", "repair orders");
    StringBuilder sb = new StringBuilder("bracewalk-records-2\n");
    f.sections().forEach(s -> sb.append(s.name()).append('=').append(s.sha256()).append('\n'));
    assertThat(f.sha256())
        .isEqualTo(RecordFingerprinter.sha256(sb.toString().getBytes(StandardCharsets.UTF_8)));
  }

  @Test
  void theCanonicalTextNamesEveryRecordAndReferenceByIdentityInIdentityOrder() {
    InspectionRecords r = copy(50);
    RecordFingerprinter.Ids ids = r.identities()::uuid;
    InspectionRecords.PlaneRecords p = r.planes().get(0);
    String text = new String(RecordFingerprinter.observations(
        p.observations().stream().sorted((x, y) -> ids.of(Kind.OBSERVATION, x.id()).toString()
            .compareTo(ids.of(Kind.OBSERVATION, y.id()).toString())).toList(), ids).bytes(),
        StandardCharsets.UTF_8);
    assertThat(text).startsWith("[observation]\nid=" + OBS_12 + "\ninspectionId=" + INSPECTION
        + "\nplaneId=" + PLANE + "\n");
    assertThat(text).doesNotContain("id=62").doesNotContain("inspectionId=53");
    assertThat(text.indexOf(OBS_12)).isLessThan(text.indexOf(OBS_11));
    assertThat(text.indexOf(OBS_11)).isLessThan(text.indexOf(OBS_10));
    String orders = new String(RecordFingerprinter.orders(r.orders(), ids).bytes(),
        StandardCharsets.UTF_8);
    assertThat(orders).contains("id=" + ORDER + "\ninspectionId=" + INSPECTION)
        .contains("id=" + ACTION + "\norderId=" + ORDER + "\nplaneId=" + PLANE);
    String site = new String(RecordFingerprinter.site(r.site(), ids).bytes(),
        StandardCharsets.UTF_8);
    assertThat(site).startsWith("[site]\nid=" + SITE + "\n");
  }

  @Test
  void anotherIdentityIsAnotherRecord() {
    InspectionRecords r = copy(0);
    Map<Kind, Map<Long, String>> m = new EnumMap<>(r.identities().byKind());
    m.put(Kind.PHOTO, Map.of(20L, "00000000-0000-4000-8000-0000000000ff"));
    InspectionRecords other = new InspectionRecords(r.site(), r.structure(), r.inspection(),
        r.planes(), r.orders(), new InspectionRecords.Identities(m));
    RecordFingerprint a = RecordFingerprinter.fingerprint(r, RecordFingerprinter.SCHEME_2);
    RecordFingerprint b = RecordFingerprinter.fingerprint(other, RecordFingerprinter.SCHEME_2);
    assertThat(b.sha256()).isNotEqualTo(a.sha256());
    assertThat(b.sections().get(6)).isNotEqualTo(a.sections().get(6)); // the photos section
    assertThat(b.sections().subList(0, 6)).isEqualTo(a.sections().subList(0, 6));
  }

  @Test
  void theSecondFormNeedsTheIdentitiesAndAnUnknownFormIsRefused() {
    assertThatThrownBy(() -> RecordFingerprinter.fingerprint(RecordFingerprinterTest.records(),
        RecordFingerprinter.SCHEME_2)).isInstanceOf(IllegalStateException.class)
        .hasMessageContaining("no global identity known for site 1");
    assertThatThrownBy(() -> RecordFingerprinter.fingerprint(RecordFingerprinterTest.records(),
        "bracewalk-records-9")).isInstanceOf(IllegalArgumentException.class);
  }
}

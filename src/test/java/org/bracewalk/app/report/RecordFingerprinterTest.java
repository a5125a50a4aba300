package org.bracewalk.app.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneId;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.UnaryOperator;
import org.bracewalk.app.Fixtures;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.DefectType;
import org.bracewalk.core.model.DesignRevision;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.DisplayUnits;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.InspectionStatus;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.Photo;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.RepairAction;
import org.bracewalk.core.model.RepairActionKind;
import org.bracewalk.core.model.RepairOrder;
import org.bracewalk.core.model.Site;
import org.bracewalk.core.model.Structure;
import org.bracewalk.core.port.report.RecordFingerprint;
import org.bracewalk.core.port.report.SectionDigest;
import org.junit.jupiter.api.Test;

class RecordFingerprinterTest {
  static final Instant T = Instant.parse("2025-03-03T08:00:00Z");

  static Site site() {
    return Fixtures.site().withId(1);
  }

  static Structure structure() {
    return Fixtures.structure(1).withId(2);
  }

  static Inspection inspection() {
    return new Inspection(3, 2, T, T.plusSeconds(3600), "P. Lowry", "inspector", "P. Lowry", "early",
        "M. Okoro", InspectionReason.AFTER_IMPACT, InspectionStatus.FINALISED, "Orrin Vale",
        "4 Quarry Lane");
  }

  static PlaneRecord plane() {
    return new PlaneRecord(4, 2, "spine", Fixtures.threeByTwo().grid());
  }

  static DesignRevision design() {
    return new DesignRevision(5, 4, 1, "D. Fenwick", LocalDate.of(2025, 2, 1), "approved", T,
        Fixtures.threeByTwo());
  }

  static Observation obs(long id, int lift, PanelState state, String note) {
    return new Observation(id, 3, 4, PanelRef.of(lift, 1), state, null,
        state == PanelState.DAMAGED_INEFFECTIVE ? 12.5 : null,
        state == PanelState.DAMAGED_INEFFECTIVE ? 1000 : null,
        state == PanelState.DAMAGED_INEFFECTIVE ? DefectType.BENT : null, note, T.plusSeconds(id),
        "P. Lowry", null, null);
  }

  static InspectionRecords records() {
    List<Observation> rows = List.of(obs(10, 1, PanelState.SOUND, ""),
        obs(11, 2, PanelState.DAMAGED_INEFFECTIVE, "bowed"), obs(12, 3, PanelState.SOUND, "ok"));
    Photo photo = new Photo(20, 11, "bow.jpg", "image/jpeg", new byte[] {1, 2, 3}, T);
    RepairOrder order = new RepairOrder(30, 3, T.plusSeconds(4000), "P. Lowry", "keep off");
    RepairAction action = new RepairAction(31, 30, 4, PanelRef.of(2, 1), RepairActionKind.REPLACE,
        Brace.rigid(Diagonal.RISING), "new brace", LocalDate.of(2025, 3, 5), "crew", null, "", null);
    return new InspectionRecords(site(), structure(), inspection(),
        List.of(new InspectionRecords.PlaneRecords(plane(), design(), rows, Map.of(11L, List.of(photo)))),
        List.of(new InspectionRecords.OrderRecords(order, List.of(action))));
  }

  @Test
  void theDigestIsSha256AsPublished() {
    // FIPS 180-2, appendix B.1: SHA-256("abc")
    assertThat(RecordFingerprinter.sha256("abc".getBytes(StandardCharsets.US_ASCII)))
        .isEqualTo("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
  }

  @Test
  void sectionsComeInTheDocumentedOrder() {
    assertThat(RecordFingerprinter.fingerprint(records()).sections())
        .extracting(SectionDigest::name)
        .containsExactly("site", "structure", "inspection", "plane 4 grid", "plane 4 design",
            "plane 4 observations", "plane 4 photos", "repair orders");
  }

  @Test
  void theFingerprintIsTheDigestOfTheSchemeAndTheSectionLines() {
    RecordFingerprint f = RecordFingerprinter.fingerprint(records());
    StringBuilder sb = new StringBuilder("bracewalk-records-1\n");
    f.sections().forEach(s -> sb.append(s.name()).append('=').append(s.sha256()).append('\n'));
    assertThat(f.sha256()).isEqualTo(RecordFingerprinter.sha256(sb.toString().getBytes(StandardCharsets.UTF_8)));
    assertThat(RecordFingerprinter.fingerprint(records())).isEqualTo(f);
  }

  @Test
  void theCanonicalFormEscapesSoNoValueCanPassForAnotherField() {
    Canonical a = new Canonical().record("x").field("note", "a\nb=c").field("by", "d");
    Canonical b = new Canonical().record("x").field("note", "a").field("b", "c\nby=d");
    assertThat(a.toString()).isEqualTo("[x]\nnote=a\\nb=c\nby=d\n");
    assertThat(a.bytes()).isNotEqualTo(b.bytes());
    assertThat(new Canonical().field("v", null).toString()).isEqualTo("v!\n");
    assertThat(new Canonical().field("v", "").toString()).isEqualTo("v=\n");
  }

  @Test
  void changingAnyRecordChangesItsSectionAndTheFingerprint() {
    RecordFingerprint base = RecordFingerprinter.fingerprint(records());
    Map<String, UnaryOperator<InspectionRecords>> changes = new LinkedHashMap<>();
    changes.put("site: address", r -> with(r, new Site(1, r.site().name(), r.site().clientName(),
        "5 Quarry Lane, Eastmere", r.site().location(), r.site().timeZone(), r.site().units())));
    changes.put("site: zone and units", r -> with(r, new Site(1, r.site().name(), r.site().clientName(),
        r.site().clientAddress(), r.site().location(), ZoneId.of("UTC"), DisplayUnits.IMPERIAL)));
    changes.put("structure", r -> new InspectionRecords(r.site(), new Structure(2, 1,
        r.structure().name(), r.structure().kind(), "pallet racking, 6 bays",
        r.structure().designReference(), 7), r.inspection(), r.planes(), r.orders()));
    changes.put("inspection", r -> new InspectionRecords(r.site(), r.structure(),
        new Inspection(3, 2, T, T.plusSeconds(3600), "P. Lowry", "inspector", "P. Lowry", "late",
            "M. Okoro", InspectionReason.AFTER_IMPACT, InspectionStatus.FINALISED, "Orrin Vale",
            "4 Quarry Lane"), r.planes(), r.orders()));
    changes.put("plane 4 grid", r -> withPlane(r, new InspectionRecords.PlaneRecords(
        new PlaneRecord(4, 2, "spine B", plane().grid()), design(), rows(r), photos(r))));
    changes.put("plane 4 design", r -> withPlane(r, new InspectionRecords.PlaneRecords(plane(),
        new DesignRevision(5, 4, 1, "D. Fenwick", LocalDate.of(2025, 2, 1), "approved",
            T, Fixtures.threeByTwo().withBrace(PanelRef.of(1, 2), Brace.rigid(Diagonal.FALLING))),
        rows(r), photos(r))));
    changes.put("plane 4 observations", r -> {
      List<Observation> rows = new ArrayList<>(rows(r));
      rows.set(2, obs(12, 3, PanelState.SOUND, "ok."));
      return withPlane(r, new InspectionRecords.PlaneRecords(plane(), design(), rows, photos(r)));
    });
    changes.put("plane 4 photos", r -> withPlane(r, new InspectionRecords.PlaneRecords(plane(),
        design(), rows(r),
        Map.of(11L, List.of(new Photo(20, 11, "bow.jpg", "image/jpeg", new byte[] {1, 2, 4}, T))))));
    changes.put("repair orders", r -> {
      RepairAction a = r.orders().get(0).actions().get(0);
      RepairAction done = new RepairAction(a.id(), a.orderId(), a.planeId(), a.panel(), a.action(),
          a.brace(), a.description(), a.dueDate(), a.assignee(), T.plusSeconds(9000), "crew", null);
      return new InspectionRecords(r.site(), r.structure(), r.inspection(), r.planes(),
          List.of(new InspectionRecords.OrderRecords(r.orders().get(0).order(), List.of(done))));
    });
    for (Map.Entry<String, UnaryOperator<InspectionRecords>> e : changes.entrySet()) {
      assertThat(changes).hasSize(9);
      RecordFingerprint changed = RecordFingerprinter.fingerprint(e.getValue().apply(records()));
      assertThat(changed.sha256()).as(e.getKey()).isNotEqualTo(base.sha256());
      for (int i = 0; i < base.sections().size(); i++) {
        SectionDigest before = base.sections().get(i);
        SectionDigest after = changed.sections().get(i);
        assertThat(after.sha256().equals(before.sha256()))
            .as("%s after changing %s", before.name(), e.getKey())
            .isEqualTo(!before.name().equals(e.getKey().split(":")[0]));
      }
    }
  }

  @Test
  void aNullAndAnEmptyValueFingerprintApart() {
    InspectionRecords r = records();
    RepairAction a = r.orders().get(0).actions().get(0);
    RepairAction noDue = new RepairAction(a.id(), a.orderId(), a.planeId(), a.panel(), a.action(),
        a.brace(), a.description(), null, a.assignee(), null, "", null);
    InspectionRecords changed = new InspectionRecords(r.site(), r.structure(), r.inspection(),
        r.planes(), List.of(new InspectionRecords.OrderRecords(r.orders().get(0).order(), List.of(noDue))));
    assertThat(RecordFingerprinter.fingerprint(changed).sha256())
        .isNotEqualTo(RecordFingerprinter.fingerprint(r).sha256());
  }

  private static List<Observation> rows(InspectionRecords r) {
    return r.planes().get(0).observations();
  }

  private static Map<Long, List<Photo>> photos(InspectionRecords r) {
    return r.planes().get(0).photos();
  }

  private static InspectionRecords with(InspectionRecords r, Site s) {
    return new InspectionRecords(s, r.structure(), r.inspection(), r.planes(), r.orders());
  }

  private static InspectionRecords withPlane(InspectionRecords r, InspectionRecords.PlaneRecords p) {
    return new InspectionRecords(r.site(), r.structure(), r.inspection(), List.of(p), r.orders());
  }
}

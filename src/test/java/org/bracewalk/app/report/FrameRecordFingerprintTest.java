package org.bracewalk.app.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.bracewalk.app.Fixtures;
import org.bracewalk.core.model.DefectType;
import org.bracewalk.core.model.DesignRevision;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.port.report.RecordFingerprint;
import org.bracewalk.core.port.report.SectionDigest;
import org.junit.jupiter.api.Test;

/**
 * The record fingerprint with frame members: the records added for them (a design's frame
 * members left out, observations of frame members) are in the canonical form only where they
 * exist, so every record made before keeps the text, and every document its fingerprint, it had.
 * The expected texts are written out from the form documented in DEVELOPERS.md ("Record
 * fingerprint"), not taken from the code.
 */
class FrameRecordFingerprintTest {

  private static Observation frameObs(long id, FrameRef member, PanelState state, Long supersedes,
      String reason) {
    return new Observation(id, 3, 4, null, state, null,
        state == PanelState.DAMAGED_INEFFECTIVE ? 7.5 : null,
        state == PanelState.DAMAGED_INEFFECTIVE ? 1000 : null,
        state == PanelState.DAMAGED_INEFFECTIVE ? DefectType.BENT : null, "",
        RecordFingerprinterTest.T.plusSeconds(id), "P. Lowry", supersedes, reason, member);
  }

  private static InspectionRecords with(List<Observation> rows, DesignRevision design) {
    InspectionRecords base = RecordFingerprinterTest.records();
    InspectionRecords.PlaneRecords p = base.planes().get(0);
    return new InspectionRecords(base.site(), base.structure(), base.inspection(),
        List.of(new InspectionRecords.PlaneRecords(p.plane(), design, rows, p.photos())),
        base.orders());
  }

  private static String digest(RecordFingerprint f, String section) {
    return f.sections().stream().filter(s -> s.name().equals(section))
        .map(SectionDigest::sha256).findFirst().orElseThrow();
  }

  @Test
  void anObservationOfDiagonalsAndAFullFrameDesignKeepTheDocumentedForm() {
    // DEVELOPERS.md: [type], then name=value per field in the fixed order, name! when absent
    String expected = """
        [observation]
        id=10
        inspectionId=3
        planeId=4
        lift=1
        bay=1
        state=sound
        member!
        bowTenthsMm!
        gaugeLengthMm!
        defect!
        note=
        recordedAt=2025-03-03T08:00:10Z
        recordedBy=P. Lowry
        supersedes!
        correctionReason=
        """;
    assertThat(new String(RecordFingerprinter.observations(
            List.of(RecordFingerprinterTest.obs(10, 1, PanelState.SOUND, ""))).bytes(),
        StandardCharsets.UTF_8)).isEqualTo(expected);
    String design = new String(RecordFingerprinter.design(RecordFingerprinterTest.design())
        .bytes(), StandardCharsets.UTF_8);
    assertThat(design).startsWith("[design]\nid=5\n").doesNotContain("frame");
  }

  @Test
  void aFrameObservationAndAMemberLeftOutHaveTheirOwnRecords() {
    Observation o = frameObs(13, FrameRef.standard(2, 0), PanelState.DAMAGED_INEFFECTIVE, null, "");
    assertThat(new String(RecordFingerprinter.observations(List.of(o)).bytes(),
        StandardCharsets.UTF_8)).isEqualTo("""
        [frame-observation]
        id=13
        inspectionId=3
        planeId=4
        type=standard
        first=2
        second=0
        state=damaged-ineffective
        bowTenthsMm=75
        gaugeLengthMm=1000
        defect=bent
        note=
        recordedAt=2025-03-03T08:00:13Z
        recordedBy=P. Lowry
        supersedes!
        correctionReason=
        """);
    DesignRevision d = RecordFingerprinterTest.design();
    DesignRevision omitting = new DesignRevision(d.id(), d.planeId(), d.number(), d.author(),
        d.date(), d.approvalNote(), d.recordedAt(),
        Fixtures.threeByTwo().withOmittedFrame(Set.of(FrameRef.ledger(3, 2))));
    String text = new String(RecordFingerprinter.design(omitting).bytes(), StandardCharsets.UTF_8);
    String full = new String(RecordFingerprinter.design(d).bytes(), StandardCharsets.UTF_8);
    assertThat(text).isEqualTo(full
        + "[omitted-frame-member]\ntype=ledger\nfirst=3\nsecond=2\n");
  }

  @Test
  void frameRecordsChangeTheirOwnSectionsOnly() {
    InspectionRecords base = RecordFingerprinterTest.records();
    List<Observation> rows = new ArrayList<>(base.planes().get(0).observations());
    RecordFingerprint before = RecordFingerprinter.fingerprint(base);
    rows.add(frameObs(13, FrameRef.ledger(0, 1), PanelState.MISSING, null, ""));
    RecordFingerprint after = RecordFingerprinter.fingerprint(
        with(rows, base.planes().get(0).design()));
    assertThat(after.sha256()).isNotEqualTo(before.sha256());
    for (SectionDigest s : before.sections()) {
      if (s.name().equals("plane 4 observations")) {
        assertThat(digest(after, s.name())).isNotEqualTo(s.sha256());
      } else {
        assertThat(digest(after, s.name())).as(s.name()).isEqualTo(s.sha256());
      }
    }
    // each field of a frame observation is covered: member, state, correction
    Map<String, Observation> variants = Map.of(
        "member", frameObs(13, FrameRef.ledger(0, 2), PanelState.MISSING, null, ""),
        "type", frameObs(13, FrameRef.standard(1, 1), PanelState.MISSING, null, ""),
        "state", frameObs(13, FrameRef.ledger(0, 1), PanelState.DAMAGED_EFFECTIVE, null, ""),
        "correction", frameObs(13, FrameRef.ledger(0, 1), PanelState.MISSING, 12L, "misread"));
    variants.forEach((what, v) -> {
      List<Observation> changed = new ArrayList<>(rows);
      changed.set(changed.size() - 1, v);
      assertThat(RecordFingerprinter.fingerprint(with(changed, base.planes().get(0).design()))
          .sha256()).as(what).isNotEqualTo(after.sha256());
    });
    // a member left out of the design changes the design section
    DesignRevision d = base.planes().get(0).design();
    DesignRevision omitting = new DesignRevision(d.id(), d.planeId(), d.number(), d.author(),
        d.date(), d.approvalNote(), d.recordedAt(),
        d.design().withOmittedFrame(Set.of(FrameRef.standard(1, 2))));
    RecordFingerprint o = RecordFingerprinter.fingerprint(with(rows, omitting));
    assertThat(digest(o, "plane 4 design")).isNotEqualTo(digest(after, "plane 4 design"));
  }
}

package org.bracewalk.app.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.RepairAction;
import org.bracewalk.core.model.RepairActionKind;
import org.bracewalk.core.port.report.RecordFingerprint;
import org.bracewalk.core.port.report.SectionDigest;
import org.junit.jupiter.api.Test;

/**
 * The record fingerprint with repair actions on frame members (V10): such an action is a
 * {@code [frame-action]} record in its place by id, present only where one was recorded, so every
 * earlier order keeps its canonical text and every document issued before keeps its fingerprint.
 * The expected texts are written out from the form documented in DEVELOPERS.md ("Record
 * fingerprint"); the pinned digests were computed by the fingerprinter as it was before frame
 * repair actions existed (main at 96512e5), over {@link RecordFingerprinterTest#records()}.
 */
class FrameRepairFingerprintTest {
  /** The fingerprint of {@code RecordFingerprinterTest.records()} before V10 (see above). */
  private static final String BEFORE_V10 =
      "bd9050eb09ca5abb282036730a7c86b7d7b5369d3f28f1e54732dde5058d3951";
  /** Its "repair orders" section digest before V10. */
  private static final String ORDERS_BEFORE_V10 =
      "8dc75b9c7412a18159c1babbd512cac22abdb7f694042dac93b6a0cb93293a3d";

  private static RepairAction frameAction(long id, FrameRef member, RepairActionKind kind,
      Instant doneAt, String doneBy, Long verifiedBy) {
    return new RepairAction(id, 30, 4, null, kind, null, "refit it", LocalDate.of(2025, 3, 6),
        "crew", doneAt, doneBy, verifiedBy, member);
  }

  private static InspectionRecords withActions(List<RepairAction> actions) {
    InspectionRecords base = RecordFingerprinterTest.records();
    return new InspectionRecords(base.site(), base.structure(), base.inspection(), base.planes(),
        List.of(new InspectionRecords.OrderRecords(base.orders().get(0).order(), actions)));
  }

  private static String digest(RecordFingerprint f, String section) {
    return f.sections().stream().filter(s -> s.name().equals(section))
        .map(SectionDigest::sha256).findFirst().orElseThrow();
  }

  @Test
  void recordsWithoutFrameRepairActionsKeepTheirTextAndFingerprint() {
    InspectionRecords r = RecordFingerprinterTest.records();
    // DEVELOPERS.md: [type], then name=value per field in the fixed order, name! when absent
    assertThat(new String(RecordFingerprinter.orders(r.orders()).bytes(), StandardCharsets.UTF_8))
        .isEqualTo("""
            [order]
            id=30
            inspectionId=3
            createdAt=2025-03-03T09:06:40Z
            createdBy=P. Lowry
            note=keep off
            [action]
            id=31
            orderId=30
            planeId=4
            lift=2
            bay=1
            action=replace
            member=/
            description=new brace
            dueDate=2025-03-05
            assignee=crew
            doneAt!
            doneBy=
            verifiedBy!
            """);
    RecordFingerprint f = RecordFingerprinter.fingerprint(r);
    assertThat(digest(f, "repair orders")).isEqualTo(ORDERS_BEFORE_V10);
    assertThat(f.sha256()).isEqualTo(BEFORE_V10);
  }

  @Test
  void aFrameMemberActionHasItsOwnRecordInItsPlaceById() {
    InspectionRecords base = RecordFingerprinterTest.records();
    RepairAction panel = base.orders().get(0).actions().get(0); // id 31
    RepairAction refit = frameAction(32, FrameRef.ledger(3, 2), RepairActionKind.REFIT,
        Instant.parse("2025-03-04T12:00:00Z"), "crew", 7L);
    String text = new String(RecordFingerprinter.orders(withActions(List.of(panel, refit))
        .orders()).bytes(), StandardCharsets.UTF_8);
    String before = new String(RecordFingerprinter.orders(base.orders()).bytes(),
        StandardCharsets.UTF_8);
    assertThat(text).isEqualTo(before + """
        [frame-action]
        id=32
        orderId=30
        planeId=4
        type=ledger
        first=3
        second=2
        action=refit
        description=refit it
        dueDate=2025-03-06
        assignee=crew
        doneAt=2025-03-04T12:00:00Z
        doneBy=crew
        verifiedBy=7
        """);
  }

  @Test
  void aFrameRepairActionChangesTheRepairOrdersSectionOnly() {
    InspectionRecords base = RecordFingerprinterTest.records();
    RepairAction panel = base.orders().get(0).actions().get(0);
    RecordFingerprint before = RecordFingerprinter.fingerprint(base);
    RepairAction replace = frameAction(32, FrameRef.standard(1, 0), RepairActionKind.REPLACE,
        null, "", null);
    RecordFingerprint after = RecordFingerprinter.fingerprint(
        withActions(List.of(panel, replace)));
    for (SectionDigest s : before.sections()) {
      if (s.name().equals("repair orders")) {
        assertThat(digest(after, s.name())).isNotEqualTo(s.sha256());
      } else {
        assertThat(digest(after, s.name())).as(s.name()).isEqualTo(s.sha256());
      }
    }
    // each field that names the member or records the work is covered
    Instant done = Instant.parse("2025-03-04T12:00:00Z");
    Map<String, RepairAction> variants = Map.of(
        "member", frameAction(32, FrameRef.standard(1, 1), RepairActionKind.REPLACE, null, "",
            null),
        "type", frameAction(32, FrameRef.ledger(1, 1), RepairActionKind.REPLACE, null, "", null),
        "action", frameAction(32, FrameRef.standard(1, 0), RepairActionKind.REFIT, null, "", null),
        "done", frameAction(32, FrameRef.standard(1, 0), RepairActionKind.REPLACE, done, "crew",
            null),
        "verified", frameAction(32, FrameRef.standard(1, 0), RepairActionKind.REPLACE, done, "",
            9L));
    List<String> seen = new ArrayList<>();
    variants.forEach((what, v) -> {
      String sha = RecordFingerprinter.fingerprint(withActions(List.of(panel, v))).sha256();
      assertThat(sha).as(what).isNotEqualTo(after.sha256());
      seen.add(sha);
    });
    assertThat(seen).doesNotHaveDuplicates();
  }
}

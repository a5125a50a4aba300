package org.bracewalk.store;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import org.bracewalk.app.Fixtures;
import org.bracewalk.app.NewInspection;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.RepairAction;
import org.bracewalk.core.model.RepairActionKind;
import org.bracewalk.core.model.RepairOrder;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Migration V10 (repair actions on frame members) for any SQLite client: a repair action names a
 * panel, a frame member (as V9 names one on observations) or the whole plane; refit only on a
 * frame member; the schema refuses every other row; actions stay append-only with done and
 * verified set once. And a file of V9 keeps every repair action, id and guard through the rebuild.
 */
class FrameRepairActionSqlTest {
  private static final String AT = "'2025-03-03T09:00:00.000Z'";

  @TempDir Path dir;

  private static void run(Path file, String... sql) throws SQLException {
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file);
        Statement st = c.createStatement()) {
      st.execute("PRAGMA foreign_keys = ON");
      for (String s : sql) {
        st.executeUpdate(s);
      }
    }
  }

  private static void refused(Path file, String sql, String because) throws SQLException {
    String before = FrameMemberSqlTest.everything(file);
    assertThatThrownBy(() -> run(file, sql)).as(sql)
        .isInstanceOf(SQLException.class).hasMessageContaining(because);
    assertThat(FrameMemberSqlTest.everything(file)).as("nothing changed by " + sql)
        .isEqualTo(before);
  }

  private static List<String> names(Path file, String type) throws SQLException {
    List<String> out = new ArrayList<>();
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file);
        Statement st = c.createStatement();
        ResultSet r = st.executeQuery("SELECT name FROM sqlite_master WHERE type = '" + type
            + "' AND tbl_name = 'repair_actions' ORDER BY name")) {
      while (r.next()) {
        out.add(r.getString(1));
      }
    }
    return out;
  }

  /** An action of order 1 on plane 1 with the given columns and values. */
  private static String action(String columns, String values) {
    return "INSERT INTO repair_actions (order_id, plane_id, " + columns + ") VALUES (1, 1, "
        + values + ")";
  }

  /** A current file with one 3 x 2 plane ("spine"), one finalised inspection and one order. */
  private Path fileWithOrder() {
    Path file = dir.resolve("b.db");
    try (Database db = Database.open(file)) {
      Fixtures.Services s = Fixtures.Services.over(db);
      PlaneRecord p = Fixtures.plane(s);
      assertThat(p.id()).isEqualTo(1);
      long i = s.inspections().start(p.structureId(),
          NewInspection.of("M. Okafor", "inspector", InspectionReason.AFTER_IMPACT)).id();
      s.inspections().finalise(i);
      assertThat(db.repairs().addOrder(new RepairOrder(0, i, Instant.parse("2025-03-03T10:00:00Z"),
          "M. Okafor", "")).id()).isEqualTo(1);
    }
    return file;
  }

  @Test
  void theRepositoryStoresAndReadsBackAFrameMemberAction() {
    Path file = fileWithOrder();
    try (Database db = Database.open(file)) {
      RepairAction refit = db.repairs().addAction(new RepairAction(0, 1, 1, null,
          RepairActionKind.REFIT, null, "refit the beam", LocalDate.of(2025, 3, 5), "crew B",
          null, "", null, FrameRef.ledger(3, 2)));
      RepairAction replace = db.repairs().addAction(new RepairAction(0, 1, 1, null,
          RepairActionKind.REPLACE, null, "", null, "", null, "", null, FrameRef.standard(1, 0)));
      RepairAction plane = db.repairs().addAction(new RepairAction(0, 1, 1, null,
          RepairActionKind.TAKE_OUT_OF_SERVICE, null, "keep off", null, "", null, "", null));
      assertThat(db.repairs().findAction(refit.id())).contains(new RepairAction(refit.id(), 1, 1,
          null, RepairActionKind.REFIT, null, "refit the beam", LocalDate.of(2025, 3, 5),
          "crew B", null, "", null, FrameRef.ledger(3, 2)));
      assertThat(db.repairs().actionsOf(1)).extracting(RepairAction::frameMember)
          .containsExactly(FrameRef.ledger(3, 2), FrameRef.standard(1, 0), null);
      assertThat(plane.panel()).isNull();
      Instant done = Instant.parse("2025-03-04T12:00:00Z");
      RepairAction marked = db.repairs().markDone(replace.id(), done, "crew B");
      assertThat(marked).isEqualTo(new RepairAction(replace.id(), 1, 1, null,
          RepairActionKind.REPLACE, null, "", null, "", done, "crew B", null,
          FrameRef.standard(1, 0)));
    }
  }

  @Test
  void theSchemaRefusesBadFrameMemberActions() throws Exception {
    Path file = fileWithOrder();
    String refit = "frame_type, frame_first, frame_second, action";
    // refit only on a frame member
    refused(file, action("lift, bay, action", "1, 1, 'refit'"), "CHECK constraint");
    refused(file, action("action", "'refit'"), "CHECK constraint");
    // a frame member: repair, replace or refit; never brace or out of service; no diagonal
    refused(file, action(refit, "'ledger', 1, 1, 'brace'"), "CHECK constraint");
    refused(file, action(refit, "'ledger', 1, 1, 'take-out-of-service'"), "CHECK constraint");
    refused(file, action(refit + ", brace_diagonal, brace_kind",
        "'ledger', 1, 1, 'replace', '/', 'rigid'"), "CHECK constraint");
    // a panel or a frame member, not both
    refused(file, action("lift, bay, " + refit, "1, 1, 'ledger', 1, 1, 'refit'"),
        "CHECK constraint");
    // the names of V9: ledger (level 0.., bay 1..), standard (lift 1.., line 0..), all or none
    refused(file, action(refit, "'ledger', 0, 0, 'refit'"), "CHECK constraint");
    refused(file, action(refit, "'standard', 0, 1, 'refit'"), "CHECK constraint");
    refused(file, action(refit, "'brace', 1, 1, 'refit'"), "CHECK constraint");
    refused(file, action("frame_type, frame_first, action", "'ledger', 1, 'refit'"),
        "CHECK constraint");
    refused(file, action("frame_first, frame_second, action", "1, 1, 'repair'"),
        "CHECK constraint");
    refused(file, action(refit, "'ledger', 1, 1, 'fix'"), "CHECK constraint");
    // inside the plane (3 lifts x 2 bays): ledger levels 0..3, bays 1..2; standard lines 0..2
    refused(file, action(refit, "'ledger', 4, 1, 'refit'"),
        "the frame member of the repair action lies outside the plane");
    refused(file, action(refit, "'standard', 1, 3, 'refit'"),
        "the frame member of the repair action lies outside the plane");
    // these go in
    run(file, action(refit, "'ledger', 3, 2, 'refit'"),
        action(refit, "'standard', 3, 0, 'repair'"),
        action("lift, bay, action, brace_diagonal, brace_kind", "1, 2, 'brace', 'X', 'rigid'"));
    // append-only: the member never changes, done and verified are set once
    refused(file, "UPDATE repair_actions SET frame_first = 2 WHERE id = 1",
        "repair action cannot be changed");
    refused(file, "UPDATE repair_actions SET frame_type = 'standard', frame_first = 3,"
        + " frame_second = 2 WHERE id = 1", "repair action cannot be changed");
    refused(file, "UPDATE repair_actions SET action = 'replace' WHERE id = 1",
        "repair action cannot be changed");
    refused(file, "DELETE FROM repair_actions WHERE id = 1", "repair action cannot be deleted");
    refused(file, "INSERT OR REPLACE INTO repair_actions (id, order_id, plane_id, frame_type,"
        + " frame_first, frame_second, action) VALUES (1, 1, 1, 'ledger', 2, 2, 'refit')",
        "records are never overwritten");
    refused(file, action(refit + ", description", "'ledger', 2, 2, 'refit', ' padded'"),
        "text is stored trimmed");
    run(file, "UPDATE repair_actions SET done_at = " + AT + ", done_by = 'crew' WHERE id = 1");
    refused(file, "UPDATE repair_actions SET done_by = 'other' WHERE id = 1",
        "repair action cannot be changed");
  }

  /** A file of V9 with a repair order: a panel action done and verified, a whole-plane one. */
  private static final String[] V9_RECORDS =
      OldFileRows.oneFrameInspected(
          "UPDATE inspections SET status = 'finalised', finished_at = '2025-02-01T09:00:00.000Z',"
              + " inspection_interval_days = 7 WHERE id = 1",
          "INSERT INTO inspections (id, structure_id, started_at, inspector_name, reason)"
              + " VALUES (2, 1, '2025-02-05T08:00:00.000Z', 'M. Okafor', 'routine')",
          "INSERT INTO inspection_scope VALUES (2, 1, 1)",
          "UPDATE inspections SET status = 'finalised', finished_at = '2025-02-05T09:00:00.000Z',"
              + " inspection_interval_days = 7 WHERE id = 2",
          "INSERT INTO repair_orders (id, inspection_id, created_at, created_by, note)"
              + " VALUES (4, 1, '2025-02-01T10:00:00.000Z', 'M. Okafor', 'keep off')",
          "INSERT INTO repair_actions (id, order_id, plane_id, lift, bay, action, brace_diagonal,"
              + " brace_kind, description, due_date, assignee) VALUES (6, 4, 1, 1, 1, 'replace', '/',"
              + " 'rigid', 'new brace', '2025-02-03', 'crew B')",
          "UPDATE repair_actions SET done_at = '2025-02-02T15:00:00.000Z', done_by = 'crew B'"
              + " WHERE id = 6",
          "UPDATE repair_actions SET verified_by_inspection_id = 2 WHERE id = 6",
          "INSERT INTO repair_actions (id, order_id, plane_id, action, description)"
              + " VALUES (9, 4, 1, 'take-out-of-service', 'tape it off')");

  @Test
  void aV9FileKeepsEveryRepairActionIdAndGuardThroughTheRebuild() throws Exception {
    Path file = OlderFiles.migratedTo(dir.resolve("v9.db"), "9");
    run(file, V9_RECORDS);
    List<String> triggersBefore = names(file, "trigger");
    List<String> indexesBefore = names(file, "index");
    String before = FrameMemberSqlTest.everything(file);

    try (Database db = Database.open(file)) {
      assertThat(db.repairs().actionsOf(4)).containsExactly(
          new RepairAction(6, 4, 1, PanelRef.of(1, 1),
              RepairActionKind.REPLACE, Brace.rigid(
                  Diagonal.RISING), "new brace",
              LocalDate.of(2025, 2, 3), "crew B", Instant.parse("2025-02-02T15:00:00Z"),
              "crew B", 2L),
          new RepairAction(9, 4, 1, null, RepairActionKind.TAKE_OUT_OF_SERVICE, null,
              "tape it off", null, "", null, "", null));
    }
    // every row as it was, the new columns empty; the same indexes and triggers, and the new one
    String expected = before.replace("verified_by_inspection_id=2|\n",
            "verified_by_inspection_id=2|frame_type=null|frame_first=null|frame_second=null|\n")
        .replace("verified_by_inspection_id=null|\n",
            "verified_by_inspection_id=null|frame_type=null|frame_first=null|frame_second=null|\n")
        // V11: a site stored before jurisdictions were recorded is "other"
        .replace("display_units=metric|\n", "display_units=metric|jurisdiction=other|\n");
    assertThat(expected).isNotEqualTo(before);
    assertThat(FrameMemberSqlTest.withoutUuids(FrameMemberSqlTest.everything(file)))
        .isEqualTo(expected);
    // V12's indexes of global identities are the only other ones
    assertThat(names(file, "index").stream().filter(n -> !n.endsWith("_by_uuid")))
        .containsExactlyElementsOf(indexesBefore);
    // V12's triggers of global identities aside
    assertThat(names(file, "trigger").stream().filter(n -> !n.contains("uuid")))
        .containsAll(triggersBefore)
        .contains("repair_actions_frame_member_inside_the_plane")
        .hasSize(triggersBefore.size() + 1);
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file);
        Statement st = c.createStatement()) {
      try (ResultSet r = st.executeQuery("PRAGMA foreign_key_check")) {
        assertThat(r.next()).as("no dangling reference").isFalse();
      }
      try (ResultSet r = st.executeQuery("PRAGMA integrity_check")) {
        r.next();
        assertThat(r.getString(1)).isEqualTo("ok");
      }
      try (ResultSet r = st.executeQuery(
          "SELECT sql FROM sqlite_master WHERE tbl_name = 'repair_actions'")) {
        while (r.next()) {
          assertThat(r.getString(1)).doesNotContain("_v10");
        }
      }
    }
    // the guards hold on the migrated file as before
    refused(file, "DELETE FROM repair_actions WHERE id = 9", "repair action cannot be deleted");
    refused(file, "UPDATE repair_actions SET description = 'x' WHERE id = 9",
        "repair action cannot be changed");
    refused(file, "UPDATE repair_actions SET verified_by_inspection_id = 1 WHERE id = 6",
        "repair action cannot be changed");
  }
}

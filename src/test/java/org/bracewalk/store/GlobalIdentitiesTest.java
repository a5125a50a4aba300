package org.bracewalk.store;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.ZoneId;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.UUID;
import org.bracewalk.core.model.DisplayUnits;
import org.bracewalk.core.model.Site;
import org.bracewalk.core.port.GlobalIdentities;
import org.bracewalk.core.port.GlobalIdentities.Kind;
import org.bracewalk.core.port.StoreException;
import org.flywaydb.core.Flyway;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * Migration V12: every record a sync moves has a global identity (a UUID), unique, never changed,
 * in both stores. The outside reference for the form is RFC 9562 (UUID version 4: 8-4-4-4-12 hex
 * digits, version nibble 4, variant bits 10), checked with {@link UUID#fromString}.
 */
class GlobalIdentitiesTest {
  @TempDir Path dir;

  /** The tables a sync moves, each with its kind. */
  private static final Map<String, Kind> SYNCED = Map.of(
      "sites", Kind.SITE, "structures", Kind.STRUCTURE, "planes", Kind.PLANE,
      "design_revisions", Kind.DESIGN_REVISION, "inspections", Kind.INSPECTION,
      "observations", Kind.OBSERVATION, "photos", Kind.PHOTO, "repair_orders", Kind.REPAIR_ORDER,
      "repair_actions", Kind.REPAIR_ACTION, "issued_reports", Kind.ISSUED_REPORT);

  /** Records of every synced kind, as a V11 database holds them (raw SQL, ids given). */
  private static final String[] V11_RECORDS =
      OldFileRows.oneFrameInspected(
          "INSERT INTO sites (id, name, time_zone, display_units) VALUES (2, 'Yard', 'UTC', 'metric')",
          "INSERT INTO observations (id, inspection_id, plane_id, lift, bay, state, recorded_at)"
              + " VALUES (7, 1, 1, 1, 1, 'missing', '2025-02-01T08:10:00.000Z')",
          "INSERT INTO observations (id, inspection_id, plane_id, lift, bay, state, recorded_at)"
              + " VALUES (8, 1, 1, 2, 1, 'sound', '2025-02-01T08:11:00.000Z')",
          "INSERT INTO photos (id, observation_id, file_name, media_type, data, attached_at)"
              + " VALUES (5, 7, 'a.jpg', 'image/jpeg', x'ffd8ff00', '2025-02-01T08:12:00.000Z')",
          "INSERT INTO photos (id, observation_id, file_name, media_type, data, attached_at)"
              + " VALUES (6, 7, 'b.jpg', 'image/jpeg', x'ffd8ff01', '2025-02-01T08:12:00.000Z')",
          "UPDATE inspections SET status = 'finalised', finished_at = '2025-02-01T09:00:00.000Z',"
              + " inspection_interval_days = 7 WHERE id = 1",
          "INSERT INTO repair_orders (id, inspection_id, created_at, created_by, note)"
              + " VALUES (4, 1, '2025-02-01T10:00:00.000Z', 'M. Okafor', 'keep off')",
          "INSERT INTO repair_actions (id, order_id, plane_id, lift, bay, action, brace_diagonal,"
              + " brace_kind, description, due_date, assignee) VALUES (6, 4, 1, 1, 1, 'replace', '/',"
              + " 'rigid', 'new brace', '2025-02-03', 'crew B')",
          "INSERT INTO repair_actions (id, order_id, plane_id, action, description)"
              + " VALUES (9, 4, 1, 'take-out-of-service', 'tape it off')",
          "INSERT INTO issued_reports (inspection_id, file_name, fingerprint, issued_at, kind,"
              + " records_fingerprint, origin) VALUES (1, 'i1.pdf', '" + "a".repeat(64) + "',"
              + " '2025-02-03T00:00:00.000Z', 'inspection-report', '" + "b".repeat(64) + "', 'issued')");

  private static String v11Database(StoreBackend backend, Path dir) throws SQLException {
    String location;
    if (backend == StoreBackend.SQLITE) {
      location = OlderFiles.migratedTo(dir.resolve("v11.db"), "11").toString();
    } else {
      location = StoreBackend.blankServerDatabase();
      ServerAddress server = ServerAddress.parse(location, StoreBackend.env());
      Flyway.configure(Database.class.getClassLoader())
          .dataSource(Database.serverDataSource(server, StoreBackend.env()))
          .locations(Dialect.POSTGRESQL.migrations()).target("11").load().migrate();
    }
    try (Connection c = StoreBackend.connect(location); Statement st = c.createStatement()) {
      for (String sql : V11_RECORDS) {
        st.executeUpdate(backend == StoreBackend.SQLITE ? sql
            : sql.replaceAll("x'(ffd8ff0[01])'", "'\\\\x$1'::bytea"));
      }
    }
    return location;
  }

  @ParameterizedTest
  @EnumSource(StoreBackend.class)
  void anOldDatabaseGetsAUniqueVersion4IdentityOnEveryRecordASyncMoves(StoreBackend backend)
      throws Exception {
    String location = v11Database(backend, dir);
    try (Database db = StoreBackend.reopen(location)) {
      for (Map.Entry<String, Kind> t : SYNCED.entrySet()) {
        Map<Long, String> ids = db.identities().all(t.getValue());
        assertThat(ids).as(t.getKey()).isNotEmpty();
        assertThat(ids.values()).as(t.getKey()).doesNotContainNull().doesNotHaveDuplicates()
            .allSatisfy(u -> {
              UUID parsed = UUID.fromString(u);
              assertThat(parsed.toString()).isEqualTo(u); // lower case, 8-4-4-4-12
              assertThat(parsed.version()).isEqualTo(4);
              assertThat(parsed.variant()).isEqualTo(2); // RFC 9562 variant 10xx
            });
        for (Map.Entry<Long, String> e : ids.entrySet()) {
          assertThat(db.identities().idOf(t.getValue(), e.getValue())).contains(e.getKey());
          assertThat(db.identities().uuidOf(t.getValue(), e.getKey())).isEqualTo(e.getValue());
        }
      }
      // the append-only rules still hold after the backfill
      assertThatThrownBy(() -> rawUpdate(location, "UPDATE observations SET note = 'x'"))
          .hasMessageContaining("observation cannot be changed");
      assertThatThrownBy(() -> rawUpdate(location, "UPDATE sites SET name = 'x'"))
          .hasMessageContaining("site cannot be changed");
      assertThatThrownBy(() -> rawUpdate(location,
          "UPDATE inspections SET inspector_name = 'x' WHERE id = 1"))
          .hasMessageContaining("the inspection is finalised and cannot be changed");
    }
    // the column is NOT NULL in effect: across every row of every synced table
    try (Connection c = StoreBackend.connect(location); Statement st = c.createStatement()) {
      Set<String> seen = new HashSet<>();
      for (String t : SYNCED.keySet()) {
        try (ResultSet r = st.executeQuery("SELECT count(*) FROM " + t + " WHERE uuid IS NULL")) {
          r.next();
          assertThat(r.getLong(1)).as(t).isZero();
        }
        try (ResultSet r = st.executeQuery("SELECT uuid FROM " + t)) {
          while (r.next()) {
            assertThat(seen.add(r.getString(1))).as("no two records share " + r.getString(1))
                .isTrue();
          }
        }
      }
      assertThat(seen).hasSize(14);
    }
  }

  @ParameterizedTest
  @EnumSource(StoreBackend.class)
  void newRecordsGetOneAdoptedRecordsKeepTheirsAndNoneChanges(StoreBackend backend)
      throws Exception {
    String location = backend.freshLocation(dir);
    String given = "0f2c5a4e-8d1b-4c3a-9e7f-123456789abc";
    try (Database db = StoreBackend.reopen(location)) {
      Site a = db.sites().add(site("A"));
      Site b = db.identities().adopting(Kind.SITE, given, () -> db.sites().add(site("B")));
      Site c = db.sites().add(site("C"));
      GlobalIdentities ids = db.identities();
      assertThat(ids.uuidOf(Kind.SITE, b.id())).isEqualTo(given);
      List<String> all = new ArrayList<>(ids.all(Kind.SITE).values());
      assertThat(all).hasSize(3).doesNotHaveDuplicates();
      assertThat(UUID.fromString(ids.uuidOf(Kind.SITE, a.id())).version()).isEqualTo(4);
      assertThat(ids.idOf(Kind.SITE, ids.uuidOf(Kind.SITE, c.id()))).contains(c.id());
      assertThat(ids.idOf(Kind.SITE, UUID.randomUUID().toString())).isEmpty();
      // a second record with a taken identity is refused, nothing stored
      assertThatThrownBy(() -> ids.adopting(Kind.SITE, given, () -> db.sites().add(site("D"))))
          .isInstanceOf(StoreException.class)
          .hasMessageContaining("already exists: records are never overwritten");
      assertThat(db.sites().all()).hasSize(3);
      assertThatThrownBy(() -> ids.uuidOf(Kind.SITE, 99))
          .isInstanceOf(GlobalIdentities.NotFoundInStoreException.class);
    }
    // another client: an insert without one gets one; an identity never changes, even where a
    // record may otherwise change (a structure's interval)
    rawUpdate(location, "INSERT INTO structures (site_id, name, kind) VALUES (1, 'Run', 'scaffold')");
    try (Connection c = StoreBackend.connect(location); Statement st = c.createStatement();
        ResultSet r = st.executeQuery("SELECT uuid FROM structures")) {
      assertThat(r.next()).isTrue();
      assertThat(UUID.fromString(r.getString(1)).version()).isEqualTo(4);
    }
    rawUpdate(location, "UPDATE structures SET inspection_interval_days = 7");
    assertThatThrownBy(() -> rawUpdate(location,
        "UPDATE structures SET uuid = '" + UUID.randomUUID() + "'"))
        .hasMessageContaining("a record keeps its global identity (uuid)");
    assertThatThrownBy(() -> rawUpdate(location, "UPDATE structures SET uuid = NULL"))
        .isInstanceOf(SQLException.class);
    assertThatThrownBy(() -> rawUpdate(location,
        "INSERT INTO structures (site_id, name, kind, uuid) VALUES (1, 'R2', 'scaffold', 'x')"))
        .hasMessageContaining("a global identity (uuid) is 36 characters");
  }

  private static void rawUpdate(String location, String sql) throws SQLException {
    try (Connection c = StoreBackend.connect(location); Statement st = c.createStatement()) {
      st.executeUpdate(sql);
    }
  }

  private static Site site(String name) {
    return new Site(0, name, "", "", "", ZoneId.of("UTC"), DisplayUnits.METRIC);
  }
}

package org.bracewalk.store;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.List;
import org.bracewalk.app.Fixtures;
import org.bracewalk.app.NewInspection;
import org.bracewalk.app.NewObservation;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.DefectType;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.Photo;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.port.InspectionFinalisedException;
import org.bracewalk.core.port.StoreException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * The store's behaviour; the tests with a {@link StoreBackend} parameter run against both stores
 * (a database file and a PostgreSQL server), the others are about the SQLite file itself.
 */
class DatabaseTest {
  @TempDir Path dir;

  private static String pragma(Connection c, String name) throws SQLException {
    try (Statement s = c.createStatement(); ResultSet r = s.executeQuery("PRAGMA " + name)) {
      r.next();
      return r.getString(1);
    }
  }

  @Test
  void everyConnectionHasForeignKeysWalFullSyncAndABusyTimeout() throws Exception {
    Path file = dir.resolve("sub/folder/b.db");
    Files.createDirectories(file.getParent()); // the store makes no folders (DatabaseFileTest)
    try (Database db = Database.open(file)) {
      assertThat(Files.exists(file)).isTrue();
      for (int i = 0; i < 2; i++) {
        try (Connection c = Database.dataSource(file).getConnection()) {
          assertThat(pragma(c, "foreign_keys")).isEqualTo("1");
          assertThat(pragma(c, "journal_mode")).isEqualTo("wal");
          assertThat(pragma(c, "synchronous")).isEqualTo("2");
          assertThat(pragma(c, "busy_timeout")).isEqualTo(String.valueOf(Database.BUSY_TIMEOUT_MS));
        }
      }
      assertThat(db.integrityCheck()).isEqualTo("ok");
    }
  }

  @ParameterizedTest
  @EnumSource(StoreBackend.class)
  void reopeningAppliesNoMigrationTwiceAndKeepsTheRecords(StoreBackend backend) {
    String location = backend.freshLocation(dir);
    long planeId;
    try (Database db = StoreBackend.reopen(location)) {
      planeId = Fixtures.plane(Fixtures.Services.over(db)).id();
    }
    try (Database db = StoreBackend.reopen(location)) {
      PlaneRecord plane = db.planes().find(planeId).orElseThrow();
      assertThat(plane.grid()).isEqualTo(Fixtures.threeByTwo().grid());
      assertThat(db.designs().latest(planeId).orElseThrow().design())
          .isEqualTo(Fixtures.threeByTwo());
    }
  }

  @Test
  void thePackedScriptListIsTheMigrationsFolderInVersionOrder() throws Exception {
    List<String> files;
    try (var listing = Files.list(Path.of("db-migrations"))) {
      files = listing.map(p -> p.getFileName().toString())
          .filter(n -> n.endsWith(".sql"))
          .sorted(java.util.Comparator.comparingInt(
              n -> Integer.parseInt(n.substring(1, n.indexOf("__")))))
          .toList();
    }
    assertThat(Database.MIGRATION_SCRIPTS).isEqualTo(files);
  }

  @Test
  void openingAFileAtTheCurrentSchemaSkipsFlywayAndAnOlderFileIsMigrated() throws Exception {
    Path file = dir.resolve("old.db");
    // a file made by a program that knew only the first script
    OlderFiles.migratedTo(file, "1");
    assertThat(Database.schemaIsCurrent(Database.dataSource(file))).isFalse();
    try (Database db = Database.open(file)) {
      assertThat(db.integrityCheck()).isEqualTo("ok");
    }
    assertThat(Database.schemaIsCurrent(Database.dataSource(file))).isTrue();
    try (Connection c = Database.dataSource(file).getConnection(); Statement s = c.createStatement()) {
      // the second script ran: its history row and its trigger are there
      try (ResultSet r = s.executeQuery(
          "SELECT count(*) FROM flyway_schema_history WHERE script = 'V2__planes_never_change.sql'")) {
        r.next();
        assertThat(r.getInt(1)).isEqualTo(1);
      }
      try (ResultSet r = s.executeQuery(
          "SELECT count(*) FROM sqlite_master WHERE type = 'trigger' AND name = 'planes_never_change'")) {
        r.next();
        assertThat(r.getInt(1)).isEqualTo(1);
      }
      // a current file is opened without Flyway: a checksum Flyway would refuse goes unread
      s.executeUpdate("UPDATE flyway_schema_history SET checksum = 12345 WHERE script = 'V2__planes_never_change.sql'");
    }
    try (Database db = Database.open(file)) {
      assertThat(db.integrityCheck()).isEqualTo("ok");
    }
    try (Connection c = Database.dataSource(file).getConnection(); Statement s = c.createStatement()) {
      // a newer program's migration, or a failed one: not current, so Flyway looks at it again
      s.executeUpdate("INSERT INTO flyway_schema_history (installed_rank, version, description, type,"
          + " script, checksum, installed_by, execution_time, success)"
          + " VALUES (99, '99', 'later', 'SQL', 'V99__later.sql', 0, 'test', 0, 0)");
    }
    assertThat(Database.schemaIsCurrent(Database.dataSource(file))).isFalse();
    Path text = dir.resolve("notes.db");
    Files.writeString(text, "not a database at all, just words\n".repeat(100));
    assertThat(Database.schemaIsCurrent(Database.dataSource(text))).isFalse();
  }

  @Test
  void aFileThatIsNotADatabaseIsRefusedByName() throws Exception {
    Path file = dir.resolve("notes.db");
    Files.writeString(file, "shopping list: bolts, couplers, tape\n".repeat(200));
    assertThatThrownBy(() -> Database.open(file))
        .isInstanceOf(StoreException.class)
        .hasMessageContaining(file.toString());
  }

  @ParameterizedTest
  @EnumSource(StoreBackend.class)
  void recordsComeBackAsStored(StoreBackend backend) {
    try (Database db = backend.open(dir)) {
      Fixtures.Services s = Fixtures.Services.over(db);
      PlaneRecord plane = Fixtures.plane(s);
      Inspection inspection =
          s.inspections().start(plane.structureId(),
              NewInspection.of("M. Okafor", "competent person", InspectionReason.ROUTINE));
      assertThat(inspection.carriedOutForName()).isEqualTo("Orrin Vale Storage Ltd");
      Observation o =
          s.inspections().recordObservation(inspection.id(),
              new NewObservation(plane.id(), PanelRef.of(2, 1), PanelState.DAMAGED_EFFECTIVE,
                  Brace.rigid(Diagonal.RISING), 10.1, 1000, DefectType.BENT, "dent near node",
                  "M. Okafor"));
      assertThat(db.observations().find(o.id())).contains(o);
      assertThat(o.bowMm()).isEqualTo(10.1);
      Photo photo = db.observations().addPhoto(new Photo(0, o.id(), "b2.jpg", "image/jpeg",
          new byte[] {1, 2}, java.time.Instant.parse("2025-03-03T08:00:00.123Z")));
      assertThat(s.inspections().photos(o.id())).containsExactly(photo);
      assertThat(db.observations().withPhotos(inspection.id())).containsExactly(o.id());
      assertThat(db.inspections().ofStructure(plane.structureId())).containsExactly(inspection);
    }
  }

  @ParameterizedTest
  @EnumSource(StoreBackend.class)
  void observationsCannotBeChangedOrDeletedEvenBySql(StoreBackend backend) throws Exception {
    String location = backend.freshLocation(dir);
    try (Database db = StoreBackend.reopen(location)) {
      Fixtures.Services s = Fixtures.Services.over(db);
      PlaneRecord plane = Fixtures.plane(s);
      long inspection = s.inspections().start(plane.structureId(),
          NewInspection.of("M. Okafor", "", InspectionReason.ROUTINE)).id();
      s.inspections().recordObservation(inspection,
          NewObservation.of(plane.id(), PanelRef.of(1, 1), PanelState.SOUND, "M. Okafor"));
    }
    try (Connection c = StoreBackend.connect(location);
        Statement st = c.createStatement()) {
      // the database's own message is literal text (it must parse in SQLite before 3.47)
      assertThatThrownBy(() -> st.executeUpdate("UPDATE observations SET state = 'missing'"))
          .hasMessageContaining("observation cannot be changed").hasMessageContaining("append-only");
      assertThatThrownBy(() -> st.executeUpdate("DELETE FROM observations"))
          .hasMessageContaining("append-only");
    }
  }

  @ParameterizedTest
  @EnumSource(StoreBackend.class)
  void aFinalisedInspectionRefusesChangesInCodeAndInTheDatabase(StoreBackend backend) throws Exception {
    String location = backend.freshLocation(dir);
    long inspection;
    long observation;
    long planeId;
    try (Database db = StoreBackend.reopen(location)) {
      Fixtures.Services s = Fixtures.Services.over(db);
      PlaneRecord plane = Fixtures.plane(s);
      planeId = plane.id();
      inspection = s.inspections().start(plane.structureId(),
          NewInspection.of("M. Okafor", "", InspectionReason.ROUTINE)).id();
      observation = s.inspections().recordObservation(inspection,
          NewObservation.of(plane.id(), PanelRef.of(1, 1), PanelState.SOUND, "M. Okafor")).id();
      s.inspections().finalise(inspection);
      long id = inspection;
      assertThatThrownBy(() -> s.inspections().recordObservation(id,
              NewObservation.of(planeId, PanelRef.of(1, 2), PanelState.SOUND, "M. Okafor")))
          .isInstanceOf(InspectionFinalisedException.class)
          .hasMessageContaining("inspection " + id + " is finalised");
      assertThatThrownBy(() -> s.inspections().correct(id, observation,
              NewObservation.of(planeId, PanelRef.of(1, 1), PanelState.MISSING, "M. Okafor"),
              "wrong panel"))
          .isInstanceOf(InspectionFinalisedException.class);
      assertThatThrownBy(() -> s.inspections().finalise(id))
          .isInstanceOf(InspectionFinalisedException.class);
      // past the service: the repository meets the trigger and still names the inspection
      Observation sneaky = new Observation(0, id, planeId, PanelRef.of(1, 2), PanelState.SOUND,
          null, null, null, null, null, java.time.Instant.now(), "", null, null);
      assertThatThrownBy(() -> db.observations().add(sneaky))
          .isInstanceOf(InspectionFinalisedException.class)
          .satisfies(e -> assertThat(((InspectionFinalisedException) e).inspectionId()).isEqualTo(id));
      assertThatThrownBy(() -> db.observations().addPhoto(new Photo(0, observation, "x.jpg",
              "image/jpeg", new byte[] {1}, java.time.Instant.now())))
          .isInstanceOf(InspectionFinalisedException.class)
          .hasMessageContaining("inspection " + id);
    }
    try (Connection c = StoreBackend.connect(location);
        Statement st = c.createStatement()) {
      assertThatThrownBy(() -> st.executeUpdate("UPDATE inspections SET inspector_name = 'X'"))
          .hasMessageContaining("the inspection is finalised and cannot be changed (update it)");
      assertThatThrownBy(() -> st.executeUpdate("DELETE FROM inspections"))
          .hasMessageContaining("the inspection is finalised and cannot be changed (delete it)");
    }
  }

  @ParameterizedTest
  @EnumSource(StoreBackend.class)
  void foreignKeysRefuseAnObservationOfAnUnknownInspection(StoreBackend backend) {
    try (Database db = backend.open(dir)) {
      Fixtures.Services s = Fixtures.Services.over(db);
      PlaneRecord plane = Fixtures.plane(s);
      Observation orphan = new Observation(0, 99, plane.id(), PanelRef.of(1, 1), PanelState.SOUND,
          null, null, null, null, null, java.time.Instant.now(), "", null, null);
      assertThatThrownBy(() -> db.observations().add(orphan)).isInstanceOf(StoreException.class);
      assertThat(db.observations().ofInspection(99)).isEmpty();
    }
  }

  @ParameterizedTest
  @EnumSource(StoreBackend.class)
  void aFailedTransactionLeavesNothingBehind(StoreBackend backend) {
    try (Database db = backend.open(dir)) {
      Fixtures.Services s = Fixtures.Services.over(db);
      assertThatThrownBy(() -> db.inTransaction(() -> {
        s.sites().createSite(Fixtures.site());
        throw new IllegalStateException("boom");
      })).hasMessage("boom");
      assertThat(db.sites().all()).isEmpty();
      db.inTransaction(() -> s.sites().createSite(Fixtures.site()));
      assertThat(db.sites().all()).hasSize(1);
    }
  }

  /**
   * Another program holds the write lock past the busy timeout: the transaction is refused as
   * busy, and the store stays sound: the next transaction is still all or nothing. (With the
   * driver's own transactions the timed-out BEGIN left it believing one was open, and the next
   * "transaction" committed statement by statement.)
   */
  @Test
  void aTransactionRefusedAsBusyLeavesTheNextOneAllOrNothing() throws Exception {
    Path file = dir.resolve("busy.db");
    try (Database db = Database.open(file, 200);
        Connection other = DriverManager.getConnection("jdbc:sqlite:" + file);
        Statement st = other.createStatement()) {
      Fixtures.Services s = Fixtures.Services.over(db);
      st.execute("BEGIN IMMEDIATE");
      assertThatThrownBy(() -> db.inTransaction(() -> s.sites().createSite(Fixtures.site())))
          .isInstanceOf(org.bracewalk.core.port.StoreBusyException.class)
          .hasMessageContaining("stayed busy for 0.2 s");
      st.execute("ROLLBACK");
      assertThatThrownBy(() -> db.inTransaction(() -> {
        s.sites().createSite(Fixtures.site());
        throw new IllegalStateException("boom");
      })).hasMessage("boom");
      assertThat(db.sites().all()).isEmpty();
      db.inTransaction(() -> s.sites().createSite(Fixtures.site()));
      assertThat(db.sites().all()).hasSize(1);
      // and the lock is free again between transactions: the other program can write
      st.execute("BEGIN IMMEDIATE");
      st.execute("ROLLBACK");
    }
  }

  @ParameterizedTest
  @EnumSource(StoreBackend.class)
  void aSecondPlaneOfTheSameNameIsRefusedByName(StoreBackend backend) {
    try (Database db = backend.open(dir)) {
      Fixtures.Services s = Fixtures.Services.over(db);
      PlaneRecord plane = Fixtures.plane(s);
      assertThatThrownBy(() -> db.planes().add(new PlaneRecord(0, plane.structureId(), "spine",
              plane.grid())))
          .isInstanceOf(StoreException.class).hasMessageContaining("'spine'");
      assertThat(db.planes().ofStructure(plane.structureId())).hasSize(1);
      assertThat(List.of(plane)).isEqualTo(db.planes().ofStructure(plane.structureId()));
    }
  }
}

package org.bracewalk.store;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.security.MessageDigest;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.Statement;
import java.util.HexFormat;
import java.util.List;
import java.util.stream.Stream;
import org.bracewalk.app.Fixtures;
import org.bracewalk.core.port.StoreException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A Bracewalk database carries SQLite's application_id "BrWk"; any other file given as the
 * database is refused without a byte written. Header layout: SQLite's "Database File Format"
 * (sqlite.org/fileformat2.html, section 1.3): the 16-byte magic, the application id as a
 * big-endian integer at offset 68, the read/write versions at offsets 18 and 19 (2 = WAL).
 */
class DatabaseFileTest {
  @TempDir Path dir;

  /** SHA-256 of the bytes, the modification time, and the folder's listing. */
  private record Fingerprint(String sha256, FileTime modified, List<String> folder) {}

  private Fingerprint fingerprint(Path file) throws Exception {
    String sha = HexFormat.of().formatHex(
        MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(file)));
    try (Stream<Path> s = Files.list(file.getParent())) {
      return new Fingerprint(sha, Files.getLastModifiedTime(file),
          s.map(p -> p.getFileName().toString()).sorted().toList());
    }
  }

  private static byte[] header(Path file) throws Exception {
    try (InputStream in = Files.newInputStream(file)) {
      return in.readNBytes(100);
    }
  }

  /** Another program's database, made with the driver directly, closed before the test. */
  private Path foreign(String name, String journalMode, int applicationId) throws Exception {
    Path file = dir.resolve(name);
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file);
        Statement s = c.createStatement()) {
      s.execute("PRAGMA journal_mode = " + journalMode);
      if (applicationId != 0) {
        s.execute("PRAGMA application_id = " + applicationId);
      }
      s.execute("CREATE TABLE t (x TEXT)");
      s.execute("INSERT INTO t VALUES ('kept'), ('as it was')");
    }
    assertThat(Files.exists(Path.of(file + "-wal"))).isFalse();
    return file;
  }

  @Test
  void aNewDatabaseIsMarkedBrWkFromItsFirstWrite() throws Exception {
    Path file = dir.resolve("new.db");
    try (Database db = Database.open(file)) {
      Fixtures.plane(Fixtures.Services.over(db));
    }
    byte[] h = header(file);
    assertThat(new String(h, 68, 4, java.nio.charset.StandardCharsets.US_ASCII)).isEqualTo("BrWk");
    assertThat(DatabaseFile.applicationId(h)).isEqualTo(DatabaseFile.APPLICATION_ID);
    assertThat(DatabaseFile.inspect(file)).isEqualTo(DatabaseFile.Kind.BRACEWALK);
    try (Database db = Database.open(file)) {
      assertThat(db.planes().find(1)).isPresent();
    }
  }

  @Test
  void anotherProgramsSqliteFileIsRefusedWithoutAByteWritten() throws Exception {
    for (String mode : List.of("DELETE", "WAL")) {
      Path file = foreign("other-" + mode + ".sqlite", mode, 0);
      Fingerprint before = fingerprint(file);
      assertThatThrownBy(() -> Database.open(file))
          .isInstanceOf(StoreException.class)
          .hasMessageContaining(file.toString())
          .hasMessageContaining("not a Bracewalk one")
          .hasMessageContaining("its tables: t");
      assertThat(fingerprint(file)).as(mode).isEqualTo(before);
      assertThat(Files.exists(Path.of(file + "-wal"))).as(mode).isFalse();
      assertThat(Files.exists(Path.of(file + "-shm"))).as(mode).isFalse();
      assertThatThrownBy(() -> Database.delete(file)).isInstanceOf(StoreException.class)
          .hasMessageContaining(file.toString());
      assertThat(fingerprint(file)).as(mode).isEqualTo(before);
    }
  }

  @Test
  void aSqliteFileWithAnotherApplicationIdIsRefusedAndNamedAsSuch() throws Exception {
    Path file = foreign("geo.gpkg", "DELETE", 0x47504B47); // "GPKG", as GeoPackage files carry
    Fingerprint before = fingerprint(file);
    assertThatThrownBy(() -> Database.open(file))
        .isInstanceOf(StoreException.class)
        .hasMessageContaining(file.toString())
        .hasMessageContaining("another program's SQLite database")
        .hasMessageContaining("0x47504B47 'GPKG'");
    assertThat(fingerprint(file)).isEqualTo(before);
  }

  @Test
  void aFileThatIsNotSqliteIsRefusedUnchanged() throws Exception {
    Path file = dir.resolve("notes.db");
    Files.writeString(file, "shopping list: bolts, couplers, tape\n".repeat(200));
    Fingerprint before = fingerprint(file);
    assertThatThrownBy(() -> Database.open(file))
        .isInstanceOf(StoreException.class)
        .hasMessageContaining(file + " is not a SQLite database");
    assertThatThrownBy(() -> Database.delete(file)).isInstanceOf(StoreException.class);
    assertThat(fingerprint(file)).isEqualTo(before);
  }

  @Test
  void aBracewalkFileFromBeforeTheMarkIsOpenedAndThenMarked() throws Exception {
    Path file = dir.resolve("older.db");
    // as an older Bracewalk made it: migrated by Flyway, application id 0
    OlderFiles.migratedTo(file, "latest");
    assertThat(DatabaseFile.applicationId(header(file))).isZero();
    assertThat(DatabaseFile.inspect(file)).isEqualTo(DatabaseFile.Kind.UNMARKED_BRACEWALK);
    try (Database db = Database.open(file)) {
      assertThat(db.integrityCheck()).isEqualTo("ok");
    }
    assertThat(DatabaseFile.applicationId(header(file))).isEqualTo(DatabaseFile.APPLICATION_ID);
  }

  @Test
  void aFileWhileAnotherBracewalkHasItOpenIsStillRecognised() throws Exception {
    Path file = dir.resolve("shared.db");
    try (Database first = Database.open(file); Database second = Database.open(file)) {
      assertThat(second.integrityCheck()).isEqualTo("ok");
      try (Connection c = Database.dataSource(file).getConnection(); Statement s = c.createStatement();
          ResultSet r = s.executeQuery("PRAGMA application_id")) {
        r.next();
        assertThat(r.getInt(1)).isEqualTo(DatabaseFile.APPLICATION_ID);
      }
    }
  }

  @Test
  void aFolderThatDoesNotExistIsRefusedAndNotMade() {
    Path file = dir.resolve("typo/site.db");
    assertThatThrownBy(() -> Database.open(file))
        .isInstanceOf(StoreException.class)
        .hasMessageContaining("the folder " + dir.resolve("typo") + " does not exist");
    assertThat(Files.exists(dir.resolve("typo"))).isFalse();
  }

  @Test
  void deleteRemovesABracewalkFileWithItsCompanionsAndNothingWhenThereIsNone() throws Exception {
    Path file = dir.resolve("demo.db");
    assertThat(Database.delete(file)).isFalse();
    Database.open(file).close();
    assertThat(Database.delete(file)).isTrue();
    assertThat(Files.exists(file)).isFalse();
    assertThat(Files.exists(Path.of(file + "-wal"))).isFalse();
    Path link = Files.createSymbolicLink(dir.resolve("link.db"), dir.resolve("elsewhere.db"));
    assertThatThrownBy(() -> Database.delete(link)).hasMessageContaining("symbolic link");
  }
}

package org.bracewalk.store;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;
import org.bracewalk.core.port.StoreException;
import org.sqlite.SQLiteConfig;

/**
 * What a file given as the database is, found out without writing a byte to it: the one check
 * every way of opening a database goes through ({@link Database#open}, {@link Database#delete}).
 *
 * <p>A Bracewalk database carries SQLite's {@code application_id} {@link #APPLICATION_ID} (ASCII
 * {@code BrWk}) in its header. The header is read with plain file IO before the JDBC driver sees
 * the file, so a file that is not a SQLite database, or is another program's, is refused before
 * anything could switch it to WAL, run Flyway or change its header. A SQLite file with
 * application id 0 may be one made by a Bracewalk from before the mark: it is looked into through
 * a read-only connection opened {@code immutable=1} (SQLite's URI parameter: no locks, no journal,
 * no {@code -wal}/{@code -shm} files made; a plain read-only open of a WAL file would make both),
 * and accepted when Flyway's history shows Bracewalk's first migration applied. Only when the
 * file's {@code -wal} and {@code -shm} already stand beside it (another program has it open, and
 * its latest changes may be in the WAL) is it read again through an ordinary read-only connection,
 * which then creates nothing.
 */
final class DatabaseFile {
  /** SQLite's {@code application_id} of a Bracewalk database: the ASCII bytes {@code BrWk}. */
  static final int APPLICATION_ID = 0x4272576B;

  /** The first migration: its row in Flyway's history marks a Bracewalk file of before the id. */
  private static final String FIRST_SCRIPT = "V1__site_records.sql";

  /** The 16 bytes every SQLite 3 database file begins with (SQLite's file format, section 1.3). */
  private static final byte[] MAGIC = "SQLite format 3\0".getBytes(StandardCharsets.US_ASCII);

  /** Offset of the big-endian {@code application_id} in the 100-byte header (file format 1.3). */
  private static final int APPLICATION_ID_OFFSET = 68;

  private static final int HEADER_SIZE = 100;

  /** What {@link #inspect} found. */
  enum Kind {
    /** No file yet, or an empty one: Bracewalk makes its database there. */
    NEW,
    /** A Bracewalk database, marked with {@link #APPLICATION_ID}. */
    BRACEWALK,
    /** A Bracewalk database made before the mark: opened as usual and marked then. */
    UNMARKED_BRACEWALK
  }

  private DatabaseFile() {}

  /**
   * What {@code file} is, or a {@link StoreException} naming it and saying what it is when it is
   * not a Bracewalk database (or no file can be made there). Writes nothing.
   */
  static Kind inspect(Path file) {
    Path absolute = file.toAbsolutePath();
    if (Files.isDirectory(absolute)) {
      throw new StoreException(absolute + " is a folder; give a file name for the database");
    }
    Path parent = absolute.getParent();
    if (parent != null && !Files.isDirectory(parent)) {
      throw new StoreException("the folder " + parent + " does not exist, so the database "
          + absolute + " cannot be made there; create the folder first, or choose a file in a"
          + " folder that exists");
    }
    if (!Files.exists(absolute)) {
      if (Files.isSymbolicLink(absolute)) {
        throw new StoreException(absolute + " is a symbolic link to a file that does not exist;"
            + " give the database's own path");
      }
      return Kind.NEW;
    }
    if (!Files.isRegularFile(absolute)) {
      throw new StoreException(absolute + " is not a regular file (a device or a pipe?); give a"
          + " database file");
    }
    byte[] header = new byte[HEADER_SIZE];
    int read;
    long size;
    try (InputStream in = Files.newInputStream(absolute)) {
      size = Files.size(absolute);
      read = in.readNBytes(header, 0, HEADER_SIZE);
    } catch (IOException e) {
      throw new StoreException("cannot read the database " + absolute + ": " + e.getMessage(), e);
    }
    if (size == 0) {
      return Kind.NEW;
    }
    if (read < HEADER_SIZE || !startsWithMagic(header)) {
      throw new StoreException(absolute + " is not a SQLite database (" + size + " bytes, and it"
          + " does not begin with SQLite's header); Bracewalk opens only its own database files"
          + " and left this one as it was: choose another file");
    }
    int id = applicationId(header);
    if (id == APPLICATION_ID) {
      return Kind.BRACEWALK;
    }
    if (id != 0) {
      throw new StoreException(absolute + " is another program's SQLite database (its"
          + " application id is " + describeId(id) + ", Bracewalk's is " + describeId(APPLICATION_ID)
          + "); Bracewalk left it as it was: choose another file");
    }
    return unmarked(absolute);
  }

  /** A SQLite file with application id 0: Bracewalk's of before the mark, or refused. */
  private static Kind unmarked(Path file) {
    Look look = look(file, "immutable=1");
    if (!look.bracewalk()
        && Files.exists(Path.of(file + "-wal"), LinkOption.NOFOLLOW_LINKS)
        && Files.exists(Path.of(file + "-shm"), LinkOption.NOFOLLOW_LINKS)) {
      look = look(file, "mode=ro"); // the latest changes may be in the WAL of a running program
    }
    if (look.applicationId() == APPLICATION_ID) {
      return Kind.BRACEWALK;
    }
    if (look.bracewalk()) {
      return Kind.UNMARKED_BRACEWALK;
    }
    throw new StoreException(absolute(file) + " is a SQLite database but not a Bracewalk one ("
        + (look.tables().isEmpty() ? "it holds no tables"
            : "its tables: " + String.join(", ", look.tables()))
        + "; no Bracewalk schema history); Bracewalk left it as it was: choose another file");
  }

  private static String absolute(Path file) {
    return file.toAbsolutePath().toString();
  }

  /** What a read-only look into the file found. */
  private record Look(int applicationId, List<String> tables, boolean bracewalk) {}

  private static Look look(Path file, String uriParameter) {
    SQLiteConfig config = new SQLiteConfig();
    config.setReadOnly(true);
    String url = "jdbc:sqlite:" + file.toAbsolutePath().toUri() + "?" + uriParameter;
    try (Connection c = config.createConnection(url); Statement s = c.createStatement()) {
      int id;
      try (ResultSet r = s.executeQuery("PRAGMA application_id")) {
        id = r.next() ? r.getInt(1) : 0;
      }
      List<String> tables = new ArrayList<>();
      try (ResultSet r = s.executeQuery(
          "SELECT name FROM sqlite_master WHERE type = 'table' ORDER BY name LIMIT 11")) {
        while (r.next()) {
          tables.add(r.getString(1));
        }
      }
      if (tables.size() > 10) {
        tables.set(10, "...");
      }
      boolean ours = false;
      if (tables.contains("flyway_schema_history")) {
        try (ResultSet r = s.executeQuery("SELECT count(*) FROM flyway_schema_history"
            + " WHERE script = '" + FIRST_SCRIPT + "' AND success = 1")) {
          ours = r.next() && r.getInt(1) > 0;
        }
      }
      return new Look(id, tables, ours);
    } catch (SQLException e) {
      throw new StoreException(absolute(file) + " begins like a SQLite database but cannot be read"
          + " as one (" + e.getMessage() + "); Bracewalk left it as it was: choose another file", e);
    }
  }

  private static boolean startsWithMagic(byte[] header) {
    for (int i = 0; i < MAGIC.length; i++) {
      if (header[i] != MAGIC[i]) {
        return false;
      }
    }
    return true;
  }

  /** The big-endian 32-bit {@code application_id} of a 100-byte SQLite header. */
  static int applicationId(byte[] header) {
    return ((header[APPLICATION_ID_OFFSET] & 0xFF) << 24)
        | ((header[APPLICATION_ID_OFFSET + 1] & 0xFF) << 16)
        | ((header[APPLICATION_ID_OFFSET + 2] & 0xFF) << 8)
        | (header[APPLICATION_ID_OFFSET + 3] & 0xFF);
  }

  /** An id in hex, with its four bytes as text when they are printable ASCII. */
  static String describeId(int id) {
    String hex = String.format("0x%08X", id);
    StringBuilder text = new StringBuilder();
    for (int shift = 24; shift >= 0; shift -= 8) {
      int b = (id >>> shift) & 0xFF;
      if (b < 0x20 || b > 0x7E) {
        return hex;
      }
      text.append((char) b);
    }
    return hex + " '" + text + "'";
  }

  /** Marks an open Bracewalk database with {@link #APPLICATION_ID} when it is not yet marked. */
  static void mark(Connection c) throws SQLException {
    try (Statement s = c.createStatement()) {
      int id;
      try (ResultSet r = s.executeQuery("PRAGMA application_id")) {
        id = r.next() ? r.getInt(1) : 0;
      }
      if (id != APPLICATION_ID) {
        s.execute("PRAGMA application_id = " + APPLICATION_ID);
      }
    }
  }
}

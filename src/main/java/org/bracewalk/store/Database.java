package org.bracewalk.store;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Properties;
import java.util.concurrent.locks.ReentrantLock;
import java.util.logging.Level;
import java.util.logging.Logger;
import org.bracewalk.core.port.DesignRepository;
import org.bracewalk.core.port.GlobalIdentities;
import org.bracewalk.core.port.InspectionRepository;
import org.bracewalk.core.port.IssuedReportRepository;
import org.bracewalk.core.port.ObservationRepository;
import org.bracewalk.core.port.PlaneRepository;
import org.bracewalk.core.port.RecordStore;
import org.bracewalk.core.port.RepairRepository;
import org.bracewalk.core.port.SiteRepository;
import org.bracewalk.core.port.StoreException;
import org.bracewalk.core.port.StructureRepository;
import org.flywaydb.core.Flyway;
import javax.sql.DataSource;
import org.flywaydb.core.api.FlywayException;
import org.postgresql.ds.PGSimpleDataSource;
import org.sqlite.SQLiteConfig;
import org.sqlite.SQLiteDataSource;

/**
 * One Bracewalk database, a file or a team server: opens it (creating a file when new), brings its
 * schema up to date with the Flyway migrations of its {@link Dialect} ({@code
 * classpath:db/migration} for a file, {@code classpath:db/postgresql} for a PostgreSQL server,
 * the same versions and rules), and serves the repositories over one connection.
 *
 * <p>Every connection (Flyway's too) runs with foreign keys on, the WAL journal, {@code
 * synchronous=FULL} (a commit is on disk before it returns: an acknowledged observation survives a
 * crash or power cut) and a busy timeout, so a second program on the same file waits for the
 * other's write instead of failing. Transactions begin {@code IMMEDIATE}: they take the write
 * lock at the start, so two writers queue instead of deadlocking.
 *
 * <p>Thread-safe: calls are serialised on one lock; a transaction holds it throughout.
 */
public final class Database implements RecordStore {
  /**
   * Flyway reports every migration at INFO through java.util.logging when nothing else is there;
   * the command line must not print that, so only its warnings pass. Held here so the setting
   * stays (java.util.logging keeps loggers weakly).
   */
  private static final Logger FLYWAY_LOG = quiet(Logger.getLogger("org.flywaydb"));

  private static Logger quiet(Logger logger) {
    logger.setLevel(Level.WARNING);
    return logger;
  }

  /** How long a write waits for another program's write to finish. */
  static final int BUSY_TIMEOUT_MS = 10_000;

  /** The database file; null for a server. */
  private final Path file;
  /** The file, or the server's address (never with credentials), as messages name it. */
  private final String location;
  private final Dialect dialect;
  private final Connection connection;
  private final int busyTimeoutMs;
  private final ReentrantLock lock = new ReentrantLock();
  private int depth;
  private boolean closed;
  private final Map<String, PreparedStatement> statements = new HashMap<>();

  private final JdbcSiteRepository sites = new JdbcSiteRepository(this);
  private final JdbcStructureRepository structures = new JdbcStructureRepository(this);
  private final JdbcPlaneRepository planes = new JdbcPlaneRepository(this);
  private final JdbcDesignRepository designs = new JdbcDesignRepository(this);
  private final JdbcInspectionRepository inspections = new JdbcInspectionRepository(this);
  private final JdbcObservationRepository observations = new JdbcObservationRepository(this);
  private final JdbcRepairRepository repairs = new JdbcRepairRepository(this);
  private final JdbcIssuedReportRepository issuedReports = new JdbcIssuedReportRepository(this);
  private final JdbcGlobalIdentities identities = new JdbcGlobalIdentities(this);

  private Database(Path file, String location, Dialect dialect, Connection connection,
      int busyTimeoutMs) {
    this.file = file;
    this.location = location;
    this.dialect = dialect;
    this.connection = connection;
    this.busyTimeoutMs = busyTimeoutMs;
  }

  /**
   * Opens (or creates) the database file and migrates it. The file is first looked at without
   * writing a byte ({@link DatabaseFile#inspect}): anything that is not a Bracewalk database, and a
   * file in a folder that does not exist, is refused before the driver opens it. A new file is
   * marked with Bracewalk's {@code application_id} before anything else is written to it; a
   * Bracewalk file of before the mark is marked when it is opened.
   *
   * @throws StoreException naming the file when it cannot be opened, is not a Bracewalk database,
   *     or cannot be migrated
   */
  public static Database open(Path file) {
    return open(file, BUSY_TIMEOUT_MS);
  }

  /** As {@link #open(Path)}, waiting at most {@code busyTimeoutMs} for another program's write. */
  static Database open(Path file, int busyTimeoutMs) {
    Path absolute = file.toAbsolutePath();
    DatabaseFile.Kind kind = DatabaseFile.inspect(absolute);
    SQLiteDataSource dataSource = dataSource(absolute, busyTimeoutMs);
    if (kind == DatabaseFile.Kind.NEW) {
      try (Connection c = dataSource.getConnection()) {
        DatabaseFile.mark(c);
      } catch (SQLException e) {
        throw SqlErrors.translate(e, absolute.toString());
      }
    }
    migrate(dataSource, absolute);
    try {
      Connection c = dataSource.getConnection();
      requirePragmas(c, absolute);
      if (kind != DatabaseFile.Kind.BRACEWALK) {
        DatabaseFile.mark(c);
      }
      return new Database(absolute, absolute.toString(), Dialect.SQLITE, c, busyTimeoutMs);
    } catch (SQLException e) {
      throw SqlErrors.translate(e, absolute.toString(), busyTimeoutMs);
    }
  }

  /**
   * Opens a database given as text: a team server ({@code postgresql://HOST[:PORT]/DB}, see
   * {@link ServerAddress}) or a file path ({@link #open(Path)}).
   *
   * @param location the file or the server address
   * @param env the process environment, for the server's {@code PGUSER}, {@code PGPASSWORD} and
   *     {@code PGSSLMODE}
   * @throws StoreException naming the file or server when it cannot be opened or migrated
   */
  public static Database open(String location, Map<String, String> env) {
    if (ServerAddress.isServer(location)) {
      return open(ServerAddress.parse(location, env), env, BUSY_TIMEOUT_MS);
    }
    return open(Path.of(location));
  }

  /**
   * Opens a team server's database and migrates it when the role may (a working role on a
   * migrated database needs no more than the documented grants: the schema is current, so
   * Flyway is not run). Every connection waits at most {@code busyTimeoutMs} for a row another
   * session holds ({@code lock_timeout}), then reports the server busy.
   */
  static Database open(ServerAddress server, Map<String, String> env, int busyTimeoutMs) {
    String where = server.toString();
    PGSimpleDataSource dataSource = serverDataSource(server, env);
    migrate(dataSource, where, Dialect.POSTGRESQL);
    try {
      Connection c = dataSource.getConnection();
      try (Statement s = c.createStatement()) {
        s.execute("SET lock_timeout = " + busyTimeoutMs);
      }
      return new Database(null, where, Dialect.POSTGRESQL, c, busyTimeoutMs);
    } catch (SQLException e) {
      throw SqlErrors.translate(e, where, busyTimeoutMs);
    }
  }

  static PGSimpleDataSource serverDataSource(ServerAddress server, Map<String, String> env) {
    PGSimpleDataSource ds = new PGSimpleDataSource();
    ds.setURL(server.jdbcUrl());
    Properties p = server.properties(env);
    for (String name : p.stringPropertyNames()) {
      try {
        ds.setProperty(name, p.getProperty(name));
      } catch (SQLException e) {
        throw new StoreException("the server " + server + ": " + e.getMessage(), e);
      }
    }
    ds.setConnectTimeout(10);
    return ds;
  }

  /**
   * Deletes a Bracewalk database file with its {@code -wal}, {@code -shm} and {@code -journal}
   * files (for {@code demo --replace}); does nothing when there is no file. Anything that is not
   * a Bracewalk database is refused, as {@link #open} refuses it, and left as it was.
   *
   * @return true when a database was deleted (false: no file, or an empty one)
   * @throws StoreException naming the file and saying what it is, or why it cannot be deleted
   */
  public static boolean delete(Path file) {
    Path absolute = file.toAbsolutePath();
    if (!Files.exists(absolute, java.nio.file.LinkOption.NOFOLLOW_LINKS)) {
      return false;
    }
    if (Files.isSymbolicLink(absolute)) {
      throw new StoreException(absolute + " is a symbolic link; Bracewalk replaces only a database"
          + " file itself, not a link to one: give the database's own path");
    }
    if (DatabaseFile.inspect(absolute) == DatabaseFile.Kind.NEW) {
      return false; // an empty file: opening it makes the database, nothing to delete
    }
    try {
      for (String suffix : List.of("-wal", "-shm", "-journal", "")) {
        Files.deleteIfExists(Path.of(absolute + suffix));
      }
    } catch (IOException e) {
      throw new StoreException("cannot replace " + absolute + ": " + e.getMessage(), e);
    }
    return true;
  }

  static SQLiteDataSource dataSource(Path file) {
    return dataSource(file, BUSY_TIMEOUT_MS);
  }

  static SQLiteDataSource dataSource(Path file, int busyTimeoutMs) {
    SQLiteConfig config = new SQLiteConfig();
    config.setBusyTimeout(busyTimeoutMs);
    config.enforceForeignKeys(true);
    config.setJournalMode(SQLiteConfig.JournalMode.WAL);
    config.setSynchronous(SQLiteConfig.SynchronousMode.FULL);
    config.setTransactionMode(SQLiteConfig.TransactionMode.IMMEDIATE);
    SQLiteDataSource ds = new SQLiteDataSource(config);
    ds.setUrl("jdbc:sqlite:" + file);
    return ds;
  }

  /**
   * The migration scripts packed as {@code classpath:db/migration}, in the order Flyway applies
   * them. {@code DatabaseTest} keeps this list equal to the files in {@code db-migrations/}: add a
   * new script's name here when adding the script.
   */
  static final List<String> MIGRATION_SCRIPTS =
      List.of(
          "V1__site_records.sql",
          "V2__planes_never_change.sql",
          "V3__records_never_overwritten.sql",
          "V4__observation_sources.sql",
          "V5__register_of_issued_documents.sql",
          "V6__plane_limits_and_retirements.sql",
          "V7__inspection_scope.sql",
          "V8__plane_role.sql",
          "V9__frame_members.sql",
          "V10__frame_member_repairs.sql",
          "V11__site_jurisdiction.sql",
          "V12__global_identities.sql");

  /**
   * True when the file's schema history shows exactly the packed scripts, in order, all applied
   * successfully: then there is nothing for Flyway to do, and opening skips it (loading and
   * configuring Flyway is about half a second of a cold start, paid while the app's window
   * waits). Anything else (a new file, a pending or failed migration, a newer program's
   * migration, a file that is not a database) goes through Flyway, which migrates or names the
   * problem. Scripts are never edited once released (DEVELOPERS.md), so checksums are left to
   * Flyway's runs.
   */
  static boolean schemaIsCurrent(SQLiteDataSource dataSource) {
    return schemaIsCurrent(dataSource, Dialect.SQLITE);
  }

  /** As {@link #schemaIsCurrent(SQLiteDataSource)}, for a database of either dialect. */
  static boolean schemaIsCurrent(DataSource dataSource, Dialect dialect) {
    try (Connection c = dataSource.getConnection(); Statement s = c.createStatement()) {
      try (ResultSet t = s.executeQuery(dialect == Dialect.SQLITE
          ? "SELECT 1 FROM sqlite_master WHERE type = 'table' AND name = 'flyway_schema_history'"
          : "SELECT 1 WHERE to_regclass('flyway_schema_history') IS NOT NULL")) {
        if (!t.next()) {
          return false;
        }
      }
      List<String> applied = new ArrayList<>();
      try (ResultSet r = s.executeQuery(
          "SELECT script, success FROM flyway_schema_history WHERE version IS NOT NULL"
              + " ORDER BY installed_rank")) {
        while (r.next()) {
          if (!r.getBoolean(2)) {
            return false;
          }
          applied.add(r.getString(1));
        }
      }
      return applied.equals(MIGRATION_SCRIPTS);
    } catch (SQLException e) {
      return false; // Flyway will say what is wrong with the file
    }
  }

  private static void migrate(SQLiteDataSource dataSource, Path file) {
    migrate(dataSource, file.toString(), Dialect.SQLITE);
  }

  private static void migrate(DataSource dataSource, String file, Dialect dialect) {
    if (schemaIsCurrent(dataSource, dialect)) {
      return;
    }
    FLYWAY_LOG.fine(() -> "migrating " + file);
    Flyway flyway =
        Flyway.configure(Database.class.getClassLoader())
            .dataSource(dataSource)
            .locations(dialect.migrations())
            .load();
    try {
      flyway.migrate();
    } catch (FlywayException first) {
      // Two programs opening a new file at once: the loser sees the winner's half-made schema
      // history. Once the winner is done, migrating again finds nothing to do.
      try {
        Thread.sleep(200);
        flyway.migrate();
      } catch (FlywayException again) {
        if (dialect == Dialect.POSTGRESQL && again.getCause() instanceof SQLException sql
            && sql.getSQLState() != null && sql.getSQLState().startsWith("08")) {
          throw SqlErrors.translate(sql, file);
        }
        throw new StoreException(
            "cannot open "
                + file
                + " as a Bracewalk database: "
                + rootMessage(again)
                + (dialect == Dialect.SQLITE ? " (is it a Bracewalk database file?)"
                    : " (a working role cannot migrate: run Bracewalk once as the migration role;"
                        + " see README, \"A team server: PostgreSQL\")"),
            again);
      } catch (InterruptedException e) {
        Thread.currentThread().interrupt();
        throw new StoreException("interrupted while opening " + file, e);
      }
    }
  }

  private static String rootMessage(Throwable t) {
    Throwable r = t;
    while (r.getCause() != null && r.getCause() != r) {
      r = r.getCause();
    }
    String m = r.getMessage() == null ? r.getClass().getSimpleName() : r.getMessage();
    return m.lines().findFirst().orElse(m);
  }

  /** Refuses to work on a connection that lacks the durability settings (a driver surprise). */
  private static void requirePragmas(Connection c, Path file) throws SQLException {
    try (Statement s = c.createStatement()) {
      String mode = single(s, "PRAGMA journal_mode");
      String fk = single(s, "PRAGMA foreign_keys");
      String sync = single(s, "PRAGMA synchronous");
      if (!"wal".equalsIgnoreCase(mode) || !"1".equals(fk) || !"2".equals(sync)) {
        c.close();
        throw new StoreException(
            "the database "
                + file
                + " did not take its safety settings (journal "
                + mode
                + ", foreign keys "
                + fk
                + ", synchronous "
                + sync
                + "); is the file on a network share?");
      }
    }
  }

  private static String single(Statement s, String sql) throws SQLException {
    try (ResultSet r = s.executeQuery(sql)) {
      return r.next() ? r.getString(1) : null;
    }
  }

  /** Work on the connection. */
  @FunctionalInterface
  interface SqlWork<T> {
    T run(Connection c) throws SQLException;
  }

  /** Runs {@code work} on the connection under the lock, translating SQL errors. */
  <T> T call(SqlWork<T> work) {
    return call(work, null);
  }

  /**
   * Runs {@code work} on the connection under the lock; a refusal by a trigger is shown with
   * {@code subject} (the record the work writes, with the ids the database's literal message
   * cannot carry).
   */
  <T> T call(SqlWork<T> work, SqlErrors.Subject subject) {
    lock.lock();
    try {
      requireOpen();
      return work.run(connection);
    } catch (SQLException e) {
      throw SqlErrors.translate(e, location, subject, busyTimeoutMs);
    } finally {
      lock.unlock();
    }
  }

  /**
   * The transaction is begun, committed and rolled back by plain SQL statements while the driver
   * stays in auto-commit mode. The driver's own transactions (auto-commit off) begin the next
   * transaction inside {@code commit()}: that {@code BEGIN IMMEDIATE} waits for another program's
   * write lock and, after the busy timeout, makes {@code commit()} throw although the commit is on
   * disk (a saved change reported as lost); and a {@code BEGIN} that timed out left the driver
   * believing a transaction was open, so the next "transaction" ran statement by statement.
   */
  @Override
  public <T> T inTransaction(Work<T> work) {
    lock.lock();
    try {
      requireOpen();
      if (depth > 0) {
        depth++;
        try {
          return work.run();
        } finally {
          depth--;
        }
      }
      execute(dialect.begin(), false);
      depth = 1;
      T result;
      try {
        result = work.run();
      } catch (RuntimeException | Error e) {
        depth = 0;
        rollback(e);
        throw e;
      }
      depth = 0;
      execute("COMMIT", true);
      return result;
    } finally {
      lock.unlock();
    }
  }

  /**
   * Runs one transaction-control statement; when it fails, rolls back first if asked (as far as
   * that goes) and throws the failure, translated.
   */
  private void execute(String sql, boolean rollBackOnFailure) {
    try (Statement s = connection.createStatement()) {
      s.execute(sql);
    } catch (SQLException e) {
      StoreException failure = translate(e);
      if (rollBackOnFailure) {
        rollback(failure);
      }
      throw failure;
    }
  }

  /** Rolls the open transaction back; a failure to do so is attached to {@code cause}. */
  private void rollback(Throwable cause) {
    try (Statement s = connection.createStatement()) {
      s.execute("ROLLBACK");
    } catch (SQLException e) {
      // SQLite rolls back by itself after some errors (disk full, I/O): then none is open
      cause.addSuppressed(e);
    }
  }

  private StoreException translate(SQLException e) {
    return SqlErrors.translate(e, location, busyTimeoutMs);
  }

  /**
   * A prepared statement kept for the life of the connection (compiling SQL costs more than
   * running these small statements). Call only inside {@link #call}; never close it; set every
   * parameter each time.
   */
  PreparedStatement prepared(String sql) throws SQLException {
    PreparedStatement s = statements.get(sql);
    if (s == null) {
      s = connection.prepareStatement(sql, Statement.RETURN_GENERATED_KEYS);
      statements.put(sql, s);
    }
    return s;
  }

  /**
   * The id the database gave the last row inserted on this connection ({@link
   * Dialect#lastInsertId}). Asked through a kept statement:
   * the driver's generated-keys path prepares a new query each time, which costs more than the
   * insert itself. Call only inside {@link #call}, right after the insert.
   */
  long lastInsertId() throws SQLException {
    try (ResultSet r = prepared(dialect.lastInsertId()).executeQuery()) {
      if (!r.next()) {
        throw new SQLException("no id came back for the new row");
      }
      return r.getLong(1);
    }
  }

  /** True inside {@link #inTransaction}. */
  boolean inTransaction() {
    return depth > 0;
  }

  private void requireOpen() {
    if (closed) {
      throw new StoreException("the database " + location + " is closed");
    }
  }

  /** The database file; null when the database is a server's. */
  public Path file() {
    return file;
  }

  @Override
  public java.util.Optional<Path> databaseFile() {
    return java.util.Optional.ofNullable(file);
  }

  @Override
  public String location() {
    return location;
  }

  /** True when this is a team server's database rather than a file. */
  public boolean onServer() {
    return dialect == Dialect.POSTGRESQL;
  }

  /** The SQL dialect of this store. */
  Dialect dialect() {
    return dialect;
  }

  /**
   * Runs {@code PRAGMA integrity_check} and returns its first line ({@code ok} when sound). A
   * server checks its own pages; there it is refused, naming the server.
   */
  public String integrityCheck() {
    if (dialect != Dialect.SQLITE) {
      throw new StoreException("the integrity check reads a SQLite file; " + location
          + " is a PostgreSQL server (its administrator checks it, e.g. with pg_amcheck)");
    }
    return call(
        c -> {
          try (Statement s = c.createStatement()) {
            return single(s, "PRAGMA integrity_check");
          }
        });
  }

  @Override
  public void close() {
    lock.lock();
    try {
      if (!closed) {
        closed = true;
        for (PreparedStatement s : statements.values()) {
          s.close();
        }
        statements.clear();
        connection.close();
      }
    } catch (SQLException e) {
      throw translate(e);
    } finally {
      lock.unlock();
    }
  }

  @Override
  public SiteRepository sites() {
    return sites;
  }

  @Override
  public StructureRepository structures() {
    return structures;
  }

  @Override
  public PlaneRepository planes() {
    return planes;
  }

  @Override
  public DesignRepository designs() {
    return designs;
  }

  @Override
  public InspectionRepository inspections() {
    return inspections;
  }

  @Override
  public ObservationRepository observations() {
    return observations;
  }

  @Override
  public RepairRepository repairs() {
    return repairs;
  }

  @Override
  public IssuedReportRepository issuedReports() {
    return issuedReports;
  }

  @Override
  public GlobalIdentities identities() {
    return identities;
  }

  /** The uuid of the next row of {@code kind} a repository inserts (called under the lock). */
  String newUuid(GlobalIdentities.Kind kind) {
    return identities.next(kind);
  }
}

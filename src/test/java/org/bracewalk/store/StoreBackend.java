package org.bracewalk.store;

import static org.junit.jupiter.api.Assertions.fail;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Assumptions;

/**
 * The two stores the store's tests run against, as one parameterised suite ({@code
 * @ParameterizedClass @EnumSource(StoreBackend.class)} or a parameterised method).
 *
 * <p>PostgreSQL needs a server: {@value #URL_VARIABLE} names it ({@code
 * postgresql://HOST:PORT/DB}, a throwaway cluster: each test gets a new database there, copied from
 * a migrated template made once per run; each is dropped a little later in the run, the last
 * few and the template when it ends); the
 * login is {@code PGUSER} / {@code ~/.pgpass} / {@code PGPASSWORD}, a role that may create
 * databases and roles. {@code .ci/run} starts one. Without the variable a PostgreSQL test is
 * reported skipped, saying so; when the variable or {@code CI} is set and no server answers, it
 * fails: in CI a missing server is never a silent skip.
 */
public enum StoreBackend {
  SQLITE,
  POSTGRESQL;

  /** The variable naming the test server. */
  static final String URL_VARIABLE = "BRACEWALK_TEST_PG";

  private static final Map<String, String> ENV = System.getenv();
  private static final String RUN = "bw" + ProcessHandle.current().pid();
  private static final AtomicInteger NEXT = new AtomicInteger();
  private static final List<String> MADE = new ArrayList<>();
  private static String template;

  /**
   * A new, empty (migrated) database of this backend: a file in {@code dir}, or a new database on
   * the test server; its location as {@code --db} takes it.
   */
  public String freshLocation(Path dir) {
    if (this == SQLITE) {
      return dir.resolve("b" + NEXT.incrementAndGet() + ".db").toString();
    }
    ServerAddress admin = server();
    String name = RUN + "_" + NEXT.incrementAndGet();
    try (Connection c = connectTo(admin); Statement s = c.createStatement()) {
      dropOlder(s);
      s.execute("CREATE DATABASE " + name + " TEMPLATE " + template(admin, s));
      synchronized (MADE) {
        MADE.add(name);
      }
    } catch (SQLException e) {
      fail("cannot make a test database on " + admin + ": " + e.getMessage(), e);
    }
    return new ServerAddress(admin.host(), admin.port(), name, admin.sslmode()).toString();
  }

  /** The process environment the tests log in with ({@code PGUSER}, {@code PGPASSWORD}). */
  public static Map<String, String> env() {
    return ENV;
  }

  /**
   * A new database on the test server with nothing in it, not even the schema (for a test that
   * migrates step by step); its address.
   */
  static String blankServerDatabase() {
    ServerAddress admin = server();
    String name = RUN + "_" + NEXT.incrementAndGet() + "_blank";
    try (Connection c = connectTo(admin); Statement s = c.createStatement()) {
      s.execute("CREATE DATABASE " + name);
      synchronized (MADE) {
        MADE.add(name);
      }
    } catch (SQLException e) {
      fail("cannot make a test database on " + admin + ": " + e.getMessage(), e);
    }
    return new ServerAddress(admin.host(), admin.port(), name, admin.sslmode()).toString();
  }

  /** Opens a new, empty database of this backend. */
  Database open(Path dir) {
    return Database.open(freshLocation(dir), ENV);
  }

  /** Opens the database at {@code location} (from {@link #freshLocation}) again. */
  static Database reopen(String location) {
    return Database.open(location, ENV);
  }

  /**
   * A plain JDBC connection to {@code location}, as another client would open it (SQLite: foreign
   * keys on, as every client of a Bracewalk file is told to; PostgreSQL: the test login).
   */
  public static Connection connect(String location) throws SQLException {
    if (ServerAddress.isServer(location)) {
      return connectTo(ServerAddress.parse(location, ENV));
    }
    Connection c = DriverManager.getConnection("jdbc:sqlite:" + location);
    try (Statement s = c.createStatement()) {
      s.execute("PRAGMA foreign_keys = ON");
    }
    return c;
  }

  /** As {@link #connect}, logging in as {@code user} (no password: the test cluster trusts). */
  static Connection connectAs(String location, String user) throws SQLException {
    ServerAddress a = ServerAddress.parse(location, ENV);
    java.util.Properties p = a.properties(ENV);
    p.setProperty("user", user);
    p.remove("password");
    return DriverManager.getConnection(a.jdbcUrl(), p);
  }

  /** The names of the tables (not the schema history) of the database at {@code location}. */
  static List<String> tables(Connection c, String location) throws SQLException {
    List<String> out = new ArrayList<>();
    String sql = ServerAddress.isServer(location)
        ? "SELECT table_name FROM information_schema.tables WHERE table_schema = 'public'"
            + " AND table_type = 'BASE TABLE' ORDER BY 1"
        : "SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%'"
            + " ORDER BY name";
    try (Statement s = c.createStatement(); var r = s.executeQuery(sql)) {
      while (r.next()) {
        out.add(r.getString(1));
      }
    }
    return out;
  }

  private static Connection connectTo(ServerAddress a) throws SQLException {
    return DriverManager.getConnection(a.jdbcUrl(), a.properties(ENV));
  }

  /** The test server, or the test is skipped (locally) or failed (CI, or the variable set). */
  static ServerAddress server() {
    String url = ENV.get(URL_VARIABLE);
    boolean expected = url != null && !url.isBlank() || ENV.get("CI") != null;
    if (url == null || url.isBlank()) {
      if (expected) {
        fail("CI is set but " + URL_VARIABLE + " is not: the PostgreSQL tests need a server"
            + " (.ci/run starts one)");
      }
      Assumptions.abort("no PostgreSQL server for this test: set " + URL_VARIABLE
          + "=postgresql://HOST:PORT/DB (a throwaway cluster; .ci/run starts one)");
    }
    ServerAddress a = ServerAddress.parse(url, ENV);
    try (Connection c = connectTo(a)) {
      return a;
    } catch (SQLException e) {
      fail(URL_VARIABLE + " names " + a + " but no server answers there (" + e.getMessage()
          + "): the PostgreSQL tests cannot run", e);
      return a;
    }
  }

  /** The migrated template database of this run, made on first use. */
  private static synchronized String template(ServerAddress admin, Statement s)
      throws SQLException {
    if (template == null) {
      String name = RUN + "_template";
      s.execute("CREATE DATABASE " + name);
      synchronized (MADE) {
        MADE.add(name);
      }
      Database.open(new ServerAddress(admin.host(), admin.port(), name, admin.sslmode())
          .toString(), ENV).close();
      template = name;
      Runtime.getRuntime().addShutdownHook(new Thread(() -> dropAll(admin)));
    }
    return template;
  }

  /**
   * Drops this run's test databases but the two made last (a test has closed its database by the
   * time the next test makes one), so few are left for the end of the run: dropping dozens then
   * outlasts the time surefire gives a test JVM to exit.
   */
  private static void dropOlder(Statement s) throws SQLException {
    List<String> doomed = new ArrayList<>();
    synchronized (MADE) {
      for (String name : MADE) {
        if (!name.endsWith("_template")) {
          doomed.add(name);
        }
      }
      doomed = doomed.subList(0, Math.max(0, doomed.size() - 2));
      MADE.removeAll(doomed);
    }
    for (String name : doomed) {
      s.execute("DROP DATABASE IF EXISTS " + name + " WITH (FORCE)");
    }
  }

  private static void dropAll(ServerAddress admin) {
    try (Connection c = connectTo(admin); Statement s = c.createStatement()) {
      synchronized (MADE) {
        for (String name : MADE) {
          s.execute("DROP DATABASE IF EXISTS " + name + " WITH (FORCE)");
        }
      }
    } catch (SQLException e) {
      System.err.println("could not drop the test databases: " + e.getMessage());
    }
  }
}

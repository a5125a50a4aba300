package org.bracewalk.store;

import java.net.URI;
import java.net.URISyntaxException;
import java.util.Locale;
import java.util.Map;
import java.util.Properties;
import org.bracewalk.core.port.StoreException;

/**
 * A team server given where a database file is accepted: {@code postgresql://HOST[:PORT]/DB},
 * optionally with {@code ?sslmode=MODE}. Credentials never come in the address (it is typed on
 * command lines and shown in window titles and logs): the user is {@code PGUSER}, else the
 * operating system's user name, as PostgreSQL's own tools do; the password is {@code PGPASSWORD}
 * when set, else the JDBC driver looks it up itself in {@code ~/.pgpass} (or the file {@code
 * PGPASSFILE} names; the driver reads both, and {@code pg_service.conf}, but not {@code
 * PGPASSWORD}, {@code PGUSER} or {@code PGSSLMODE}, which are read here). {@code sslmode} comes
 * from the address, else {@code PGSSLMODE}, else the driver's default ({@code prefer}).
 *
 * @param host the server's host name or address
 * @param port the port (5432 when not given)
 * @param database the database's name
 * @param sslmode the TLS mode asked for, or null for the driver's default
 */
public record ServerAddress(String host, int port, String database, String sslmode) {
  /** The scheme that marks a server address (PostgreSQL's own connection URI scheme). */
  public static final String SCHEME = "postgresql://";

  private static final int DEFAULT_PORT = 5432;

  /** True when {@code location} names a server rather than a file. */
  public static boolean isServer(String location) {
    return location != null
        && location.regionMatches(true, 0, SCHEME, 0, SCHEME.length());
  }

  /**
   * Reads a server address, or a {@link StoreException} naming what is wrong with it.
   *
   * @param location {@code postgresql://HOST[:PORT]/DB[?sslmode=MODE]}
   * @param env the process environment, for {@code PGSSLMODE}
   */
  public static ServerAddress parse(String location, Map<String, String> env) {
    URI uri;
    try {
      uri = new URI(location);
    } catch (URISyntaxException e) {
      throw new StoreException("the server address " + location + " is not a valid address ("
          + e.getReason() + "); write postgresql://HOST[:PORT]/DATABASE");
    }
    if (uri.getRawUserInfo() != null) {
      throw new StoreException("the server address " + redacted(location) + " holds a user name"
          + " or password; Bracewalk takes neither from an address (it would show on screen and in"
          + " the process list): set PGUSER, and put the password in ~/.pgpass (or PGPASSWORD)");
    }
    String host = uri.getHost();
    String path = uri.getPath() == null ? "" : uri.getPath();
    if (host == null || host.isBlank() || path.length() < 2 || path.indexOf('/', 1) >= 0) {
      throw new StoreException("the server address " + location + " needs a host and a database:"
          + " write postgresql://HOST[:PORT]/DATABASE");
    }
    String sslmode = null;
    if (uri.getQuery() != null) {
      for (String pair : uri.getQuery().split("&")) {
        int eq = pair.indexOf('=');
        String key = eq < 0 ? pair : pair.substring(0, eq);
        if (!"sslmode".equals(key) || eq < 0) {
          throw new StoreException("the server address " + redacted(location) + " has the"
              + " parameter '" + key + "'; only sslmode is taken from an address (credentials"
              + " come from PGUSER, ~/.pgpass or PGPASSWORD)");
        }
        sslmode = pair.substring(eq + 1);
      }
    }
    if (sslmode == null) {
      String fromEnv = env.get("PGSSLMODE");
      sslmode = fromEnv == null || fromEnv.isBlank() ? null : fromEnv.trim();
    }
    if (sslmode != null && !java.util.List.of("disable", "allow", "prefer", "require",
        "verify-ca", "verify-full").contains(sslmode.toLowerCase(Locale.ROOT))) {
      throw new StoreException("sslmode '" + sslmode + "' of the server address " + location
          + " is not one of disable, allow, prefer, require, verify-ca, verify-full");
    }
    return new ServerAddress(host, uri.getPort() < 0 ? DEFAULT_PORT : uri.getPort(),
        path.substring(1), sslmode);
  }

  /** An address with anything between the scheme and an {@code @} hidden. */
  private static String redacted(String location) {
    int at = location.indexOf('@');
    return at < 0 ? location.replaceAll("\\?.*$", "?...")
        : SCHEME + "***" + location.substring(at).replaceAll("\\?.*$", "?...");
  }

  /** The address as the user writes it (never with credentials). */
  @Override
  public String toString() {
    return SCHEME + (host.contains(":") ? "[" + host + "]" : host) + ":" + port + "/" + database
        + (sslmode == null ? "" : "?sslmode=" + sslmode);
  }

  /** The JDBC URL, without credentials. */
  String jdbcUrl() {
    return "jdbc:postgresql://" + (host.contains(":") ? "[" + host + "]" : host) + ":" + port + "/"
        + database;
  }

  /**
   * The driver's connection properties: user, password (only when {@code PGPASSWORD} is set;
   * otherwise the driver reads {@code ~/.pgpass}), sslmode, and the application name the server
   * shows in {@code pg_stat_activity}.
   */
  Properties properties(Map<String, String> env) {
    Properties p = new Properties();
    String user = env.get("PGUSER");
    if (user == null || user.isBlank()) {
      user = System.getProperty("user.name");
    }
    p.setProperty("user", user);
    String password = env.get("PGPASSWORD");
    if (password != null && !password.isEmpty()) {
      p.setProperty("password", password);
    }
    if (sslmode != null) {
      p.setProperty("sslmode", sslmode);
    }
    p.setProperty("ApplicationName", "Bracewalk");
    return p;
  }
}

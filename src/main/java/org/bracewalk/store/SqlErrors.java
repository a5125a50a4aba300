package org.bracewalk.store;

import java.sql.SQLException;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.bracewalk.core.port.InspectionFinalisedException;
import org.bracewalk.core.port.StoreBusyException;
import org.bracewalk.core.port.StoreException;
import org.postgresql.util.PSQLException;
import org.postgresql.util.ServerErrorMessage;
import org.sqlite.SQLiteErrorCode;
import org.sqlite.SQLiteException;

/**
 * Turns SQLite and PostgreSQL errors into messages a user can act on.
 *
 * <p>The triggers' messages are literal text (an expression in {@code RAISE(ABORT, ...)} parses
 * only in SQLite 3.47 and later, and the file must open in older tools), so they name the kind of
 * record and the rule but no ids. The repository that writes a record passes a {@link Subject}
 * naming it with its ids, and the message shown is the subject, a colon, and the rule.
 */
final class SqlErrors {
  private static final Pattern FINALISED =
      Pattern.compile("is finalised and cannot be changed \\(([^)]*)\\)");
  private static final Pattern DETAIL = Pattern.compile("\\((.*)\\)\\s*$", Pattern.DOTALL);

  private SqlErrors() {}

  /**
   * The record a statement writes, as the user knows it.
   *
   * @param label e.g. "observation of inspection 3, plane 5, lift 2, bay 1"
   * @param inspectionId the inspection the record belongs to, when there is one, so that a
   *     refusal because it is finalised names it; {@code null} otherwise
   */
  record Subject(String label, Long inspectionId) {
    static Subject of(String label) {
      return new Subject(label, null);
    }

    static Subject of(String label, long inspectionId) {
      return new Subject(label, inspectionId);
    }
  }

  static StoreException translate(SQLException e, String file) {
    return translate(e, file, null, Database.BUSY_TIMEOUT_MS);
  }

  /** As {@link #translate(SQLException, String)}, for a store that waits {@code busyTimeoutMs}. */
  static StoreException translate(SQLException e, String file, int busyTimeoutMs) {
    return translate(e, file, null, busyTimeoutMs);
  }

  /** As {@link #translate(SQLException, String)}, naming the record written. */
  static StoreException translate(SQLException e, String file, Subject subject) {
    return translate(e, file, subject, Database.BUSY_TIMEOUT_MS);
  }

  static StoreException translate(SQLException e, String file, Subject subject, int busyTimeoutMs) {
    if (e instanceof PSQLException server) {
      return translateServer(server, file, subject, busyTimeoutMs);
    }
    String message = e.getMessage() == null ? "" : e.getMessage();
    SQLiteErrorCode code = e instanceof SQLiteException s ? s.getResultCode() : null;
    if (code == SQLiteErrorCode.SQLITE_CONSTRAINT_TRIGGER) {
      String rule = detail(message);
      Matcher finalised = FINALISED.matcher(rule);
      if (finalised.find() && subject != null && subject.inspectionId() != null) {
        return new InspectionFinalisedException(subject.inspectionId(), finalised.group(1), e);
      }
      return new StoreException(subject == null ? rule : subject.label() + ": " + rule, e);
    }
    if (code != null && code.name().startsWith("SQLITE_CONSTRAINT")) {
      return new StoreException("the database refused "
          + (subject == null ? "the record" : subject.label()) + ": " + detail(message), e);
    }
    if (code != null
        && (code.name().startsWith("SQLITE_BUSY") || code.name().startsWith("SQLITE_LOCKED"))) {
      return new StoreBusyException(
          "the database "
              + file
              + " stayed busy for "
              + seconds(busyTimeoutMs)
              + " s (another Bracewalk is writing to it)",
          e);
    }
    if (code == SQLiteErrorCode.SQLITE_NOTADB || code == SQLiteErrorCode.SQLITE_CORRUPT) {
      return new StoreException(file + " is not a readable Bracewalk database: " + message, e);
    }
    return new StoreException("database " + file + ": " + message, e);
  }

  /**
   * A PostgreSQL error, by its SQLSTATE (PostgreSQL's appendix "Error Codes"): a trigger's
   * {@code RAISE EXCEPTION} ({@code P0001}) carries the same literal rule as SQLite's trigger and
   * is shown the same way; a constraint (class 23) is refused naming the record; a lock wait that
   * ran out, a deadlock or a serialization failure is "busy"; a connection or login failure names
   * the server and where the credentials come from.
   */
  private static StoreException translateServer(
      PSQLException e, String server, Subject subject, int busyTimeoutMs) {
    String state = e.getSQLState() == null ? "" : e.getSQLState();
    ServerErrorMessage detail = e.getServerErrorMessage();
    String message = detail != null && detail.getMessage() != null ? detail.getMessage()
        : String.valueOf(e.getMessage());
    if ("P0001".equals(state)) {
      Matcher finalised = FINALISED.matcher(message);
      if (finalised.find() && subject != null && subject.inspectionId() != null) {
        return new InspectionFinalisedException(subject.inspectionId(), finalised.group(1), e);
      }
      return new StoreException(subject == null ? message : subject.label() + ": " + message, e);
    }
    if (state.startsWith("23")) {
      return new StoreException("the database refused "
          + (subject == null ? "the record" : subject.label()) + ": " + message, e);
    }
    if ("55P03".equals(state) || "40P01".equals(state) || "40001".equals(state)) {
      return new StoreBusyException("the server " + server + " stayed busy for "
          + seconds(busyTimeoutMs) + " s (another Bracewalk is writing the same records)", e);
    }
    if ("28P01".equals(state) || "28000".equals(state)) {
      return new StoreException("the server " + server + " refused the login (" + message
          + "); Bracewalk logs in as PGUSER (else your system user name) with the password from"
          + " ~/.pgpass or PGPASSWORD", e);
    }
    if ("3D000".equals(state)) {
      return new StoreException("the server " + server + " has no such database (" + message
          + "); the office creates it first (README, \"A team server: PostgreSQL\")", e);
    }
    if (state.startsWith("08")) {
      return new StoreException("cannot reach the server " + server + ": " + message, e);
    }
    if ("42501".equals(state)) {
      return new StoreException("the server " + server + " refused: " + message
          + " (the working role has only the grants README lists)", e);
    }
    return new StoreException("database " + server + ": " + message, e);
  }

  private static String seconds(int ms) {
    return ms % 1000 == 0 ? String.valueOf(ms / 1000) : String.valueOf(ms / 1000.0);
  }

  private static String detail(String message) {
    Matcher m = DETAIL.matcher(message);
    return m.find() ? m.group(1) : message;
  }
}

package org.bracewalk.store;

import java.sql.SQLException;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.bracewalk.core.port.InspectionFinalisedException;
import org.bracewalk.core.port.StoreBusyException;
import org.bracewalk.core.port.StoreException;
import org.sqlite.SQLiteErrorCode;
import org.sqlite.SQLiteException;

/** Turns SQLite errors into messages a user can act on. */
final class SqlErrors {
  private static final Pattern FINALISED =
      Pattern.compile("inspection (\\d+) is finalised and cannot be changed \\(([^)]*)\\)");
  private static final Pattern DETAIL = Pattern.compile("\\((.*)\\)\\s*$", Pattern.DOTALL);

  private SqlErrors() {}

  static StoreException translate(SQLException e, String file) {
    return translate(e, file, Database.BUSY_TIMEOUT_MS);
  }

  /** As {@link #translate(SQLException, String)}, for a store that waits {@code busyTimeoutMs}. */
  static StoreException translate(SQLException e, String file, int busyTimeoutMs) {
    String message = e.getMessage() == null ? "" : e.getMessage();
    Matcher finalised = FINALISED.matcher(message);
    if (finalised.find()) {
      return new InspectionFinalisedException(
          Long.parseLong(finalised.group(1)), finalised.group(2), e);
    }
    SQLiteErrorCode code = e instanceof SQLiteException s ? s.getResultCode() : null;
    if (code == SQLiteErrorCode.SQLITE_CONSTRAINT_TRIGGER) {
      return new StoreException(detail(message), e);
    }
    if (code != null && code.name().startsWith("SQLITE_CONSTRAINT")) {
      return new StoreException("the database refused the record: " + detail(message), e);
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

  private static String seconds(int ms) {
    return ms % 1000 == 0 ? String.valueOf(ms / 1000) : String.valueOf(ms / 1000.0);
  }

  private static String detail(String message) {
    Matcher m = DETAIL.matcher(message);
    return m.find() ? m.group(1) : message;
  }
}

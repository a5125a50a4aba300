package org.bracewalk.store;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Types;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.MemberKind;

/**
 * How values sit in columns. Instants are text in one fixed UTC format with milliseconds, so text
 * order is time order; dates are ISO text; a brace is a diagonal symbol and a kind label.
 */
final class Columns {
  private static final DateTimeFormatter INSTANT =
      DateTimeFormatter.ofPattern("uuuu-MM-dd'T'HH:mm:ss.SSS'Z'").withZone(ZoneOffset.UTC);

  private Columns() {}

  static String text(Instant at) {
    return at == null ? null : INSTANT.format(at);
  }

  /** The instant as the store keeps it: to the millisecond. */
  static Instant millis(Instant at) {
    return at == null ? null : at.truncatedTo(java.time.temporal.ChronoUnit.MILLIS);
  }

  static Instant instant(ResultSet r, String column) throws SQLException {
    String s = r.getString(column);
    return s == null ? null : Instant.parse(s);
  }

  static String text(LocalDate date) {
    return date == null ? null : date.toString();
  }

  static LocalDate date(ResultSet r, String column) throws SQLException {
    String s = r.getString(column);
    return s == null ? null : LocalDate.parse(s);
  }

  static Brace brace(ResultSet r, String diagonalColumn, String kindColumn) throws SQLException {
    String d = r.getString(diagonalColumn);
    if (d == null) {
      return null;
    }
    return new Brace(Diagonal.fromSymbol(d), MemberKind.fromLabel(r.getString(kindColumn)));
  }

  static void setBrace(PreparedStatement s, int diagonalIndex, int kindIndex, Brace b)
      throws SQLException {
    s.setString(diagonalIndex, b == null ? null : b.diagonal().symbol());
    s.setString(kindIndex, b == null ? null : b.kind().label());
  }

  static Long longOrNull(ResultSet r, String column) throws SQLException {
    long v = r.getLong(column);
    return r.wasNull() ? null : v;
  }

  static Integer intOrNull(ResultSet r, String column) throws SQLException {
    int v = r.getInt(column);
    return r.wasNull() ? null : v;
  }

  static void setLong(PreparedStatement s, int index, Long v) throws SQLException {
    if (v == null) {
      s.setNull(index, Types.INTEGER);
    } else {
      s.setLong(index, v);
    }
  }

  static void setInt(PreparedStatement s, int index, Integer v) throws SQLException {
    if (v == null) {
      s.setNull(index, Types.INTEGER);
    } else {
      s.setInt(index, v);
    }
  }
}

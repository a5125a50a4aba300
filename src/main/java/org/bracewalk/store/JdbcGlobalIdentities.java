package org.bracewalk.store;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import java.util.UUID;
import org.bracewalk.core.port.GlobalIdentities;
import org.bracewalk.core.port.RecordStore;

/**
 * The {@code uuid} column (migration V12) of every table a sync moves. New rows get a random UUID
 * from {@link #next}; {@link #adopting} hands a given one to the next row of a kind instead.
 */
final class JdbcGlobalIdentities implements GlobalIdentities {
  private static final Map<Kind, String> TABLES = new EnumMap<>(Kind.class);

  static {
    TABLES.put(Kind.SITE, "sites");
    TABLES.put(Kind.STRUCTURE, "structures");
    TABLES.put(Kind.PLANE, "planes");
    TABLES.put(Kind.DESIGN_REVISION, "design_revisions");
    TABLES.put(Kind.INSPECTION, "inspections");
    TABLES.put(Kind.OBSERVATION, "observations");
    TABLES.put(Kind.PHOTO, "photos");
    TABLES.put(Kind.REPAIR_ORDER, "repair_orders");
    TABLES.put(Kind.REPAIR_ACTION, "repair_actions");
    TABLES.put(Kind.ISSUED_REPORT, "issued_reports");
  }

  private final Database db;
  /** Identities handed to the next row of a kind; guarded by the database's lock. */
  private final Map<Kind, String> adopted = new EnumMap<>(Kind.class);

  JdbcGlobalIdentities(Database db) {
    this.db = db;
  }

  /** The table of a kind. */
  static String table(Kind kind) {
    return TABLES.get(kind);
  }

  /** The uuid of the next row of {@code kind}: an adopted one, else a new random one. */
  String next(Kind kind) {
    String given = adopted.remove(kind);
    return given != null ? given : UUID.randomUUID().toString();
  }

  @Override
  public String uuidOf(Kind kind, long id) {
    Optional<String> found = db.call(c -> {
      try (PreparedStatement s =
          c.prepareStatement("SELECT uuid FROM " + table(kind) + " WHERE id = ?")) {
        s.setLong(1, id);
        try (ResultSet r = s.executeQuery()) {
          return r.next() ? Optional.ofNullable(r.getString(1)) : Optional.<String>empty();
        }
      }
    });
    return found.orElseThrow(() -> new NotFoundInStoreException(
        "no " + kind.words() + " " + id + " in " + db.location()));
  }

  @Override
  public Map<Long, String> uuidsOf(Kind kind, java.util.Collection<Long> ids) {
    java.util.List<Long> list = new java.util.ArrayList<>(new java.util.TreeSet<>(ids));
    Map<Long, String> out = new LinkedHashMap<>();
    int chunk = 500;
    for (int from = 0; from < list.size(); from += chunk) {
      java.util.List<Long> part = list.subList(from, Math.min(list.size(), from + chunk));
      String marks = String.join(", ", java.util.Collections.nCopies(part.size(), "?"));
      out.putAll(db.call(c -> {
        try (PreparedStatement s = c.prepareStatement(
            "SELECT id, uuid FROM " + table(kind) + " WHERE id IN (" + marks + ")")) {
          for (int i = 0; i < part.size(); i++) {
            s.setLong(i + 1, part.get(i));
          }
          Map<Long, String> found = new LinkedHashMap<>();
          try (ResultSet r = s.executeQuery()) {
            while (r.next()) {
              found.put(r.getLong(1), r.getString(2));
            }
          }
          return found;
        }
      }));
    }
    return out;
  }

  @Override
  public Map<Long, String> all(Kind kind) {
    return db.call(c -> {
      try (PreparedStatement s =
          c.prepareStatement("SELECT id, uuid FROM " + table(kind) + " ORDER BY id");
          ResultSet r = s.executeQuery()) {
        Map<Long, String> out = new LinkedHashMap<>();
        while (r.next()) {
          out.put(r.getLong(1), r.getString(2));
        }
        return out;
      }
    });
  }

  @Override
  public Optional<Long> idOf(Kind kind, String uuid) {
    return db.call(c -> {
      try (PreparedStatement s =
          c.prepareStatement("SELECT id FROM " + table(kind) + " WHERE uuid = ?")) {
        s.setString(1, uuid);
        try (ResultSet r = s.executeQuery()) {
          return r.next() ? Optional.of(r.getLong(1)) : Optional.<Long>empty();
        }
      }
    });
  }

  @Override
  public <T> T adopting(Kind kind, String uuid, RecordStore.Work<T> insert) {
    UUID.fromString(uuid); // refuses anything that is not a UUID
    return db.inTransaction(() -> {
      adopted.put(kind, uuid.toLowerCase(java.util.Locale.ROOT));
      try {
        return insert.run();
      } finally {
        adopted.remove(kind);
      }
    });
  }
}

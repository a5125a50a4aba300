package org.bracewalk.store;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.bracewalk.core.model.Structure;
import org.bracewalk.core.model.StructureKind;
import org.bracewalk.core.port.GlobalIdentities;
import org.bracewalk.core.port.StructureRepository;

/** Structures in table {@code structures}. */
final class JdbcStructureRepository implements StructureRepository {
  private static final String INSERT =
      """
      INSERT INTO structures
        (site_id, name, kind, description, design_reference, inspection_interval_days, uuid)
      VALUES (?, ?, ?, ?, ?, ?, ?)
      """;
  private static final String SELECT =
      """
      SELECT id, site_id, name, kind, description, design_reference, inspection_interval_days
      FROM structures
      """;

  private static final String AS_OF_INSPECTION =
      """
      SELECT s.id, s.site_id, s.name, s.kind, s.description, s.design_reference,
             coalesce(i.inspection_interval_days, s.inspection_interval_days)
               AS inspection_interval_days
      FROM inspections i JOIN structures s ON s.id = i.structure_id
      WHERE i.id = ?
      """;

  private final Database db;

  JdbcStructureRepository(Database db) {
    this.db = db;
  }

  @Override
  public Structure add(Structure structure) {
    return db.call(
        c -> {
          try (PreparedStatement s = c.prepareStatement(INSERT, Statement.RETURN_GENERATED_KEYS)) {
            s.setLong(1, structure.siteId());
            s.setString(2, structure.name());
            s.setString(3, structure.kind().label());
            s.setString(4, structure.description());
            s.setString(5, structure.designReference());
            s.setInt(6, structure.inspectionIntervalDays());
            s.setString(7, db.newUuid(GlobalIdentities.Kind.STRUCTURE));
            s.executeUpdate();
            return structure.withId(db.lastInsertId());
          }
        },
        SqlErrors.Subject.of("structure '" + structure.name() + "' of site " + structure.siteId()));
  }

  @Override
  public Optional<Structure> find(long id) {
    return query(SELECT + " WHERE id = ?", id).stream().findFirst();
  }

  @Override
  public List<Structure> ofSite(long siteId) {
    return query(SELECT + " WHERE site_id = ? ORDER BY id", siteId);
  }

  @Override
  public Optional<Structure> setInspectionInterval(long structureId, int days) {
    int changed = db.call(
        c -> {
          try (PreparedStatement s = c.prepareStatement(
              "UPDATE structures SET inspection_interval_days = ? WHERE id = ?")) {
            s.setInt(1, days);
            s.setLong(2, structureId);
            return s.executeUpdate();
          }
        },
        SqlErrors.Subject.of("structure " + structureId));
    return changed == 0 ? Optional.empty() : find(structureId);
  }

  @Override
  public Optional<Structure> asOfInspection(long inspectionId) {
    return query(AS_OF_INSPECTION, inspectionId).stream().findFirst();
  }

  private List<Structure> query(String sql, long key) {
    return db.call(
        c -> {
          try (PreparedStatement s = c.prepareStatement(sql)) {
            s.setLong(1, key);
            try (ResultSet r = s.executeQuery()) {
              List<Structure> out = new ArrayList<>();
              while (r.next()) {
                out.add(read(r));
              }
              return out;
            }
          }
        });
  }

  private static Structure read(ResultSet r) throws SQLException {
    return new Structure(
        r.getLong("id"),
        r.getLong("site_id"),
        r.getString("name"),
        StructureKind.fromLabel(r.getString("kind")),
        r.getString("description"),
        r.getString("design_reference"),
        r.getInt("inspection_interval_days"));
  }
}

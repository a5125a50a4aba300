package org.bracewalk.store;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.InspectionStatus;
import org.bracewalk.core.port.GlobalIdentities;
import org.bracewalk.core.port.InspectionFinalisedException;
import org.bracewalk.core.port.InspectionRepository;
import org.bracewalk.core.port.StoreException;

/** Inspections in table {@code inspections}; the triggers keep finalised ones as they are. */
final class JdbcInspectionRepository implements InspectionRepository {
  private static final String INSERT =
      """
      INSERT INTO inspections
        (structure_id, started_at, finished_at, inspector_name, inspector_position,
         competent_person, shift, storage_safety_person, reason, status,
         carried_out_for_name, carried_out_for_address, inspection_interval_days, uuid)
      VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?,
              CASE WHEN ? = 'finalised'
                   THEN (SELECT inspection_interval_days FROM structures WHERE id = ?) END, ?)
      """;
  private static final String SELECT =
      """
      SELECT id, structure_id, started_at, finished_at, inspector_name, inspector_position,
             competent_person, shift, storage_safety_person, reason, status,
             carried_out_for_name, carried_out_for_address
      FROM inspections
      """;
  private static final String FINALISE =
      """
      UPDATE inspections
      SET status = 'finalised', finished_at = ?,
          inspection_interval_days =
            (SELECT s.inspection_interval_days FROM structures s
             WHERE s.id = inspections.structure_id)
      WHERE id = ? AND status = 'open'
      """;

  private final Database db;

  JdbcInspectionRepository(Database db) {
    this.db = db;
  }

  @Override
  public Inspection add(Inspection inspection) {
    return db.call(
        c -> {
          try (PreparedStatement s = c.prepareStatement(INSERT, Statement.RETURN_GENERATED_KEYS)) {
            s.setLong(1, inspection.structureId());
            s.setString(2, Columns.text(inspection.startedAt()));
            s.setString(3, Columns.text(inspection.finishedAt()));
            s.setString(4, inspection.inspectorName());
            s.setString(5, inspection.inspectorPosition());
            s.setString(6, inspection.competentPerson());
            s.setString(7, inspection.shift());
            s.setString(8, inspection.storageSafetyPerson());
            s.setString(9, inspection.reason().label());
            s.setString(10, inspection.status().label());
            s.setString(11, inspection.carriedOutForName());
            s.setString(12, inspection.carriedOutForAddress());
            // the status and structure again: plain positional parameters, as both stores take
            s.setString(13, inspection.status().label());
            s.setLong(14, inspection.structureId());
            s.setString(15, db.newUuid(GlobalIdentities.Kind.INSPECTION));
            s.executeUpdate();
            return find(db.lastInsertId()).orElseThrow();
          }
        },
        SqlErrors.Subject.of("inspection of structure " + inspection.structureId()));
  }

  @Override
  public Optional<Inspection> find(long id) {
    return query(SELECT + " WHERE id = ?", id).stream().findFirst();
  }

  @Override
  public List<Inspection> ofStructure(long structureId) {
    return query(SELECT + " WHERE structure_id = ? ORDER BY started_at, id", structureId);
  }

  @Override
  public List<Inspection> all() {
    return query(SELECT + " ORDER BY id", null);
  }

  @Override
  public Inspection finalise(long id, Instant finishedAt) {
    return db.call(
        c -> {
          try (PreparedStatement s = c.prepareStatement(FINALISE)) {
            s.setString(1, Columns.text(finishedAt));
            s.setLong(2, id);
            if (s.executeUpdate() == 0) {
              Inspection current =
                  find(id).orElseThrow(() -> new StoreException("inspection " + id + " not found"));
              if (current.isFinalised()) {
                throw new InspectionFinalisedException(id, "finalise it again");
              }
              throw new StoreException("inspection " + id + " could not be finalised");
            }
          }
          return find(id).orElseThrow();
        },
        SqlErrors.Subject.of("inspection " + id, id));
  }

  private List<Inspection> query(String sql, Long key) {
    return db.call(
        c -> {
          PreparedStatement s = db.prepared(sql);
          if (key != null) {
            s.setLong(1, key);
          }
          try (ResultSet r = s.executeQuery()) {
            List<Inspection> out = new ArrayList<>();
            while (r.next()) {
              out.add(read(r));
            }
            return out;
          }
        });
  }

  private static Inspection read(ResultSet r) throws SQLException {
    return new Inspection(
        r.getLong("id"),
        r.getLong("structure_id"),
        Columns.instant(r, "started_at"),
        Columns.instant(r, "finished_at"),
        r.getString("inspector_name"),
        r.getString("inspector_position"),
        r.getString("competent_person"),
        r.getString("shift"),
        r.getString("storage_safety_person"),
        InspectionReason.fromLabel(r.getString("reason")),
        InspectionStatus.fromLabel(r.getString("status")),
        r.getString("carried_out_for_name"),
        r.getString("carried_out_for_address"));
  }
}

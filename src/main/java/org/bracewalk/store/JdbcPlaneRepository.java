package org.bracewalk.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.bracewalk.core.model.Millimetres;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.PlaneRole;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.PlaneRetirement;
import org.bracewalk.core.model.Support;
import org.bracewalk.core.port.GlobalIdentities;
import org.bracewalk.core.port.PlaneRepository;
import org.bracewalk.core.port.StoreException;

/**
 * Planes in {@code planes}, their bay widths and lift heights (whole millimetres) in {@code
 * plane_bay_widths} and {@code plane_lift_heights}.
 */
final class JdbcPlaneRepository implements PlaneRepository {
  private static final String INSERT =
      """
      INSERT INTO planes (structure_id, name, lifts, bays, support, role, uuid) VALUES (?, ?, ?, ?, ?, ?, ?)
      """;
  private static final String INSERT_WIDTH =
      """
      INSERT INTO plane_bay_widths (plane_id, bay, width_mm) VALUES (?, ?, ?)
      """;
  private static final String INSERT_HEIGHT =
      """
      INSERT INTO plane_lift_heights (plane_id, lift, height_mm) VALUES (?, ?, ?)
      """;
  private static final String SELECT =
      """
      SELECT id, structure_id, name, lifts, bays, support, role FROM planes
      """;
  private static final String WIDTHS =
      """
      SELECT width_mm FROM plane_bay_widths WHERE plane_id = ? ORDER BY bay
      """;
  private static final String HEIGHTS =
      """
      SELECT height_mm FROM plane_lift_heights WHERE plane_id = ? ORDER BY lift
      """;
  private static final String SAME_NAME =
      """
      SELECT 1 FROM planes WHERE structure_id = ? AND name = ?
      """;

  private static final String OF_INSPECTION =
      """
       WHERE id IN (SELECT plane_id FROM inspection_scope WHERE inspection_id = ?)
       ORDER BY id
      """;
  private static final String INSERT_SCOPE =
      """
      INSERT INTO inspection_scope (inspection_id, plane_id, design_revision_id) VALUES (?, ?, ?)
      """;
  private static final String SCOPE =
      """
      SELECT plane_id, design_revision_id FROM inspection_scope WHERE inspection_id = ?
       ORDER BY plane_id
      """;
  private static final String INSERT_RETIREMENT =
      """
      INSERT INTO plane_retirements (plane_id, retired_at, retired_by, reason) VALUES (?, ?, ?, ?)
      """;
  private static final String RETIREMENTS =
      """
      SELECT r.plane_id, r.retired_at, r.retired_by, r.reason FROM plane_retirements r
      """;

  private final Database db;

  JdbcPlaneRepository(Database db) {
    this.db = db;
  }

  @Override
  public PlaneRecord add(PlaneRecord plane) {
    PlaneGrid grid = Millimetres.round(plane.grid());
    List<Integer> widths = Millimetres.toMillimetres(grid.bayWidths());
    List<Integer> heights = Millimetres.toMillimetres(grid.liftHeights());
    return db.inTransaction(
        () ->
            db.call(
                c -> {
                  if (exists(c, plane.structureId(), plane.name())) {
                    throw new StoreException(
                        "structure "
                            + plane.structureId()
                            + " already has a plane named '"
                            + plane.name()
                            + "'; give this one another name");
                  }
                  long id;
                  try (PreparedStatement s =
                      c.prepareStatement(INSERT, Statement.RETURN_GENERATED_KEYS)) {
                    s.setLong(1, plane.structureId());
                    s.setString(2, plane.name());
                    s.setInt(3, grid.lifts());
                    s.setInt(4, grid.bays());
                    s.setString(5, grid.support().label());
                    s.setString(6, plane.role().label());
                    s.setString(7, db.newUuid(GlobalIdentities.Kind.PLANE));
                    s.executeUpdate();
                    id = db.lastInsertId();
                  }
                  insertLengths(c, INSERT_WIDTH, id, widths);
                  insertLengths(c, INSERT_HEIGHT, id, heights);
                  return new PlaneRecord(id, plane.structureId(), plane.name(), grid, plane.role());
                },
                SqlErrors.Subject.of(
                    "plane '" + plane.name() + "' of structure " + plane.structureId())));
  }

  private static boolean exists(Connection c, long structureId, String name) throws SQLException {
    try (PreparedStatement s = c.prepareStatement(SAME_NAME)) {
      s.setLong(1, structureId);
      s.setString(2, name);
      try (ResultSet r = s.executeQuery()) {
        return r.next();
      }
    }
  }

  private static void insertLengths(Connection c, String sql, long planeId, List<Integer> mm)
      throws SQLException {
    try (PreparedStatement s = c.prepareStatement(sql)) {
      for (int i = 0; i < mm.size(); i++) {
        s.setLong(1, planeId);
        s.setInt(2, i + 1);
        s.setInt(3, mm.get(i));
        s.addBatch();
      }
      s.executeBatch();
    }
  }

  /**
   * Planes never change once stored (migration V2 makes the database refuse), so a plane read
   * outside a transaction is kept: recording an observation looks its plane up every time.
   * Reads inside a transaction are not kept, as the transaction may yet roll back.
   */
  private final Map<Long, PlaneRecord> committed = new HashMap<>();

  @Override
  public Optional<PlaneRecord> find(long id) {
    return db.call(
        c -> {
          boolean keep = !db.inTransaction();
          PlaneRecord known = keep ? committed.get(id) : null;
          if (known != null) {
            return Optional.of(known);
          }
          Optional<PlaneRecord> found = query(SELECT + " WHERE id = ?", id, null).stream().findFirst();
          if (keep) {
            found.ifPresent(p -> committed.put(id, p));
          }
          return found;
        });
  }

  @Override
  public List<PlaneRecord> ofStructure(long structureId) {
    return query(SELECT + " WHERE structure_id = ? ORDER BY id", structureId, null);
  }

  @Override
  public List<PlaneRecord> ofInspection(long inspectionId) {
    return query(SELECT + OF_INSPECTION, inspectionId, null);
  }

  @Override
  public void fixScope(long inspectionId, Map<Long, Long> revisionByPlane) {
    db.inTransaction(
        () ->
            db.call(
                c -> {
                  if (revisionByPlane.isEmpty()) {
                    return null;
                  }
                  try (PreparedStatement s = c.prepareStatement(INSERT_SCOPE)) {
                    for (Map.Entry<Long, Long> e : revisionByPlane.entrySet()) {
                      s.setLong(1, inspectionId);
                      s.setLong(2, e.getKey());
                      s.setLong(3, e.getValue());
                      s.addBatch();
                    }
                    s.executeBatch();
                  }
                  return null;
                },
                SqlErrors.Subject.of("scope of inspection " + inspectionId + " (planes "
                    + revisionByPlane.keySet() + ")", inspectionId)));
  }

  @Override
  public Map<Long, Long> scopeOf(long inspectionId) {
    return db.call(
        c -> {
          PreparedStatement s = db.prepared(SCOPE);
          s.setLong(1, inspectionId);
          Map<Long, Long> out = new LinkedHashMap<>();
          try (ResultSet r = s.executeQuery()) {
            while (r.next()) {
              out.put(r.getLong(1), r.getLong(2));
            }
          }
          return out;
        });
  }

  @Override
  public PlaneRetirement retire(PlaneRetirement retirement) {
    PlaneRetirement stored = new PlaneRetirement(retirement.planeId(),
        Columns.millis(retirement.retiredAt()), retirement.retiredBy(), retirement.reason());
    return db.inTransaction(
        () ->
            db.call(
                c -> {
                  if (retirementOf(c, retirement.planeId()).isPresent()) {
                    throw new StoreException("plane " + retirement.planeId()
                        + " is already retired; a retirement is kept as recorded");
                  }
                  try (PreparedStatement s = c.prepareStatement(INSERT_RETIREMENT)) {
                    s.setLong(1, stored.planeId());
                    s.setString(2, Columns.text(stored.retiredAt()));
                    s.setString(3, stored.retiredBy());
                    s.setString(4, stored.reason());
                    s.executeUpdate();
                  }
                  return stored;
                }));
  }

  @Override
  public Optional<PlaneRetirement> retirement(long planeId) {
    // asked before every observation is recorded: a kept statement
    return db.call(
        c -> {
          PreparedStatement s = db.prepared(RETIREMENTS + " WHERE r.plane_id = ?");
          s.setLong(1, planeId);
          return retirements(s).stream().findFirst();
        });
  }

  @Override
  public List<PlaneRetirement> retirementsOf(long structureId) {
    return db.call(
        c -> {
          try (PreparedStatement s = c.prepareStatement(RETIREMENTS
              + " JOIN planes p ON p.id = r.plane_id WHERE p.structure_id = ? ORDER BY r.plane_id")) {
            s.setLong(1, structureId);
            return retirements(s);
          }
        });
  }

  private static Optional<PlaneRetirement> retirementOf(Connection c, long planeId)
      throws SQLException {
    try (PreparedStatement s = c.prepareStatement(RETIREMENTS + " WHERE r.plane_id = ?")) {
      s.setLong(1, planeId);
      return retirements(s).stream().findFirst();
    }
  }

  private static List<PlaneRetirement> retirements(PreparedStatement s) throws SQLException {
    List<PlaneRetirement> out = new ArrayList<>();
    try (ResultSet r = s.executeQuery()) {
      while (r.next()) {
        out.add(new PlaneRetirement(r.getLong("plane_id"), Columns.instant(r, "retired_at"),
            r.getString("retired_by"), r.getString("reason")));
      }
    }
    return out;
  }

  @Override
  public Optional<PlaneRecord> findByName(long structureId, String name) {
    return query(SELECT + " WHERE structure_id = ? AND name = ?", structureId, name.strip())
        .stream()
        .findFirst();
  }

  private List<PlaneRecord> query(String sql, long key, String name) {
    return db.call(
        c -> {
          List<PlaneRecord> out = new ArrayList<>();
          PreparedStatement s = db.prepared(sql);
          s.setLong(1, key);
          if (name != null) {
            s.setString(2, name);
          }
          {
            try (ResultSet r = s.executeQuery()) {
              while (r.next()) {
                long id = r.getLong("id");
                out.add(
                    new PlaneRecord(
                        id,
                        r.getLong("structure_id"),
                        r.getString("name"),
                        new PlaneGrid(
                            r.getInt("lifts"),
                            r.getInt("bays"),
                            null,
                            null,
                            Support.fromLabel(r.getString("support"))),
                        PlaneRole.fromLabel(r.getString("role"))));
              }
            }
          }
          List<PlaneRecord> full = new ArrayList<>(out.size());
          for (PlaneRecord p : out) {
            PlaneGrid g = p.grid();
            full.add(
                new PlaneRecord(
                    p.id(),
                    p.structureId(),
                    p.name(),
                    new PlaneGrid(
                        g.lifts(),
                        g.bays(),
                        Millimetres.toMetres(lengths(WIDTHS, p.id())),
                        Millimetres.toMetres(lengths(HEIGHTS, p.id())),
                        g.support()),
                    p.role()));
          }
          return full;
        });
  }

  private List<Integer> lengths(String sql, long planeId) throws SQLException {
    PreparedStatement s = db.prepared(sql);
    s.setLong(1, planeId);
    try (ResultSet r = s.executeQuery()) {
      List<Integer> out = new ArrayList<>();
      while (r.next()) {
        out.add(r.getInt(1));
      }
      return out;
    }
  }
}

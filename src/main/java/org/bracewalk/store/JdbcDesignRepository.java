package org.bracewalk.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.DesignRevision;
import org.bracewalk.core.model.FrameMemberType;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.port.GlobalIdentities;
import org.bracewalk.core.port.DesignRepository;
import org.bracewalk.core.port.StoreException;

/**
 * Design revisions in {@code design_revisions}; their braced panels and openings in {@code
 * design_panels}; the frame members it leaves out in {@code design_frame_omissions}. The grid comes
 * from the plane.
 */
final class JdbcDesignRepository implements DesignRepository {
  private static final String INSERT =
      """
      INSERT INTO design_revisions
        (plane_id, number, author, design_date, approval_note, recorded_at, panel_count,
         omitted_frame_count, uuid)
      VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?)
      """;
  private static final String INSERT_PANEL =
      """
      INSERT INTO design_panels (revision_id, lift, bay, diagonal, member_kind, opening)
      VALUES (?, ?, ?, ?, ?, ?)
      """;
  private static final String INSERT_OMISSION =
      """
      INSERT INTO design_frame_omissions (revision_id, frame_type, frame_first, frame_second)
      VALUES (?, ?, ?, ?)
      """;
  private static final String OMISSIONS =
      """
      SELECT frame_type, frame_first, frame_second FROM design_frame_omissions
      WHERE revision_id = ?
      """;
  private static final String SELECT =
      """
      SELECT id, plane_id, number, author, design_date, approval_note, recorded_at
      FROM design_revisions
      """;
  private static final String PANELS =
      """
      SELECT lift, bay, diagonal, member_kind, opening FROM design_panels WHERE revision_id = ?
      """;
  private static final String NUMBER_TAKEN =
      """
      SELECT 1 FROM design_revisions WHERE plane_id = ? AND number = ?
      """;

  private final Database db;

  JdbcDesignRepository(Database db) {
    this.db = db;
  }

  @Override
  public DesignRevision add(DesignRevision revision) {
    PlaneRecord plane =
        db.planes()
            .find(revision.planeId())
            .orElseThrow(() -> new StoreException("plane " + revision.planeId() + " not found"));
    if (!plane.grid().equals(revision.design().grid())) {
      throw new StoreException(
          "design revision "
              + revision.number()
              + " does not fit the grid of plane '"
              + plane.name()
              + "' (lifts, bays, widths, heights and support must match)");
    }
    return db.inTransaction(
        () ->
            db.call(
                c -> {
                  if (numberTaken(c, revision)) {
                    throw new StoreException(
                        "plane '"
                            + plane.name()
                            + "' already has a design revision "
                            + revision.number()
                            + "; add the next number instead");
                  }
                  long id;
                  try (PreparedStatement s =
                      c.prepareStatement(INSERT, Statement.RETURN_GENERATED_KEYS)) {
                    s.setLong(1, revision.planeId());
                    s.setInt(2, revision.number());
                    s.setString(3, revision.author());
                    s.setString(4, Columns.text(revision.date()));
                    s.setString(5, revision.approvalNote());
                    s.setString(6, Columns.text(revision.recordedAt()));
                    // the rows stored below; the database takes no more panels for it after them
                    s.setInt(7, revision.design().sortedBraces().size()
                        + revision.design().sortedOpenings().size());
                    s.setInt(8, revision.design().omittedFrame().size());
                    s.setString(9, db.newUuid(GlobalIdentities.Kind.DESIGN_REVISION));
                    s.executeUpdate();
                    id = db.lastInsertId();
                  }
                  try (PreparedStatement s = c.prepareStatement(INSERT_PANEL)) {
                    for (Map.Entry<PanelRef, Brace> e :
                        revision.design().sortedBraces().entrySet()) {
                      s.setLong(1, id);
                      s.setInt(2, e.getKey().lift());
                      s.setInt(3, e.getKey().bay());
                      Columns.setBrace(s, 4, 5, e.getValue());
                      s.setInt(6, 0);
                      s.addBatch();
                    }
                    for (PanelRef p : revision.design().sortedOpenings()) {
                      s.setLong(1, id);
                      s.setInt(2, p.lift());
                      s.setInt(3, p.bay());
                      Columns.setBrace(s, 4, 5, null);
                      s.setInt(6, 1);
                      s.addBatch();
                    }
                    s.executeBatch();
                  }
                  try (PreparedStatement s = c.prepareStatement(INSERT_OMISSION)) {
                    for (FrameRef f : revision.design().sortedOmittedFrame()) {
                      s.setLong(1, id);
                      s.setString(2, f.type().label());
                      s.setInt(3, f.first());
                      s.setInt(4, f.second());
                      s.addBatch();
                    }
                    s.executeBatch();
                  }
                  return read(c, id).orElseThrow();
                },
                SqlErrors.Subject.of("design revision " + revision.number() + " of plane '"
                    + plane.name() + "'")));
  }

  private static boolean numberTaken(Connection c, DesignRevision revision) throws SQLException {
    try (PreparedStatement s = c.prepareStatement(NUMBER_TAKEN)) {
      s.setLong(1, revision.planeId());
      s.setInt(2, revision.number());
      try (ResultSet r = s.executeQuery()) {
        return r.next();
      }
    }
  }

  @Override
  public Optional<DesignRevision> find(long id) {
    return db.call(c -> read(c, id));
  }

  @Override
  public List<DesignRevision> ofPlane(long planeId) {
    return db.call(
        c -> {
          List<Long> ids = new ArrayList<>();
          try (PreparedStatement s =
              c.prepareStatement("SELECT id FROM design_revisions WHERE plane_id = ? ORDER BY number")) {
            s.setLong(1, planeId);
            try (ResultSet r = s.executeQuery()) {
              while (r.next()) {
                ids.add(r.getLong(1));
              }
            }
          }
          List<DesignRevision> out = new ArrayList<>();
          for (long id : ids) {
            out.add(read(c, id).orElseThrow());
          }
          return out;
        });
  }

  private Optional<DesignRevision> read(Connection c, long id) throws SQLException {
    long planeId;
    int number;
    String author;
    String note;
    java.time.LocalDate date;
    java.time.Instant recordedAt;
    try (PreparedStatement s = c.prepareStatement(SELECT + " WHERE id = ?")) {
      s.setLong(1, id);
      try (ResultSet r = s.executeQuery()) {
        if (!r.next()) {
          return Optional.empty();
        }
        planeId = r.getLong("plane_id");
        number = r.getInt("number");
        author = r.getString("author");
        date = Columns.date(r, "design_date");
        note = r.getString("approval_note");
        recordedAt = Columns.instant(r, "recorded_at");
      }
    }
    Map<PanelRef, Brace> braces = new HashMap<>();
    Set<PanelRef> openings = new HashSet<>();
    try (PreparedStatement s = c.prepareStatement(PANELS)) {
      s.setLong(1, id);
      try (ResultSet r = s.executeQuery()) {
        while (r.next()) {
          PanelRef p = PanelRef.of(r.getInt("lift"), r.getInt("bay"));
          if (r.getInt("opening") == 1) {
            openings.add(p);
          } else {
            braces.put(p, Columns.brace(r, "diagonal", "member_kind"));
          }
        }
      }
    }
    Set<FrameRef> omitted = new HashSet<>();
    try (PreparedStatement s = c.prepareStatement(OMISSIONS)) {
      s.setLong(1, id);
      try (ResultSet r = s.executeQuery()) {
        while (r.next()) {
          omitted.add(new FrameRef(FrameMemberType.fromWord(r.getString("frame_type")),
              r.getInt("frame_first"), r.getInt("frame_second")));
        }
      }
    }
    PlaneRecord plane = db.planes().find(planeId).orElseThrow();
    return Optional.of(
        new DesignRevision(
            id, planeId, number, author, date, note, recordedAt,
            new PlaneDesign(plane.grid(), braces, openings, omitted)));
  }
}

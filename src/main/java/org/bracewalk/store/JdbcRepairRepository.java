package org.bracewalk.store;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.bracewalk.core.model.FrameMemberType;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.RepairAction;
import org.bracewalk.core.model.RepairActionKind;
import org.bracewalk.core.model.RepairOrder;
import org.bracewalk.core.port.GlobalIdentities;
import org.bracewalk.core.port.RepairRepository;
import org.bracewalk.core.port.StoreException;

/**
 * Repair orders in {@code repair_orders}, their actions in {@code repair_actions} (on a panel:
 * lift and bay; on a frame member: frame_type, frame_first, frame_second, as V10 stores them; on
 * the whole plane: neither).
 */
final class JdbcRepairRepository implements RepairRepository {
  private static final String INSERT_ORDER =
      """
      INSERT INTO repair_orders (inspection_id, created_at, created_by, note, uuid)
      VALUES (?, ?, ?, ?, ?)
      """;
  private static final String SELECT_ORDER =
      """
      SELECT id, inspection_id, created_at, created_by, note FROM repair_orders
      """;
  private static final String INSERT_ACTION =
      """
      INSERT INTO repair_actions
        (order_id, plane_id, lift, bay, action, brace_diagonal, brace_kind, description,
         due_date, assignee, done_at, done_by, verified_by_inspection_id, frame_type, frame_first,
         frame_second, uuid)
      VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)
      """;
  private static final String SELECT_ACTION =
      """
      SELECT id, order_id, plane_id, lift, bay, action, brace_diagonal, brace_kind, description,
             due_date, assignee, done_at, done_by, verified_by_inspection_id, frame_type,
             frame_first, frame_second
      FROM repair_actions
      """;
  private static final String MARK_DONE =
      """
      UPDATE repair_actions SET done_at = ?, done_by = ? WHERE id = ? AND done_at IS NULL
      """;
  private static final String MARK_VERIFIED =
      """
      UPDATE repair_actions SET verified_by_inspection_id = ?
      WHERE id = ? AND done_at IS NOT NULL AND verified_by_inspection_id IS NULL
      """;

  private final Database db;

  JdbcRepairRepository(Database db) {
    this.db = db;
  }

  @Override
  public RepairOrder addOrder(RepairOrder order) {
    return db.call(
        c -> {
          try (PreparedStatement s =
              c.prepareStatement(INSERT_ORDER, Statement.RETURN_GENERATED_KEYS)) {
            s.setLong(1, order.inspectionId());
            s.setString(2, Columns.text(order.createdAt()));
            s.setString(3, order.createdBy());
            s.setString(4, order.note());
            s.setString(5, db.newUuid(GlobalIdentities.Kind.REPAIR_ORDER));
            s.executeUpdate();
            return findOrder(db.lastInsertId()).orElseThrow();
          }
        },
        SqlErrors.Subject.of("repair order of inspection " + order.inspectionId()));
  }

  @Override
  public RepairAction addAction(RepairAction a) {
    FrameRef member = a.frameMember();
    return db.call(
        c -> {
          try (PreparedStatement s =
              c.prepareStatement(INSERT_ACTION, Statement.RETURN_GENERATED_KEYS)) {
            s.setLong(1, a.orderId());
            s.setLong(2, a.planeId());
            Columns.setInt(s, 3, a.panel() == null ? null : a.panel().lift());
            Columns.setInt(s, 4, a.panel() == null ? null : a.panel().bay());
            s.setString(5, a.action().label());
            Columns.setBrace(s, 6, 7, a.brace());
            s.setString(8, a.description());
            s.setString(9, Columns.text(a.dueDate()));
            s.setString(10, a.assignee());
            s.setString(11, Columns.text(a.doneAt()));
            s.setString(12, a.doneBy());
            Columns.setLong(s, 13, a.verifiedByInspectionId());
            s.setString(14, member == null ? null : member.type().label());
            Columns.setInt(s, 15, member == null ? null : member.first());
            Columns.setInt(s, 16, member == null ? null : member.second());
            s.setString(17, db.newUuid(GlobalIdentities.Kind.REPAIR_ACTION));
            s.executeUpdate();
            return findAction(db.lastInsertId()).orElseThrow();
          }
        },
        SqlErrors.Subject.of("action of repair order " + a.orderId() + " on plane " + a.planeId()
            + (a.panel() == null ? "" : ", " + a.panel())));
  }

  @Override
  public Optional<RepairOrder> findOrder(long id) {
    return orders(SELECT_ORDER + " WHERE id = ?", id).stream().findFirst();
  }

  @Override
  public Optional<RepairAction> findAction(long id) {
    return actions(SELECT_ACTION + " WHERE id = ?", id).stream().findFirst();
  }

  @Override
  public List<RepairOrder> ordersOf(long inspectionId) {
    return orders(SELECT_ORDER + " WHERE inspection_id = ? ORDER BY id", inspectionId);
  }

  @Override
  public List<RepairAction> actionsOf(long orderId) {
    return actions(SELECT_ACTION + " WHERE order_id = ? ORDER BY id", orderId);
  }

  @Override
  public RepairAction markDone(long actionId, Instant doneAt, String doneBy) {
    return update(MARK_DONE, actionId, "is already done", s -> {
      s.setString(1, Columns.text(doneAt));
      s.setString(2, doneBy == null ? "" : doneBy.strip());
      s.setLong(3, actionId);
    });
  }

  @Override
  public RepairAction markVerified(long actionId, long inspectionId) {
    return update(MARK_VERIFIED, actionId, "is not done yet or already verified", s -> {
      s.setLong(1, inspectionId);
      s.setLong(2, actionId);
    });
  }

  private interface Binder {
    void bind(PreparedStatement s) throws SQLException;
  }

  private RepairAction update(String sql, long actionId, String refusal, Binder binder) {
    return db.call(
        c -> {
          try (PreparedStatement s = c.prepareStatement(sql)) {
            binder.bind(s);
            if (s.executeUpdate() == 0) {
              findAction(actionId)
                  .orElseThrow(() -> new StoreException("repair action " + actionId + " not found"));
              throw new StoreException("repair action " + actionId + " " + refusal);
            }
          }
          return findAction(actionId).orElseThrow();
        },
        SqlErrors.Subject.of("repair action " + actionId));
  }

  private List<RepairOrder> orders(String sql, long key) {
    return db.call(
        c -> {
          try (PreparedStatement s = c.prepareStatement(sql)) {
            s.setLong(1, key);
            try (ResultSet r = s.executeQuery()) {
              List<RepairOrder> out = new ArrayList<>();
              while (r.next()) {
                out.add(
                    new RepairOrder(
                        r.getLong("id"),
                        r.getLong("inspection_id"),
                        Columns.instant(r, "created_at"),
                        r.getString("created_by"),
                        r.getString("note")));
              }
              return out;
            }
          }
        });
  }

  private List<RepairAction> actions(String sql, long key) {
    return db.call(
        c -> {
          try (PreparedStatement s = c.prepareStatement(sql)) {
            s.setLong(1, key);
            try (ResultSet r = s.executeQuery()) {
              List<RepairAction> out = new ArrayList<>();
              while (r.next()) {
                out.add(read(r));
              }
              return out;
            }
          }
        });
  }

  private static RepairAction read(ResultSet r) throws SQLException {
    Integer lift = Columns.intOrNull(r, "lift");
    Integer bay = Columns.intOrNull(r, "bay");
    String frameType = r.getString("frame_type");
    FrameRef member = frameType == null ? null
        : new FrameRef(FrameMemberType.fromWord(frameType), r.getInt("frame_first"),
            r.getInt("frame_second"));
    return new RepairAction(
        r.getLong("id"),
        r.getLong("order_id"),
        r.getLong("plane_id"),
        lift == null || bay == null ? null : PanelRef.of(lift, bay),
        RepairActionKind.fromLabel(r.getString("action")),
        Columns.brace(r, "brace_diagonal", "brace_kind"),
        r.getString("description"),
        Columns.date(r, "due_date"),
        r.getString("assignee"),
        Columns.instant(r, "done_at"),
        r.getString("done_by"),
        Columns.longOrNull(r, "verified_by_inspection_id"),
        member);
  }
}

package org.bracewalk.store;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.bracewalk.core.model.DefectType;
import org.bracewalk.core.model.FrameMemberType;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.Photo;
import org.bracewalk.core.port.GlobalIdentities;
import org.bracewalk.core.port.ObservationRepository;
import org.bracewalk.core.port.StoreException;

/**
 * Observations in {@code observations} (of one panel's diagonals: lift and bay; of one frame
 * member: frame_type, frame_first, frame_second), photos (BLOBs) in {@code photos}. Both append-only: the
 * triggers refuse updates, deletes, and inserts into finalised inspections. Bows are kept in
 * tenths of a millimetre.
 */
final class JdbcObservationRepository implements ObservationRepository {
  /** The message of migration V6's trigger refusing observations into a retired plane. */
  static final String RETIRED_PLANE = "the plane was retired before the inspection started";

  private static final String INSERT =
      """
      INSERT INTO observations
        (inspection_id, plane_id, lift, bay, state, member_diagonal, member_kind, bow_tenth_mm,
         gauge_length_mm, defect, note, recorded_at, recorded_by, supersedes_id,
         correction_reason, frame_type, frame_first, frame_second, uuid)
      VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)
      """;
  private static final String SELECT =
      """
      SELECT id, inspection_id, plane_id, lift, bay, state, member_diagonal, member_kind,
             bow_tenth_mm, gauge_length_mm, defect, note, recorded_at, recorded_by,
             supersedes_id, correction_reason, frame_type, frame_first, frame_second
      FROM observations
      """;
  private static final String INSERT_PHOTO =
      """
      INSERT INTO photos (observation_id, file_name, media_type, data, attached_at, uuid)
      VALUES (?, ?, ?, ?, ?, ?)
      """;
  private static final String SELECT_PHOTOS =
      """
      SELECT id, observation_id, file_name, media_type, data, attached_at
      FROM photos WHERE observation_id = ? ORDER BY id
      """;
  private static final String WITH_PHOTOS =
      """
      SELECT DISTINCT o.id FROM observations o JOIN photos p ON p.observation_id = o.id
      WHERE o.inspection_id = ? ORDER BY o.id
      """;

  private static final String SOURCES =
      """
      SELECT line, observation_id FROM observation_sources
      WHERE inspection_id = ? AND source_sha256 = ?
      """;
  private static final String INSERT_SOURCE =
      """
      INSERT INTO observation_sources (inspection_id, source_sha256, line, observation_id)
      VALUES (?, ?, ?, ?)
      """;

  private final Database db;

  JdbcObservationRepository(Database db) {
    this.db = db;
  }

  @Override
  public Observation add(Observation o) {
    return db.call(
        c -> {
          PreparedStatement s = db.prepared(INSERT);
          {
            s.setLong(1, o.inspectionId());
            s.setLong(2, o.planeId());
            FrameRef member = o.frameMember();
            Columns.setInt(s, 3, o.panel() == null ? null : o.panel().lift());
            Columns.setInt(s, 4, o.panel() == null ? null : o.panel().bay());
            s.setString(5, o.state().label());
            Columns.setBrace(s, 6, 7, o.memberFound());
            Columns.setInt(s, 8, o.bowMm() == null ? null : tenths(o.bowMm()));
            Columns.setInt(s, 9, o.gaugeLengthMm());
            s.setString(10, o.defect() == null ? null : o.defect().label());
            s.setString(11, o.note());
            s.setString(12, Columns.text(o.recordedAt()));
            s.setString(13, o.recordedBy());
            Columns.setLong(s, 14, o.supersedes());
            s.setString(15, o.correctionReason());
            s.setString(16, member == null ? null : member.type().label());
            Columns.setInt(s, 17, member == null ? null : member.first());
            Columns.setInt(s, 18, member == null ? null : member.second());
            try {
              s.setString(19, db.newUuid(GlobalIdentities.Kind.OBSERVATION));
              s.executeUpdate();
            } catch (SQLException e) {
              // the trigger's message is literal text (V6); name the plane and inspection here
              if (String.valueOf(e.getMessage()).contains(RETIRED_PLANE)) {
                throw new StoreException("plane " + o.planeId() + " was retired before inspection "
                    + o.inspectionId() + " started and is not part of it; nothing was stored", e);
              }
              throw e;
            }
            long id = db.lastInsertId();
            // as read back: instants to the millisecond, bows to the tenth
            return new Observation(id, o.inspectionId(), o.planeId(), o.panel(), o.state(),
                o.memberFound(), o.bowMm() == null ? null : tenths(o.bowMm()) / 10.0,
                o.gaugeLengthMm(), o.defect(), o.note(), Columns.millis(o.recordedAt()),
                o.recordedBy(), o.supersedes(), o.correctionReason(), o.frameMember());
          }
        },
        SqlErrors.Subject.of("observation of inspection " + o.inspectionId() + ", plane "
            + o.planeId() + ", " + (o.panel() == null ? o.frameMember() : o.panel())
            + (o.supersedes() == null ? "" : ", correcting observation " + o.supersedes()),
            o.inspectionId()));
  }

  /** A bow in millimetres as whole tenths, rounded half up. */
  static int tenths(double mm) {
    return (int) Math.round(mm * 10.0);
  }

  @Override
  public Optional<Observation> find(long id) {
    return query(SELECT + " WHERE id = ?", id).stream().findFirst();
  }

  @Override
  public List<Observation> ofInspection(long inspectionId) {
    return query(SELECT + " WHERE inspection_id = ? ORDER BY id", inspectionId);
  }

  private List<Observation> query(String sql, long key) {
    return db.call(
        c -> {
          PreparedStatement s = db.prepared(sql);
          s.setLong(1, key);
          try (ResultSet r = s.executeQuery()) {
            List<Observation> out = new ArrayList<>();
            while (r.next()) {
              out.add(read(r));
            }
            return out;
          }
        });
  }

  private static Observation read(ResultSet r) throws SQLException {
    Integer bow = Columns.intOrNull(r, "bow_tenth_mm");
    String defect = r.getString("defect");
    String frameType = r.getString("frame_type");
    FrameRef member = frameType == null ? null
        : new FrameRef(FrameMemberType.fromWord(frameType), r.getInt("frame_first"),
            r.getInt("frame_second"));
    return new Observation(
        r.getLong("id"),
        r.getLong("inspection_id"),
        r.getLong("plane_id"),
        member == null ? PanelRef.of(r.getInt("lift"), r.getInt("bay")) : null,
        PanelState.fromLabel(r.getString("state")),
        Columns.brace(r, "member_diagonal", "member_kind"),
        bow == null ? null : bow / 10.0,
        Columns.intOrNull(r, "gauge_length_mm"),
        defect == null ? null : DefectType.fromLabel(defect),
        r.getString("note"),
        Columns.instant(r, "recorded_at"),
        r.getString("recorded_by"),
        Columns.longOrNull(r, "supersedes_id"),
        r.getString("correction_reason"),
        member);
  }

  @Override
  public Photo addPhoto(Photo photo) {
    Long inspectionId = find(photo.observationId()).map(Observation::inspectionId).orElse(null);
    return db.call(
        c -> {
          try (PreparedStatement s =
              c.prepareStatement(INSERT_PHOTO, Statement.RETURN_GENERATED_KEYS)) {
            s.setLong(1, photo.observationId());
            s.setString(2, photo.fileName());
            s.setString(3, photo.mediaType());
            s.setBytes(4, photo.data());
            s.setString(5, Columns.text(photo.attachedAt()));
            s.setString(6, db.newUuid(GlobalIdentities.Kind.PHOTO));
            s.executeUpdate();
            long id = db.lastInsertId();
            // as read back (instants to the millisecond), without reading the observation's
            // other photos back: a dozen large photos would otherwise be read a dozen times over
            return new Photo(id, photo.observationId(), photo.fileName(), photo.mediaType(),
                photo.data(), Columns.millis(photo.attachedAt()));
          }
        },
        new SqlErrors.Subject("photo '" + photo.fileName() + "' of observation "
            + photo.observationId()
            + (inspectionId == null ? "" : " of inspection " + inspectionId), inspectionId));
  }

  @Override
  public List<Photo> photosOf(long observationId) {
    return db.call(
        c -> {
          try (PreparedStatement s = c.prepareStatement(SELECT_PHOTOS)) {
            s.setLong(1, observationId);
            try (ResultSet r = s.executeQuery()) {
              List<Photo> out = new ArrayList<>();
              while (r.next()) {
                out.add(
                    new Photo(
                        r.getLong("id"),
                        r.getLong("observation_id"),
                        r.getString("file_name"),
                        r.getString("media_type"),
                        r.getBytes("data"),
                        Columns.instant(r, "attached_at")));
              }
              return out;
            }
          }
        });
  }

  @Override
  public List<Long> withPhotos(long inspectionId) {
    return db.call(
        c -> {
          try (PreparedStatement s = c.prepareStatement(WITH_PHOTOS)) {
            s.setLong(1, inspectionId);
            try (ResultSet r = s.executeQuery()) {
              List<Long> out = new ArrayList<>();
              while (r.next()) {
                out.add(r.getLong(1));
              }
              return out;
            }
          }
        });
  }

  @Override
  public Map<Integer, Long> recordedFrom(long inspectionId, String sourceSha256) {
    return db.call(
        c -> {
          PreparedStatement s = db.prepared(SOURCES);
          s.setLong(1, inspectionId);
          s.setString(2, sourceSha256);
          try (ResultSet r = s.executeQuery()) {
            Map<Integer, Long> out = new HashMap<>();
            while (r.next()) {
              out.put(r.getInt(1), r.getLong(2));
            }
            return out;
          }
        });
  }

  @Override
  public void addSource(long inspectionId, String sourceSha256, int line, long observationId) {
    db.call(
        c -> {
          PreparedStatement s = db.prepared(INSERT_SOURCE);
          s.setLong(1, inspectionId);
          s.setString(2, sourceSha256);
          s.setInt(3, line);
          s.setLong(4, observationId);
          return s.executeUpdate();
        });
  }
}

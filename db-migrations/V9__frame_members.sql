-- Frame members (ledgers and standards; racking: beams, frame horizontals and uprights) in the
-- records: the members a design revision leaves out, and observations of frame members.
--
-- Naming, as core.model.FrameRef: a ledger is (level 0..lifts, bay 1..bays), a standard segment
-- (lift 1..lifts, line 0..bays); stored as frame_type ('ledger' / 'standard'), frame_first and
-- frame_second.
--
-- 1. design_frame_omissions: one row per frame member a revision leaves out (a revision with no
--    row has a complete frame, which is what every revision before this migration had).
--    Append-only like design_panels: design_revisions.omitted_frame_count says how many rows the
--    revision has, and none can be added once it has them all. Existing revisions get 0.
--
-- 2. Frame-member observations live in the observations table itself, so they are exactly the
--    same kind of record as observations of diagonals: one id space (a correction, a photo, a
--    CSV source row and the command line name an observation by its id alone), the same photos,
--    corrections (supersedes + reason, corrected once, within one inspection), finalisation
--    guard, sources (V4), scope (V7), retirement (V6) and append-only triggers, with no second
--    copy of any of them to drift apart. A separate frame_observations table would have needed
--    its own photos and sources tables and ids that could collide with the diagonals'.
--    SQLite cannot relax observations.lift / bay NOT NULL or V1's CHECK that an 'extra'
--    observation names a diagonal, so the table is rebuilt: observations, photos and
--    observation_sources are copied into new tables with every id kept, the old tables are
--    dropped (children first, so foreign keys hold throughout; this runs in Flyway's one
--    transaction with foreign keys on), the new ones take the old names (ALTER TABLE RENAME
--    rewrites their foreign keys to the new table), and every index and trigger of the three
--    tables (V3, V4, V6, V7) is made again as it was, plus the frame checks below.
--    An observation names either a panel (lift, bay) or a frame member, never both.
--
-- Trigger messages are literal text (SQLite 3.31+ must parse this file); the program adds the
-- ids when it translates them (store.SqlErrors). Never edit this file once released: add a new
-- migration instead (see DEVELOPERS.md).

-- ---- 1. frame members a design leaves out ---------------------------------------------------

ALTER TABLE design_revisions ADD COLUMN omitted_frame_count INTEGER NOT NULL DEFAULT 0
  CHECK (omitted_frame_count >= 0);

CREATE TABLE design_frame_omissions (
  revision_id  INTEGER NOT NULL REFERENCES design_revisions (id),
  frame_type   TEXT NOT NULL CHECK (frame_type IN ('ledger', 'standard')),
  frame_first  INTEGER NOT NULL CHECK (frame_first >= 0),
  frame_second INTEGER NOT NULL CHECK (frame_second >= 0),
  CHECK (frame_type <> 'ledger' OR frame_second >= 1),
  CHECK (frame_type <> 'standard' OR frame_first >= 1),
  PRIMARY KEY (revision_id, frame_type, frame_first, frame_second)
) WITHOUT ROWID;

CREATE TRIGGER design_frame_omissions_never_change BEFORE UPDATE ON design_frame_omissions
BEGIN
  SELECT RAISE(ABORT, 'design revision cannot be changed: add a new revision');
END;

CREATE TRIGGER design_frame_omissions_never_go BEFORE DELETE ON design_frame_omissions
BEGIN
  SELECT RAISE(ABORT, 'design revision cannot be changed: add a new revision');
END;

CREATE TRIGGER design_frame_omissions_never_overwritten BEFORE INSERT ON design_frame_omissions
WHEN EXISTS (SELECT 1 FROM design_frame_omissions
             WHERE revision_id = NEW.revision_id AND frame_type = NEW.frame_type
               AND frame_first = NEW.frame_first AND frame_second = NEW.frame_second)
BEGIN
  SELECT RAISE(ABORT, 'the frame member is already left out of the design revision: records are never overwritten; add a new revision');
END;

CREATE TRIGGER design_frame_omissions_only_while_stored BEFORE INSERT ON design_frame_omissions
WHEN (SELECT count(*) FROM design_frame_omissions WHERE revision_id = NEW.revision_id)
     >= (SELECT omitted_frame_count FROM design_revisions WHERE id = NEW.revision_id)
BEGIN
  SELECT RAISE(ABORT, 'design revision already has all its frame members left out and cannot be changed: add a new revision');
END;

CREATE TRIGGER design_frame_omissions_inside_the_plane BEFORE INSERT ON design_frame_omissions
WHEN NEW.frame_first > (SELECT p.lifts FROM planes p JOIN design_revisions d ON d.plane_id = p.id
                        WHERE d.id = NEW.revision_id)
  OR NEW.frame_second > (SELECT p.bays FROM planes p JOIN design_revisions d ON d.plane_id = p.id
                         WHERE d.id = NEW.revision_id)
BEGIN
  SELECT RAISE(ABORT, 'the frame member left out of the design lies outside the plane');
END;

-- ---- 2. observations of panels or frame members: the rebuild ----------------------------------

DROP TRIGGER observations_never_change;
DROP TRIGGER observations_never_go;
DROP TRIGGER observations_never_overwritten;
DROP TRIGGER corrections_never_overwritten;
DROP TRIGGER observations_only_into_open_inspections;
DROP TRIGGER observations_of_the_inspected_structure;
DROP TRIGGER observations_inside_the_plane;
DROP TRIGGER corrections_within_one_inspection;
DROP TRIGGER observations_stored_trimmed;
DROP TRIGGER observations_not_into_retired_planes;
DROP TRIGGER observations_within_the_scope;
DROP TRIGGER photos_never_change;
DROP TRIGGER photos_never_go;
DROP TRIGGER photos_never_overwritten;
DROP TRIGGER photos_only_into_open_inspections;
DROP TRIGGER photos_stored_trimmed;
DROP TRIGGER observation_sources_never_replaced;
DROP TRIGGER observation_sources_of_the_same_inspection;
DROP TRIGGER observation_sources_never_change;
DROP TRIGGER observation_sources_never_go;
DROP TRIGGER inspection_scope_only_while_starting;

CREATE TABLE observations_v9 (
  id                INTEGER PRIMARY KEY,
  inspection_id     INTEGER NOT NULL REFERENCES inspections (id),
  plane_id          INTEGER NOT NULL REFERENCES planes (id),
  lift              INTEGER CHECK (lift >= 1),
  bay               INTEGER CHECK (bay >= 1),
  state             TEXT NOT NULL CHECK (state IN ('sound', 'damaged-effective',
                      'damaged-ineffective', 'missing', 'extra', 'not-inspected', 'not-reachable')),
  member_diagonal   TEXT CHECK (member_diagonal IN ('/', '\', 'X')),
  member_kind       TEXT CHECK (member_kind IN ('rigid', 'tension-only')),
  bow_tenth_mm      INTEGER CHECK (bow_tenth_mm BETWEEN 0 AND 100000),
  gauge_length_mm   INTEGER CHECK (gauge_length_mm BETWEEN 1 AND 10000),
  defect            TEXT CHECK (defect IN ('bent', 'torn', 'loose-connection', 'corroded', 'other')),
  note              TEXT NOT NULL DEFAULT '',
  recorded_at       TEXT NOT NULL,
  recorded_by       TEXT NOT NULL DEFAULT '',
  supersedes_id     INTEGER REFERENCES observations_v9 (id),
  correction_reason TEXT NOT NULL DEFAULT '',
  frame_type        TEXT CHECK (frame_type IN ('ledger', 'standard')),
  frame_first       INTEGER CHECK (frame_first >= 0),
  frame_second      INTEGER CHECK (frame_second >= 0),
  -- a panel (lift and bay) or a frame member (type and two numbers), exactly one of them
  CHECK ((lift IS NULL) = (bay IS NULL)),
  CHECK ((frame_type IS NULL) = (frame_first IS NULL)
     AND (frame_type IS NULL) = (frame_second IS NULL)),
  CHECK ((lift IS NULL) <> (frame_type IS NULL)),
  CHECK (frame_type IS NOT 'ledger' OR frame_second >= 1),
  CHECK (frame_type IS NOT 'standard' OR frame_first >= 1),
  -- a frame member names no diagonal; 'extra' on it means there although the design leaves it out
  CHECK (frame_type IS NULL OR member_diagonal IS NULL),
  CHECK ((member_diagonal IS NULL) = (member_kind IS NULL)),
  CHECK (state <> 'extra' OR member_diagonal IS NOT NULL OR frame_type IS NOT NULL),
  CHECK (bow_tenth_mm IS NULL OR gauge_length_mm IS NOT NULL),
  CHECK ((supersedes_id IS NULL AND correction_reason = '')
      OR (supersedes_id IS NOT NULL AND length(trim(correction_reason)) > 0))
);

INSERT INTO observations_v9
  (id, inspection_id, plane_id, lift, bay, state, member_diagonal, member_kind, bow_tenth_mm,
   gauge_length_mm, defect, note, recorded_at, recorded_by, supersedes_id, correction_reason)
SELECT id, inspection_id, plane_id, lift, bay, state, member_diagonal, member_kind, bow_tenth_mm,
       gauge_length_mm, defect, note, recorded_at, recorded_by, supersedes_id, correction_reason
FROM observations ORDER BY id;

CREATE TABLE photos_v9 (
  id             INTEGER PRIMARY KEY,
  observation_id INTEGER NOT NULL REFERENCES observations_v9 (id),
  file_name      TEXT NOT NULL CHECK (length(trim(file_name)) > 0),
  media_type     TEXT NOT NULL CHECK (length(trim(media_type)) > 0),
  data           BLOB NOT NULL CHECK (length(data) > 0),
  attached_at    TEXT NOT NULL
);

INSERT INTO photos_v9 (id, observation_id, file_name, media_type, data, attached_at)
SELECT id, observation_id, file_name, media_type, data, attached_at FROM photos ORDER BY id;

CREATE TABLE observation_sources_v9 (
  inspection_id  INTEGER NOT NULL REFERENCES inspections (id),
  source_sha256  TEXT NOT NULL CHECK (length(source_sha256) = 64),
  line           INTEGER NOT NULL CHECK (line >= 1),
  observation_id INTEGER NOT NULL UNIQUE REFERENCES observations_v9 (id),
  PRIMARY KEY (inspection_id, source_sha256, line)
) WITHOUT ROWID;

INSERT INTO observation_sources_v9 (inspection_id, source_sha256, line, observation_id)
SELECT inspection_id, source_sha256, line, observation_id FROM observation_sources;

DROP TABLE observation_sources;
DROP TABLE photos;
DROP TABLE observations;

ALTER TABLE observations_v9 RENAME TO observations;
ALTER TABLE photos_v9 RENAME TO photos;
ALTER TABLE observation_sources_v9 RENAME TO observation_sources;

CREATE INDEX observations_by_inspection ON observations (inspection_id, plane_id);
-- A row is corrected at most once; a correction of a correction names the correction.
CREATE UNIQUE INDEX observations_superseded_once ON observations (supersedes_id)
  WHERE supersedes_id IS NOT NULL;
CREATE INDEX photos_by_observation ON photos (observation_id);

-- ---- observations: the triggers of V3, V6 and V7, as they were -------------------------------

CREATE TRIGGER observations_never_change BEFORE UPDATE ON observations
BEGIN
  SELECT RAISE(ABORT, 'observation cannot be changed: observations are append-only; record a correction that supersedes it');
END;

CREATE TRIGGER observations_never_go BEFORE DELETE ON observations
BEGIN
  SELECT RAISE(ABORT, 'observation cannot be deleted: observations are append-only; record a correction that supersedes it');
END;

CREATE TRIGGER observations_never_overwritten BEFORE INSERT ON observations
WHEN EXISTS (SELECT 1 FROM observations WHERE id = NEW.id)
BEGIN
  SELECT RAISE(ABORT, 'observation already exists: records are never overwritten; record a correction that supersedes it');
END;

CREATE TRIGGER corrections_never_overwritten BEFORE INSERT ON observations
WHEN NEW.supersedes_id IS NOT NULL
 AND EXISTS (SELECT 1 FROM observations WHERE supersedes_id = NEW.supersedes_id)
BEGIN
  SELECT RAISE(ABORT, 'the observation is already corrected: records are never overwritten; correct the correction instead');
END;

CREATE TRIGGER observations_only_into_open_inspections BEFORE INSERT ON observations
WHEN (SELECT status FROM inspections WHERE id = NEW.inspection_id) = 'finalised'
BEGIN
  SELECT RAISE(ABORT, 'the inspection is finalised and cannot be changed (record an observation)');
END;

CREATE TRIGGER observations_of_the_inspected_structure BEFORE INSERT ON observations
WHEN (SELECT structure_id FROM planes WHERE id = NEW.plane_id)
     IS NOT (SELECT structure_id FROM inspections WHERE id = NEW.inspection_id)
BEGIN
  SELECT RAISE(ABORT, 'the plane is not part of the structure the inspection covers');
END;

CREATE TRIGGER observations_inside_the_plane BEFORE INSERT ON observations
WHEN NEW.lift > (SELECT lifts FROM planes WHERE id = NEW.plane_id)
  OR NEW.bay > (SELECT bays FROM planes WHERE id = NEW.plane_id)
BEGIN
  SELECT RAISE(ABORT, 'the panel (lift, bay) lies outside the plane');
END;

CREATE TRIGGER corrections_within_one_inspection BEFORE INSERT ON observations
WHEN NEW.supersedes_id IS NOT NULL
 AND (SELECT inspection_id FROM observations WHERE id = NEW.supersedes_id) IS NOT NEW.inspection_id
BEGIN
  SELECT RAISE(ABORT, 'the observation corrected is not of the same inspection and cannot be corrected there');
END;

CREATE TRIGGER observations_stored_trimmed BEFORE INSERT ON observations
WHEN NEW.note <> trim(NEW.note, ' ' || char(9, 10, 11, 12, 13))
  OR NEW.recorded_by <> trim(NEW.recorded_by, ' ' || char(9, 10, 11, 12, 13))
  OR NEW.correction_reason <> trim(NEW.correction_reason, ' ' || char(9, 10, 11, 12, 13))
BEGIN
  SELECT RAISE(ABORT, 'the note, recorded-by or correction reason has blanks at its ends: text is stored trimmed');
END;

CREATE TRIGGER observations_not_into_retired_planes BEFORE INSERT ON observations
WHEN EXISTS (SELECT 1 FROM plane_retirements r JOIN inspections i ON i.id = NEW.inspection_id
             WHERE r.plane_id = NEW.plane_id AND r.retired_at <= i.started_at)
BEGIN
  SELECT RAISE(ABORT, 'the plane was retired before the inspection started and is not part of it');
END;

CREATE TRIGGER observations_within_the_scope BEFORE INSERT ON observations
WHEN NOT EXISTS (SELECT 1 FROM inspection_scope
                 WHERE inspection_id = NEW.inspection_id AND plane_id = NEW.plane_id)
 AND NOT EXISTS (SELECT 1 FROM plane_retirements r JOIN inspections i ON i.id = NEW.inspection_id
                 WHERE r.plane_id = NEW.plane_id AND r.retired_at <= i.started_at)
BEGIN
  SELECT RAISE(ABORT, 'the plane is not in the scope of the inspection (fixed when it started): record it in a new inspection');
END;

-- ---- observations of frame members: the new checks --------------------------------------------

-- ledger: level <= lifts, bay <= bays; standard: lift <= lifts, line <= bays
CREATE TRIGGER observations_frame_member_inside_the_plane BEFORE INSERT ON observations
WHEN NEW.frame_type IS NOT NULL
 AND (NEW.frame_first > (SELECT lifts FROM planes WHERE id = NEW.plane_id)
   OR NEW.frame_second > (SELECT bays FROM planes WHERE id = NEW.plane_id))
BEGIN
  SELECT RAISE(ABORT, 'the frame member lies outside the plane');
END;

-- 'extra' on a frame member: there although the design revision in the inspection's scope
-- leaves it out; a member the design has cannot be extra.
CREATE TRIGGER observations_extra_frame_member_left_out_by_the_design BEFORE INSERT ON observations
WHEN NEW.frame_type IS NOT NULL AND NEW.state = 'extra'
 AND NOT EXISTS (SELECT 1 FROM inspection_scope s
                 JOIN design_frame_omissions f ON f.revision_id = s.design_revision_id
                 WHERE s.inspection_id = NEW.inspection_id AND s.plane_id = NEW.plane_id
                   AND f.frame_type = NEW.frame_type AND f.frame_first = NEW.frame_first
                   AND f.frame_second = NEW.frame_second)
BEGIN
  SELECT RAISE(ABORT, 'the frame member is in the design and cannot be recorded as extra: record it sound, damaged or missing');
END;

-- ---- photos: the triggers of V3, as they were ---------------------------------------------------

CREATE TRIGGER photos_never_change BEFORE UPDATE ON photos
BEGIN
  SELECT RAISE(ABORT, 'photo cannot be changed: photos are kept as taken');
END;

CREATE TRIGGER photos_never_go BEFORE DELETE ON photos
BEGIN
  SELECT RAISE(ABORT, 'photo cannot be deleted: photos are kept as taken');
END;

CREATE TRIGGER photos_never_overwritten BEFORE INSERT ON photos
WHEN EXISTS (SELECT 1 FROM photos WHERE id = NEW.id)
BEGIN
  SELECT RAISE(ABORT, 'photo already exists: records are never overwritten; photos are kept as taken');
END;

CREATE TRIGGER photos_only_into_open_inspections BEFORE INSERT ON photos
WHEN (SELECT i.status FROM observations o JOIN inspections i ON i.id = o.inspection_id
      WHERE o.id = NEW.observation_id) = 'finalised'
BEGIN
  SELECT RAISE(ABORT, 'the inspection is finalised and cannot be changed (attach a photo)');
END;

CREATE TRIGGER photos_stored_trimmed BEFORE INSERT ON photos
WHEN NEW.file_name <> trim(NEW.file_name, ' ' || char(9, 10, 11, 12, 13))
  OR NEW.media_type <> trim(NEW.media_type, ' ' || char(9, 10, 11, 12, 13))
BEGIN
  SELECT RAISE(ABORT, 'the photo file name or media type has blanks at its ends: text is stored trimmed');
END;

-- ---- observation sources: the triggers of V4, as they were ---------------------------------------

CREATE TRIGGER observation_sources_never_replaced BEFORE INSERT ON observation_sources
WHEN EXISTS (SELECT 1 FROM observation_sources
             WHERE (inspection_id = NEW.inspection_id AND source_sha256 = NEW.source_sha256
                    AND line = NEW.line)
                OR observation_id = NEW.observation_id)
BEGIN
  SELECT RAISE(ABORT, 'this line of the file is already recorded in the inspection (observation sources are append-only); nothing was replaced');
END;

CREATE TRIGGER observation_sources_of_the_same_inspection BEFORE INSERT ON observation_sources
WHEN (SELECT inspection_id FROM observations WHERE id = NEW.observation_id)
     IS NOT NEW.inspection_id
BEGIN
  SELECT RAISE(ABORT, 'the observation named as recorded from the file is not an observation of that inspection');
END;

CREATE TRIGGER observation_sources_never_change BEFORE UPDATE ON observation_sources
BEGIN
  SELECT RAISE(ABORT, 'where an observation was recorded from cannot be changed (observation sources are append-only)');
END;

CREATE TRIGGER observation_sources_never_go BEFORE DELETE ON observation_sources
BEGIN
  SELECT RAISE(ABORT, 'where an observation was recorded from cannot be deleted (observation sources are append-only)');
END;

-- ---- the scope trigger of V7 that reads observations, as it was --------------------------------

CREATE TRIGGER inspection_scope_only_while_starting BEFORE INSERT ON inspection_scope
WHEN (SELECT status FROM inspections WHERE id = NEW.inspection_id) IS NOT 'open'
  OR EXISTS (SELECT 1 FROM observations WHERE inspection_id = NEW.inspection_id)
BEGIN
  SELECT RAISE(ABORT, 'the scope of an inspection is fixed when it starts: a plane cannot be added once it has observations or is finalised; start a new inspection');
END;

-- Bracewalk site records, first schema.
-- Lengths are whole millimetres (bows: tenths of a millimetre, because the EN 15635 damage
-- limits fall on whole millimetres and 10.0 mm must stay apart from 10.1 mm).
-- Times are UTC instants as text, always 'YYYY-MM-DDTHH:MM:SS.mmmZ' so that text order is time
-- order. Dates (design date, due date) are 'YYYY-MM-DD'.
-- Audit trail: observations, photos and design revisions are append-only, and a finalised
-- inspection cannot change; the triggers at the end refuse, naming the row.
-- Never edit this file once released: add V2__... instead (see DEVELOPERS.md).

CREATE TABLE sites (
  id             INTEGER PRIMARY KEY,
  name           TEXT NOT NULL CHECK (length(trim(name)) > 0),
  client_name    TEXT NOT NULL DEFAULT '',
  client_address TEXT NOT NULL DEFAULT '',
  location       TEXT NOT NULL DEFAULT '',
  time_zone      TEXT NOT NULL,
  display_units  TEXT NOT NULL CHECK (display_units IN ('metric', 'imperial'))
);

CREATE TABLE structures (
  id                       INTEGER PRIMARY KEY,
  site_id                  INTEGER NOT NULL REFERENCES sites (id),
  name                     TEXT NOT NULL CHECK (length(trim(name)) > 0),
  kind                     TEXT NOT NULL
                           CHECK (kind IN ('scaffold', 'racking-run', 'other-braced-frame')),
  description              TEXT NOT NULL DEFAULT '',
  design_reference         TEXT NOT NULL DEFAULT '',
  inspection_interval_days INTEGER NOT NULL DEFAULT 7
                           CHECK (inspection_interval_days BETWEEN 1 AND 366)
);
CREATE INDEX structures_by_site ON structures (site_id);

CREATE TABLE planes (
  id           INTEGER PRIMARY KEY,
  structure_id INTEGER NOT NULL REFERENCES structures (id),
  name         TEXT NOT NULL CHECK (length(trim(name)) > 0),
  lifts        INTEGER NOT NULL CHECK (lifts >= 1),
  bays         INTEGER NOT NULL CHECK (bays >= 1),
  support      TEXT NOT NULL CHECK (support IN ('pinned-base', 'free')),
  UNIQUE (structure_id, name)
);

CREATE TABLE plane_bay_widths (
  plane_id INTEGER NOT NULL REFERENCES planes (id),
  bay      INTEGER NOT NULL CHECK (bay >= 1),
  width_mm INTEGER NOT NULL CHECK (width_mm >= 1),
  PRIMARY KEY (plane_id, bay)
) WITHOUT ROWID;

CREATE TABLE plane_lift_heights (
  plane_id  INTEGER NOT NULL REFERENCES planes (id),
  lift      INTEGER NOT NULL CHECK (lift >= 1),
  height_mm INTEGER NOT NULL CHECK (height_mm >= 1),
  PRIMARY KEY (plane_id, lift)
) WITHOUT ROWID;

CREATE TABLE design_revisions (
  id            INTEGER PRIMARY KEY,
  plane_id      INTEGER NOT NULL REFERENCES planes (id),
  number        INTEGER NOT NULL CHECK (number >= 1),
  author        TEXT NOT NULL DEFAULT '',
  design_date   TEXT NOT NULL,
  approval_note TEXT NOT NULL DEFAULT '',
  recorded_at   TEXT NOT NULL,
  UNIQUE (plane_id, number)
);

-- One row per braced panel or opening of a revision; a panel with no row has no diagonal.
CREATE TABLE design_panels (
  revision_id INTEGER NOT NULL REFERENCES design_revisions (id),
  lift        INTEGER NOT NULL CHECK (lift >= 1),
  bay         INTEGER NOT NULL CHECK (bay >= 1),
  diagonal    TEXT CHECK (diagonal IN ('/', '\', 'X')),
  member_kind TEXT CHECK (member_kind IN ('rigid', 'tension-only')),
  opening     INTEGER NOT NULL DEFAULT 0 CHECK (opening IN (0, 1)),
  CHECK ((opening = 1 AND diagonal IS NULL AND member_kind IS NULL)
      OR (opening = 0 AND diagonal IS NOT NULL AND member_kind IS NOT NULL)),
  PRIMARY KEY (revision_id, lift, bay)
) WITHOUT ROWID;

CREATE TABLE inspections (
  id                      INTEGER PRIMARY KEY,
  structure_id            INTEGER NOT NULL REFERENCES structures (id),
  started_at              TEXT NOT NULL,
  finished_at             TEXT,
  inspector_name          TEXT NOT NULL CHECK (length(trim(inspector_name)) > 0),
  inspector_position      TEXT NOT NULL DEFAULT '',
  competent_person        TEXT NOT NULL DEFAULT '',
  shift                   TEXT NOT NULL DEFAULT '',
  storage_safety_person   TEXT NOT NULL DEFAULT '',
  reason                  TEXT NOT NULL CHECK (reason IN ('routine', 'after-impact',
                            'after-alteration', 'handover', 'after-severe-weather')),
  status                  TEXT NOT NULL DEFAULT 'open' CHECK (status IN ('open', 'finalised')),
  carried_out_for_name    TEXT NOT NULL DEFAULT '',
  carried_out_for_address TEXT NOT NULL DEFAULT '',
  CHECK ((status = 'open' AND finished_at IS NULL)
      OR (status = 'finalised' AND finished_at IS NOT NULL AND finished_at >= started_at))
);
CREATE INDEX inspections_by_structure ON inspections (structure_id, started_at);

CREATE TABLE observations (
  id                INTEGER PRIMARY KEY,
  inspection_id     INTEGER NOT NULL REFERENCES inspections (id),
  plane_id          INTEGER NOT NULL REFERENCES planes (id),
  lift              INTEGER NOT NULL CHECK (lift >= 1),
  bay               INTEGER NOT NULL CHECK (bay >= 1),
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
  supersedes_id     INTEGER REFERENCES observations (id),
  correction_reason TEXT NOT NULL DEFAULT '',
  CHECK ((member_diagonal IS NULL) = (member_kind IS NULL)),
  CHECK (state <> 'extra' OR member_diagonal IS NOT NULL),
  CHECK (bow_tenth_mm IS NULL OR gauge_length_mm IS NOT NULL),
  CHECK ((supersedes_id IS NULL AND correction_reason = '')
      OR (supersedes_id IS NOT NULL AND length(trim(correction_reason)) > 0))
);
CREATE INDEX observations_by_inspection ON observations (inspection_id, plane_id);
-- A row is corrected at most once; a correction of a correction names the correction.
CREATE UNIQUE INDEX observations_superseded_once ON observations (supersedes_id)
  WHERE supersedes_id IS NOT NULL;

CREATE TABLE photos (
  id             INTEGER PRIMARY KEY,
  observation_id INTEGER NOT NULL REFERENCES observations (id),
  file_name      TEXT NOT NULL CHECK (length(trim(file_name)) > 0),
  media_type     TEXT NOT NULL CHECK (length(trim(media_type)) > 0),
  data           BLOB NOT NULL CHECK (length(data) > 0),
  attached_at    TEXT NOT NULL
);
CREATE INDEX photos_by_observation ON photos (observation_id);

CREATE TABLE repair_orders (
  id            INTEGER PRIMARY KEY,
  inspection_id INTEGER NOT NULL REFERENCES inspections (id),
  created_at    TEXT NOT NULL,
  created_by    TEXT NOT NULL DEFAULT '',
  note          TEXT NOT NULL DEFAULT ''
);
CREATE INDEX repair_orders_by_inspection ON repair_orders (inspection_id);

CREATE TABLE repair_actions (
  id                        INTEGER PRIMARY KEY,
  order_id                  INTEGER NOT NULL REFERENCES repair_orders (id),
  plane_id                  INTEGER NOT NULL REFERENCES planes (id),
  lift                      INTEGER CHECK (lift >= 1),
  bay                       INTEGER CHECK (bay >= 1),
  action                    TEXT NOT NULL
                            CHECK (action IN ('repair', 'replace', 'brace', 'take-out-of-service')),
  brace_diagonal            TEXT CHECK (brace_diagonal IN ('/', '\', 'X')),
  brace_kind                TEXT CHECK (brace_kind IN ('rigid', 'tension-only')),
  description               TEXT NOT NULL DEFAULT '',
  due_date                  TEXT,
  assignee                  TEXT NOT NULL DEFAULT '',
  done_at                   TEXT,
  done_by                   TEXT NOT NULL DEFAULT '',
  verified_by_inspection_id INTEGER REFERENCES inspections (id),
  CHECK ((lift IS NULL) = (bay IS NULL)),
  CHECK ((brace_diagonal IS NULL) = (brace_kind IS NULL)),
  CHECK (done_at IS NOT NULL OR done_by = ''),
  CHECK (verified_by_inspection_id IS NULL OR done_at IS NOT NULL)
);
CREATE INDEX repair_actions_by_order ON repair_actions (order_id);

CREATE TABLE issued_reports (
  id            INTEGER PRIMARY KEY,
  inspection_id INTEGER NOT NULL REFERENCES inspections (id),
  file_name     TEXT NOT NULL CHECK (length(trim(file_name)) > 0),
  fingerprint   TEXT NOT NULL CHECK (length(fingerprint) = 64),
  issued_at     TEXT NOT NULL
);
CREATE INDEX issued_reports_by_inspection ON issued_reports (inspection_id);

-- The audit trail, enforced by the database whatever program writes to it.

CREATE TRIGGER observations_never_change BEFORE UPDATE ON observations
BEGIN
  SELECT RAISE(ABORT, 'observation ' || OLD.id || ' of inspection ' || OLD.inspection_id
    || ' cannot be changed: observations are append-only; record a correction that supersedes it');
END;

CREATE TRIGGER observations_never_go BEFORE DELETE ON observations
BEGIN
  SELECT RAISE(ABORT, 'observation ' || OLD.id || ' of inspection ' || OLD.inspection_id
    || ' cannot be deleted: observations are append-only; record a correction that supersedes it');
END;

CREATE TRIGGER observations_only_into_open_inspections BEFORE INSERT ON observations
WHEN (SELECT status FROM inspections WHERE id = NEW.inspection_id) = 'finalised'
BEGIN
  SELECT RAISE(ABORT, 'inspection ' || NEW.inspection_id
    || ' is finalised and cannot be changed (record an observation)');
END;

CREATE TRIGGER observations_of_the_inspected_structure BEFORE INSERT ON observations
WHEN (SELECT structure_id FROM planes WHERE id = NEW.plane_id)
     IS NOT (SELECT structure_id FROM inspections WHERE id = NEW.inspection_id)
BEGIN
  SELECT RAISE(ABORT, 'plane ' || NEW.plane_id || ' is not part of the structure inspection '
    || NEW.inspection_id || ' covers');
END;

CREATE TRIGGER observations_inside_the_plane BEFORE INSERT ON observations
WHEN NEW.lift > (SELECT lifts FROM planes WHERE id = NEW.plane_id)
  OR NEW.bay > (SELECT bays FROM planes WHERE id = NEW.plane_id)
BEGIN
  SELECT RAISE(ABORT, 'lift ' || NEW.lift || ', bay ' || NEW.bay || ' lies outside plane '
    || NEW.plane_id);
END;

CREATE TRIGGER corrections_within_one_inspection BEFORE INSERT ON observations
WHEN NEW.supersedes_id IS NOT NULL
 AND (SELECT inspection_id FROM observations WHERE id = NEW.supersedes_id) IS NOT NEW.inspection_id
BEGIN
  SELECT RAISE(ABORT, 'observation ' || NEW.supersedes_id
    || ' is not an observation of inspection ' || NEW.inspection_id || ' and cannot be corrected there');
END;

CREATE TRIGGER photos_never_change BEFORE UPDATE ON photos
BEGIN
  SELECT RAISE(ABORT, 'photo ' || OLD.id || ' cannot be changed: photos are kept as taken');
END;

CREATE TRIGGER photos_never_go BEFORE DELETE ON photos
BEGIN
  SELECT RAISE(ABORT, 'photo ' || OLD.id || ' cannot be deleted: photos are kept as taken');
END;

CREATE TRIGGER photos_only_into_open_inspections BEFORE INSERT ON photos
WHEN (SELECT i.status FROM observations o JOIN inspections i ON i.id = o.inspection_id
      WHERE o.id = NEW.observation_id) = 'finalised'
BEGIN
  SELECT RAISE(ABORT, 'inspection ' || (SELECT inspection_id FROM observations
    WHERE id = NEW.observation_id) || ' is finalised and cannot be changed (attach a photo)');
END;

CREATE TRIGGER finalised_inspections_never_change BEFORE UPDATE ON inspections
WHEN OLD.status = 'finalised'
BEGIN
  SELECT RAISE(ABORT, 'inspection ' || OLD.id || ' is finalised and cannot be changed (update it)');
END;

CREATE TRIGGER finalised_inspections_never_go BEFORE DELETE ON inspections
WHEN OLD.status = 'finalised'
BEGIN
  SELECT RAISE(ABORT, 'inspection ' || OLD.id || ' is finalised and cannot be changed (delete it)');
END;

CREATE TRIGGER design_revisions_never_change BEFORE UPDATE ON design_revisions
BEGIN
  SELECT RAISE(ABORT, 'design revision ' || OLD.number || ' of plane ' || OLD.plane_id
    || ' cannot be changed: add a new revision');
END;

CREATE TRIGGER design_revisions_never_go BEFORE DELETE ON design_revisions
BEGIN
  SELECT RAISE(ABORT, 'design revision ' || OLD.number || ' of plane ' || OLD.plane_id
    || ' cannot be deleted: add a new revision');
END;

CREATE TRIGGER design_panels_never_change BEFORE UPDATE ON design_panels
BEGIN
  SELECT RAISE(ABORT, 'design revision ' || OLD.revision_id
    || ' cannot be changed: add a new revision');
END;

CREATE TRIGGER design_panels_never_go BEFORE DELETE ON design_panels
BEGIN
  SELECT RAISE(ABORT, 'design revision ' || OLD.revision_id
    || ' cannot be changed: add a new revision');
END;

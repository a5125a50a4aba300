-- One size limit for every stored plane, and retirement of a plane created by mistake.
--
-- The limit (100 lifts x 500 bays) is PlaneLimits.MAX_LIFTS and PlaneLimits.MAX_BAYS of the
-- program; the program refuses first and names the field, the trigger holds any other writer.
-- Planes stored before this migration are left as they are: retire one that is too large.
--
-- A retired plane is kept for the record (its designs, observations and reports stay), and is
-- left out of every inspection started at or after the moment it was retired. Inspections
-- started before keep it as they did. Retirements are append-only: never changed, never removed,
-- at most one per plane.
--
-- Trigger messages are literal text (SQLite before 3.47 cannot parse an expression there); the
-- program adds the ids when it turns the error into its own message.

CREATE TRIGGER planes_within_the_size_limit BEFORE INSERT ON planes
WHEN NEW.lifts > 100 OR NEW.bays > 500
BEGIN
  SELECT RAISE(ABORT, 'the plane is larger than the limit of 100 lifts x 500 bays a stored plane may have; nothing was stored');
END;

CREATE TABLE plane_retirements (
  id         INTEGER PRIMARY KEY,
  plane_id   INTEGER NOT NULL UNIQUE REFERENCES planes (id),
  retired_at TEXT NOT NULL CHECK (length(retired_at) = 24),
  retired_by TEXT NOT NULL DEFAULT '',
  reason     TEXT NOT NULL CHECK (length(trim(reason)) > 0)
);

CREATE TRIGGER plane_retirements_once BEFORE INSERT ON plane_retirements
WHEN EXISTS (SELECT 1 FROM plane_retirements WHERE plane_id = NEW.plane_id)
BEGIN
  SELECT RAISE(ABORT, 'the plane is already retired: a retirement is kept as recorded and cannot be replaced');
END;

CREATE TRIGGER plane_retirements_never_change BEFORE UPDATE ON plane_retirements
BEGIN
  SELECT RAISE(ABORT, 'a plane retirement cannot be changed: retirements are kept as recorded');
END;

CREATE TRIGGER plane_retirements_never_go BEFORE DELETE ON plane_retirements
BEGIN
  SELECT RAISE(ABORT, 'a plane retirement cannot be deleted: retirements are kept as recorded');
END;

CREATE TRIGGER observations_not_into_retired_planes BEFORE INSERT ON observations
WHEN EXISTS (SELECT 1 FROM plane_retirements r JOIN inspections i ON i.id = NEW.inspection_id
             WHERE r.plane_id = NEW.plane_id AND r.retired_at <= i.started_at)
BEGIN
  SELECT RAISE(ABORT, 'the plane was retired before the inspection started and is not part of it');
END;

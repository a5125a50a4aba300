-- Global identities (issue 13): every record a sync moves between a field file and the team
-- server gets a uuid, its identity in every copy of the record (ids are local to one database).
-- Existing rows get a random version-4 UUID here; the repositories give every new row one
-- (java.util.UUID). A row inserted by another program without one gets one from the database
-- (AFTER INSERT), so no stored row lacks it; once set it never changes; two rows never share one.
--
-- The triggers that refuse every UPDATE of a record are made again as they were, but for the one
-- update that gives a row without a uuid its uuid: only this migration's backfill and the AFTER
-- INSERT triggers below ever meet such a row (ALTER TABLE cannot give a column a random default).

ALTER TABLE sites ADD COLUMN uuid TEXT;

ALTER TABLE structures ADD COLUMN uuid TEXT;

ALTER TABLE planes ADD COLUMN uuid TEXT;

ALTER TABLE design_revisions ADD COLUMN uuid TEXT;

ALTER TABLE inspections ADD COLUMN uuid TEXT;

ALTER TABLE observations ADD COLUMN uuid TEXT;

ALTER TABLE photos ADD COLUMN uuid TEXT;

ALTER TABLE repair_orders ADD COLUMN uuid TEXT;

ALTER TABLE repair_actions ADD COLUMN uuid TEXT;

ALTER TABLE issued_reports ADD COLUMN uuid TEXT;


DROP TRIGGER sites_never_change;
DROP TRIGGER planes_never_change;
DROP TRIGGER design_revisions_never_change;
DROP TRIGGER finalised_inspections_never_change;
DROP TRIGGER observations_never_change;
DROP TRIGGER photos_never_change;
DROP TRIGGER repair_orders_never_change;
DROP TRIGGER issued_reports_never_change;

UPDATE sites SET uuid = lower(hex(randomblob(4))) || '-' || lower(hex(randomblob(2))) || '-4'
    || substr(lower(hex(randomblob(2))), 2) || '-'
    || substr('89ab', 1 + abs(random() % 4), 1) || substr(lower(hex(randomblob(2))), 2)
    || '-' || lower(hex(randomblob(6)))
WHERE uuid IS NULL;

UPDATE structures SET uuid = lower(hex(randomblob(4))) || '-' || lower(hex(randomblob(2))) || '-4'
    || substr(lower(hex(randomblob(2))), 2) || '-'
    || substr('89ab', 1 + abs(random() % 4), 1) || substr(lower(hex(randomblob(2))), 2)
    || '-' || lower(hex(randomblob(6)))
WHERE uuid IS NULL;

UPDATE planes SET uuid = lower(hex(randomblob(4))) || '-' || lower(hex(randomblob(2))) || '-4'
    || substr(lower(hex(randomblob(2))), 2) || '-'
    || substr('89ab', 1 + abs(random() % 4), 1) || substr(lower(hex(randomblob(2))), 2)
    || '-' || lower(hex(randomblob(6)))
WHERE uuid IS NULL;

UPDATE design_revisions SET uuid = lower(hex(randomblob(4))) || '-' || lower(hex(randomblob(2))) || '-4'
    || substr(lower(hex(randomblob(2))), 2) || '-'
    || substr('89ab', 1 + abs(random() % 4), 1) || substr(lower(hex(randomblob(2))), 2)
    || '-' || lower(hex(randomblob(6)))
WHERE uuid IS NULL;

UPDATE inspections SET uuid = lower(hex(randomblob(4))) || '-' || lower(hex(randomblob(2))) || '-4'
    || substr(lower(hex(randomblob(2))), 2) || '-'
    || substr('89ab', 1 + abs(random() % 4), 1) || substr(lower(hex(randomblob(2))), 2)
    || '-' || lower(hex(randomblob(6)))
WHERE uuid IS NULL;

UPDATE observations SET uuid = lower(hex(randomblob(4))) || '-' || lower(hex(randomblob(2))) || '-4'
    || substr(lower(hex(randomblob(2))), 2) || '-'
    || substr('89ab', 1 + abs(random() % 4), 1) || substr(lower(hex(randomblob(2))), 2)
    || '-' || lower(hex(randomblob(6)))
WHERE uuid IS NULL;

UPDATE photos SET uuid = lower(hex(randomblob(4))) || '-' || lower(hex(randomblob(2))) || '-4'
    || substr(lower(hex(randomblob(2))), 2) || '-'
    || substr('89ab', 1 + abs(random() % 4), 1) || substr(lower(hex(randomblob(2))), 2)
    || '-' || lower(hex(randomblob(6)))
WHERE uuid IS NULL;

UPDATE repair_orders SET uuid = lower(hex(randomblob(4))) || '-' || lower(hex(randomblob(2))) || '-4'
    || substr(lower(hex(randomblob(2))), 2) || '-'
    || substr('89ab', 1 + abs(random() % 4), 1) || substr(lower(hex(randomblob(2))), 2)
    || '-' || lower(hex(randomblob(6)))
WHERE uuid IS NULL;

UPDATE repair_actions SET uuid = lower(hex(randomblob(4))) || '-' || lower(hex(randomblob(2))) || '-4'
    || substr(lower(hex(randomblob(2))), 2) || '-'
    || substr('89ab', 1 + abs(random() % 4), 1) || substr(lower(hex(randomblob(2))), 2)
    || '-' || lower(hex(randomblob(6)))
WHERE uuid IS NULL;

UPDATE issued_reports SET uuid = lower(hex(randomblob(4))) || '-' || lower(hex(randomblob(2))) || '-4'
    || substr(lower(hex(randomblob(2))), 2) || '-'
    || substr('89ab', 1 + abs(random() % 4), 1) || substr(lower(hex(randomblob(2))), 2)
    || '-' || lower(hex(randomblob(6)))
WHERE uuid IS NULL;

-- ---- sites -------------------------------------------------------------------------------------

CREATE TRIGGER sites_never_change BEFORE UPDATE ON sites
WHEN OLD.uuid IS NOT NULL
BEGIN
  SELECT RAISE(ABORT, 'site cannot be changed: inspections and issued reports rest on it');
END;

CREATE UNIQUE INDEX sites_by_uuid ON sites (uuid);

CREATE TRIGGER sites_uuid_never_overwritten BEFORE INSERT ON sites
WHEN NEW.uuid IS NOT NULL AND EXISTS (SELECT 1 FROM sites WHERE uuid = NEW.uuid)
BEGIN
  SELECT RAISE(ABORT, 'site with this global identity (uuid) already exists: records are never overwritten');
END;

CREATE TRIGGER sites_uuid_well_formed BEFORE INSERT ON sites
WHEN NEW.uuid IS NOT NULL AND (length(NEW.uuid) <> 36 OR NEW.uuid GLOB '*[^0-9a-f-]*')
BEGIN
  SELECT RAISE(ABORT, 'a global identity (uuid) is 36 characters of lower-case hex digits and hyphens');
END;

CREATE TRIGGER sites_given_a_uuid AFTER INSERT ON sites
WHEN NEW.uuid IS NULL
BEGIN
  UPDATE sites SET uuid = lower(hex(randomblob(4))) || '-' || lower(hex(randomblob(2))) || '-4'
    || substr(lower(hex(randomblob(2))), 2) || '-'
    || substr('89ab', 1 + abs(random() % 4), 1) || substr(lower(hex(randomblob(2))), 2)
    || '-' || lower(hex(randomblob(6)))
  WHERE id = NEW.id;
END;

CREATE TRIGGER sites_keep_their_uuid BEFORE UPDATE OF uuid ON sites
WHEN OLD.uuid IS NOT NULL AND NEW.uuid IS NOT OLD.uuid
BEGIN
  SELECT RAISE(ABORT, 'a record keeps its global identity (uuid): every copy of the record knows it by it');
END;

-- ---- structures --------------------------------------------------------------------------------

CREATE UNIQUE INDEX structures_by_uuid ON structures (uuid);

CREATE TRIGGER structures_uuid_never_overwritten BEFORE INSERT ON structures
WHEN NEW.uuid IS NOT NULL AND EXISTS (SELECT 1 FROM structures WHERE uuid = NEW.uuid)
BEGIN
  SELECT RAISE(ABORT, 'structure with this global identity (uuid) already exists: records are never overwritten');
END;

CREATE TRIGGER structures_uuid_well_formed BEFORE INSERT ON structures
WHEN NEW.uuid IS NOT NULL AND (length(NEW.uuid) <> 36 OR NEW.uuid GLOB '*[^0-9a-f-]*')
BEGIN
  SELECT RAISE(ABORT, 'a global identity (uuid) is 36 characters of lower-case hex digits and hyphens');
END;

CREATE TRIGGER structures_given_a_uuid AFTER INSERT ON structures
WHEN NEW.uuid IS NULL
BEGIN
  UPDATE structures SET uuid = lower(hex(randomblob(4))) || '-' || lower(hex(randomblob(2))) || '-4'
    || substr(lower(hex(randomblob(2))), 2) || '-'
    || substr('89ab', 1 + abs(random() % 4), 1) || substr(lower(hex(randomblob(2))), 2)
    || '-' || lower(hex(randomblob(6)))
  WHERE id = NEW.id;
END;

CREATE TRIGGER structures_keep_their_uuid BEFORE UPDATE OF uuid ON structures
WHEN OLD.uuid IS NOT NULL AND NEW.uuid IS NOT OLD.uuid
BEGIN
  SELECT RAISE(ABORT, 'a record keeps its global identity (uuid): every copy of the record knows it by it');
END;

-- ---- planes ------------------------------------------------------------------------------------

CREATE TRIGGER planes_never_change BEFORE UPDATE ON planes
WHEN OLD.uuid IS NOT NULL
BEGIN
  SELECT RAISE(ABORT, 'plane cannot be changed: its designs and observations refer to its grid; create a new plane');
END;

CREATE UNIQUE INDEX planes_by_uuid ON planes (uuid);

CREATE TRIGGER planes_uuid_never_overwritten BEFORE INSERT ON planes
WHEN NEW.uuid IS NOT NULL AND EXISTS (SELECT 1 FROM planes WHERE uuid = NEW.uuid)
BEGIN
  SELECT RAISE(ABORT, 'plane with this global identity (uuid) already exists: records are never overwritten');
END;

CREATE TRIGGER planes_uuid_well_formed BEFORE INSERT ON planes
WHEN NEW.uuid IS NOT NULL AND (length(NEW.uuid) <> 36 OR NEW.uuid GLOB '*[^0-9a-f-]*')
BEGIN
  SELECT RAISE(ABORT, 'a global identity (uuid) is 36 characters of lower-case hex digits and hyphens');
END;

CREATE TRIGGER planes_given_a_uuid AFTER INSERT ON planes
WHEN NEW.uuid IS NULL
BEGIN
  UPDATE planes SET uuid = lower(hex(randomblob(4))) || '-' || lower(hex(randomblob(2))) || '-4'
    || substr(lower(hex(randomblob(2))), 2) || '-'
    || substr('89ab', 1 + abs(random() % 4), 1) || substr(lower(hex(randomblob(2))), 2)
    || '-' || lower(hex(randomblob(6)))
  WHERE id = NEW.id;
END;

CREATE TRIGGER planes_keep_their_uuid BEFORE UPDATE OF uuid ON planes
WHEN OLD.uuid IS NOT NULL AND NEW.uuid IS NOT OLD.uuid
BEGIN
  SELECT RAISE(ABORT, 'a record keeps its global identity (uuid): every copy of the record knows it by it');
END;

-- ---- design_revisions --------------------------------------------------------------------------

CREATE TRIGGER design_revisions_never_change BEFORE UPDATE ON design_revisions
WHEN OLD.uuid IS NOT NULL
BEGIN
  SELECT RAISE(ABORT, 'design revision cannot be changed: add a new revision');
END;

CREATE UNIQUE INDEX design_revisions_by_uuid ON design_revisions (uuid);

CREATE TRIGGER design_revisions_uuid_never_overwritten BEFORE INSERT ON design_revisions
WHEN NEW.uuid IS NOT NULL AND EXISTS (SELECT 1 FROM design_revisions WHERE uuid = NEW.uuid)
BEGIN
  SELECT RAISE(ABORT, 'design revision with this global identity (uuid) already exists: records are never overwritten');
END;

CREATE TRIGGER design_revisions_uuid_well_formed BEFORE INSERT ON design_revisions
WHEN NEW.uuid IS NOT NULL AND (length(NEW.uuid) <> 36 OR NEW.uuid GLOB '*[^0-9a-f-]*')
BEGIN
  SELECT RAISE(ABORT, 'a global identity (uuid) is 36 characters of lower-case hex digits and hyphens');
END;

CREATE TRIGGER design_revisions_given_a_uuid AFTER INSERT ON design_revisions
WHEN NEW.uuid IS NULL
BEGIN
  UPDATE design_revisions SET uuid = lower(hex(randomblob(4))) || '-' || lower(hex(randomblob(2))) || '-4'
    || substr(lower(hex(randomblob(2))), 2) || '-'
    || substr('89ab', 1 + abs(random() % 4), 1) || substr(lower(hex(randomblob(2))), 2)
    || '-' || lower(hex(randomblob(6)))
  WHERE id = NEW.id;
END;

CREATE TRIGGER design_revisions_keep_their_uuid BEFORE UPDATE OF uuid ON design_revisions
WHEN OLD.uuid IS NOT NULL AND NEW.uuid IS NOT OLD.uuid
BEGIN
  SELECT RAISE(ABORT, 'a record keeps its global identity (uuid): every copy of the record knows it by it');
END;

-- ---- inspections -------------------------------------------------------------------------------

CREATE TRIGGER finalised_inspections_never_change BEFORE UPDATE ON inspections
WHEN OLD.status = 'finalised' AND OLD.uuid IS NOT NULL
BEGIN
  SELECT RAISE(ABORT, 'the inspection is finalised and cannot be changed (update it)');
END;

CREATE UNIQUE INDEX inspections_by_uuid ON inspections (uuid);

CREATE TRIGGER inspections_uuid_never_overwritten BEFORE INSERT ON inspections
WHEN NEW.uuid IS NOT NULL AND EXISTS (SELECT 1 FROM inspections WHERE uuid = NEW.uuid)
BEGIN
  SELECT RAISE(ABORT, 'inspection with this global identity (uuid) already exists: records are never overwritten');
END;

CREATE TRIGGER inspections_uuid_well_formed BEFORE INSERT ON inspections
WHEN NEW.uuid IS NOT NULL AND (length(NEW.uuid) <> 36 OR NEW.uuid GLOB '*[^0-9a-f-]*')
BEGIN
  SELECT RAISE(ABORT, 'a global identity (uuid) is 36 characters of lower-case hex digits and hyphens');
END;

CREATE TRIGGER inspections_given_a_uuid AFTER INSERT ON inspections
WHEN NEW.uuid IS NULL
BEGIN
  UPDATE inspections SET uuid = lower(hex(randomblob(4))) || '-' || lower(hex(randomblob(2))) || '-4'
    || substr(lower(hex(randomblob(2))), 2) || '-'
    || substr('89ab', 1 + abs(random() % 4), 1) || substr(lower(hex(randomblob(2))), 2)
    || '-' || lower(hex(randomblob(6)))
  WHERE id = NEW.id;
END;

CREATE TRIGGER inspections_keep_their_uuid BEFORE UPDATE OF uuid ON inspections
WHEN OLD.uuid IS NOT NULL AND NEW.uuid IS NOT OLD.uuid
BEGIN
  SELECT RAISE(ABORT, 'a record keeps its global identity (uuid): every copy of the record knows it by it');
END;

-- ---- observations ------------------------------------------------------------------------------

CREATE TRIGGER observations_never_change BEFORE UPDATE ON observations
WHEN OLD.uuid IS NOT NULL
BEGIN
  SELECT RAISE(ABORT, 'observation cannot be changed: observations are append-only; record a correction that supersedes it');
END;

CREATE UNIQUE INDEX observations_by_uuid ON observations (uuid);

CREATE TRIGGER observations_uuid_never_overwritten BEFORE INSERT ON observations
WHEN NEW.uuid IS NOT NULL AND EXISTS (SELECT 1 FROM observations WHERE uuid = NEW.uuid)
BEGIN
  SELECT RAISE(ABORT, 'observation with this global identity (uuid) already exists: records are never overwritten');
END;

CREATE TRIGGER observations_uuid_well_formed BEFORE INSERT ON observations
WHEN NEW.uuid IS NOT NULL AND (length(NEW.uuid) <> 36 OR NEW.uuid GLOB '*[^0-9a-f-]*')
BEGIN
  SELECT RAISE(ABORT, 'a global identity (uuid) is 36 characters of lower-case hex digits and hyphens');
END;

CREATE TRIGGER observations_given_a_uuid AFTER INSERT ON observations
WHEN NEW.uuid IS NULL
BEGIN
  UPDATE observations SET uuid = lower(hex(randomblob(4))) || '-' || lower(hex(randomblob(2))) || '-4'
    || substr(lower(hex(randomblob(2))), 2) || '-'
    || substr('89ab', 1 + abs(random() % 4), 1) || substr(lower(hex(randomblob(2))), 2)
    || '-' || lower(hex(randomblob(6)))
  WHERE id = NEW.id;
END;

CREATE TRIGGER observations_keep_their_uuid BEFORE UPDATE OF uuid ON observations
WHEN OLD.uuid IS NOT NULL AND NEW.uuid IS NOT OLD.uuid
BEGIN
  SELECT RAISE(ABORT, 'a record keeps its global identity (uuid): every copy of the record knows it by it');
END;

-- ---- photos ------------------------------------------------------------------------------------

CREATE TRIGGER photos_never_change BEFORE UPDATE ON photos
WHEN OLD.uuid IS NOT NULL
BEGIN
  SELECT RAISE(ABORT, 'photo cannot be changed: photos are kept as taken');
END;

CREATE UNIQUE INDEX photos_by_uuid ON photos (uuid);

CREATE TRIGGER photos_uuid_never_overwritten BEFORE INSERT ON photos
WHEN NEW.uuid IS NOT NULL AND EXISTS (SELECT 1 FROM photos WHERE uuid = NEW.uuid)
BEGIN
  SELECT RAISE(ABORT, 'photo with this global identity (uuid) already exists: records are never overwritten');
END;

CREATE TRIGGER photos_uuid_well_formed BEFORE INSERT ON photos
WHEN NEW.uuid IS NOT NULL AND (length(NEW.uuid) <> 36 OR NEW.uuid GLOB '*[^0-9a-f-]*')
BEGIN
  SELECT RAISE(ABORT, 'a global identity (uuid) is 36 characters of lower-case hex digits and hyphens');
END;

CREATE TRIGGER photos_given_a_uuid AFTER INSERT ON photos
WHEN NEW.uuid IS NULL
BEGIN
  UPDATE photos SET uuid = lower(hex(randomblob(4))) || '-' || lower(hex(randomblob(2))) || '-4'
    || substr(lower(hex(randomblob(2))), 2) || '-'
    || substr('89ab', 1 + abs(random() % 4), 1) || substr(lower(hex(randomblob(2))), 2)
    || '-' || lower(hex(randomblob(6)))
  WHERE id = NEW.id;
END;

CREATE TRIGGER photos_keep_their_uuid BEFORE UPDATE OF uuid ON photos
WHEN OLD.uuid IS NOT NULL AND NEW.uuid IS NOT OLD.uuid
BEGIN
  SELECT RAISE(ABORT, 'a record keeps its global identity (uuid): every copy of the record knows it by it');
END;

-- ---- repair_orders -----------------------------------------------------------------------------

CREATE TRIGGER repair_orders_never_change BEFORE UPDATE ON repair_orders
WHEN OLD.uuid IS NOT NULL
BEGIN
  SELECT RAISE(ABORT, 'repair order cannot be changed: raise a new order');
END;

CREATE UNIQUE INDEX repair_orders_by_uuid ON repair_orders (uuid);

CREATE TRIGGER repair_orders_uuid_never_overwritten BEFORE INSERT ON repair_orders
WHEN NEW.uuid IS NOT NULL AND EXISTS (SELECT 1 FROM repair_orders WHERE uuid = NEW.uuid)
BEGIN
  SELECT RAISE(ABORT, 'repair order with this global identity (uuid) already exists: records are never overwritten');
END;

CREATE TRIGGER repair_orders_uuid_well_formed BEFORE INSERT ON repair_orders
WHEN NEW.uuid IS NOT NULL AND (length(NEW.uuid) <> 36 OR NEW.uuid GLOB '*[^0-9a-f-]*')
BEGIN
  SELECT RAISE(ABORT, 'a global identity (uuid) is 36 characters of lower-case hex digits and hyphens');
END;

CREATE TRIGGER repair_orders_given_a_uuid AFTER INSERT ON repair_orders
WHEN NEW.uuid IS NULL
BEGIN
  UPDATE repair_orders SET uuid = lower(hex(randomblob(4))) || '-' || lower(hex(randomblob(2))) || '-4'
    || substr(lower(hex(randomblob(2))), 2) || '-'
    || substr('89ab', 1 + abs(random() % 4), 1) || substr(lower(hex(randomblob(2))), 2)
    || '-' || lower(hex(randomblob(6)))
  WHERE id = NEW.id;
END;

CREATE TRIGGER repair_orders_keep_their_uuid BEFORE UPDATE OF uuid ON repair_orders
WHEN OLD.uuid IS NOT NULL AND NEW.uuid IS NOT OLD.uuid
BEGIN
  SELECT RAISE(ABORT, 'a record keeps its global identity (uuid): every copy of the record knows it by it');
END;

-- ---- repair_actions ----------------------------------------------------------------------------

CREATE UNIQUE INDEX repair_actions_by_uuid ON repair_actions (uuid);

CREATE TRIGGER repair_actions_uuid_never_overwritten BEFORE INSERT ON repair_actions
WHEN NEW.uuid IS NOT NULL AND EXISTS (SELECT 1 FROM repair_actions WHERE uuid = NEW.uuid)
BEGIN
  SELECT RAISE(ABORT, 'repair action with this global identity (uuid) already exists: records are never overwritten');
END;

CREATE TRIGGER repair_actions_uuid_well_formed BEFORE INSERT ON repair_actions
WHEN NEW.uuid IS NOT NULL AND (length(NEW.uuid) <> 36 OR NEW.uuid GLOB '*[^0-9a-f-]*')
BEGIN
  SELECT RAISE(ABORT, 'a global identity (uuid) is 36 characters of lower-case hex digits and hyphens');
END;

CREATE TRIGGER repair_actions_given_a_uuid AFTER INSERT ON repair_actions
WHEN NEW.uuid IS NULL
BEGIN
  UPDATE repair_actions SET uuid = lower(hex(randomblob(4))) || '-' || lower(hex(randomblob(2))) || '-4'
    || substr(lower(hex(randomblob(2))), 2) || '-'
    || substr('89ab', 1 + abs(random() % 4), 1) || substr(lower(hex(randomblob(2))), 2)
    || '-' || lower(hex(randomblob(6)))
  WHERE id = NEW.id;
END;

CREATE TRIGGER repair_actions_keep_their_uuid BEFORE UPDATE OF uuid ON repair_actions
WHEN OLD.uuid IS NOT NULL AND NEW.uuid IS NOT OLD.uuid
BEGIN
  SELECT RAISE(ABORT, 'a record keeps its global identity (uuid): every copy of the record knows it by it');
END;

-- ---- issued_reports ----------------------------------------------------------------------------

CREATE TRIGGER issued_reports_never_change BEFORE UPDATE ON issued_reports
WHEN OLD.uuid IS NOT NULL
BEGIN
  SELECT RAISE(ABORT, 'the register of issued documents is append-only: a registered document cannot be changed; issue a new one');
END;

CREATE UNIQUE INDEX issued_reports_by_uuid ON issued_reports (uuid);

CREATE TRIGGER issued_reports_uuid_never_overwritten BEFORE INSERT ON issued_reports
WHEN NEW.uuid IS NOT NULL AND EXISTS (SELECT 1 FROM issued_reports WHERE uuid = NEW.uuid)
BEGIN
  SELECT RAISE(ABORT, 'issued document with this global identity (uuid) already exists: records are never overwritten');
END;

CREATE TRIGGER issued_reports_uuid_well_formed BEFORE INSERT ON issued_reports
WHEN NEW.uuid IS NOT NULL AND (length(NEW.uuid) <> 36 OR NEW.uuid GLOB '*[^0-9a-f-]*')
BEGIN
  SELECT RAISE(ABORT, 'a global identity (uuid) is 36 characters of lower-case hex digits and hyphens');
END;

CREATE TRIGGER issued_reports_given_a_uuid AFTER INSERT ON issued_reports
WHEN NEW.uuid IS NULL
BEGIN
  UPDATE issued_reports SET uuid = lower(hex(randomblob(4))) || '-' || lower(hex(randomblob(2))) || '-4'
    || substr(lower(hex(randomblob(2))), 2) || '-'
    || substr('89ab', 1 + abs(random() % 4), 1) || substr(lower(hex(randomblob(2))), 2)
    || '-' || lower(hex(randomblob(6)))
  WHERE id = NEW.id;
END;

CREATE TRIGGER issued_reports_keep_their_uuid BEFORE UPDATE OF uuid ON issued_reports
WHEN OLD.uuid IS NOT NULL AND NEW.uuid IS NOT OLD.uuid
BEGIN
  SELECT RAISE(ABORT, 'a record keeps its global identity (uuid): every copy of the record knows it by it');
END;

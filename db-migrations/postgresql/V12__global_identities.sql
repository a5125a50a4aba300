-- PostgreSQL dialect of db-migrations/V12__global_identities.sql: the same version, description and rules, the same
-- messages (PL/pgSQL RAISE EXCEPTION in place of SQLite's RAISE(ABORT, ...)). Never edit once released.

-- Global identities (issue 13): every record a sync moves between a field file and the team
-- server gets a uuid, its identity in every copy of the record (ids are local to one database).
-- Existing rows get a random version-4 UUID as the column is added (gen_random_uuid(), built in
-- since PostgreSQL 13; adding a column fires no row trigger, so the append-only triggers stay as
-- they are); the repositories give every new row one (java.util.UUID), and a row inserted by
-- another program without one gets one from the column's default, as a file's AFTER INSERT
-- trigger gives it. Once set it never changes; two rows never share one.

ALTER TABLE sites ADD COLUMN uuid TEXT NOT NULL DEFAULT gen_random_uuid()::text;
ALTER TABLE sites ADD CONSTRAINT sites_by_uuid UNIQUE (uuid);
ALTER TABLE structures ADD COLUMN uuid TEXT NOT NULL DEFAULT gen_random_uuid()::text;
ALTER TABLE structures ADD CONSTRAINT structures_by_uuid UNIQUE (uuid);
ALTER TABLE planes ADD COLUMN uuid TEXT NOT NULL DEFAULT gen_random_uuid()::text;
ALTER TABLE planes ADD CONSTRAINT planes_by_uuid UNIQUE (uuid);
ALTER TABLE design_revisions ADD COLUMN uuid TEXT NOT NULL DEFAULT gen_random_uuid()::text;
ALTER TABLE design_revisions ADD CONSTRAINT design_revisions_by_uuid UNIQUE (uuid);
ALTER TABLE inspections ADD COLUMN uuid TEXT NOT NULL DEFAULT gen_random_uuid()::text;
ALTER TABLE inspections ADD CONSTRAINT inspections_by_uuid UNIQUE (uuid);
ALTER TABLE observations ADD COLUMN uuid TEXT NOT NULL DEFAULT gen_random_uuid()::text;
ALTER TABLE observations ADD CONSTRAINT observations_by_uuid UNIQUE (uuid);
ALTER TABLE photos ADD COLUMN uuid TEXT NOT NULL DEFAULT gen_random_uuid()::text;
ALTER TABLE photos ADD CONSTRAINT photos_by_uuid UNIQUE (uuid);
ALTER TABLE repair_orders ADD COLUMN uuid TEXT NOT NULL DEFAULT gen_random_uuid()::text;
ALTER TABLE repair_orders ADD CONSTRAINT repair_orders_by_uuid UNIQUE (uuid);
ALTER TABLE repair_actions ADD COLUMN uuid TEXT NOT NULL DEFAULT gen_random_uuid()::text;
ALTER TABLE repair_actions ADD CONSTRAINT repair_actions_by_uuid UNIQUE (uuid);
ALTER TABLE issued_reports ADD COLUMN uuid TEXT NOT NULL DEFAULT gen_random_uuid()::text;
ALTER TABLE issued_reports ADD CONSTRAINT issued_reports_by_uuid UNIQUE (uuid);

-- ---- sites -------------------------------------------------------------------------------------

CREATE OR REPLACE FUNCTION sites_uuid_never_overwritten() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF EXISTS (SELECT 1 FROM sites WHERE uuid = NEW.uuid) THEN
    RAISE EXCEPTION USING MESSAGE = 'site with this global identity (uuid) already exists: records are never overwritten';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER sites_uuid_never_overwritten BEFORE INSERT ON sites FOR EACH ROW EXECUTE FUNCTION sites_uuid_never_overwritten();

CREATE OR REPLACE FUNCTION sites_uuid_well_formed() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF length(NEW.uuid) <> 36 OR NEW.uuid ~ '[^0-9a-f-]' THEN
    RAISE EXCEPTION USING MESSAGE = 'a global identity (uuid) is 36 characters of lower-case hex digits and hyphens';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER sites_uuid_well_formed BEFORE INSERT ON sites FOR EACH ROW EXECUTE FUNCTION sites_uuid_well_formed();

CREATE OR REPLACE FUNCTION sites_keep_their_uuid() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.uuid IS DISTINCT FROM OLD.uuid THEN
    RAISE EXCEPTION USING MESSAGE = 'a record keeps its global identity (uuid): every copy of the record knows it by it';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER sites_keep_their_uuid BEFORE UPDATE ON sites FOR EACH ROW EXECUTE FUNCTION sites_keep_their_uuid();

-- ---- structures --------------------------------------------------------------------------------

CREATE OR REPLACE FUNCTION structures_uuid_never_overwritten() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF EXISTS (SELECT 1 FROM structures WHERE uuid = NEW.uuid) THEN
    RAISE EXCEPTION USING MESSAGE = 'structure with this global identity (uuid) already exists: records are never overwritten';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER structures_uuid_never_overwritten BEFORE INSERT ON structures FOR EACH ROW EXECUTE FUNCTION structures_uuid_never_overwritten();

CREATE OR REPLACE FUNCTION structures_uuid_well_formed() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF length(NEW.uuid) <> 36 OR NEW.uuid ~ '[^0-9a-f-]' THEN
    RAISE EXCEPTION USING MESSAGE = 'a global identity (uuid) is 36 characters of lower-case hex digits and hyphens';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER structures_uuid_well_formed BEFORE INSERT ON structures FOR EACH ROW EXECUTE FUNCTION structures_uuid_well_formed();

CREATE OR REPLACE FUNCTION structures_keep_their_uuid() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.uuid IS DISTINCT FROM OLD.uuid THEN
    RAISE EXCEPTION USING MESSAGE = 'a record keeps its global identity (uuid): every copy of the record knows it by it';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER structures_keep_their_uuid BEFORE UPDATE ON structures FOR EACH ROW EXECUTE FUNCTION structures_keep_their_uuid();

-- ---- planes ------------------------------------------------------------------------------------

CREATE OR REPLACE FUNCTION planes_uuid_never_overwritten() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF EXISTS (SELECT 1 FROM planes WHERE uuid = NEW.uuid) THEN
    RAISE EXCEPTION USING MESSAGE = 'plane with this global identity (uuid) already exists: records are never overwritten';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER planes_uuid_never_overwritten BEFORE INSERT ON planes FOR EACH ROW EXECUTE FUNCTION planes_uuid_never_overwritten();

CREATE OR REPLACE FUNCTION planes_uuid_well_formed() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF length(NEW.uuid) <> 36 OR NEW.uuid ~ '[^0-9a-f-]' THEN
    RAISE EXCEPTION USING MESSAGE = 'a global identity (uuid) is 36 characters of lower-case hex digits and hyphens';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER planes_uuid_well_formed BEFORE INSERT ON planes FOR EACH ROW EXECUTE FUNCTION planes_uuid_well_formed();

CREATE OR REPLACE FUNCTION planes_keep_their_uuid() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.uuid IS DISTINCT FROM OLD.uuid THEN
    RAISE EXCEPTION USING MESSAGE = 'a record keeps its global identity (uuid): every copy of the record knows it by it';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER planes_keep_their_uuid BEFORE UPDATE ON planes FOR EACH ROW EXECUTE FUNCTION planes_keep_their_uuid();

-- ---- design_revisions --------------------------------------------------------------------------

CREATE OR REPLACE FUNCTION design_revisions_uuid_never_overwritten() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF EXISTS (SELECT 1 FROM design_revisions WHERE uuid = NEW.uuid) THEN
    RAISE EXCEPTION USING MESSAGE = 'design revision with this global identity (uuid) already exists: records are never overwritten';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER design_revisions_uuid_never_overwritten BEFORE INSERT ON design_revisions FOR EACH ROW EXECUTE FUNCTION design_revisions_uuid_never_overwritten();

CREATE OR REPLACE FUNCTION design_revisions_uuid_well_formed() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF length(NEW.uuid) <> 36 OR NEW.uuid ~ '[^0-9a-f-]' THEN
    RAISE EXCEPTION USING MESSAGE = 'a global identity (uuid) is 36 characters of lower-case hex digits and hyphens';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER design_revisions_uuid_well_formed BEFORE INSERT ON design_revisions FOR EACH ROW EXECUTE FUNCTION design_revisions_uuid_well_formed();

CREATE OR REPLACE FUNCTION design_revisions_keep_their_uuid() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.uuid IS DISTINCT FROM OLD.uuid THEN
    RAISE EXCEPTION USING MESSAGE = 'a record keeps its global identity (uuid): every copy of the record knows it by it';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER design_revisions_keep_their_uuid BEFORE UPDATE ON design_revisions FOR EACH ROW EXECUTE FUNCTION design_revisions_keep_their_uuid();

-- ---- inspections -------------------------------------------------------------------------------

CREATE OR REPLACE FUNCTION inspections_uuid_never_overwritten() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF EXISTS (SELECT 1 FROM inspections WHERE uuid = NEW.uuid) THEN
    RAISE EXCEPTION USING MESSAGE = 'inspection with this global identity (uuid) already exists: records are never overwritten';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER inspections_uuid_never_overwritten BEFORE INSERT ON inspections FOR EACH ROW EXECUTE FUNCTION inspections_uuid_never_overwritten();

CREATE OR REPLACE FUNCTION inspections_uuid_well_formed() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF length(NEW.uuid) <> 36 OR NEW.uuid ~ '[^0-9a-f-]' THEN
    RAISE EXCEPTION USING MESSAGE = 'a global identity (uuid) is 36 characters of lower-case hex digits and hyphens';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER inspections_uuid_well_formed BEFORE INSERT ON inspections FOR EACH ROW EXECUTE FUNCTION inspections_uuid_well_formed();

CREATE OR REPLACE FUNCTION inspections_keep_their_uuid() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.uuid IS DISTINCT FROM OLD.uuid THEN
    RAISE EXCEPTION USING MESSAGE = 'a record keeps its global identity (uuid): every copy of the record knows it by it';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER inspections_keep_their_uuid BEFORE UPDATE ON inspections FOR EACH ROW EXECUTE FUNCTION inspections_keep_their_uuid();

-- ---- observations ------------------------------------------------------------------------------

CREATE OR REPLACE FUNCTION observations_uuid_never_overwritten() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF EXISTS (SELECT 1 FROM observations WHERE uuid = NEW.uuid) THEN
    RAISE EXCEPTION USING MESSAGE = 'observation with this global identity (uuid) already exists: records are never overwritten';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER observations_uuid_never_overwritten BEFORE INSERT ON observations FOR EACH ROW EXECUTE FUNCTION observations_uuid_never_overwritten();

CREATE OR REPLACE FUNCTION observations_uuid_well_formed() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF length(NEW.uuid) <> 36 OR NEW.uuid ~ '[^0-9a-f-]' THEN
    RAISE EXCEPTION USING MESSAGE = 'a global identity (uuid) is 36 characters of lower-case hex digits and hyphens';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER observations_uuid_well_formed BEFORE INSERT ON observations FOR EACH ROW EXECUTE FUNCTION observations_uuid_well_formed();

CREATE OR REPLACE FUNCTION observations_keep_their_uuid() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.uuid IS DISTINCT FROM OLD.uuid THEN
    RAISE EXCEPTION USING MESSAGE = 'a record keeps its global identity (uuid): every copy of the record knows it by it';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER observations_keep_their_uuid BEFORE UPDATE ON observations FOR EACH ROW EXECUTE FUNCTION observations_keep_their_uuid();

-- ---- photos ------------------------------------------------------------------------------------

CREATE OR REPLACE FUNCTION photos_uuid_never_overwritten() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF EXISTS (SELECT 1 FROM photos WHERE uuid = NEW.uuid) THEN
    RAISE EXCEPTION USING MESSAGE = 'photo with this global identity (uuid) already exists: records are never overwritten';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER photos_uuid_never_overwritten BEFORE INSERT ON photos FOR EACH ROW EXECUTE FUNCTION photos_uuid_never_overwritten();

CREATE OR REPLACE FUNCTION photos_uuid_well_formed() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF length(NEW.uuid) <> 36 OR NEW.uuid ~ '[^0-9a-f-]' THEN
    RAISE EXCEPTION USING MESSAGE = 'a global identity (uuid) is 36 characters of lower-case hex digits and hyphens';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER photos_uuid_well_formed BEFORE INSERT ON photos FOR EACH ROW EXECUTE FUNCTION photos_uuid_well_formed();

CREATE OR REPLACE FUNCTION photos_keep_their_uuid() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.uuid IS DISTINCT FROM OLD.uuid THEN
    RAISE EXCEPTION USING MESSAGE = 'a record keeps its global identity (uuid): every copy of the record knows it by it';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER photos_keep_their_uuid BEFORE UPDATE ON photos FOR EACH ROW EXECUTE FUNCTION photos_keep_their_uuid();

-- ---- repair_orders -----------------------------------------------------------------------------

CREATE OR REPLACE FUNCTION repair_orders_uuid_never_overwritten() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF EXISTS (SELECT 1 FROM repair_orders WHERE uuid = NEW.uuid) THEN
    RAISE EXCEPTION USING MESSAGE = 'repair order with this global identity (uuid) already exists: records are never overwritten';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER repair_orders_uuid_never_overwritten BEFORE INSERT ON repair_orders FOR EACH ROW EXECUTE FUNCTION repair_orders_uuid_never_overwritten();

CREATE OR REPLACE FUNCTION repair_orders_uuid_well_formed() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF length(NEW.uuid) <> 36 OR NEW.uuid ~ '[^0-9a-f-]' THEN
    RAISE EXCEPTION USING MESSAGE = 'a global identity (uuid) is 36 characters of lower-case hex digits and hyphens';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER repair_orders_uuid_well_formed BEFORE INSERT ON repair_orders FOR EACH ROW EXECUTE FUNCTION repair_orders_uuid_well_formed();

CREATE OR REPLACE FUNCTION repair_orders_keep_their_uuid() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.uuid IS DISTINCT FROM OLD.uuid THEN
    RAISE EXCEPTION USING MESSAGE = 'a record keeps its global identity (uuid): every copy of the record knows it by it';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER repair_orders_keep_their_uuid BEFORE UPDATE ON repair_orders FOR EACH ROW EXECUTE FUNCTION repair_orders_keep_their_uuid();

-- ---- repair_actions ----------------------------------------------------------------------------

CREATE OR REPLACE FUNCTION repair_actions_uuid_never_overwritten() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF EXISTS (SELECT 1 FROM repair_actions WHERE uuid = NEW.uuid) THEN
    RAISE EXCEPTION USING MESSAGE = 'repair action with this global identity (uuid) already exists: records are never overwritten';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER repair_actions_uuid_never_overwritten BEFORE INSERT ON repair_actions FOR EACH ROW EXECUTE FUNCTION repair_actions_uuid_never_overwritten();

CREATE OR REPLACE FUNCTION repair_actions_uuid_well_formed() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF length(NEW.uuid) <> 36 OR NEW.uuid ~ '[^0-9a-f-]' THEN
    RAISE EXCEPTION USING MESSAGE = 'a global identity (uuid) is 36 characters of lower-case hex digits and hyphens';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER repair_actions_uuid_well_formed BEFORE INSERT ON repair_actions FOR EACH ROW EXECUTE FUNCTION repair_actions_uuid_well_formed();

CREATE OR REPLACE FUNCTION repair_actions_keep_their_uuid() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.uuid IS DISTINCT FROM OLD.uuid THEN
    RAISE EXCEPTION USING MESSAGE = 'a record keeps its global identity (uuid): every copy of the record knows it by it';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER repair_actions_keep_their_uuid BEFORE UPDATE ON repair_actions FOR EACH ROW EXECUTE FUNCTION repair_actions_keep_their_uuid();

-- ---- issued_reports ----------------------------------------------------------------------------

CREATE OR REPLACE FUNCTION issued_reports_uuid_never_overwritten() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF EXISTS (SELECT 1 FROM issued_reports WHERE uuid = NEW.uuid) THEN
    RAISE EXCEPTION USING MESSAGE = 'issued document with this global identity (uuid) already exists: records are never overwritten';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER issued_reports_uuid_never_overwritten BEFORE INSERT ON issued_reports FOR EACH ROW EXECUTE FUNCTION issued_reports_uuid_never_overwritten();

CREATE OR REPLACE FUNCTION issued_reports_uuid_well_formed() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF length(NEW.uuid) <> 36 OR NEW.uuid ~ '[^0-9a-f-]' THEN
    RAISE EXCEPTION USING MESSAGE = 'a global identity (uuid) is 36 characters of lower-case hex digits and hyphens';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER issued_reports_uuid_well_formed BEFORE INSERT ON issued_reports FOR EACH ROW EXECUTE FUNCTION issued_reports_uuid_well_formed();

CREATE OR REPLACE FUNCTION issued_reports_keep_their_uuid() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.uuid IS DISTINCT FROM OLD.uuid THEN
    RAISE EXCEPTION USING MESSAGE = 'a record keeps its global identity (uuid): every copy of the record knows it by it';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER issued_reports_keep_their_uuid BEFORE UPDATE ON issued_reports FOR EACH ROW EXECUTE FUNCTION issued_reports_keep_their_uuid();

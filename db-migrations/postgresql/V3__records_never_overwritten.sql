-- PostgreSQL dialect of db-migrations/V3__records_never_overwritten.sql: the same version, description and rules, the same
-- messages (PL/pgSQL RAISE EXCEPTION in place of SQLite's RAISE(ABORT, ...)). Never edit once released.

-- Nothing lost, nothing forged: the rules of V1 and V2 for every SQLite client, and the records
-- they left unguarded.
--
-- 1. Every trigger of V1 and V2 is dropped and made again with a literal message. An expression
--    in RAISE(ABORT, ...) parses only in SQLite 3.47 and later; the file must open in the sqlite3
--    command line of common systems (3.31 and later) and in Python's sqlite3 module. Bracewalk
--    adds the ids it knows when it shows the message (store.SqlErrors).
-- 2. INSERT OR REPLACE (and REPLACE INTO, and UPDATE OR REPLACE) deletes the row it collides with
--    without firing delete triggers (recursive triggers are off by default), so a replace could
--    move an observation or a photo out of a finalised inspection, reopen a finalised inspection
--    or edit the design panels in force. Every protected table refuses an insert whose id or
--    other unique key is taken, and ids never change in an update.
-- 3. Sites, structures, repair orders and actions, and the panels of a design revision are
--    guarded too (see each section).
-- 4. Text is stored trimmed: the program trims it before storing, and an insert of text with
--    blanks at its ends is refused, so nothing can lean on trimming on read.
-- 5. A finalised inspection keeps the structure's inspection interval as at its finalisation.
-- Never edit this file once released: add V4__... instead (see DEVELOPERS.md).

-- ---- 1. the old triggers go; they come back below with literal messages -------------------

DROP TRIGGER observations_never_change ON observations;
DROP TRIGGER observations_never_go ON observations;
DROP TRIGGER observations_only_into_open_inspections ON observations;
DROP TRIGGER observations_of_the_inspected_structure ON observations;
DROP TRIGGER observations_inside_the_plane ON observations;
DROP TRIGGER corrections_within_one_inspection ON observations;
DROP TRIGGER photos_never_change ON photos;
DROP TRIGGER photos_never_go ON photos;
DROP TRIGGER photos_only_into_open_inspections ON photos;
DROP TRIGGER finalised_inspections_never_change ON inspections;
DROP TRIGGER finalised_inspections_never_go ON inspections;
DROP TRIGGER design_revisions_never_change ON design_revisions;
DROP TRIGGER design_revisions_never_go ON design_revisions;
DROP TRIGGER design_panels_never_change ON design_panels;
DROP TRIGGER design_panels_never_go ON design_panels;
DROP TRIGGER planes_never_change ON planes;
DROP TRIGGER planes_never_go ON planes;
DROP TRIGGER plane_widths_never_change ON plane_bay_widths;
DROP TRIGGER plane_widths_never_go ON plane_bay_widths;
DROP TRIGGER plane_heights_never_change ON plane_lift_heights;
DROP TRIGGER plane_heights_never_go ON plane_lift_heights;

-- ---- new columns and their back-fill (the triggers are away, so finalised rows take them) ----

-- The structure's inspection interval as at finalisation; NULL while the inspection is open.
ALTER TABLE inspections ADD COLUMN inspection_interval_days BIGINT
  CHECK (inspection_interval_days IS NULL OR inspection_interval_days BETWEEN 1 AND 366);
UPDATE inspections
SET inspection_interval_days =
  (SELECT s.inspection_interval_days FROM structures s WHERE s.id = inspections.structure_id)
WHERE status = 'finalised';

-- How many design_panels rows the revision has: panels may be added only until there are that
-- many, that is while the revision is being stored.
ALTER TABLE design_revisions ADD COLUMN panel_count BIGINT
  CHECK (panel_count IS NULL OR panel_count >= 0);
UPDATE design_revisions
SET panel_count = (SELECT count(*) FROM design_panels p WHERE p.revision_id = design_revisions.id);

-- ---- observations: append-only ------------------------------------------------------------

CREATE OR REPLACE FUNCTION observations_never_change() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION USING MESSAGE = 'observation cannot be changed: observations are append-only; record a correction that supersedes it';
  RETURN NEW;
END $$;
CREATE TRIGGER observations_never_change BEFORE UPDATE ON observations FOR EACH ROW EXECUTE FUNCTION observations_never_change();

CREATE OR REPLACE FUNCTION observations_never_go() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION USING MESSAGE = 'observation cannot be deleted: observations are append-only; record a correction that supersedes it';
  RETURN OLD;
END $$;
CREATE TRIGGER observations_never_go BEFORE DELETE ON observations FOR EACH ROW EXECUTE FUNCTION observations_never_go();

CREATE OR REPLACE FUNCTION observations_never_overwritten() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF EXISTS (SELECT 1 FROM observations WHERE id = NEW.id) THEN
    RAISE EXCEPTION USING MESSAGE = 'observation already exists: records are never overwritten; record a correction that supersedes it';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER observations_never_overwritten BEFORE INSERT ON observations FOR EACH ROW EXECUTE FUNCTION observations_never_overwritten();

CREATE OR REPLACE FUNCTION corrections_never_overwritten() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.supersedes_id IS NOT NULL
    AND EXISTS (SELECT 1 FROM observations WHERE supersedes_id = NEW.supersedes_id) THEN
    RAISE EXCEPTION USING MESSAGE = 'the observation is already corrected: records are never overwritten; correct the correction instead';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER corrections_never_overwritten BEFORE INSERT ON observations FOR EACH ROW EXECUTE FUNCTION corrections_never_overwritten();

CREATE OR REPLACE FUNCTION observations_only_into_open_inspections() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF (SELECT status FROM inspections WHERE id = NEW.inspection_id) = 'finalised' THEN
    RAISE EXCEPTION USING MESSAGE = 'the inspection is finalised and cannot be changed (record an observation)';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER observations_only_into_open_inspections BEFORE INSERT ON observations FOR EACH ROW EXECUTE FUNCTION observations_only_into_open_inspections();

CREATE OR REPLACE FUNCTION observations_of_the_inspected_structure() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF (SELECT structure_id FROM planes WHERE id = NEW.plane_id)
    IS DISTINCT FROM (SELECT structure_id FROM inspections WHERE id = NEW.inspection_id) THEN
    RAISE EXCEPTION USING MESSAGE = 'the plane is not part of the structure the inspection covers';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER observations_of_the_inspected_structure BEFORE INSERT ON observations FOR EACH ROW EXECUTE FUNCTION observations_of_the_inspected_structure();

CREATE OR REPLACE FUNCTION observations_inside_the_plane() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.lift > (SELECT lifts FROM planes WHERE id = NEW.plane_id)
    OR NEW.bay > (SELECT bays FROM planes WHERE id = NEW.plane_id) THEN
    RAISE EXCEPTION USING MESSAGE = 'the panel (lift, bay) lies outside the plane';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER observations_inside_the_plane BEFORE INSERT ON observations FOR EACH ROW EXECUTE FUNCTION observations_inside_the_plane();

CREATE OR REPLACE FUNCTION corrections_within_one_inspection() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.supersedes_id IS NOT NULL
    AND (SELECT inspection_id FROM observations WHERE id = NEW.supersedes_id) IS DISTINCT FROM NEW.inspection_id THEN
    RAISE EXCEPTION USING MESSAGE = 'the observation corrected is not of the same inspection and cannot be corrected there';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER corrections_within_one_inspection BEFORE INSERT ON observations FOR EACH ROW EXECUTE FUNCTION corrections_within_one_inspection();

CREATE OR REPLACE FUNCTION observations_stored_trimmed() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.note <> btrim(NEW.note, ' ' || (chr(9) || chr(10) || chr(11) || chr(12) || chr(13)))
    OR NEW.recorded_by <> btrim(NEW.recorded_by, ' ' || (chr(9) || chr(10) || chr(11) || chr(12) || chr(13)))
    OR NEW.correction_reason <> btrim(NEW.correction_reason, ' ' || (chr(9) || chr(10) || chr(11) || chr(12) || chr(13))) THEN
    RAISE EXCEPTION USING MESSAGE = 'the note, recorded-by or correction reason has blanks at its ends: text is stored trimmed';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER observations_stored_trimmed BEFORE INSERT ON observations FOR EACH ROW EXECUTE FUNCTION observations_stored_trimmed();

-- ---- photos: kept as taken ------------------------------------------------------------------

CREATE OR REPLACE FUNCTION photos_never_change() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION USING MESSAGE = 'photo cannot be changed: photos are kept as taken';
  RETURN NEW;
END $$;
CREATE TRIGGER photos_never_change BEFORE UPDATE ON photos FOR EACH ROW EXECUTE FUNCTION photos_never_change();

CREATE OR REPLACE FUNCTION photos_never_go() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION USING MESSAGE = 'photo cannot be deleted: photos are kept as taken';
  RETURN OLD;
END $$;
CREATE TRIGGER photos_never_go BEFORE DELETE ON photos FOR EACH ROW EXECUTE FUNCTION photos_never_go();

CREATE OR REPLACE FUNCTION photos_never_overwritten() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF EXISTS (SELECT 1 FROM photos WHERE id = NEW.id) THEN
    RAISE EXCEPTION USING MESSAGE = 'photo already exists: records are never overwritten; photos are kept as taken';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER photos_never_overwritten BEFORE INSERT ON photos FOR EACH ROW EXECUTE FUNCTION photos_never_overwritten();

CREATE OR REPLACE FUNCTION photos_only_into_open_inspections() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF (SELECT i.status FROM observations o JOIN inspections i ON i.id = o.inspection_id
    WHERE o.id = NEW.observation_id) = 'finalised' THEN
    RAISE EXCEPTION USING MESSAGE = 'the inspection is finalised and cannot be changed (attach a photo)';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER photos_only_into_open_inspections BEFORE INSERT ON photos FOR EACH ROW EXECUTE FUNCTION photos_only_into_open_inspections();

CREATE OR REPLACE FUNCTION photos_stored_trimmed() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.file_name <> btrim(NEW.file_name, ' ' || (chr(9) || chr(10) || chr(11) || chr(12) || chr(13)))
    OR NEW.media_type <> btrim(NEW.media_type, ' ' || (chr(9) || chr(10) || chr(11) || chr(12) || chr(13))) THEN
    RAISE EXCEPTION USING MESSAGE = 'the photo file name or media type has blanks at its ends: text is stored trimmed';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER photos_stored_trimmed BEFORE INSERT ON photos FOR EACH ROW EXECUTE FUNCTION photos_stored_trimmed();

-- ---- inspections: a finalised one never changes; an open one keeps its id and structure -----

CREATE OR REPLACE FUNCTION finalised_inspections_never_change() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF OLD.status = 'finalised' THEN
    RAISE EXCEPTION USING MESSAGE = 'the inspection is finalised and cannot be changed (update it)';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER finalised_inspections_never_change BEFORE UPDATE ON inspections FOR EACH ROW EXECUTE FUNCTION finalised_inspections_never_change();

CREATE OR REPLACE FUNCTION finalised_inspections_never_go() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF OLD.status = 'finalised' THEN
    RAISE EXCEPTION USING MESSAGE = 'the inspection is finalised and cannot be changed (delete it)';
  END IF;
  RETURN OLD;
END $$;
CREATE TRIGGER finalised_inspections_never_go BEFORE DELETE ON inspections FOR EACH ROW EXECUTE FUNCTION finalised_inspections_never_go();

CREATE OR REPLACE FUNCTION inspections_never_overwritten() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF EXISTS (SELECT 1 FROM inspections WHERE id = NEW.id) THEN
    RAISE EXCEPTION USING MESSAGE = 'inspection already exists: records are never overwritten';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER inspections_never_overwritten BEFORE INSERT ON inspections FOR EACH ROW EXECUTE FUNCTION inspections_never_overwritten();

-- An UPDATE OR REPLACE that gave an open inspection a finalised one's id would delete that one.
CREATE OR REPLACE FUNCTION inspections_keep_their_identity() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.id IS DISTINCT FROM OLD.id OR NEW.structure_id IS DISTINCT FROM OLD.structure_id
    OR NEW.started_at IS DISTINCT FROM OLD.started_at THEN
    RAISE EXCEPTION USING MESSAGE = 'an inspection keeps its id, structure and start time: start a new inspection';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER inspections_keep_their_identity BEFORE UPDATE ON inspections FOR EACH ROW EXECUTE FUNCTION inspections_keep_their_identity();

CREATE OR REPLACE FUNCTION inspections_interval_as_at_finalisation() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF OLD.status = 'open'
    AND ((NEW.status = 'open' AND NEW.inspection_interval_days IS NOT NULL)
    OR (NEW.status = 'finalised' AND NEW.inspection_interval_days
    IS DISTINCT FROM (SELECT inspection_interval_days FROM structures WHERE id = NEW.structure_id))) THEN
    RAISE EXCEPTION USING MESSAGE = 'a finalised inspection keeps the structure''s inspection interval as at its finalisation, an open one none';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER inspections_interval_as_at_finalisation BEFORE UPDATE ON inspections FOR EACH ROW EXECUTE FUNCTION inspections_interval_as_at_finalisation();

CREATE OR REPLACE FUNCTION inspections_interval_as_at_insert() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF (NEW.status = 'open' AND NEW.inspection_interval_days IS NOT NULL)
    OR (NEW.status = 'finalised' AND NEW.inspection_interval_days
    IS DISTINCT FROM (SELECT inspection_interval_days FROM structures WHERE id = NEW.structure_id)) THEN
    RAISE EXCEPTION USING MESSAGE = 'a finalised inspection keeps the structure''s inspection interval as at its finalisation, an open one none';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER inspections_interval_as_at_insert BEFORE INSERT ON inspections FOR EACH ROW EXECUTE FUNCTION inspections_interval_as_at_insert();

CREATE OR REPLACE FUNCTION inspections_stored_trimmed() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.inspector_name <> btrim(NEW.inspector_name, ' ' || (chr(9) || chr(10) || chr(11) || chr(12) || chr(13)))
    OR NEW.inspector_position <> btrim(NEW.inspector_position, ' ' || (chr(9) || chr(10) || chr(11) || chr(12) || chr(13)))
    OR NEW.competent_person <> btrim(NEW.competent_person, ' ' || (chr(9) || chr(10) || chr(11) || chr(12) || chr(13)))
    OR NEW.shift <> btrim(NEW.shift, ' ' || (chr(9) || chr(10) || chr(11) || chr(12) || chr(13)))
    OR NEW.storage_safety_person <> btrim(NEW.storage_safety_person, ' ' || (chr(9) || chr(10) || chr(11) || chr(12) || chr(13)))
    OR NEW.carried_out_for_name <> btrim(NEW.carried_out_for_name, ' ' || (chr(9) || chr(10) || chr(11) || chr(12) || chr(13)))
    OR NEW.carried_out_for_address
    <> btrim(NEW.carried_out_for_address, ' ' || (chr(9) || chr(10) || chr(11) || chr(12) || chr(13))) THEN
    RAISE EXCEPTION USING MESSAGE = 'a name, position, shift or address of the inspection has blanks at its ends: text is stored trimmed';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER inspections_stored_trimmed BEFORE INSERT ON inspections FOR EACH ROW EXECUTE FUNCTION inspections_stored_trimmed();

-- ---- design revisions and their panels: append-only ----------------------------------------

CREATE OR REPLACE FUNCTION design_revisions_never_change() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION USING MESSAGE = 'design revision cannot be changed: add a new revision';
  RETURN NEW;
END $$;
CREATE TRIGGER design_revisions_never_change BEFORE UPDATE ON design_revisions FOR EACH ROW EXECUTE FUNCTION design_revisions_never_change();

CREATE OR REPLACE FUNCTION design_revisions_never_go() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION USING MESSAGE = 'design revision cannot be deleted: add a new revision';
  RETURN OLD;
END $$;
CREATE TRIGGER design_revisions_never_go BEFORE DELETE ON design_revisions FOR EACH ROW EXECUTE FUNCTION design_revisions_never_go();

CREATE OR REPLACE FUNCTION design_revisions_never_overwritten() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF EXISTS (SELECT 1 FROM design_revisions WHERE id = NEW.id)
    OR EXISTS (SELECT 1 FROM design_revisions WHERE plane_id = NEW.plane_id AND number = NEW.number) THEN
    RAISE EXCEPTION USING MESSAGE = 'design revision already exists: records are never overwritten; add the next number';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER design_revisions_never_overwritten BEFORE INSERT ON design_revisions FOR EACH ROW EXECUTE FUNCTION design_revisions_never_overwritten();

CREATE OR REPLACE FUNCTION design_revisions_declare_their_panels() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.panel_count IS NULL THEN
    RAISE EXCEPTION USING MESSAGE = 'a new design revision states its panel count (panel_count)';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER design_revisions_declare_their_panels BEFORE INSERT ON design_revisions FOR EACH ROW EXECUTE FUNCTION design_revisions_declare_their_panels();

-- The design in force for an inspection is the latest revision recorded by its finish: a revision
-- recorded as of then or earlier would change what a finalised inspection was checked against.
CREATE OR REPLACE FUNCTION design_revisions_not_before_finalised_inspections() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF EXISTS (SELECT 1 FROM inspections i JOIN planes p ON p.structure_id = i.structure_id
    WHERE p.id = NEW.plane_id AND i.status = 'finalised'
    AND i.finished_at >= NEW.recorded_at) THEN
    RAISE EXCEPTION USING MESSAGE = 'design revision recorded as of a finalised inspection''s finish: it would change the design that inspection was checked against; record it as of now';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER design_revisions_not_before_finalised_inspections BEFORE INSERT ON design_revisions FOR EACH ROW EXECUTE FUNCTION design_revisions_not_before_finalised_inspections();

CREATE OR REPLACE FUNCTION design_revisions_stored_trimmed() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.author <> btrim(NEW.author, ' ' || (chr(9) || chr(10) || chr(11) || chr(12) || chr(13)))
    OR NEW.approval_note <> btrim(NEW.approval_note, ' ' || (chr(9) || chr(10) || chr(11) || chr(12) || chr(13))) THEN
    RAISE EXCEPTION USING MESSAGE = 'the design author or approval note has blanks at its ends: text is stored trimmed';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER design_revisions_stored_trimmed BEFORE INSERT ON design_revisions FOR EACH ROW EXECUTE FUNCTION design_revisions_stored_trimmed();

CREATE OR REPLACE FUNCTION design_panels_never_change() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION USING MESSAGE = 'design revision cannot be changed: add a new revision';
  RETURN NEW;
END $$;
CREATE TRIGGER design_panels_never_change BEFORE UPDATE ON design_panels FOR EACH ROW EXECUTE FUNCTION design_panels_never_change();

CREATE OR REPLACE FUNCTION design_panels_never_go() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION USING MESSAGE = 'design revision cannot be changed: add a new revision';
  RETURN OLD;
END $$;
CREATE TRIGGER design_panels_never_go BEFORE DELETE ON design_panels FOR EACH ROW EXECUTE FUNCTION design_panels_never_go();

CREATE OR REPLACE FUNCTION design_panels_never_overwritten() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF EXISTS (SELECT 1 FROM design_panels
    WHERE revision_id = NEW.revision_id AND lift = NEW.lift AND bay = NEW.bay) THEN
    RAISE EXCEPTION USING MESSAGE = 'design panel already exists: records are never overwritten; add a new revision';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER design_panels_never_overwritten BEFORE INSERT ON design_panels FOR EACH ROW EXECUTE FUNCTION design_panels_never_overwritten();

CREATE OR REPLACE FUNCTION design_panels_only_while_stored() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF (SELECT count(*) FROM design_panels WHERE revision_id = NEW.revision_id)
    >= (SELECT panel_count FROM design_revisions WHERE id = NEW.revision_id) THEN
    RAISE EXCEPTION USING MESSAGE = 'design revision already has all its panels and cannot be changed: add a new revision';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER design_panels_only_while_stored BEFORE INSERT ON design_panels FOR EACH ROW EXECUTE FUNCTION design_panels_only_while_stored();

-- ---- planes and their grids: fixed once stored (V2) ------------------------------------------

CREATE OR REPLACE FUNCTION planes_never_change() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION USING MESSAGE = 'plane cannot be changed: its designs and observations refer to its grid; create a new plane';
  RETURN NEW;
END $$;
CREATE TRIGGER planes_never_change BEFORE UPDATE ON planes FOR EACH ROW EXECUTE FUNCTION planes_never_change();

CREATE OR REPLACE FUNCTION planes_never_go() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION USING MESSAGE = 'plane cannot be deleted: its designs and observations refer to it';
  RETURN OLD;
END $$;
CREATE TRIGGER planes_never_go BEFORE DELETE ON planes FOR EACH ROW EXECUTE FUNCTION planes_never_go();

CREATE OR REPLACE FUNCTION planes_never_overwritten() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF EXISTS (SELECT 1 FROM planes WHERE id = NEW.id)
    OR EXISTS (SELECT 1 FROM planes WHERE structure_id = NEW.structure_id AND name = NEW.name) THEN
    RAISE EXCEPTION USING MESSAGE = 'plane already exists: records are never overwritten; give a new plane another name';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER planes_never_overwritten BEFORE INSERT ON planes FOR EACH ROW EXECUTE FUNCTION planes_never_overwritten();

CREATE OR REPLACE FUNCTION planes_stored_trimmed() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.name <> btrim(NEW.name, ' ' || (chr(9) || chr(10) || chr(11) || chr(12) || chr(13))) THEN
    RAISE EXCEPTION USING MESSAGE = 'the plane name has blanks at its ends: text is stored trimmed';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER planes_stored_trimmed BEFORE INSERT ON planes FOR EACH ROW EXECUTE FUNCTION planes_stored_trimmed();

CREATE OR REPLACE FUNCTION plane_widths_never_change() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION USING MESSAGE = 'the bay widths of a plane cannot be changed';
  RETURN NEW;
END $$;
CREATE TRIGGER plane_widths_never_change BEFORE UPDATE ON plane_bay_widths FOR EACH ROW EXECUTE FUNCTION plane_widths_never_change();

CREATE OR REPLACE FUNCTION plane_widths_never_go() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION USING MESSAGE = 'the bay widths of a plane cannot be changed';
  RETURN OLD;
END $$;
CREATE TRIGGER plane_widths_never_go BEFORE DELETE ON plane_bay_widths FOR EACH ROW EXECUTE FUNCTION plane_widths_never_go();

CREATE OR REPLACE FUNCTION plane_widths_never_overwritten() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF EXISTS (SELECT 1 FROM plane_bay_widths WHERE plane_id = NEW.plane_id AND bay = NEW.bay) THEN
    RAISE EXCEPTION USING MESSAGE = 'the bay widths of a plane cannot be changed: records are never overwritten';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER plane_widths_never_overwritten BEFORE INSERT ON plane_bay_widths FOR EACH ROW EXECUTE FUNCTION plane_widths_never_overwritten();

CREATE OR REPLACE FUNCTION plane_heights_never_change() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION USING MESSAGE = 'the lift heights of a plane cannot be changed';
  RETURN NEW;
END $$;
CREATE TRIGGER plane_heights_never_change BEFORE UPDATE ON plane_lift_heights FOR EACH ROW EXECUTE FUNCTION plane_heights_never_change();

CREATE OR REPLACE FUNCTION plane_heights_never_go() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION USING MESSAGE = 'the lift heights of a plane cannot be changed';
  RETURN OLD;
END $$;
CREATE TRIGGER plane_heights_never_go BEFORE DELETE ON plane_lift_heights FOR EACH ROW EXECUTE FUNCTION plane_heights_never_go();

CREATE OR REPLACE FUNCTION plane_heights_never_overwritten() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF EXISTS (SELECT 1 FROM plane_lift_heights WHERE plane_id = NEW.plane_id AND lift = NEW.lift) THEN
    RAISE EXCEPTION USING MESSAGE = 'the lift heights of a plane cannot be changed: records are never overwritten';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER plane_heights_never_overwritten BEFORE INSERT ON plane_lift_heights FOR EACH ROW EXECUTE FUNCTION plane_heights_never_overwritten();

-- ---- sites: every field is on the report and in its fingerprint; none changes -------------

CREATE OR REPLACE FUNCTION sites_never_change() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION USING MESSAGE = 'site cannot be changed: inspections and issued reports rest on it';
  RETURN NEW;
END $$;
CREATE TRIGGER sites_never_change BEFORE UPDATE ON sites FOR EACH ROW EXECUTE FUNCTION sites_never_change();

CREATE OR REPLACE FUNCTION sites_never_go() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION USING MESSAGE = 'site cannot be deleted: inspections and issued reports rest on it';
  RETURN OLD;
END $$;
CREATE TRIGGER sites_never_go BEFORE DELETE ON sites FOR EACH ROW EXECUTE FUNCTION sites_never_go();

CREATE OR REPLACE FUNCTION sites_never_overwritten() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF EXISTS (SELECT 1 FROM sites WHERE id = NEW.id) THEN
    RAISE EXCEPTION USING MESSAGE = 'site already exists: records are never overwritten';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER sites_never_overwritten BEFORE INSERT ON sites FOR EACH ROW EXECUTE FUNCTION sites_never_overwritten();

CREATE OR REPLACE FUNCTION sites_stored_trimmed() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.name <> btrim(NEW.name, ' ' || (chr(9) || chr(10) || chr(11) || chr(12) || chr(13)))
    OR NEW.client_name <> btrim(NEW.client_name, ' ' || (chr(9) || chr(10) || chr(11) || chr(12) || chr(13)))
    OR NEW.client_address <> btrim(NEW.client_address, ' ' || (chr(9) || chr(10) || chr(11) || chr(12) || chr(13)))
    OR NEW.location <> btrim(NEW.location, ' ' || (chr(9) || chr(10) || chr(11) || chr(12) || chr(13)))
    OR NEW.time_zone <> btrim(NEW.time_zone, ' ' || (chr(9) || chr(10) || chr(11) || chr(12) || chr(13))) THEN
    RAISE EXCEPTION USING MESSAGE = 'a name, address or location of the site has blanks at its ends: text is stored trimmed';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER sites_stored_trimmed BEFORE INSERT ON sites FOR EACH ROW EXECUTE FUNCTION sites_stored_trimmed();

-- ---- structures: only the inspection interval changes (finalised inspections keep theirs) --

CREATE OR REPLACE FUNCTION structures_keep_their_particulars() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.id IS DISTINCT FROM OLD.id OR NEW.site_id IS DISTINCT FROM OLD.site_id OR NEW.name IS DISTINCT FROM OLD.name
    OR NEW.kind IS DISTINCT FROM OLD.kind OR NEW.description IS DISTINCT FROM OLD.description
    OR NEW.design_reference IS DISTINCT FROM OLD.design_reference THEN
    RAISE EXCEPTION USING MESSAGE = 'structure cannot be changed but for its inspection interval: inspections and issued reports rest on it';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER structures_keep_their_particulars BEFORE UPDATE ON structures FOR EACH ROW EXECUTE FUNCTION structures_keep_their_particulars();

CREATE OR REPLACE FUNCTION structures_never_go() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION USING MESSAGE = 'structure cannot be deleted: inspections and issued reports rest on it';
  RETURN OLD;
END $$;
CREATE TRIGGER structures_never_go BEFORE DELETE ON structures FOR EACH ROW EXECUTE FUNCTION structures_never_go();

CREATE OR REPLACE FUNCTION structures_never_overwritten() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF EXISTS (SELECT 1 FROM structures WHERE id = NEW.id) THEN
    RAISE EXCEPTION USING MESSAGE = 'structure already exists: records are never overwritten';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER structures_never_overwritten BEFORE INSERT ON structures FOR EACH ROW EXECUTE FUNCTION structures_never_overwritten();

CREATE OR REPLACE FUNCTION structures_stored_trimmed() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.name <> btrim(NEW.name, ' ' || (chr(9) || chr(10) || chr(11) || chr(12) || chr(13)))
    OR NEW.description <> btrim(NEW.description, ' ' || (chr(9) || chr(10) || chr(11) || chr(12) || chr(13)))
    OR NEW.design_reference <> btrim(NEW.design_reference, ' ' || (chr(9) || chr(10) || chr(11) || chr(12) || chr(13))) THEN
    RAISE EXCEPTION USING MESSAGE = 'the structure name, description or design reference has blanks at its ends: text is stored trimmed';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER structures_stored_trimmed BEFORE INSERT ON structures FOR EACH ROW EXECUTE FUNCTION structures_stored_trimmed();

-- ---- repair orders: never changed; actions: only done, then verified, each set once --------

CREATE OR REPLACE FUNCTION repair_orders_never_change() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION USING MESSAGE = 'repair order cannot be changed: raise a new order';
  RETURN NEW;
END $$;
CREATE TRIGGER repair_orders_never_change BEFORE UPDATE ON repair_orders FOR EACH ROW EXECUTE FUNCTION repair_orders_never_change();

CREATE OR REPLACE FUNCTION repair_orders_never_go() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION USING MESSAGE = 'repair order cannot be deleted: raise a new order';
  RETURN OLD;
END $$;
CREATE TRIGGER repair_orders_never_go BEFORE DELETE ON repair_orders FOR EACH ROW EXECUTE FUNCTION repair_orders_never_go();

CREATE OR REPLACE FUNCTION repair_orders_never_overwritten() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF EXISTS (SELECT 1 FROM repair_orders WHERE id = NEW.id) THEN
    RAISE EXCEPTION USING MESSAGE = 'repair order already exists: records are never overwritten';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER repair_orders_never_overwritten BEFORE INSERT ON repair_orders FOR EACH ROW EXECUTE FUNCTION repair_orders_never_overwritten();

CREATE OR REPLACE FUNCTION repair_orders_stored_trimmed() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.created_by <> btrim(NEW.created_by, ' ' || (chr(9) || chr(10) || chr(11) || chr(12) || chr(13)))
    OR NEW.note <> btrim(NEW.note, ' ' || (chr(9) || chr(10) || chr(11) || chr(12) || chr(13))) THEN
    RAISE EXCEPTION USING MESSAGE = 'the repair order''s author or note has blanks at its ends: text is stored trimmed';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER repair_orders_stored_trimmed BEFORE INSERT ON repair_orders FOR EACH ROW EXECUTE FUNCTION repair_orders_stored_trimmed();

CREATE OR REPLACE FUNCTION repair_actions_never_go() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION USING MESSAGE = 'repair action cannot be deleted: record it done, or raise a new order';
  RETURN OLD;
END $$;
CREATE TRIGGER repair_actions_never_go BEFORE DELETE ON repair_actions FOR EACH ROW EXECUTE FUNCTION repair_actions_never_go();

CREATE OR REPLACE FUNCTION repair_actions_never_overwritten() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF EXISTS (SELECT 1 FROM repair_actions WHERE id = NEW.id) THEN
    RAISE EXCEPTION USING MESSAGE = 'repair action already exists: records are never overwritten';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER repair_actions_never_overwritten BEFORE INSERT ON repair_actions FOR EACH ROW EXECUTE FUNCTION repair_actions_never_overwritten();

CREATE OR REPLACE FUNCTION repair_actions_only_done_then_verified() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.id IS DISTINCT FROM OLD.id OR NEW.order_id IS DISTINCT FROM OLD.order_id
    OR NEW.plane_id IS DISTINCT FROM OLD.plane_id OR NEW.lift IS DISTINCT FROM OLD.lift OR NEW.bay IS DISTINCT FROM OLD.bay
    OR NEW.action IS DISTINCT FROM OLD.action OR NEW.brace_diagonal IS DISTINCT FROM OLD.brace_diagonal
    OR NEW.brace_kind IS DISTINCT FROM OLD.brace_kind OR NEW.description IS DISTINCT FROM OLD.description
    OR NEW.due_date IS DISTINCT FROM OLD.due_date OR NEW.assignee IS DISTINCT FROM OLD.assignee
    OR (OLD.done_at IS NOT NULL
    AND (NEW.done_at IS DISTINCT FROM OLD.done_at OR NEW.done_by IS DISTINCT FROM OLD.done_by))
    OR (OLD.done_at IS NULL AND NEW.done_at IS NULL AND NEW.done_by IS DISTINCT FROM OLD.done_by)
    OR (OLD.verified_by_inspection_id IS NOT NULL
    AND NEW.verified_by_inspection_id IS DISTINCT FROM OLD.verified_by_inspection_id) THEN
    RAISE EXCEPTION USING MESSAGE = 'repair action cannot be changed: only its done time and person, then the verifying inspection, are set, each once';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER repair_actions_only_done_then_verified BEFORE UPDATE ON repair_actions FOR EACH ROW EXECUTE FUNCTION repair_actions_only_done_then_verified();

CREATE OR REPLACE FUNCTION repair_actions_stored_trimmed() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.description <> btrim(NEW.description, ' ' || (chr(9) || chr(10) || chr(11) || chr(12) || chr(13)))
    OR NEW.assignee <> btrim(NEW.assignee, ' ' || (chr(9) || chr(10) || chr(11) || chr(12) || chr(13)))
    OR NEW.done_by <> btrim(NEW.done_by, ' ' || (chr(9) || chr(10) || chr(11) || chr(12) || chr(13))) THEN
    RAISE EXCEPTION USING MESSAGE = 'the repair action''s description, assignee or done-by has blanks at its ends: text is stored trimmed';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER repair_actions_stored_trimmed BEFORE INSERT ON repair_actions FOR EACH ROW EXECUTE FUNCTION repair_actions_stored_trimmed();

CREATE OR REPLACE FUNCTION repair_actions_done_by_trimmed() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.done_by <> btrim(NEW.done_by, ' ' || (chr(9) || chr(10) || chr(11) || chr(12) || chr(13))) THEN
    RAISE EXCEPTION USING MESSAGE = 'the repair action''s done-by has blanks at its ends: text is stored trimmed';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER repair_actions_done_by_trimmed BEFORE UPDATE ON repair_actions FOR EACH ROW EXECUTE FUNCTION repair_actions_done_by_trimmed();

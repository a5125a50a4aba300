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

DROP TRIGGER observations_never_change;
DROP TRIGGER observations_never_go;
DROP TRIGGER observations_only_into_open_inspections;
DROP TRIGGER observations_of_the_inspected_structure;
DROP TRIGGER observations_inside_the_plane;
DROP TRIGGER corrections_within_one_inspection;
DROP TRIGGER photos_never_change;
DROP TRIGGER photos_never_go;
DROP TRIGGER photos_only_into_open_inspections;
DROP TRIGGER finalised_inspections_never_change;
DROP TRIGGER finalised_inspections_never_go;
DROP TRIGGER design_revisions_never_change;
DROP TRIGGER design_revisions_never_go;
DROP TRIGGER design_panels_never_change;
DROP TRIGGER design_panels_never_go;
DROP TRIGGER planes_never_change;
DROP TRIGGER planes_never_go;
DROP TRIGGER plane_widths_never_change;
DROP TRIGGER plane_widths_never_go;
DROP TRIGGER plane_heights_never_change;
DROP TRIGGER plane_heights_never_go;

-- ---- new columns and their back-fill (the triggers are away, so finalised rows take them) ----

-- The structure's inspection interval as at finalisation; NULL while the inspection is open.
ALTER TABLE inspections ADD COLUMN inspection_interval_days INTEGER
  CHECK (inspection_interval_days IS NULL OR inspection_interval_days BETWEEN 1 AND 366);
UPDATE inspections
SET inspection_interval_days =
  (SELECT s.inspection_interval_days FROM structures s WHERE s.id = inspections.structure_id)
WHERE status = 'finalised';

-- How many design_panels rows the revision has: panels may be added only until there are that
-- many, that is while the revision is being stored.
ALTER TABLE design_revisions ADD COLUMN panel_count INTEGER
  CHECK (panel_count IS NULL OR panel_count >= 0);
UPDATE design_revisions
SET panel_count = (SELECT count(*) FROM design_panels p WHERE p.revision_id = design_revisions.id);

-- ---- observations: append-only ------------------------------------------------------------

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

-- ---- photos: kept as taken ------------------------------------------------------------------

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

-- ---- inspections: a finalised one never changes; an open one keeps its id and structure -----

CREATE TRIGGER finalised_inspections_never_change BEFORE UPDATE ON inspections
WHEN OLD.status = 'finalised'
BEGIN
  SELECT RAISE(ABORT, 'the inspection is finalised and cannot be changed (update it)');
END;

CREATE TRIGGER finalised_inspections_never_go BEFORE DELETE ON inspections
WHEN OLD.status = 'finalised'
BEGIN
  SELECT RAISE(ABORT, 'the inspection is finalised and cannot be changed (delete it)');
END;

CREATE TRIGGER inspections_never_overwritten BEFORE INSERT ON inspections
WHEN EXISTS (SELECT 1 FROM inspections WHERE id = NEW.id)
BEGIN
  SELECT RAISE(ABORT, 'inspection already exists: records are never overwritten');
END;

-- An UPDATE OR REPLACE that gave an open inspection a finalised one's id would delete that one.
CREATE TRIGGER inspections_keep_their_identity BEFORE UPDATE ON inspections
WHEN NEW.id IS NOT OLD.id OR NEW.structure_id IS NOT OLD.structure_id
  OR NEW.started_at IS NOT OLD.started_at
BEGIN
  SELECT RAISE(ABORT, 'an inspection keeps its id, structure and start time: start a new inspection');
END;

CREATE TRIGGER inspections_interval_as_at_finalisation BEFORE UPDATE ON inspections
WHEN OLD.status = 'open'
 AND ((NEW.status = 'open' AND NEW.inspection_interval_days IS NOT NULL)
  OR (NEW.status = 'finalised' AND NEW.inspection_interval_days
      IS NOT (SELECT inspection_interval_days FROM structures WHERE id = NEW.structure_id)))
BEGIN
  SELECT RAISE(ABORT, 'a finalised inspection keeps the structure''s inspection interval as at its finalisation, an open one none');
END;

CREATE TRIGGER inspections_interval_as_at_insert BEFORE INSERT ON inspections
WHEN (NEW.status = 'open' AND NEW.inspection_interval_days IS NOT NULL)
  OR (NEW.status = 'finalised' AND NEW.inspection_interval_days
      IS NOT (SELECT inspection_interval_days FROM structures WHERE id = NEW.structure_id))
BEGIN
  SELECT RAISE(ABORT, 'a finalised inspection keeps the structure''s inspection interval as at its finalisation, an open one none');
END;

CREATE TRIGGER inspections_stored_trimmed BEFORE INSERT ON inspections
WHEN NEW.inspector_name <> trim(NEW.inspector_name, ' ' || char(9, 10, 11, 12, 13))
  OR NEW.inspector_position <> trim(NEW.inspector_position, ' ' || char(9, 10, 11, 12, 13))
  OR NEW.competent_person <> trim(NEW.competent_person, ' ' || char(9, 10, 11, 12, 13))
  OR NEW.shift <> trim(NEW.shift, ' ' || char(9, 10, 11, 12, 13))
  OR NEW.storage_safety_person <> trim(NEW.storage_safety_person, ' ' || char(9, 10, 11, 12, 13))
  OR NEW.carried_out_for_name <> trim(NEW.carried_out_for_name, ' ' || char(9, 10, 11, 12, 13))
  OR NEW.carried_out_for_address
     <> trim(NEW.carried_out_for_address, ' ' || char(9, 10, 11, 12, 13))
BEGIN
  SELECT RAISE(ABORT, 'a name, position, shift or address of the inspection has blanks at its ends: text is stored trimmed');
END;

-- ---- design revisions and their panels: append-only ----------------------------------------

CREATE TRIGGER design_revisions_never_change BEFORE UPDATE ON design_revisions
BEGIN
  SELECT RAISE(ABORT, 'design revision cannot be changed: add a new revision');
END;

CREATE TRIGGER design_revisions_never_go BEFORE DELETE ON design_revisions
BEGIN
  SELECT RAISE(ABORT, 'design revision cannot be deleted: add a new revision');
END;

CREATE TRIGGER design_revisions_never_overwritten BEFORE INSERT ON design_revisions
WHEN EXISTS (SELECT 1 FROM design_revisions WHERE id = NEW.id)
  OR EXISTS (SELECT 1 FROM design_revisions WHERE plane_id = NEW.plane_id AND number = NEW.number)
BEGIN
  SELECT RAISE(ABORT, 'design revision already exists: records are never overwritten; add the next number');
END;

CREATE TRIGGER design_revisions_declare_their_panels BEFORE INSERT ON design_revisions
WHEN NEW.panel_count IS NULL
BEGIN
  SELECT RAISE(ABORT, 'a new design revision states its panel count (panel_count)');
END;

-- The design in force for an inspection is the latest revision recorded by its finish: a revision
-- recorded as of then or earlier would change what a finalised inspection was checked against.
CREATE TRIGGER design_revisions_not_before_finalised_inspections BEFORE INSERT ON design_revisions
WHEN EXISTS (SELECT 1 FROM inspections i JOIN planes p ON p.structure_id = i.structure_id
             WHERE p.id = NEW.plane_id AND i.status = 'finalised'
               AND i.finished_at >= NEW.recorded_at)
BEGIN
  SELECT RAISE(ABORT, 'design revision recorded as of a finalised inspection''s finish: it would change the design that inspection was checked against; record it as of now');
END;

CREATE TRIGGER design_revisions_stored_trimmed BEFORE INSERT ON design_revisions
WHEN NEW.author <> trim(NEW.author, ' ' || char(9, 10, 11, 12, 13))
  OR NEW.approval_note <> trim(NEW.approval_note, ' ' || char(9, 10, 11, 12, 13))
BEGIN
  SELECT RAISE(ABORT, 'the design author or approval note has blanks at its ends: text is stored trimmed');
END;

CREATE TRIGGER design_panels_never_change BEFORE UPDATE ON design_panels
BEGIN
  SELECT RAISE(ABORT, 'design revision cannot be changed: add a new revision');
END;

CREATE TRIGGER design_panels_never_go BEFORE DELETE ON design_panels
BEGIN
  SELECT RAISE(ABORT, 'design revision cannot be changed: add a new revision');
END;

CREATE TRIGGER design_panels_never_overwritten BEFORE INSERT ON design_panels
WHEN EXISTS (SELECT 1 FROM design_panels
             WHERE revision_id = NEW.revision_id AND lift = NEW.lift AND bay = NEW.bay)
BEGIN
  SELECT RAISE(ABORT, 'design panel already exists: records are never overwritten; add a new revision');
END;

CREATE TRIGGER design_panels_only_while_stored BEFORE INSERT ON design_panels
WHEN (SELECT count(*) FROM design_panels WHERE revision_id = NEW.revision_id)
     >= (SELECT panel_count FROM design_revisions WHERE id = NEW.revision_id)
BEGIN
  SELECT RAISE(ABORT, 'design revision already has all its panels and cannot be changed: add a new revision');
END;

-- ---- planes and their grids: fixed once stored (V2) ------------------------------------------

CREATE TRIGGER planes_never_change BEFORE UPDATE ON planes
BEGIN
  SELECT RAISE(ABORT, 'plane cannot be changed: its designs and observations refer to its grid; create a new plane');
END;

CREATE TRIGGER planes_never_go BEFORE DELETE ON planes
BEGIN
  SELECT RAISE(ABORT, 'plane cannot be deleted: its designs and observations refer to it');
END;

CREATE TRIGGER planes_never_overwritten BEFORE INSERT ON planes
WHEN EXISTS (SELECT 1 FROM planes WHERE id = NEW.id)
  OR EXISTS (SELECT 1 FROM planes WHERE structure_id = NEW.structure_id AND name = NEW.name)
BEGIN
  SELECT RAISE(ABORT, 'plane already exists: records are never overwritten; give a new plane another name');
END;

CREATE TRIGGER planes_stored_trimmed BEFORE INSERT ON planes
WHEN NEW.name <> trim(NEW.name, ' ' || char(9, 10, 11, 12, 13))
BEGIN
  SELECT RAISE(ABORT, 'the plane name has blanks at its ends: text is stored trimmed');
END;

CREATE TRIGGER plane_widths_never_change BEFORE UPDATE ON plane_bay_widths
BEGIN
  SELECT RAISE(ABORT, 'the bay widths of a plane cannot be changed');
END;

CREATE TRIGGER plane_widths_never_go BEFORE DELETE ON plane_bay_widths
BEGIN
  SELECT RAISE(ABORT, 'the bay widths of a plane cannot be changed');
END;

CREATE TRIGGER plane_widths_never_overwritten BEFORE INSERT ON plane_bay_widths
WHEN EXISTS (SELECT 1 FROM plane_bay_widths WHERE plane_id = NEW.plane_id AND bay = NEW.bay)
BEGIN
  SELECT RAISE(ABORT, 'the bay widths of a plane cannot be changed: records are never overwritten');
END;

CREATE TRIGGER plane_heights_never_change BEFORE UPDATE ON plane_lift_heights
BEGIN
  SELECT RAISE(ABORT, 'the lift heights of a plane cannot be changed');
END;

CREATE TRIGGER plane_heights_never_go BEFORE DELETE ON plane_lift_heights
BEGIN
  SELECT RAISE(ABORT, 'the lift heights of a plane cannot be changed');
END;

CREATE TRIGGER plane_heights_never_overwritten BEFORE INSERT ON plane_lift_heights
WHEN EXISTS (SELECT 1 FROM plane_lift_heights WHERE plane_id = NEW.plane_id AND lift = NEW.lift)
BEGIN
  SELECT RAISE(ABORT, 'the lift heights of a plane cannot be changed: records are never overwritten');
END;

-- ---- sites: every field is on the report and in its fingerprint; none changes -------------

CREATE TRIGGER sites_never_change BEFORE UPDATE ON sites
BEGIN
  SELECT RAISE(ABORT, 'site cannot be changed: inspections and issued reports rest on it');
END;

CREATE TRIGGER sites_never_go BEFORE DELETE ON sites
BEGIN
  SELECT RAISE(ABORT, 'site cannot be deleted: inspections and issued reports rest on it');
END;

CREATE TRIGGER sites_never_overwritten BEFORE INSERT ON sites
WHEN EXISTS (SELECT 1 FROM sites WHERE id = NEW.id)
BEGIN
  SELECT RAISE(ABORT, 'site already exists: records are never overwritten');
END;

CREATE TRIGGER sites_stored_trimmed BEFORE INSERT ON sites
WHEN NEW.name <> trim(NEW.name, ' ' || char(9, 10, 11, 12, 13))
  OR NEW.client_name <> trim(NEW.client_name, ' ' || char(9, 10, 11, 12, 13))
  OR NEW.client_address <> trim(NEW.client_address, ' ' || char(9, 10, 11, 12, 13))
  OR NEW.location <> trim(NEW.location, ' ' || char(9, 10, 11, 12, 13))
  OR NEW.time_zone <> trim(NEW.time_zone, ' ' || char(9, 10, 11, 12, 13))
BEGIN
  SELECT RAISE(ABORT, 'a name, address or location of the site has blanks at its ends: text is stored trimmed');
END;

-- ---- structures: only the inspection interval changes (finalised inspections keep theirs) --

CREATE TRIGGER structures_keep_their_particulars BEFORE UPDATE ON structures
WHEN NEW.id IS NOT OLD.id OR NEW.site_id IS NOT OLD.site_id OR NEW.name IS NOT OLD.name
  OR NEW.kind IS NOT OLD.kind OR NEW.description IS NOT OLD.description
  OR NEW.design_reference IS NOT OLD.design_reference
BEGIN
  SELECT RAISE(ABORT, 'structure cannot be changed but for its inspection interval: inspections and issued reports rest on it');
END;

CREATE TRIGGER structures_never_go BEFORE DELETE ON structures
BEGIN
  SELECT RAISE(ABORT, 'structure cannot be deleted: inspections and issued reports rest on it');
END;

CREATE TRIGGER structures_never_overwritten BEFORE INSERT ON structures
WHEN EXISTS (SELECT 1 FROM structures WHERE id = NEW.id)
BEGIN
  SELECT RAISE(ABORT, 'structure already exists: records are never overwritten');
END;

CREATE TRIGGER structures_stored_trimmed BEFORE INSERT ON structures
WHEN NEW.name <> trim(NEW.name, ' ' || char(9, 10, 11, 12, 13))
  OR NEW.description <> trim(NEW.description, ' ' || char(9, 10, 11, 12, 13))
  OR NEW.design_reference <> trim(NEW.design_reference, ' ' || char(9, 10, 11, 12, 13))
BEGIN
  SELECT RAISE(ABORT, 'the structure name, description or design reference has blanks at its ends: text is stored trimmed');
END;

-- ---- repair orders: never changed; actions: only done, then verified, each set once --------

CREATE TRIGGER repair_orders_never_change BEFORE UPDATE ON repair_orders
BEGIN
  SELECT RAISE(ABORT, 'repair order cannot be changed: raise a new order');
END;

CREATE TRIGGER repair_orders_never_go BEFORE DELETE ON repair_orders
BEGIN
  SELECT RAISE(ABORT, 'repair order cannot be deleted: raise a new order');
END;

CREATE TRIGGER repair_orders_never_overwritten BEFORE INSERT ON repair_orders
WHEN EXISTS (SELECT 1 FROM repair_orders WHERE id = NEW.id)
BEGIN
  SELECT RAISE(ABORT, 'repair order already exists: records are never overwritten');
END;

CREATE TRIGGER repair_orders_stored_trimmed BEFORE INSERT ON repair_orders
WHEN NEW.created_by <> trim(NEW.created_by, ' ' || char(9, 10, 11, 12, 13))
  OR NEW.note <> trim(NEW.note, ' ' || char(9, 10, 11, 12, 13))
BEGIN
  SELECT RAISE(ABORT, 'the repair order''s author or note has blanks at its ends: text is stored trimmed');
END;

CREATE TRIGGER repair_actions_never_go BEFORE DELETE ON repair_actions
BEGIN
  SELECT RAISE(ABORT, 'repair action cannot be deleted: record it done, or raise a new order');
END;

CREATE TRIGGER repair_actions_never_overwritten BEFORE INSERT ON repair_actions
WHEN EXISTS (SELECT 1 FROM repair_actions WHERE id = NEW.id)
BEGIN
  SELECT RAISE(ABORT, 'repair action already exists: records are never overwritten');
END;

CREATE TRIGGER repair_actions_only_done_then_verified BEFORE UPDATE ON repair_actions
WHEN NEW.id IS NOT OLD.id OR NEW.order_id IS NOT OLD.order_id
  OR NEW.plane_id IS NOT OLD.plane_id OR NEW.lift IS NOT OLD.lift OR NEW.bay IS NOT OLD.bay
  OR NEW.action IS NOT OLD.action OR NEW.brace_diagonal IS NOT OLD.brace_diagonal
  OR NEW.brace_kind IS NOT OLD.brace_kind OR NEW.description IS NOT OLD.description
  OR NEW.due_date IS NOT OLD.due_date OR NEW.assignee IS NOT OLD.assignee
  OR (OLD.done_at IS NOT NULL
      AND (NEW.done_at IS NOT OLD.done_at OR NEW.done_by IS NOT OLD.done_by))
  OR (OLD.done_at IS NULL AND NEW.done_at IS NULL AND NEW.done_by IS NOT OLD.done_by)
  OR (OLD.verified_by_inspection_id IS NOT NULL
      AND NEW.verified_by_inspection_id IS NOT OLD.verified_by_inspection_id)
BEGIN
  SELECT RAISE(ABORT, 'repair action cannot be changed: only its done time and person, then the verifying inspection, are set, each once');
END;

CREATE TRIGGER repair_actions_stored_trimmed BEFORE INSERT ON repair_actions
WHEN NEW.description <> trim(NEW.description, ' ' || char(9, 10, 11, 12, 13))
  OR NEW.assignee <> trim(NEW.assignee, ' ' || char(9, 10, 11, 12, 13))
  OR NEW.done_by <> trim(NEW.done_by, ' ' || char(9, 10, 11, 12, 13))
BEGIN
  SELECT RAISE(ABORT, 'the repair action''s description, assignee or done-by has blanks at its ends: text is stored trimmed');
END;

CREATE TRIGGER repair_actions_done_by_trimmed BEFORE UPDATE ON repair_actions
WHEN NEW.done_by <> trim(NEW.done_by, ' ' || char(9, 10, 11, 12, 13))
BEGIN
  SELECT RAISE(ABORT, 'the repair action''s done-by has blanks at its ends: text is stored trimmed');
END;

-- PostgreSQL dialect of db-migrations/V9__frame_members.sql: the same version, description and rules, the same
-- messages (PL/pgSQL RAISE EXCEPTION in place of SQLite's RAISE(ABORT, ...)). Never edit once released.

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

ALTER TABLE design_revisions ADD COLUMN omitted_frame_count BIGINT NOT NULL DEFAULT 0
  CHECK (omitted_frame_count >= 0);

CREATE TABLE design_frame_omissions (
  revision_id  BIGINT NOT NULL REFERENCES design_revisions (id),
  frame_type   TEXT NOT NULL CHECK (frame_type IN ('ledger', 'standard')),
  frame_first  BIGINT NOT NULL CHECK (frame_first >= 0),
  frame_second BIGINT NOT NULL CHECK (frame_second >= 0),
  CHECK (frame_type <> 'ledger' OR frame_second >= 1),
  CHECK (frame_type <> 'standard' OR frame_first >= 1),
  PRIMARY KEY (revision_id, frame_type, frame_first, frame_second)
);

CREATE OR REPLACE FUNCTION design_frame_omissions_never_change() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION USING MESSAGE = 'design revision cannot be changed: add a new revision';
  RETURN NEW;
END $$;
CREATE TRIGGER design_frame_omissions_never_change BEFORE UPDATE ON design_frame_omissions FOR EACH ROW EXECUTE FUNCTION design_frame_omissions_never_change();

CREATE OR REPLACE FUNCTION design_frame_omissions_never_go() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION USING MESSAGE = 'design revision cannot be changed: add a new revision';
  RETURN OLD;
END $$;
CREATE TRIGGER design_frame_omissions_never_go BEFORE DELETE ON design_frame_omissions FOR EACH ROW EXECUTE FUNCTION design_frame_omissions_never_go();

CREATE OR REPLACE FUNCTION design_frame_omissions_never_overwritten() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF EXISTS (SELECT 1 FROM design_frame_omissions
    WHERE revision_id = NEW.revision_id AND frame_type = NEW.frame_type
    AND frame_first = NEW.frame_first AND frame_second = NEW.frame_second) THEN
    RAISE EXCEPTION USING MESSAGE = 'the frame member is already left out of the design revision: records are never overwritten; add a new revision';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER design_frame_omissions_never_overwritten BEFORE INSERT ON design_frame_omissions FOR EACH ROW EXECUTE FUNCTION design_frame_omissions_never_overwritten();

CREATE OR REPLACE FUNCTION design_frame_omissions_only_while_stored() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF (SELECT count(*) FROM design_frame_omissions WHERE revision_id = NEW.revision_id)
    >= (SELECT omitted_frame_count FROM design_revisions WHERE id = NEW.revision_id) THEN
    RAISE EXCEPTION USING MESSAGE = 'design revision already has all its frame members left out and cannot be changed: add a new revision';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER design_frame_omissions_only_while_stored BEFORE INSERT ON design_frame_omissions FOR EACH ROW EXECUTE FUNCTION design_frame_omissions_only_while_stored();

CREATE OR REPLACE FUNCTION design_frame_omissions_inside_the_plane() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.frame_first > (SELECT p.lifts FROM planes p JOIN design_revisions d ON d.plane_id = p.id
    WHERE d.id = NEW.revision_id)
    OR NEW.frame_second > (SELECT p.bays FROM planes p JOIN design_revisions d ON d.plane_id = p.id
    WHERE d.id = NEW.revision_id) THEN
    RAISE EXCEPTION USING MESSAGE = 'the frame member left out of the design lies outside the plane';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER design_frame_omissions_inside_the_plane BEFORE INSERT ON design_frame_omissions FOR EACH ROW EXECUTE FUNCTION design_frame_omissions_inside_the_plane();

-- ---- 2. observations of panels or frame members: the rebuild ----------------------------------

DROP TRIGGER observations_never_change ON observations;
DROP TRIGGER observations_never_go ON observations;
DROP TRIGGER observations_never_overwritten ON observations;
DROP TRIGGER corrections_never_overwritten ON observations;
DROP TRIGGER observations_only_into_open_inspections ON observations;
DROP TRIGGER observations_of_the_inspected_structure ON observations;
DROP TRIGGER observations_inside_the_plane ON observations;
DROP TRIGGER corrections_within_one_inspection ON observations;
DROP TRIGGER observations_stored_trimmed ON observations;
DROP TRIGGER observations_not_into_retired_planes ON observations;
DROP TRIGGER observations_within_the_scope ON observations;
DROP TRIGGER photos_never_change ON photos;
DROP TRIGGER photos_never_go ON photos;
DROP TRIGGER photos_never_overwritten ON photos;
DROP TRIGGER photos_only_into_open_inspections ON photos;
DROP TRIGGER photos_stored_trimmed ON photos;
DROP TRIGGER observation_sources_never_replaced ON observation_sources;
DROP TRIGGER observation_sources_of_the_same_inspection ON observation_sources;
DROP TRIGGER observation_sources_never_change ON observation_sources;
DROP TRIGGER observation_sources_never_go ON observation_sources;
DROP TRIGGER inspection_scope_only_while_starting ON inspection_scope;

-- PostgreSQL changes columns in place: no rebuild, ids and their identity sequences stay.
ALTER TABLE observations ALTER COLUMN lift DROP NOT NULL;
ALTER TABLE observations ALTER COLUMN bay DROP NOT NULL;
ALTER TABLE observations ADD COLUMN frame_type TEXT CHECK (frame_type IN ('ledger', 'standard'));
ALTER TABLE observations ADD COLUMN frame_first BIGINT CHECK (frame_first >= 0);
ALTER TABLE observations ADD COLUMN frame_second BIGINT CHECK (frame_second >= 0);
-- V1's check that an 'extra' observation names a diagonal: dropped, and made again below with
-- frame members allowed (its name is PostgreSQL's choice, so it is found by what it says).
DO $$
DECLARE
  doomed TEXT;
BEGIN
  SELECT conname INTO STRICT doomed FROM pg_constraint
  WHERE conrelid = 'observations'::regclass AND contype = 'c'
    AND pg_get_constraintdef(oid) LIKE '%''extra''%' AND pg_get_constraintdef(oid) NOT LIKE '%frame_type%'
    AND pg_get_constraintdef(oid) NOT LIKE '%damaged%';
  EXECUTE format('ALTER TABLE observations DROP CONSTRAINT %I', doomed);
END $$;
-- a panel (lift and bay) or a frame member (type and two numbers), exactly one of them
ALTER TABLE observations ADD CHECK ((lift IS NULL) = (bay IS NULL));
ALTER TABLE observations ADD CHECK ((frame_type IS NULL) = (frame_first IS NULL)
     AND (frame_type IS NULL) = (frame_second IS NULL));
ALTER TABLE observations ADD CHECK ((lift IS NULL) <> (frame_type IS NULL));
ALTER TABLE observations ADD CHECK (frame_type IS DISTINCT FROM 'ledger' OR frame_second >= 1);
ALTER TABLE observations ADD CHECK (frame_type IS DISTINCT FROM 'standard' OR frame_first >= 1);
-- a frame member names no diagonal; 'extra' on it means there although the design leaves it out
ALTER TABLE observations ADD CHECK (frame_type IS NULL OR member_diagonal IS NULL);
ALTER TABLE observations ADD CHECK (state <> 'extra' OR member_diagonal IS NOT NULL OR frame_type IS NOT NULL);
-- photos and observation_sources keep their columns: SQLite rebuilt them only because they
-- refer to the rebuilt observations table.

-- ---- observations: the triggers of V3, V6 and V7, as they were -------------------------------

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

CREATE OR REPLACE FUNCTION observations_not_into_retired_planes() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF EXISTS (SELECT 1 FROM plane_retirements r JOIN inspections i ON i.id = NEW.inspection_id
    WHERE r.plane_id = NEW.plane_id AND r.retired_at <= i.started_at) THEN
    RAISE EXCEPTION USING MESSAGE = 'the plane was retired before the inspection started and is not part of it';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER observations_not_into_retired_planes BEFORE INSERT ON observations FOR EACH ROW EXECUTE FUNCTION observations_not_into_retired_planes();

CREATE OR REPLACE FUNCTION observations_within_the_scope() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NOT EXISTS (SELECT 1 FROM inspection_scope
    WHERE inspection_id = NEW.inspection_id AND plane_id = NEW.plane_id)
    AND NOT EXISTS (SELECT 1 FROM plane_retirements r JOIN inspections i ON i.id = NEW.inspection_id
    WHERE r.plane_id = NEW.plane_id AND r.retired_at <= i.started_at) THEN
    RAISE EXCEPTION USING MESSAGE = 'the plane is not in the scope of the inspection (fixed when it started): record it in a new inspection';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER observations_within_the_scope BEFORE INSERT ON observations FOR EACH ROW EXECUTE FUNCTION observations_within_the_scope();

-- ---- observations of frame members: the new checks --------------------------------------------

-- ledger: level <= lifts, bay <= bays; standard: lift <= lifts, line <= bays
CREATE OR REPLACE FUNCTION observations_frame_member_inside_the_plane() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.frame_type IS NOT NULL
    AND (NEW.frame_first > (SELECT lifts FROM planes WHERE id = NEW.plane_id)
    OR NEW.frame_second > (SELECT bays FROM planes WHERE id = NEW.plane_id)) THEN
    RAISE EXCEPTION USING MESSAGE = 'the frame member lies outside the plane';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER observations_frame_member_inside_the_plane BEFORE INSERT ON observations FOR EACH ROW EXECUTE FUNCTION observations_frame_member_inside_the_plane();

-- 'extra' on a frame member: there although the design revision in the inspection's scope
-- leaves it out; a member the design has cannot be extra.
CREATE OR REPLACE FUNCTION observations_extra_frame_member_left_out_by_the_design() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.frame_type IS NOT NULL AND NEW.state = 'extra'
    AND NOT EXISTS (SELECT 1 FROM inspection_scope s
    JOIN design_frame_omissions f ON f.revision_id = s.design_revision_id
    WHERE s.inspection_id = NEW.inspection_id AND s.plane_id = NEW.plane_id
    AND f.frame_type = NEW.frame_type AND f.frame_first = NEW.frame_first
    AND f.frame_second = NEW.frame_second) THEN
    RAISE EXCEPTION USING MESSAGE = 'the frame member is in the design and cannot be recorded as extra: record it sound, damaged or missing';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER observations_extra_frame_member_left_out_by_the_design BEFORE INSERT ON observations FOR EACH ROW EXECUTE FUNCTION observations_extra_frame_member_left_out_by_the_design();

-- ---- photos: the triggers of V3, as they were ---------------------------------------------------

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

-- ---- observation sources: the triggers of V4, as they were ---------------------------------------

CREATE OR REPLACE FUNCTION observation_sources_never_replaced() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF EXISTS (SELECT 1 FROM observation_sources
    WHERE (inspection_id = NEW.inspection_id AND source_sha256 = NEW.source_sha256
    AND line = NEW.line)
    OR observation_id = NEW.observation_id) THEN
    RAISE EXCEPTION USING MESSAGE = 'this line of the file is already recorded in the inspection (observation sources are append-only); nothing was replaced';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER observation_sources_never_replaced BEFORE INSERT ON observation_sources FOR EACH ROW EXECUTE FUNCTION observation_sources_never_replaced();

CREATE OR REPLACE FUNCTION observation_sources_of_the_same_inspection() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF (SELECT inspection_id FROM observations WHERE id = NEW.observation_id)
    IS DISTINCT FROM NEW.inspection_id THEN
    RAISE EXCEPTION USING MESSAGE = 'the observation named as recorded from the file is not an observation of that inspection';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER observation_sources_of_the_same_inspection BEFORE INSERT ON observation_sources FOR EACH ROW EXECUTE FUNCTION observation_sources_of_the_same_inspection();

CREATE OR REPLACE FUNCTION observation_sources_never_change() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION USING MESSAGE = 'where an observation was recorded from cannot be changed (observation sources are append-only)';
  RETURN NEW;
END $$;
CREATE TRIGGER observation_sources_never_change BEFORE UPDATE ON observation_sources FOR EACH ROW EXECUTE FUNCTION observation_sources_never_change();

CREATE OR REPLACE FUNCTION observation_sources_never_go() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION USING MESSAGE = 'where an observation was recorded from cannot be deleted (observation sources are append-only)';
  RETURN OLD;
END $$;
CREATE TRIGGER observation_sources_never_go BEFORE DELETE ON observation_sources FOR EACH ROW EXECUTE FUNCTION observation_sources_never_go();

-- ---- the scope trigger of V7 that reads observations, as it was --------------------------------

CREATE OR REPLACE FUNCTION inspection_scope_only_while_starting() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF (SELECT status FROM inspections WHERE id = NEW.inspection_id) IS DISTINCT FROM 'open'
    OR EXISTS (SELECT 1 FROM observations WHERE inspection_id = NEW.inspection_id) THEN
    RAISE EXCEPTION USING MESSAGE = 'the scope of an inspection is fixed when it starts: a plane cannot be added once it has observations or is finalised; start a new inspection';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER inspection_scope_only_while_starting BEFORE INSERT ON inspection_scope FOR EACH ROW EXECUTE FUNCTION inspection_scope_only_while_starting();

-- PostgreSQL dialect of db-migrations/V10__frame_member_repairs.sql: the same version, description and rules, the same
-- messages (PL/pgSQL RAISE EXCEPTION in place of SQLite's RAISE(ABORT, ...)). Never edit once released.

-- Repair actions on frame members (ledgers and standards; racking: beams, frame horizontals and
-- uprights): "refit the ledger at level 3, bay 2", "replace the standard of lift 1 on line 2".
--
-- A repair action names a panel (lift, bay), a frame member (frame_type, frame_first,
-- frame_second: the names, meanings and CHECKs of V9's observations, as core.model.FrameRef), or
-- neither (the whole plane); never a panel and a frame member together. An action on a frame
-- member is 'repair', 'replace' or the new 'refit' (put back a design member found missing) and
-- names no diagonal; 'refit' is only for a frame member.
--
-- SQLite cannot alter a CHECK, so repair_actions is rebuilt: its rows are copied with every id
-- kept into repair_actions_v10, the old table is dropped (nothing refers to it by foreign key;
-- its index and triggers go with it), the new one takes the old name, and the index and every
-- trigger of V3 on it are made again as they were (the update guard now also holds the frame
-- columns), plus a check that a frame member lies inside its plane. This runs in Flyway's one
-- transaction with foreign keys on.
--
-- Trigger messages are literal text (SQLite 3.31+ must parse this file); the program adds the
-- ids when it translates them (store.SqlErrors). Never edit this file once released: add a new
-- migration instead (see DEVELOPERS.md).

DROP TRIGGER repair_actions_never_go ON repair_actions;
DROP TRIGGER repair_actions_never_overwritten ON repair_actions;
DROP TRIGGER repair_actions_only_done_then_verified ON repair_actions;
DROP TRIGGER repair_actions_stored_trimmed ON repair_actions;
DROP TRIGGER repair_actions_done_by_trimmed ON repair_actions;
DROP INDEX repair_actions_by_order;

-- PostgreSQL changes the table in place: no rebuild, ids and their identity sequence stay.
-- V1's check of the action's values gives way to one with 'refit' (found by what it says: its
-- name is PostgreSQL's choice).
DO $$
DECLARE
  doomed TEXT;
BEGIN
  SELECT conname INTO STRICT doomed FROM pg_constraint
  WHERE conrelid = 'repair_actions'::regclass AND contype = 'c'
    AND pg_get_constraintdef(oid) LIKE '%take-out-of-service%';
  EXECUTE format('ALTER TABLE repair_actions DROP CONSTRAINT %I', doomed);
END $$;
ALTER TABLE repair_actions ADD CHECK (action IN ('repair', 'replace', 'brace',
  'take-out-of-service', 'refit'));
ALTER TABLE repair_actions ADD COLUMN frame_type TEXT CHECK (frame_type IN ('ledger', 'standard'));
ALTER TABLE repair_actions ADD COLUMN frame_first BIGINT CHECK (frame_first >= 0);
ALTER TABLE repair_actions ADD COLUMN frame_second BIGINT CHECK (frame_second >= 0);
-- a frame member as V9 names it on observations: type and two numbers, all or none
ALTER TABLE repair_actions ADD CHECK ((frame_type IS NULL) = (frame_first IS NULL)
     AND (frame_type IS NULL) = (frame_second IS NULL));
ALTER TABLE repair_actions ADD CHECK (frame_type IS DISTINCT FROM 'ledger' OR frame_second >= 1);
ALTER TABLE repair_actions ADD CHECK (frame_type IS DISTINCT FROM 'standard' OR frame_first >= 1);
-- a panel, a frame member, or neither (the whole plane); never both
ALTER TABLE repair_actions ADD CHECK (lift IS NULL OR frame_type IS NULL);
-- an action on a frame member names no diagonal and is repair, replace or refit
ALTER TABLE repair_actions ADD CHECK (frame_type IS NULL OR brace_diagonal IS NULL);
ALTER TABLE repair_actions ADD CHECK (frame_type IS NULL OR action IN ('repair', 'replace', 'refit'));
-- refit puts back a frame member
ALTER TABLE repair_actions ADD CHECK (action <> 'refit' OR frame_type IS NOT NULL);

CREATE INDEX repair_actions_by_order ON repair_actions (order_id);

-- ---- the triggers of V3, as they were (the update guard also holds the frame columns) ----------

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
    OR NEW.frame_type IS DISTINCT FROM OLD.frame_type OR NEW.frame_first IS DISTINCT FROM OLD.frame_first
    OR NEW.frame_second IS DISTINCT FROM OLD.frame_second
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

-- ---- frame members: the new check --------------------------------------------------------------

-- ledger: level <= lifts, bay <= bays; standard: lift <= lifts, line <= bays
CREATE OR REPLACE FUNCTION repair_actions_frame_member_inside_the_plane() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.frame_type IS NOT NULL
    AND (NEW.frame_first > (SELECT lifts FROM planes WHERE id = NEW.plane_id)
    OR NEW.frame_second > (SELECT bays FROM planes WHERE id = NEW.plane_id)) THEN
    RAISE EXCEPTION USING MESSAGE = 'the frame member of the repair action lies outside the plane';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER repair_actions_frame_member_inside_the_plane BEFORE INSERT ON repair_actions FOR EACH ROW EXECUTE FUNCTION repair_actions_frame_member_inside_the_plane();

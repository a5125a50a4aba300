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

DROP TRIGGER repair_actions_never_go;
DROP TRIGGER repair_actions_never_overwritten;
DROP TRIGGER repair_actions_only_done_then_verified;
DROP TRIGGER repair_actions_stored_trimmed;
DROP TRIGGER repair_actions_done_by_trimmed;
DROP INDEX repair_actions_by_order;

CREATE TABLE repair_actions_v10 (
  id                        INTEGER PRIMARY KEY,
  order_id                  INTEGER NOT NULL REFERENCES repair_orders (id),
  plane_id                  INTEGER NOT NULL REFERENCES planes (id),
  lift                      INTEGER CHECK (lift >= 1),
  bay                       INTEGER CHECK (bay >= 1),
  action                    TEXT NOT NULL
                            CHECK (action IN ('repair', 'replace', 'brace', 'take-out-of-service',
                                              'refit')),
  brace_diagonal            TEXT CHECK (brace_diagonal IN ('/', '\', 'X')),
  brace_kind                TEXT CHECK (brace_kind IN ('rigid', 'tension-only')),
  description               TEXT NOT NULL DEFAULT '',
  due_date                  TEXT,
  assignee                  TEXT NOT NULL DEFAULT '',
  done_at                   TEXT,
  done_by                   TEXT NOT NULL DEFAULT '',
  verified_by_inspection_id INTEGER REFERENCES inspections (id),
  frame_type                TEXT CHECK (frame_type IN ('ledger', 'standard')),
  frame_first               INTEGER CHECK (frame_first >= 0),
  frame_second              INTEGER CHECK (frame_second >= 0),
  CHECK ((lift IS NULL) = (bay IS NULL)),
  CHECK ((brace_diagonal IS NULL) = (brace_kind IS NULL)),
  CHECK (done_at IS NOT NULL OR done_by = ''),
  CHECK (verified_by_inspection_id IS NULL OR done_at IS NOT NULL),
  -- a frame member as V9 names it on observations: type and two numbers, all or none
  CHECK ((frame_type IS NULL) = (frame_first IS NULL)
     AND (frame_type IS NULL) = (frame_second IS NULL)),
  CHECK (frame_type IS NOT 'ledger' OR frame_second >= 1),
  CHECK (frame_type IS NOT 'standard' OR frame_first >= 1),
  -- a panel, a frame member, or neither (the whole plane); never both
  CHECK (lift IS NULL OR frame_type IS NULL),
  -- an action on a frame member names no diagonal and is repair, replace or refit
  CHECK (frame_type IS NULL OR brace_diagonal IS NULL),
  CHECK (frame_type IS NULL OR action IN ('repair', 'replace', 'refit')),
  -- refit puts back a frame member
  CHECK (action <> 'refit' OR frame_type IS NOT NULL)
);

INSERT INTO repair_actions_v10
  (id, order_id, plane_id, lift, bay, action, brace_diagonal, brace_kind, description, due_date,
   assignee, done_at, done_by, verified_by_inspection_id)
SELECT id, order_id, plane_id, lift, bay, action, brace_diagonal, brace_kind, description,
       due_date, assignee, done_at, done_by, verified_by_inspection_id
FROM repair_actions ORDER BY id;

DROP TABLE repair_actions;

ALTER TABLE repair_actions_v10 RENAME TO repair_actions;

CREATE INDEX repair_actions_by_order ON repair_actions (order_id);

-- ---- the triggers of V3, as they were (the update guard also holds the frame columns) ----------

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
  OR NEW.frame_type IS NOT OLD.frame_type OR NEW.frame_first IS NOT OLD.frame_first
  OR NEW.frame_second IS NOT OLD.frame_second
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

-- ---- frame members: the new check --------------------------------------------------------------

-- ledger: level <= lifts, bay <= bays; standard: lift <= lifts, line <= bays
CREATE TRIGGER repair_actions_frame_member_inside_the_plane BEFORE INSERT ON repair_actions
WHEN NEW.frame_type IS NOT NULL
 AND (NEW.frame_first > (SELECT lifts FROM planes WHERE id = NEW.plane_id)
   OR NEW.frame_second > (SELECT bays FROM planes WHERE id = NEW.plane_id))
BEGIN
  SELECT RAISE(ABORT, 'the frame member of the repair action lies outside the plane');
END;

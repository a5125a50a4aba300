-- PostgreSQL dialect of db-migrations/V7__inspection_scope.sql: the same version, description and rules, the same
-- messages (PL/pgSQL RAISE EXCEPTION in place of SQLite's RAISE(ABORT, ...)). Never edit once released.

-- An inspection's scope is fixed when it starts: the planes it covers and, for each, the design
-- revision it is checked against. Analysis, report, repair order, history, export and
-- verify-report of an inspection read this table and nothing else, so a plane added to the
-- structure or a design revised later leaves what an inspection was, and what its issued
-- documents rest on, as it was.
--
-- The program writes the scope in the transaction that starts the inspection (the planes of the
-- structure not retired, each with its highest-numbered revision). A plane with no design
-- revision cannot be analysed and is left out.
--
-- Inspections already in the file are given the scope they had (a plane's birth is the time its
-- first design revision was recorded: a plane and its revision 1 are stored together):
--  * planes: those of the structure not retired at or before the inspection's start that were
--    born by its start; and any plane it has an observation or repair action of; and, for an
--    inspection with documents issued, the planes born by its last issue (the issued documents
--    were made from them, and must keep verifying);
--  * revision of a finalised inspection: the rule its documents were issued under, unchanged:
--    the highest-numbered revision recorded at or before its finish, else revision 1;
--  * revision of an open inspection: the highest-numbered revision now.
--
-- The scope is append-only: rows are never changed or removed, never replaced, and only written
-- while the inspection has no observation and is open. Messages are literal text (SQLite 3.31+
-- must parse this file); the program adds the ids when it translates them.
-- Never edit this file once released: add a new migration instead (see DEVELOPERS.md).

CREATE TABLE inspection_scope (
  inspection_id      BIGINT NOT NULL REFERENCES inspections (id),
  plane_id           BIGINT NOT NULL REFERENCES planes (id),
  design_revision_id BIGINT NOT NULL REFERENCES design_revisions (id),
  PRIMARY KEY (inspection_id, plane_id)
);

INSERT INTO inspection_scope (inspection_id, plane_id, design_revision_id)
SELECT i.id, p.id,
       CASE WHEN i.status = 'finalised' THEN
         COALESCE((SELECT d.id FROM design_revisions d
                   WHERE d.plane_id = p.id AND d.recorded_at <= i.finished_at
                   ORDER BY d.number DESC LIMIT 1),
                  (SELECT d.id FROM design_revisions d WHERE d.plane_id = p.id
                   ORDER BY d.number LIMIT 1))
       ELSE
         (SELECT d.id FROM design_revisions d WHERE d.plane_id = p.id
          ORDER BY d.number DESC LIMIT 1)
       END
FROM inspections i
JOIN planes p ON p.structure_id = i.structure_id
WHERE EXISTS (SELECT 1 FROM design_revisions d WHERE d.plane_id = p.id)
  AND (EXISTS (SELECT 1 FROM observations o WHERE o.inspection_id = i.id AND o.plane_id = p.id)
    OR EXISTS (SELECT 1 FROM repair_actions a JOIN repair_orders r ON r.id = a.order_id
               WHERE r.inspection_id = i.id AND a.plane_id = p.id)
    OR (NOT EXISTS (SELECT 1 FROM plane_retirements t
                    WHERE t.plane_id = p.id AND t.retired_at <= i.started_at)
        AND (SELECT min(d.recorded_at) FROM design_revisions d WHERE d.plane_id = p.id)
            <= GREATEST(i.started_at,
                   COALESCE((SELECT max(r.issued_at) FROM issued_reports r
                             WHERE r.inspection_id = i.id), i.started_at))));

CREATE OR REPLACE FUNCTION inspection_scope_never_changes() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION USING MESSAGE = 'the scope of an inspection cannot be changed: it is fixed when the inspection starts; start a new inspection';
  RETURN NEW;
END $$;
CREATE TRIGGER inspection_scope_never_changes BEFORE UPDATE ON inspection_scope FOR EACH ROW EXECUTE FUNCTION inspection_scope_never_changes();

CREATE OR REPLACE FUNCTION inspection_scope_never_goes() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION USING MESSAGE = 'the scope of an inspection cannot be changed: it is fixed when the inspection starts; start a new inspection';
  RETURN OLD;
END $$;
CREATE TRIGGER inspection_scope_never_goes BEFORE DELETE ON inspection_scope FOR EACH ROW EXECUTE FUNCTION inspection_scope_never_goes();

CREATE OR REPLACE FUNCTION inspection_scope_never_overwritten() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF EXISTS (SELECT 1 FROM inspection_scope
    WHERE inspection_id = NEW.inspection_id AND plane_id = NEW.plane_id) THEN
    RAISE EXCEPTION USING MESSAGE = 'the plane is already in the scope of the inspection: records are never overwritten; the scope is fixed when the inspection starts';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER inspection_scope_never_overwritten BEFORE INSERT ON inspection_scope FOR EACH ROW EXECUTE FUNCTION inspection_scope_never_overwritten();

CREATE OR REPLACE FUNCTION inspection_scope_only_while_starting() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF (SELECT status FROM inspections WHERE id = NEW.inspection_id) IS DISTINCT FROM 'open'
    OR EXISTS (SELECT 1 FROM observations WHERE inspection_id = NEW.inspection_id) THEN
    RAISE EXCEPTION USING MESSAGE = 'the scope of an inspection is fixed when it starts: a plane cannot be added once it has observations or is finalised; start a new inspection';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER inspection_scope_only_while_starting BEFORE INSERT ON inspection_scope FOR EACH ROW EXECUTE FUNCTION inspection_scope_only_while_starting();

CREATE OR REPLACE FUNCTION inspection_scope_of_the_inspected_structure() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF (SELECT structure_id FROM planes WHERE id = NEW.plane_id)
    IS DISTINCT FROM (SELECT structure_id FROM inspections WHERE id = NEW.inspection_id)
    OR (SELECT plane_id FROM design_revisions WHERE id = NEW.design_revision_id)
    IS DISTINCT FROM NEW.plane_id THEN
    RAISE EXCEPTION USING MESSAGE = 'the scope of an inspection holds planes of its structure, each with a design revision of that plane';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER inspection_scope_of_the_inspected_structure BEFORE INSERT ON inspection_scope FOR EACH ROW EXECUTE FUNCTION inspection_scope_of_the_inspected_structure();

-- An observation is of a plane the inspection covers. (A plane retired before the inspection
-- started is refused by observations_not_into_retired_planes of V6, with its own message.)
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

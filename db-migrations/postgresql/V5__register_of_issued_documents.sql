-- PostgreSQL dialect of db-migrations/V5__register_of_issued_documents.sql: the same version, description and rules, the same
-- messages (PL/pgSQL RAISE EXCEPTION in place of SQLite's RAISE(ABORT, ...)). Never edit once released.

-- The register of issued documents: every report and repair order (PDF, and the CSV when one is
-- written) is registered with the SHA-256 of its exact bytes as written to disk (column
-- fingerprint, as in V1), its kind, the inspection, the fingerprint of the records it was made
-- from, and when it was issued. verify-report accepts a document only when its bytes are those
-- of a registered copy, its stamp names that same registered document, and the records still give
-- the registered fingerprint.
--
-- Rows from before this migration keep kind 'inspection-report' (only reports were registered
-- then), have no records fingerprint and origin 'before-register'. Rows brought in by a site-file
-- import have origin 'imported': another database issued them, so they never vouch for a file.
--
-- The register is append-only for any program that writes to the file: the triggers below refuse
-- UPDATE, DELETE and an INSERT that would replace a row (INSERT OR REPLACE / REPLACE INTO with an
-- id already used). Messages are literal text (SQLite 3.31+ must parse this file); the program
-- adds ids when it translates them.
-- Never edit this file once released: add a new migration instead (see DEVELOPERS.md).

ALTER TABLE issued_reports ADD COLUMN kind TEXT NOT NULL DEFAULT 'inspection-report'
  CHECK (kind IN ('inspection-report', 'repair-order', 'repair-order-csv'));

ALTER TABLE issued_reports ADD COLUMN records_fingerprint TEXT
  CHECK (records_fingerprint IS NULL
    OR (length(records_fingerprint) = 64 AND records_fingerprint !~ '[^0-9a-f]'));

ALTER TABLE issued_reports ADD COLUMN origin TEXT NOT NULL DEFAULT 'before-register'
  CHECK (origin IN ('issued', 'imported', 'before-register'));

CREATE INDEX issued_reports_by_bytes ON issued_reports (fingerprint);

CREATE OR REPLACE FUNCTION issued_reports_never_change() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION USING MESSAGE = 'the register of issued documents is append-only: a registered document cannot be changed; issue a new one';
  RETURN NEW;
END $$;
CREATE TRIGGER issued_reports_never_change BEFORE UPDATE ON issued_reports FOR EACH ROW EXECUTE FUNCTION issued_reports_never_change();

CREATE OR REPLACE FUNCTION issued_reports_never_go() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION USING MESSAGE = 'the register of issued documents is append-only: a registered document cannot be deleted';
  RETURN OLD;
END $$;
CREATE TRIGGER issued_reports_never_go BEFORE DELETE ON issued_reports FOR EACH ROW EXECUTE FUNCTION issued_reports_never_go();

CREATE OR REPLACE FUNCTION issued_reports_never_replaced() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF EXISTS (SELECT 1 FROM issued_reports WHERE id = NEW.id) THEN
    RAISE EXCEPTION USING MESSAGE = 'the register of issued documents is append-only: a registered document cannot be replaced; issue a new one';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER issued_reports_never_replaced BEFORE INSERT ON issued_reports FOR EACH ROW EXECUTE FUNCTION issued_reports_never_replaced();

CREATE OR REPLACE FUNCTION issued_reports_issued_complete() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.origin = 'issued' AND NEW.records_fingerprint IS NULL THEN
    RAISE EXCEPTION USING MESSAGE = 'an issued document must be registered with the fingerprint of its records';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER issued_reports_issued_complete BEFORE INSERT ON issued_reports FOR EACH ROW EXECUTE FUNCTION issued_reports_issued_complete();

CREATE OR REPLACE FUNCTION issued_reports_none_before_the_register() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.origin = 'before-register' THEN
    RAISE EXCEPTION USING MESSAGE = 'a document cannot be registered as issued before the register: only rows already there have that origin';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER issued_reports_none_before_the_register BEFORE INSERT ON issued_reports FOR EACH ROW EXECUTE FUNCTION issued_reports_none_before_the_register();

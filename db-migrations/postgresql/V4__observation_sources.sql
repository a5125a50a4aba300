-- PostgreSQL dialect of db-migrations/V4__observation_sources.sql: the same version, description and rules, the same
-- messages (PL/pgSQL RAISE EXCEPTION in place of SQLite's RAISE(ABORT, ...)). Never edit once released.

-- Where an observation recorded from a file came from: the file's content (SHA-256 of its text
-- as UTF-8) and the line its row starts on. A re-run of the same file into the same inspection
-- finds its rows here and records none of them twice, whatever interrupted the earlier run.
-- Written in the same transaction as the observation it names. Append-only, like observations.
-- Trigger messages are literal text (SQLite before 3.47 parses nothing else in RAISE); the
-- program adds the ids when it reports them.

CREATE TABLE observation_sources (
  inspection_id  BIGINT NOT NULL REFERENCES inspections (id),
  source_sha256  TEXT NOT NULL CHECK (length(source_sha256) = 64),
  line           BIGINT NOT NULL CHECK (line >= 1),
  observation_id BIGINT NOT NULL UNIQUE REFERENCES observations (id),
  PRIMARY KEY (inspection_id, source_sha256, line)
);

-- Refuses a second row for a line or an observation before any conflict resolution runs: an
-- INSERT OR REPLACE would otherwise delete the first row without firing a delete trigger.
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

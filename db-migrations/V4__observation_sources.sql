-- Where an observation recorded from a file came from: the file's content (SHA-256 of its text
-- as UTF-8) and the line its row starts on. A re-run of the same file into the same inspection
-- finds its rows here and records none of them twice, whatever interrupted the earlier run.
-- Written in the same transaction as the observation it names. Append-only, like observations.
-- Trigger messages are literal text (SQLite before 3.47 parses nothing else in RAISE); the
-- program adds the ids when it reports them.

CREATE TABLE observation_sources (
  inspection_id  INTEGER NOT NULL REFERENCES inspections (id),
  source_sha256  TEXT NOT NULL CHECK (length(source_sha256) = 64),
  line           INTEGER NOT NULL CHECK (line >= 1),
  observation_id INTEGER NOT NULL UNIQUE REFERENCES observations (id),
  PRIMARY KEY (inspection_id, source_sha256, line)
) WITHOUT ROWID;

-- Refuses a second row for a line or an observation before any conflict resolution runs: an
-- INSERT OR REPLACE would otherwise delete the first row without firing a delete trigger.
CREATE TRIGGER observation_sources_never_replaced BEFORE INSERT ON observation_sources
WHEN EXISTS (SELECT 1 FROM observation_sources
             WHERE (inspection_id = NEW.inspection_id AND source_sha256 = NEW.source_sha256
                    AND line = NEW.line)
                OR observation_id = NEW.observation_id)
BEGIN
  SELECT RAISE(ABORT, 'this line of the file is already recorded in the inspection (observation sources are append-only); nothing was replaced');
END;

CREATE TRIGGER observation_sources_of_the_same_inspection BEFORE INSERT ON observation_sources
WHEN (SELECT inspection_id FROM observations WHERE id = NEW.observation_id)
     IS NOT NEW.inspection_id
BEGIN
  SELECT RAISE(ABORT, 'the observation named as recorded from the file is not an observation of that inspection');
END;

CREATE TRIGGER observation_sources_never_change BEFORE UPDATE ON observation_sources
BEGIN
  SELECT RAISE(ABORT, 'where an observation was recorded from cannot be changed (observation sources are append-only)');
END;

CREATE TRIGGER observation_sources_never_go BEFORE DELETE ON observation_sources
BEGIN
  SELECT RAISE(ABORT, 'where an observation was recorded from cannot be deleted (observation sources are append-only)');
END;

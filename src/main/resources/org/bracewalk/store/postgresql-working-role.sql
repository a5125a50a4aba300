-- The least grants of Bracewalk's working role on a migrated database (README, "A team server:
-- PostgreSQL"). Run as the migration role (the owner of the tables) after the first migration and
-- after every upgrade that adds a table. :working is the working role's name (psql -v).
-- The working role reads everything and adds records. It updates only the tables where a record
-- legitimately changes (an open inspection is finalised; a structure's inspection interval; a
-- repair action is done, then verified); the server's triggers refuse every other change there,
-- whoever asks. It never deletes, truncates, alters or drops: it owns nothing.
GRANT USAGE ON SCHEMA public TO :working;
GRANT SELECT, INSERT ON ALL TABLES IN SCHEMA public TO :working;
REVOKE INSERT ON flyway_schema_history FROM :working;
GRANT UPDATE ON inspections, structures, repair_actions TO :working;
GRANT USAGE ON ALL SEQUENCES IN SCHEMA public TO :working;

-- PostgreSQL dialect of db-migrations/V8__plane_role.sql: the same version, description and rules, the same
-- messages (PL/pgSQL RAISE EXCEPTION in place of SQLite's RAISE(ABORT, ...)). Never edit once released.

-- What each plane is in its structure: an upright frame, a spine, a facade, a transverse frame,
-- plan bracing or other. The verdict's keep-off zone depends on it: a racking upright frame's
-- zone takes in the beam bays on both sides of it.
--
-- Planes never change once stored (V3's planes_never_change), so the role is set when the plane
-- is created. Planes stored before this migration are 'other': nothing in the file says what
-- they are, and a migration does not guess (a plane's name is free text). A plane of another
-- role is created anew (and the old one retired) where that matters.

ALTER TABLE planes ADD COLUMN role TEXT NOT NULL DEFAULT 'other'
  CHECK (role IN ('upright-frame', 'spine', 'facade', 'transverse-frame', 'plan-bracing', 'other'));

-- PostgreSQL dialect of db-migrations/V2__planes_never_change.sql: the same version, description and rules, the same
-- messages (PL/pgSQL RAISE EXCEPTION in place of SQLite's RAISE(ABORT, ...)). Never edit once released.

-- A plane's grid (lifts, bays, support, widths, heights) is fixed once stored: its design
-- revisions and every observation refer to its panels. A different grid is a new plane.
-- (The store also keeps planes in memory once read, which relies on this.)

CREATE OR REPLACE FUNCTION planes_never_change() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION USING MESSAGE = 'plane ' || OLD.id || ' (' || OLD.name
    || ') cannot be changed: its designs and observations refer to its grid; create a new plane';
  RETURN NEW;
END $$;
CREATE TRIGGER planes_never_change BEFORE UPDATE ON planes FOR EACH ROW EXECUTE FUNCTION planes_never_change();

CREATE OR REPLACE FUNCTION planes_never_go() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION USING MESSAGE = 'plane ' || OLD.id || ' (' || OLD.name || ') cannot be deleted';
  RETURN OLD;
END $$;
CREATE TRIGGER planes_never_go BEFORE DELETE ON planes FOR EACH ROW EXECUTE FUNCTION planes_never_go();

CREATE OR REPLACE FUNCTION plane_widths_never_change() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION USING MESSAGE = 'the bay widths of plane ' || OLD.plane_id || ' cannot be changed';
  RETURN NEW;
END $$;
CREATE TRIGGER plane_widths_never_change BEFORE UPDATE ON plane_bay_widths FOR EACH ROW EXECUTE FUNCTION plane_widths_never_change();

CREATE OR REPLACE FUNCTION plane_widths_never_go() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION USING MESSAGE = 'the bay widths of plane ' || OLD.plane_id || ' cannot be changed';
  RETURN OLD;
END $$;
CREATE TRIGGER plane_widths_never_go BEFORE DELETE ON plane_bay_widths FOR EACH ROW EXECUTE FUNCTION plane_widths_never_go();

CREATE OR REPLACE FUNCTION plane_heights_never_change() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION USING MESSAGE = 'the lift heights of plane ' || OLD.plane_id || ' cannot be changed';
  RETURN NEW;
END $$;
CREATE TRIGGER plane_heights_never_change BEFORE UPDATE ON plane_lift_heights FOR EACH ROW EXECUTE FUNCTION plane_heights_never_change();

CREATE OR REPLACE FUNCTION plane_heights_never_go() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION USING MESSAGE = 'the lift heights of plane ' || OLD.plane_id || ' cannot be changed';
  RETURN OLD;
END $$;
CREATE TRIGGER plane_heights_never_go BEFORE DELETE ON plane_lift_heights FOR EACH ROW EXECUTE FUNCTION plane_heights_never_go();

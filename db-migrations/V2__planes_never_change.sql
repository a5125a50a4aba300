-- A plane's grid (lifts, bays, support, widths, heights) is fixed once stored: its design
-- revisions and every observation refer to its panels. A different grid is a new plane.
-- (The store also keeps planes in memory once read, which relies on this.)

CREATE TRIGGER planes_never_change BEFORE UPDATE ON planes
BEGIN
  SELECT RAISE(ABORT, 'plane ' || OLD.id || ' (' || OLD.name
    || ') cannot be changed: its designs and observations refer to its grid; create a new plane');
END;

CREATE TRIGGER planes_never_go BEFORE DELETE ON planes
BEGIN
  SELECT RAISE(ABORT, 'plane ' || OLD.id || ' (' || OLD.name || ') cannot be deleted');
END;

CREATE TRIGGER plane_widths_never_change BEFORE UPDATE ON plane_bay_widths
BEGIN
  SELECT RAISE(ABORT, 'the bay widths of plane ' || OLD.plane_id || ' cannot be changed');
END;

CREATE TRIGGER plane_widths_never_go BEFORE DELETE ON plane_bay_widths
BEGIN
  SELECT RAISE(ABORT, 'the bay widths of plane ' || OLD.plane_id || ' cannot be changed');
END;

CREATE TRIGGER plane_heights_never_change BEFORE UPDATE ON plane_lift_heights
BEGIN
  SELECT RAISE(ABORT, 'the lift heights of plane ' || OLD.plane_id || ' cannot be changed');
END;

CREATE TRIGGER plane_heights_never_go BEFORE DELETE ON plane_lift_heights
BEGIN
  SELECT RAISE(ABORT, 'the lift heights of plane ' || OLD.plane_id || ' cannot be changed');
END;

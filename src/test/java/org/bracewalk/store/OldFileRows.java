package org.bracewalk.store;

import java.util.Arrays;

/**
 * Rows that the migration tests write into files of an older schema (raw SQL, ids given; the old
 * schemas never change, so neither do these): one site, a racking run, its upright frame 4 (2
 * lifts x 1 bay, pinned base), the frame's design ({@code /} in lift 1, {@code \} in lift 2) and
 * an inspection of it after an impact, started with the frame in scope. Valid in files of V8 and
 * later.
 */
final class OldFileRows {
  private static final String[] ONE_FRAME_INSPECTED = {
    "INSERT INTO sites (id, name, time_zone, display_units) VALUES (1, 'Depot', 'UTC', 'metric')",
    "INSERT INTO structures (id, site_id, name, kind) VALUES (1, 1, 'Run A', 'racking-run')",
    "INSERT INTO planes (id, structure_id, name, lifts, bays, support, role)"
        + " VALUES (1, 1, 'frame 4', 2, 1, 'pinned-base', 'upright-frame')",
    "INSERT INTO plane_bay_widths VALUES (1, 1, 1000)",
    "INSERT INTO plane_lift_heights VALUES (1, 1, 1500), (1, 2, 1500)",
    "INSERT INTO design_revisions (id, plane_id, number, design_date, recorded_at, panel_count)"
        + " VALUES (1, 1, 1, '2025-01-01', '2025-01-01T00:00:00.000Z', 2)",
    "INSERT INTO design_panels VALUES (1, 1, 1, '/', 'rigid', 0), (1, 2, 1, '\\', 'rigid', 0)",
    "INSERT INTO inspections (id, structure_id, started_at, inspector_name, reason)"
        + " VALUES (1, 1, '2025-02-01T08:00:00.000Z', 'M. Okafor', 'after-impact')",
    "INSERT INTO inspection_scope VALUES (1, 1, 1)",
  };

  private OldFileRows() {}

  /** Those rows, then {@code more}. */
  static String[] oneFrameInspected(String... more) {
    String[] all = Arrays.copyOf(ONE_FRAME_INSPECTED, ONE_FRAME_INSPECTED.length + more.length);
    System.arraycopy(more, 0, all, ONE_FRAME_INSPECTED.length, more.length);
    return all;
  }
}

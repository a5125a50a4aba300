package org.bracewalk.report;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.port.report.PlaneSection;

/**
 * The scale of each plane's elevation: a standard scale ({@link ElevationDrawing#SCALES}), the
 * same for planes that are alike, so they can be compared by eye. Planes are alike when they have
 * the same role and the same grid: as many lifts and bays, and the same overall width and height
 * to the centimetre (the upright frames of a racking run, the facades of one scaffold). Each group
 * is drawn at the smallest of the scales its planes would take alone, so every one of them fits.
 */
final class PlaneScales {
  private PlaneScales() {}

  /**
   * @param planes the planes drawn at full size
   * @param alone the scale (n of 1:n) each plane, by name, would take on its own
   * @return the scale to draw each plane at, by name
   */
  static Map<String, Integer> common(List<PlaneSection> planes, Map<String, Integer> alone) {
    Map<String, Integer> group = new HashMap<>();
    for (PlaneSection p : planes) {
      group.merge(key(p), alone.get(p.name()), Math::max);
    }
    Map<String, Integer> out = new HashMap<>();
    for (PlaneSection p : planes) {
      out.put(p.name(), group.get(key(p)));
    }
    return out;
  }

  /** What makes two planes alike. */
  static String key(PlaneSection p) {
    PlaneGrid g = p.design().grid();
    return p.role().label() + "|" + g.lifts() + "x" + g.bays() + "|"
        + Math.round(ElevationDrawing.widthOf(g) * 100) + "x"
        + Math.round(ElevationDrawing.heightOf(g) * 100);
  }
}

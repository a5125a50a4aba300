package org.bracewalk.core.model;

import java.util.ArrayList;
import java.util.List;

/**
 * Lengths are stored as whole millimetres; the engine works in metres. These conversions are the
 * one place where the rounding happens, so a grid read back from the store equals the one stored.
 */
public final class Millimetres {
  private Millimetres() {}

  /** Metres to whole millimetres, rounded half up. */
  public static int fromMetres(double metres) {
    long mm = Math.round(metres * 1000.0);
    if (mm < 1 || mm > Integer.MAX_VALUE) {
      throw new IllegalArgumentException(
          "length " + metres + " m is not a positive whole number of millimetres");
    }
    return (int) mm;
  }

  public static double toMetres(int millimetres) {
    return millimetres / 1000.0;
  }

  /** The grid with every width and height rounded to whole millimetres. */
  public static PlaneGrid round(PlaneGrid grid) {
    return new PlaneGrid(
        grid.lifts(), grid.bays(), roundAll(grid.bayWidths()), roundAll(grid.liftHeights()),
        grid.support());
  }

  /** The design on the rounded grid. */
  public static PlaneDesign round(PlaneDesign design) {
    return design.withGrid(round(design.grid()));
  }

  public static List<Integer> toMillimetres(List<Double> metres) {
    List<Integer> out = new ArrayList<>(metres.size());
    for (double m : metres) {
      out.add(fromMetres(m));
    }
    return out;
  }

  public static List<Double> toMetres(List<Integer> millimetres) {
    List<Double> out = new ArrayList<>(millimetres.size());
    for (int mm : millimetres) {
      out.add(toMetres(mm));
    }
    return out;
  }

  private static List<Double> roundAll(List<Double> metres) {
    return toMetres(toMillimetres(metres));
  }
}

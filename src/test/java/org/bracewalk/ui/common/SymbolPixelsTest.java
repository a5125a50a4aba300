package org.bracewalk.ui.common;

import static org.assertj.core.api.Assertions.assertThat;

import javafx.scene.canvas.Canvas;
import javafx.scene.image.WritableImage;
import javafx.scene.paint.Color;
import org.bracewalk.bench.HeadlessFx;
import org.junit.jupiter.api.Test;

/**
 * The app draws each symbol in the shape {@link org.bracewalk.core.symbol.Symbol} gives it: read
 * back from the pixels, a diamond is dark at its centre and light at the corners of its bounding
 * square (where a square would be dark); a dot likewise; a star is dark along its spokes only.
 */
class SymbolPixelsTest {
  @Test
  void criticalIsADiamondLooseEndADotChangedAStar() {
    HeadlessFx.start();
    double[] diamond = HeadlessFx.onFx(() -> probe(g -> PlanePainter.diamond(g, 40, 40, 16)));
    assertThat(diamond[0]).as("diamond centre").isLessThan(0.2);
    assertThat(diamond[1]).as("corner of the diamond's square").isGreaterThan(0.8);
    double[] dot = HeadlessFx.onFx(() -> probe(g -> PlanePainter.looseEnd(g, 40, 40)));
    assertThat(dot[0]).as("dot centre").isLessThan(0.2);
    assertThat(dot[2]).as("corner of the dot's square").isGreaterThan(0.8);
    double[] star = HeadlessFx.onFx(() -> probe(g -> PlanePainter.star(g, 40, 40, 16)));
    assertThat(star[3]).as("on the star's upright spoke").isLessThan(0.7);
    assertThat(star[1]).as("between the spokes").isGreaterThan(0.8);
  }

  @Test
  void notInspectedIsARingAndNotReachableABox() {
    // issue 12, item 13: the two were both a "?" on the page; in the app the box's left side
    // runs through the middle of its left edge, where the ring (wider, round) leaves white fill
    HeadlessFx.start();
    double[] sides = HeadlessFx.onFx(() -> {
      double[] out = new double[2];
      int k = 0;
      for (org.bracewalk.core.symbol.Symbol s : new org.bracewalk.core.symbol.Symbol[] {
          org.bracewalk.core.symbol.Symbol.STATE_NOT_REACHABLE,
          org.bracewalk.core.symbol.Symbol.STATE_NOT_INSPECTED}) {
        Canvas c = new Canvas(80, 80);
        var g = c.getGraphicsContext2D();
        g.setFill(Color.WHITE);
        g.fillRect(0, 0, 80, 80);
        PlanePainter.stateMark(g, 30.5, 30.5, 20, s, Color.BLACK, false);
        out[k++] = c.snapshot(null, null).getPixelReader().getColor(30, 40).getBrightness();
      }
      return out;
    });
    assertThat(sides[0]).as("left side of the R box").isLessThan(0.5);
    assertThat(sides[1]).as("inside the ? ring at the same place").isGreaterThan(0.9);
  }

  /** Brightness at the centre, at (+11, +11), (+5.5, +5.5) and (0, -12) of a white canvas. */
  private static double[] probe(java.util.function.Consumer<javafx.scene.canvas.GraphicsContext> draw) {
    Canvas c = new Canvas(80, 80);
    var g = c.getGraphicsContext2D();
    g.setFill(Color.WHITE);
    g.fillRect(0, 0, 80, 80);
    draw.accept(g);
    WritableImage img = c.snapshot(null, null);
    var px = img.getPixelReader();
    return new double[] {px.getColor(40, 40).getBrightness(), px.getColor(51, 51).getBrightness(),
        px.getColor(45, 45).getBrightness(), px.getColor(40, 28).getBrightness()};
  }
}

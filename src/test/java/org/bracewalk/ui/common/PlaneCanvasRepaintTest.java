package org.bracewalk.ui.common;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import javafx.scene.image.PixelReader;
import javafx.scene.image.WritableImage;
import org.bracewalk.bench.HeadlessFx;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.PanelFinding;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.junit.jupiter.api.Test;

/** Repainting only the panels that changed must leave the same picture as drawing it all again. */
class PlaneCanvasRepaintTest {

  @Test
  void aPartialRepaintAfterMarksAndCursorMovesLooksLikeAFullRedraw() {
    HeadlessFx.start();
    int[] result = HeadlessFx.onFx(() -> {
      Map<PanelRef, Brace> braces = new HashMap<>();
      for (int i = 1; i <= 4; i++) {
        braces.put(PanelRef.of(i, 1), Brace.rigid(Diagonal.RISING));
        braces.put(PanelRef.of(i, 4), Brace.rigid(Diagonal.FALLING));
        braces.put(PanelRef.of(i, 6), Brace.rigid(Diagonal.BOTH));
        // rods: rings at both ends, drawn in the state's colour in either way of painting
        braces.put(PanelRef.of(i, 2), Brace.tension(Diagonal.RISING));
        braces.put(PanelRef.of(i, 5), Brace.tension(Diagonal.BOTH));
      }
      PlaneDesign d = new PlaneDesign(PlaneGrid.uniform(4, 6, Support.PINNED_BASE), braces, Set.of(PanelRef.of(1, 3)));
      PlaneCanvas incremental = new PlaneCanvas();
      incremental.resize(700, 420);
      incremental.layout();
      Map<PanelRef, PanelFinding> f = new HashMap<>();
      Random rnd = new Random(7);
      PanelState[] states = {PanelState.SOUND, PanelState.MISSING, PanelState.DAMAGED_EFFECTIVE, PanelState.NOT_REACHABLE,
          PanelState.DAMAGED_INEFFECTIVE};
      PanelRef cursor = PanelRef.of(1, 1);
      int partial = 0;
      for (int k = 0; k < 40; k++) {
        PanelRef p = PanelRef.of(1 + rnd.nextInt(4), 1 + rnd.nextInt(6));
        f.put(p, PanelFinding.of(states[rnd.nextInt(states.length)]));
        cursor = PanelRef.of(1 + rnd.nextInt(4), 1 + rnd.nextInt(6));
        incremental.pictureProperty().set(
            new PlanePicture(d, Map.copyOf(f), true, List.of(), Set.of(), List.of(), Set.of(), cursor));
        if (incremental.lastPaintPartial()) {
          partial++;
        }
      }
      PlaneCanvas fresh = new PlaneCanvas();
      fresh.resize(700, 420);
      fresh.layout();
      fresh.pictureProperty().set(incremental.pictureProperty().get());
      WritableImage a = incremental.snapshot(null, null);
      WritableImage b = fresh.snapshot(null, null);
      PixelReader ra = a.getPixelReader();
      PixelReader rb = b.getPixelReader();
      int differ = 0;
      for (int y = 0; y < (int) a.getHeight(); y++) {
        for (int x = 0; x < (int) a.getWidth(); x++) {
          int pa = ra.getArgb(x, y);
          int pb = rb.getArgb(x, y);
          int dr = Math.abs(((pa >> 16) & 255) - ((pb >> 16) & 255));
          int dg = Math.abs(((pa >> 8) & 255) - ((pb >> 8) & 255));
          int db = Math.abs((pa & 255) - (pb & 255));
          if (dr + dg + db > 96) {
            differ++;
          }
        }
      }
      if (differ * 500 >= a.getWidth() * a.getHeight()) {
        // keep both pictures for a person to compare
        try {
          java.nio.file.Files.createDirectories(java.nio.file.Path.of("target"));
          javax.imageio.ImageIO.write(javafx.embed.swing.SwingFXUtils.fromFXImage(a, null), "png", new java.io.File("target/repaint-partial.png"));
          javax.imageio.ImageIO.write(javafx.embed.swing.SwingFXUtils.fromFXImage(b, null), "png", new java.io.File("target/repaint-full.png"));
        } catch (java.io.IOException e) {
          throw new java.io.UncheckedIOException(e);
        }
      }
      return new int[] {partial, differ, (int) (a.getWidth() * a.getHeight())};
    });
    assertThat(result[0]).as("partial repaints used").isGreaterThan(30);
    // anti-aliased edges drawn twice may darken a little; nothing may be missing or left behind
    assertThat(result[1]).as("pixels that differ clearly of %d", result[2]).isLessThan(result[2] / 500);
  }

  @Test
  void aRodsRingsTakeTheColourOfItsOwnStateNotOfThePanelDrawnBeforeIt() {
    HeadlessFx.start();
    int[] reddish = HeadlessFx.onFx(() -> {
      // bay 1: a rigid brace found missing (red); bay 2: a rod found sound (near black)
      PlaneDesign d = PlaneDesign.of(PlaneGrid.uniform(1, 2, Support.PINNED_BASE), Map.of(
          PanelRef.of(1, 1), Brace.rigid(Diagonal.RISING), PanelRef.of(1, 2), Brace.tension(Diagonal.RISING)));
      Map<PanelRef, PanelFinding> f = Map.of(PanelRef.of(1, 1), PanelFinding.of(PanelState.MISSING),
          PanelRef.of(1, 2), PanelFinding.of(PanelState.SOUND));
      javafx.scene.canvas.Canvas c = new javafx.scene.canvas.Canvas(400, 240);
      PlaneGeometry geo = PlanePainter.paint(c.getGraphicsContext2D(),
          new PlanePicture(d, f, true, List.of(), Set.of(), List.of(), Set.of(), null), 400, 240);
      PixelReader r = c.snapshot(null, null).getPixelReader();
      int count = 0;
      double inset = Math.min(4, Math.min(geo.panelWidth(PanelRef.of(1, 2)), geo.panelHeight(PanelRef.of(1, 2))) * 0.08);
      for (double[] seg : geo.members(PanelRef.of(1, 2), Diagonal.RISING, inset)) {
        for (int end = 0; end < 2; end++) {
          int cx = (int) Math.round(seg[2 * end]);
          int cy = (int) Math.round(seg[2 * end + 1]);
          for (int y = cy - 4; y <= cy + 4; y++) {
            for (int x = cx - 4; x <= cx + 4; x++) {
              int argb = r.getArgb(x, y);
              int red = (argb >> 16) & 255;
              int green = (argb >> 8) & 255;
              if (red > 140 && green < 90) {
                count++;
              }
            }
          }
        }
      }
      return new int[] {count};
    });
    assertThat(reddish[0]).as("alarm-red pixels around the sound rod's rings").isZero();
  }
}

package org.bracewalk.ui;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import javafx.scene.Node;
import org.bracewalk.ui.common.PlaneCanvas;
import org.bracewalk.ui.common.PlaneGeometry;
import org.bracewalk.ui.common.ScreenId;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * On every screen that draws a plane, at 1024 x 600 and 1280 x 800, every panel of the demo's
 * planes is drawn at least 44 px each way (WCAG 2.1 success criterion 2.5.5 "Target Size": 44 by
 * 44 CSS pixels).
 */
class PlaneTargetsOnScreensFxTest {
  private static ScreenRig rig;

  @BeforeAll
  static void demo() throws Exception {
    rig = ScreenRig.shared();
  }

  @AfterAll
  static void close() throws Exception {
    rig.close();
  }

  @Test
  void everyPanelIsATargetOnEveryScreenAndSize() throws Exception {
    Path out = Path.of("target", "screens-44");
    Files.createDirectories(out);
    for (double[] size : new double[][] {{1024, 600}, {1280, 800}}) {
      rig.window(size[0], size[1]);
      for (ScreenId id : new ScreenId[] {ScreenId.DESIGN, ScreenId.WALK, ScreenId.FINDINGS, ScreenId.HISTORY}) {
        rig.show(id);
        double smallest = ScreenRig.fx(() -> smallestPanel(rig));
        String name = id.name().toLowerCase() + "-" + (int) size[0] + "x" + (int) size[1];
        ScreenRig.fx(() -> {
          org.bracewalk.bench.ScreenPicture.write(rig.window.root(), size[0], size[1], out.resolve(name + ".png"),
              rig.services.outputs());
          return null;
        });
        assertThat(smallest).as(name).isGreaterThanOrEqualTo(PlaneCanvas.MIN_PANEL);
      }
    }
  }

  private static double smallestPanel(ScreenRig rig) {
    double s = Double.MAX_VALUE;
    int canvases = 0;
    for (Node n : rig.window.root().lookupAll(".plane-canvas")) {
      if (!(n instanceof PlaneCanvas c) || !n.isVisible() || c.geometry() == null) {
        continue;
      }
      canvases++;
      PlaneGeometry geo = c.geometry();
      for (int j = 1; j <= geo.grid().bays(); j++) {
        s = Math.min(s, geo.lineX(j) - geo.lineX(j - 1));
      }
      for (int i = 1; i <= geo.grid().lifts(); i++) {
        s = Math.min(s, geo.levelY(i - 1) - geo.levelY(i));
      }
    }
    assertThat(canvases).as("plane drawings on the screen").isPositive();
    return s;
  }
}

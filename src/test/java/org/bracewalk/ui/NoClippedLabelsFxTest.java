package org.bracewalk.ui;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javafx.scene.Node;
import javafx.scene.Parent;
import javafx.scene.control.Labeled;
import javafx.scene.text.Text;
import org.bracewalk.ui.common.ScreenId;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * No label is cut short: every screen, at window sizes 1024 x 600, 1280 x 800 and 1600 x 1000,
 * at the default text size, three steps of Ctrl+= and the largest. A label is cut short when the
 * text its skin shows (the {@code LabeledText} node) is not its whole text (an ellipsis, or letters
 * left off). (Project rule from issue 12, item 7; text that scales without loss is common practice
 * for touch screens, cf. WCAG 2.1 success criterion 1.4.4 "Resize text".)
 *
 * <p>None is allowed, in the window's frame (header, rail, status line) or in any screen. Also
 * found: a pane that never scrolls sideways holding content wider than itself (what sticks out is
 * cut off), and a window frame wider than the window (the window may scroll up and down when its
 * frame is taller, never sideways). Every screen at the largest text is written to
 * {@code target/clipped-labels/<screen>-<size>.png} for a person to look at.
 */
class NoClippedLabelsFxTest {
  static final double[][] SIZES = {{1024, 600}, {1280, 800}, {1600, 1000}};
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
  void noLabelIsCutShortOnAnyScreenAtAnySizeOrTextStep() throws Exception {
    List<String> frame = new ArrayList<>();
    java.util.Set<String> inScreens = new java.util.TreeSet<>();
    for (double[] size : SIZES) {
      rig.window(size[0], size[1], false);
      for (ScreenId id : ScreenId.values()) {
        rig.show(id);
        int[] steps = {0, 3, MainWindow.MAX_FONT - 15};
        int at = 0;
        for (int step : steps) {
          int delta = step - at;
          at = step;
          ScreenRig.fx(() -> {
            rig.window.scaleText(delta);
            rig.layout();
            String where = id.title() + " at " + (int) size[0] + "x" + (int) size[1] + ", text "
                + rig.window.fontSize() + " px";
            javafx.scene.layout.BorderPane border =
                (javafx.scene.layout.BorderPane) rig.window.root().lookup("#window-frame");
            // the window scrolls up and down when its frame is taller than it, never sideways
            if (border.getWidth() > rig.scene.getWidth() + 0.5) {
              frame.add(where + ": the window's frame is " + (int) border.getWidth() + " px wide, wider than the window");
            }
            for (Node part : new Node[] {border.getTop(), border.getLeft(), border.getBottom()}) {
              find(part, frame, where);
            }
            List<String> screen = new ArrayList<>();
            find(border.getCenter(), screen, where);
            inScreens.addAll(screen);
            if (step == steps[steps.length - 1]) {
              picture(id.title() + "-" + (int) size[0] + "x" + (int) size[1]);
            }
            return null;
          });
        }
        ScreenRig.fx(() -> {
          rig.window.scaleText(-100);
          rig.window.scaleText(15 - MainWindow.MIN_FONT);
          return null;
        });
      }
    }
    Files.createDirectories(Path.of("target"));
    Files.write(Path.of("target", "clipped-labels.txt"), inScreens);
    assertThat(frame).as("labels of the window's frame cut short").isEmpty();
    assertThat(inScreens).as("labels cut short on the screens (also in target/clipped-labels.txt)").isEmpty();
  }

  /** The window as it is now, to {@code target/clipped-labels/<name>.png}, for a person to look at. */
  private static void picture(String name) throws java.io.IOException {
    javafx.scene.image.WritableImage img = rig.scene.snapshot(null);
    java.awt.image.BufferedImage bi = javafx.embed.swing.SwingFXUtils.fromFXImage(img, null);
    Path dir = Files.createDirectories(Path.of("target", "clipped-labels"));
    javax.imageio.ImageIO.write(bi, "png", dir.resolve(name.replaceAll("[^A-Za-z0-9x-]", "") + ".png").toFile());
  }

  /**
   * Every visible label under {@code n} whose shown text is not its whole text, and every pane
   * that never scrolls sideways whose content is wider than it (whatever sticks out is cut off).
   */
  static void find(Node n, List<String> out, String where) {
    if (!n.isVisible()) {
      return;
    }
    if (n instanceof javafx.scene.control.ScrollPane sp && sp.getContent() != null
        && sp.getHbarPolicy() == javafx.scene.control.ScrollPane.ScrollBarPolicy.NEVER
        && sp.getContent().getLayoutBounds().getWidth() > sp.getViewportBounds().getWidth() + 0.5) {
      out.add(where + ": " + describe(sp) + " shows " + (int) sp.getViewportBounds().getWidth()
          + " px of content " + (int) sp.getContent().getLayoutBounds().getWidth() + " px wide");
    }
    if (n instanceof Labeled l && l.getText() != null && !l.getText().isEmpty()) {
      String shown = shownText(l);
      String whole = l.isMnemonicParsing() ? withoutMnemonic(l.getText()) : l.getText();
      if (shown != null && !shown.equals(whole)) {
        out.add(where + ": " + l.getClass().getSimpleName() + (l.getId() == null ? "" : " #" + l.getId())
            + " \"" + l.getText().replace("\n", "\\n") + "\"");
      }
    }
    if (n instanceof Parent p) {
      for (Node c : p.getChildrenUnmodifiable()) {
        find(c, out, where);
      }
    }
  }

  /** A node as a person finds it: its kind, its id if any, and the ids of its parents. */
  private static String describe(Node n) {
    StringBuilder b = new StringBuilder(n.getClass().getSimpleName());
    for (Node p = n; p != null; p = p.getParent()) {
      if (p.getId() != null) {
        b.append(" in #").append(p.getId());
        break;
      }
    }
    return b.toString();
  }

  /** The text as shown when its first underscore marks a mnemonic (as JavaFX reads it). */
  static String withoutMnemonic(String text) {
    int i = text.indexOf('_');
    return i < 0 || i == text.length() - 1 ? text : text.substring(0, i) + text.substring(i + 1);
  }

  private static String shownText(Labeled l) {
    for (Node c : l.getChildrenUnmodifiable()) {
      if (c instanceof Text t && c.getClass().getSimpleName().equals("LabeledText")) {
        return t.getText();
      }
    }
    return null;
  }
}

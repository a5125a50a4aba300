package org.bracewalk.ui;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import javafx.geometry.Bounds;
import javafx.scene.Node;
import javafx.scene.control.TableCell;
import javafx.scene.control.TableRow;
import javafx.scene.control.TableView;
import javafx.scene.image.PixelReader;
import javafx.scene.image.WritableImage;
import org.bracewalk.ui.common.ScreenId;
import org.bracewalk.ui.sites.OverviewRow;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The "OVERDUE" of the Sites screen stays readable on a selected row, in the usual and the daylight
 * look, with the table focused (the teal or black bar) and not (the grey bar). Measured on the
 * rendered row: the background is the row's commonest colour within the cell, the text colour the
 * cell's pixel that differs most from it, and their contrast ratio is computed with the relative
 * luminance of WCAG 2.1 (source: WCAG 2.1 success criterion 1.4.3 "Contrast (Minimum)", at least
 * 4.5:1 for text, and its definitions of "contrast ratio" and "relative luminance").
 */
class OverdueContrastTest {
  private static ScreenRig rig;

  @BeforeAll
  static void demo() throws Exception {
    rig = ScreenRig.shared();
  }

  @org.junit.jupiter.api.AfterAll
  static void close() throws Exception {
    rig.close();
  }

  @Test
  void usualLookFocused() throws Exception {
    assertThat(contrast(false, true)).isGreaterThanOrEqualTo(4.5);
  }

  @Test
  void usualLookNotFocused() throws Exception {
    assertThat(contrast(false, false)).isGreaterThanOrEqualTo(4.5);
  }

  @Test
  void daylightFocused() throws Exception {
    assertThat(contrast(true, true)).isGreaterThanOrEqualTo(4.5);
  }

  @Test
  void daylightNotFocused() throws Exception {
    assertThat(contrast(true, false)).isGreaterThanOrEqualTo(4.5);
  }

  @Test
  void theRatioMatchesWcagsWorkedValues() {
    // WCAG 2.1 definitions: black on white is 21:1, a colour on itself 1:1; #777777 on white is
    // about 4.48:1 (the grey commonly quoted as just failing AA, from memory)
    assertThat(ratio(0x000000, 0xffffff)).isCloseTo(21.0, org.assertj.core.data.Offset.offset(1e-9));
    assertThat(ratio(0x0f5e63, 0x0f5e63)).isEqualTo(1.0);
    assertThat(ratio(0x777777, 0xffffff)).isCloseTo(4.48, org.assertj.core.data.Offset.offset(0.01));
  }

  /** Whether {@code n} and every node above it is visible. */
  private static boolean shown(Node n) {
    for (Node p = n; p != null; p = p.getParent()) {
      if (!p.isVisible()) {
        return false;
      }
    }
    return true;
  }

  /** Renders the racking run's row (overdue) selected and measures the contrast of its due text. */
  private static double contrast(boolean daylight, boolean focused) throws Exception {
    rig.window(1280, 800);
    rig.show(ScreenId.OVERVIEW);
    return ScreenRig.fx(() -> {
      rig.window.setDaylight(daylight);
      TableView<?> table = (TableView<?>) rig.window.root().lookup(".table-view");
      @SuppressWarnings("unchecked")
      TableView<OverviewRow> rows = (TableView<OverviewRow>) table;
      int index = -1;
      for (int i = 0; i < rows.getItems().size(); i++) {
        if (rows.getItems().get(i).due() == OverviewRow.Due.OVERDUE) {
          index = i;
          break;
        }
      }
      assertThat(index).as("an overdue structure in the demo at the test's clock").isNotNegative();
      rows.getSelectionModel().clearAndSelect(index);
      rows.scrollTo(index); // in sight, as selecting it by the keys would bring it (rows wrap their verdicts)
      if (focused) {
        table.requestFocus();
      } else {
        rig.window.root().requestFocus();
      }
      rig.layout();
      assertThat(table.isFocused()).as("table focused").isEqualTo(focused);
      TableCell<?, ?> cell = null;
      for (Node n : table.lookupAll(".overdue")) {
        // a row the table keeps aside for reuse is hidden, and keeps the look it last had
        if (n instanceof TableCell<?, ?> c && c.getTableRow() != null && c.getTableRow().isSelected() && shown(c)) {
          cell = c;
        }
      }
      assertThat(cell).as("the selected row's overdue cell").isNotNull();
      assertThat(cell.getText()).contains("OVERDUE");
      TableRow<?> row = cell.getTableRow();
      WritableImage img = row.snapshot(null, null);
      Bounds b = cell.getBoundsInParent();
      PixelReader px = img.getPixelReader();
      Map<Integer, Integer> counts = new HashMap<>();
      int x0 = (int) Math.ceil(b.getMinX()) + 2;
      int x1 = (int) Math.min(img.getWidth(), Math.floor(b.getMaxX())) - 2;
      int y0 = (int) Math.ceil(b.getMinY()) + 2;
      int y1 = (int) Math.min(img.getHeight(), Math.floor(b.getMaxY())) - 2;
      for (int y = y0; y < y1; y++) {
        for (int x = x0; x < x1; x++) {
          counts.merge(px.getArgb(x, y) & 0xffffff, 1, Integer::sum);
        }
      }
      int background = counts.entrySet().stream().max(Map.Entry.comparingByValue()).orElseThrow().getKey();
      double best = 1;
      int text = background;
      for (int c : counts.keySet()) {
        double r = ratio(c, background);
        if (r > best && counts.get(c) >= 3) {
          best = r;
          text = c;
        }
      }
      Path out = Path.of("target", "contrast");
      Files.createDirectories(out);
      javax.imageio.ImageIO.write(javafx.embed.swing.SwingFXUtils.fromFXImage(img, null), "png",
          out.resolve("overdue-" + (daylight ? "daylight" : "usual") + (focused ? "-focused" : "-unfocused")
              + ".png").toFile());
      org.bracewalk.bench.ScreenPicture.write(rig.window.root(), 1280, 800,
          out.resolve("window-" + (daylight ? "daylight" : "usual") + (focused ? "-focused" : "-unfocused") + ".png"),
          rig.services.outputs());
      System.out.printf("overdue %s %s: text #%06x on #%06x, %.2f:1%n", daylight ? "daylight" : "usual",
          focused ? "focused" : "not focused", text, background, best);
      return best;
    });
  }

  /** WCAG 2.1 contrast ratio (L1 + 0.05) / (L2 + 0.05) of two sRGB colours. */
  static double ratio(int a, int b) {
    double la = luminance(a);
    double lb = luminance(b);
    return (Math.max(la, lb) + 0.05) / (Math.min(la, lb) + 0.05);
  }

  /** WCAG 2.1 relative luminance: 0.2126 R + 0.7152 G + 0.0722 B of the linearised channels. */
  static double luminance(int rgb) {
    return 0.2126 * channel((rgb >> 16) & 0xff) + 0.7152 * channel((rgb >> 8) & 0xff)
        + 0.0722 * channel(rgb & 0xff);
  }

  private static double channel(int v) {
    double c = v / 255.0;
    return c <= 0.03928 ? c / 12.92 : Math.pow((c + 0.055) / 1.055, 2.4);
  }
}

package org.bracewalk.ui;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Executor;
import javafx.scene.Parent;
import javafx.scene.image.PixelReader;
import org.bracewalk.app.AppServices;
import org.bracewalk.bench.HeadlessFx;
import org.bracewalk.bench.ScreenPicture;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.ui.common.PlaneCanvas;
import org.bracewalk.ui.common.PlaneGeometry;
import org.bracewalk.ui.common.ScreenId;
import org.bracewalk.ui.common.Selection;
import org.bracewalk.ui.findings.ReportIssuer;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Headless pictures of the Findings and History screens over the demo, opened through the main
 * window as the app opens them, kept as PNGs in {@code target/frame-screens} to be looked at: the
 * racking run's struck frame 2 (inspection 2: bottom horizontal missing, upright beyond use) and
 * the facade scaffold (inspection 3: ledger at level 1, bay 1 out). Each picture is also checked
 * where a person would look: the missing member's bar is broken (paper shows through where the
 * plain frame is solid), the repair's frame member carries the repair colour beside it, and in
 * History a changed member is boxed in the colour of changes.
 */
class FrameFindingsScreensFxTest {
  /** The colours of {@code PlanePainter}: repair dash-dot, changes since the last inspection. */
  private static final int REPAIR = 0x0b57b0;
  private static final int CHANGED = 0x6a1b9a;
  private static final int PAPER = 0xfbfaf7;
  private static final Path OUT = Path.of("target", "frame-screens");

  @TempDir Path dir;
  private AppServices services;

  @BeforeEach
  void demo() throws Exception {
    HeadlessFx.start();
    services = DemoDatabase.withDemo(dir);
    Files.createDirectories(OUT);
  }

  @AfterEach
  void close() {
    services.close();
  }

  private PlaneRecord plane(long inspection, String name) {
    return services.inspections().planesOf(inspection).stream()
        .filter(p -> p.name().equals(name)).findFirst().orElseThrow();
  }

  private static final ReportIssuer NO_DOCUMENTS = new ReportIssuer() {
    @Override
    public String issueReport(long id, Path out, java.util.function.Consumer<Progress> progress) {
      throw new IllegalStateException("not in this test");
    }

    @Override
    public String issueRepairOrder(long id, Path out,
        java.util.function.Consumer<Progress> progress) {
      throw new IllegalStateException("not in this test");
    }
  };

  /** What was drawn: the plane's canvas as pixels, and its geometry. */
  private record Shot(PixelReader pixels, PlaneGeometry geometry) {}

  /** Opens {@code screen} on the plane through the main window, writes the PNG, reads the canvas. */
  private Shot open(ScreenId screen, PlaneRecord plane, long inspection, String canvasId,
      String png) {
    return HeadlessFx.onFx(() -> {
      Executor now = Runnable::run;
      AppScreens screens = new AppScreens(services, PlaneAnalyzer.standard(), DemoDatabase.CLOCK,
          new QuietDialogs(), now, now, NO_DOCUMENTS);
      MainWindow window = new MainWindow(screens, AppScreens.screenKeys(), "frame findings");
      window.open(screen, new Selection(plane.structureId(), plane.id(), inspection));
      Parent root = window.root();
      ScreenPicture.write(root, 1360, 860, OUT.resolve(png).toAbsolutePath(),
          services.outputs());
      PlaneCanvas canvas = (PlaneCanvas) root.lookup("#" + canvasId);
      assertThat(canvas).as(canvasId).isNotNull();
      assertThat(canvas.geometry()).as("the plane was drawn").isNotNull();
      return new Shot(canvas.snapshot(null, null).getPixelReader(), canvas.geometry());
    });
  }

  /** Pixels within {@code pad} of member {@code f} whose colour is within 40 of {@code rgb}. */
  private static int near(Shot s, FrameRef f, int pad, int rgb) {
    double[] seg = s.geometry().frame(f);
    int x0 = (int) Math.min(seg[0], seg[2]) - pad;
    int x1 = (int) Math.max(seg[0], seg[2]) + pad;
    int y0 = (int) Math.min(seg[1], seg[3]) - pad;
    int y1 = (int) Math.max(seg[1], seg[3]) + pad;
    int n = 0;
    for (int x = Math.max(0, x0); x <= x1; x++) {
      for (int y = Math.max(0, y0); y <= y1; y++) {
        int c = s.pixels().getArgb(x, y);
        if (Math.abs(((c >> 16) & 255) - ((rgb >> 16) & 255)) < 40
            && Math.abs(((c >> 8) & 255) - ((rgb >> 8) & 255)) < 40
            && Math.abs((c & 255) - (rgb & 255)) < 40) {
          n++;
        }
      }
    }
    return n;
  }

  /** Paper pixels on the member's own line between its joints (none where the bar is plain). */
  private static int paperOnTheLine(Shot s, FrameRef f) {
    double[] seg = s.geometry().frame(f);
    int n = 0;
    int steps = 200;
    for (int k = 20; k <= steps - 20; k++) {
      int x = (int) Math.round(seg[0] + (seg[2] - seg[0]) * k / steps);
      int y = (int) Math.round(seg[1] + (seg[3] - seg[1]) * k / steps);
      if ((s.pixels().getArgb(x, y) & 0xffffff) == PAPER) {
        n++;
      }
    }
    return n;
  }

  @Test
  void theStruckRackingFrameOnFindingsAndHistory() {
    PlaneRecord frame2 = plane(2, "frame 2");
    Shot findings = open(ScreenId.FINDINGS, frame2, 2, "findings-canvas",
        "findings-racking-frame2.png");
    FrameRef horizontal = FrameRef.ledger(1, 1);
    assertThat(paperOnTheLine(findings, horizontal)).as("the missing horizontal is broken")
        .isGreaterThan(10);
    assertThat(paperOnTheLine(findings, FrameRef.ledger(2, 1))).as("a sound one is solid")
        .isZero();
    assertThat(near(findings, horizontal, 14, REPAIR)).as("the refit drawn beside it")
        .isGreaterThan(20);

    Shot history = open(ScreenId.HISTORY, frame2, 0, "history-canvas",
        "history-racking-frame2.png");
    assertThat(paperOnTheLine(history, horizontal)).isGreaterThan(10);
    assertThat(near(history, horizontal, 9, CHANGED)).as("the change is boxed").isGreaterThan(20);
    assertThat(near(history, FrameRef.standard(1, 0), 9, CHANGED)).isGreaterThan(20);
    assertThat(near(history, FrameRef.ledger(3, 1), 9, CHANGED)).as("an unchanged one is not")
        .isZero();
  }

  @Test
  void theFacadeLedgerTakenOutOnFindingsAndHistory() {
    PlaneRecord facade = plane(3, "north facade");
    Shot findings = open(ScreenId.FINDINGS, facade, 3, "findings-canvas",
        "findings-facade.png");
    FrameRef ledger = FrameRef.ledger(1, 1);
    assertThat(paperOnTheLine(findings, ledger)).isGreaterThan(10);
    assertThat(paperOnTheLine(findings, FrameRef.ledger(1, 2))).isZero();
    assertThat(near(findings, ledger, 14, REPAIR)).isGreaterThan(20);

    Shot history = open(ScreenId.HISTORY, facade, 0, "history-canvas", "history-facade.png");
    assertThat(paperOnTheLine(history, ledger)).isGreaterThan(10);
  }
}

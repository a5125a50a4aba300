package org.bracewalk.boot;

import java.io.PrintStream;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.atomic.AtomicLong;
import javafx.event.Event;
import javafx.scene.Scene;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyEvent;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.bracewalk.ui.HeadlessFx;
import org.bracewalk.ui.Stylesheet;
import org.bracewalk.ui.common.DialogService;
import org.bracewalk.ui.walk.Mark;
import org.bracewalk.ui.walk.MarkRecorder;
import org.bracewalk.ui.walk.RecordedMark;
import org.bracewalk.ui.walk.WalkView;
import org.bracewalk.ui.walk.WalkViewModel;

/**
 * Keystroke to redrawn verdict on a 20-lift × 100-bay plane (2,000 panels), headless: each sample
 * sends one state key to the walk-round screen and times until the mark is recorded, the plane is
 * re-analysed and the drawing commands are issued; a second figure also renders the frame (by a
 * scene snapshot, an upper bound: it adds reading the pixels back). Prints medians; a benchmark, not
 * a test. Run: {@code java -cp target/bracewalk.jar org.bracewalk.boot.WalkBench}.
 */
public final class WalkBench {
  private WalkBench() {}

  public static void main(String[] args) {
    PrintStream out = System.out;
    int samples = args.length > 0 ? Integer.parseInt(args[0]) : 200;
    HeadlessFx.start();
    PlaneDesign design = bigPlane();
    long[][] result = HeadlessFx.onFx(() -> run(design, samples));
    out.printf("walk-round keystroke on a %d x %d plane (%d panels), %d samples, in-memory record%n",
        design.grid().lifts(), design.grid().bays(), design.grid().panelCount(), samples);
    out.printf("  key -> recorded, analysed, drawn (median): %.2f ms   (90th pct %.2f ms)%n",
        median(result[0]) / 1e6, pct(result[0], 0.9) / 1e6);
    out.printf("  ... plus one rendered frame (median):      %.2f ms   (90th pct %.2f ms)%n",
        median(result[1]) / 1e6, pct(result[1], 0.9) / 1e6);
    System.exit(0);
  }

  /** 20 lifts × 100 bays, pinned base, a brace every 5th bay of every lift, widths and heights as on site. */
  static PlaneDesign bigPlane() {
    int lifts = 20;
    int bays = 100;
    Map<PanelRef, Brace> braces = new HashMap<>();
    for (int i = 1; i <= lifts; i++) {
      for (int j = 1; j <= bays; j += 5) {
        braces.put(new PanelRef(i, j), Brace.rigid(i % 2 == 1 ? Diagonal.RISING : Diagonal.FALLING));
      }
    }
    List<Double> widths = new ArrayList<>();
    for (int j = 0; j < bays; j++) {
      widths.add(j % 7 == 3 ? 1.8 : 2.4);
    }
    return PlaneDesign.of(
        new PlaneGrid(lifts, bays, widths, java.util.Collections.nCopies(lifts, 2.0), Support.PINNED_BASE),
        braces);
  }

  private static long[][] run(PlaneDesign design, int samples) {
    AtomicLong ids = new AtomicLong();
    MarkRecorder memory =
        new MarkRecorder() {
          @Override
          public RecordedMark record(PanelRef panel, Mark mark) {
            return new RecordedMark(ids.incrementAndGet(), panel, mark);
          }

          @Override
          public RecordedMark correct(RecordedMark earlier, Mark replacement, String reason) {
            return new RecordedMark(ids.incrementAndGet(), earlier.panel(), replacement);
          }
        };
    WalkViewModel vm =
        new WalkViewModel(design, "bench plane", List.of(), memory, PlaneAnalyzer.standard(), NO_DIALOGS, false, false);
    WalkView view = new WalkView(vm);
    Scene scene = new Scene(view, 1600, 900);
    Stylesheet.apply(scene);
    view.applyCss();
    view.layout();
    scene.snapshot(null);
    view.focusPlane();
    KeyCode[] keys = {KeyCode.S, KeyCode.M, KeyCode.S, KeyCode.D, KeyCode.U, KeyCode.S};
    int warm = 40;
    long[] drawn = new long[samples];
    long[] framed = new long[samples];
    for (int k = 0; k < warm + samples; k++) {
      KeyCode code = keys[k % keys.length];
      KeyEvent e = new KeyEvent(KeyEvent.KEY_PRESSED, "", "", code, false, false, false, false);
      long t0 = System.nanoTime();
      Event.fireEvent(view.canvas(), e);
      long t1 = System.nanoTime();
      scene.snapshot(null);
      long t2 = System.nanoTime();
      if (k >= warm) {
        drawn[k - warm] = t1 - t0;
        framed[k - warm] = t2 - t0;
      }
    }
    return new long[][] {drawn, framed};
  }

  private static double median(long[] xs) {
    return pct(xs, 0.5);
  }

  private static double pct(long[] xs, double q) {
    long[] s = xs.clone();
    Arrays.sort(s);
    return s[Math.min(s.length - 1, (int) Math.floor(q * (s.length - 1)))];
  }

  private static final DialogService NO_DIALOGS =
      new DialogService() {
        @Override
        public boolean confirm(String title, String message, String confirmLabel) {
          return false;
        }

        @Override
        public void inform(String title, String message) {}

        @Override
        public void showError(String title, String message) {}

        @Override
        public List<java.nio.file.Path> choosePhotos(String title, java.nio.file.Path folder) {
          return List.of();
        }

        @Override
        public java.util.Optional<String> askText(String title, String message, String initial) {
          return java.util.Optional.empty();
        }

        @Override
        public java.util.Optional<java.nio.file.Path> chooseSaveFile(String title, String suggestedName) {
          return java.util.Optional.empty();
        }
      };
}

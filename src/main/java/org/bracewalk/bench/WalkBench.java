package org.bracewalk.bench;

import java.io.PrintStream;
import java.time.Clock;
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
import org.bracewalk.app.AppServices;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.bracewalk.store.Database;
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
 * re-analysed and the drawing commands are issued; a second figure also renders the plane's
 * drawing (by a snapshot of the canvas, an upper bound: it adds reading the pixels back). Runs once
 * with the marks kept in memory and once committed to a fresh SQLite database with full sync, as
 * the app does. Prints medians; a benchmark, not a test. Run: {@code java -cp target/bracewalk.jar
 * org.bracewalk.bench.WalkBench [samples]}.
 */
public final class WalkBench {
  private WalkBench() {}

  public static void main(String[] args) {
    try {
      bench(args);
      System.exit(0);
    } catch (Exception | Error e) {
      e.printStackTrace();
      System.exit(3); // the toolkit's thread would keep the JVM alive
    }
  }

  private static void bench(String[] args) throws Exception {
    PrintStream out = System.out;
    int samples = args.length > 0 ? Integer.parseInt(args[0]) : 200;
    HeadlessFx.start();
    PlaneDesign design = bigPlane();
    out.printf("walk-round keystroke on a %d-lift x %d-bay plane (%d panels), %d samples after 40 warm-up;"
            + " %d processors, load average %.1f%n",
        design.grid().lifts(), design.grid().bays(), design.grid().panelCount(), samples,
        Runtime.getRuntime().availableProcessors(),
        java.lang.management.ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage());
    MarkRecorder memory = memoryRecorder();
    long[][] result = HeadlessFx.onFx(() -> run(design, samples, memory, false));
    print(out, "record in memory", result);
    PlaneDesign thin = withOneBraceInTheTopLift(design);
    long[][] flips = HeadlessFx.onFx(() -> run(thin, samples, memoryRecorder(), true));
    print(out, "record in memory; every keystroke changes the verdict (M on the top lift's only"
        + " brace, then Backspace)", flips);
    java.nio.file.Path dir = java.nio.file.Files.createTempDirectory("bracewalk-bench");
    try (AppServices services = AppServices.over(Database.open(dir.resolve("bench.db")), Clock.systemUTC(), PlaneAnalyzer.standard())) {
      MarkRecorder stored = storedRecorder(services, design);
      long[][] db = HeadlessFx.onFx(() -> run(design, samples, stored, false));
      print(out, "record committed to SQLite (full sync)", db);
    } finally {
      try (var files = java.nio.file.Files.walk(dir)) {
        files.sorted(java.util.Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
      }
    }
  }

  private static void print(PrintStream out, String what, long[][] r) {
    out.printf("  %s:%n", what);
    out.printf("    key -> recorded, analysed, drawn (median) %7.2f ms   (90th percentile %7.2f ms)%n",
        median(r[0]) / 1e6, pct(r[0], 0.9) / 1e6);
    out.printf("    ... and the frame rendered (median)       %7.2f ms   (90th percentile %7.2f ms)%n",
        median(r[1]) / 1e6, pct(r[1], 0.9) / 1e6);
    out.printf("    baseline: the same snapshot, nothing changed  %7.2f ms   (so the change itself adds %.1fx the baseline)%n",
        median(r[3]) / 1e6, (median(r[1]) - median(r[3])) / Math.max(1.0, median(r[3])));
    out.printf("    full redraws (verdict, blocks or critical braces changed): %d of %d keystrokes%n",
        r[2][0], r[0].length);
  }

  private static MarkRecorder memoryRecorder() {
    AtomicLong ids = new AtomicLong();
    return new MarkRecorder() {
      @Override
      public RecordedMark record(PanelRef panel, Mark mark) {
        return new RecordedMark(ids.incrementAndGet(), panel, mark);
      }

      @Override
      public RecordedMark recordMember(org.bracewalk.core.model.FrameRef member, PanelRef panel, Mark mark) {
        return new RecordedMark(ids.incrementAndGet(), panel, mark, member);
      }

      @Override
      public RecordedMark correct(RecordedMark earlier, Mark replacement, String reason) {
        return new RecordedMark(ids.incrementAndGet(), earlier.panel(), replacement, earlier.member());
      }

      @Override
      public java.util.List<RecordedMark> recordRestAsDesigned(java.util.List<PanelRef> panels) {
        return panels.stream().map(p -> new RecordedMark(ids.incrementAndGet(), p, Mark.of(
            org.bracewalk.core.model.PanelState.SOUND))).toList();
      }
    };
  }

  /** A site, structure and plane of the bench design in a fresh database, and an open inspection. */
  private static MarkRecorder storedRecorder(org.bracewalk.app.AppServices s, PlaneDesign design) {
    var site = s.sites().createSite(new org.bracewalk.core.model.Site(0, "Bench site", "Bench client", "1 Bench Road",
        "bench", java.time.ZoneOffset.UTC, org.bracewalk.core.model.DisplayUnits.METRIC));
    var st = s.sites().createStructure(new org.bracewalk.core.model.Structure(0, site.id(), "Bench scaffold",
        org.bracewalk.core.model.StructureKind.SCAFFOLD, "", "", 7));
    var plane = s.sites().createPlane(new org.bracewalk.core.model.PlaneRecord(0, st.id(), "bench plane", design.grid()),
        "bench", java.time.LocalDate.of(2025, 1, 1), "", design);
    var insp = s.inspections().start(st.id(), org.bracewalk.app.NewInspection.of("Bench", "bench",
        org.bracewalk.core.model.InspectionReason.ROUTINE));
    return new org.bracewalk.ui.walk.InspectionMarkRecorder(s.inspections(), insp.id(), plane.id(), "Bench");
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

  /** {@code design} with every brace of the top lift taken out but the one at bay 51: that one is critical. */
  static PlaneDesign withOneBraceInTheTopLift(PlaneDesign design) {
    int top = design.grid().lifts();
    Map<PanelRef, Brace> braces = new HashMap<>();
    design.braces().forEach((p, b) -> {
      if (p.lift() != top || p.bay() == CRITICAL_BAY) {
        braces.put(p, b);
      }
    });
    return PlaneDesign.of(design.grid(), braces);
  }

  private static final int CRITICAL_BAY = 51;

  /**
   * Times {@code samples} keystrokes after 40 untimed. {@code flip}: the cursor is put on the top
   * lift's only brace before each keystroke (untimed), and the keys alternate M (rigidity lost)
   * and Backspace (the mark undone, rigid again), so every keystroke redraws the whole plane.
   */
  private static long[][] run(PlaneDesign design, int samples, MarkRecorder recorder, boolean flip) {
    WalkViewModel vm =
        new WalkViewModel(design, "bench plane", List.of(), recorder, PlaneAnalyzer.standard(), NO_DIALOGS, false, false,
            Clock.systemUTC(), Runnable::run, Runnable::run); // the write inside the keystroke, as measured before
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
    long[] idle = new long[samples];
    int fullRedraws = 0;
    for (int k = 0; k < warm + samples; k++) {
      KeyCode code = keys[k % keys.length];
      if (flip) {
        code = k % 2 == 0 ? KeyCode.M : KeyCode.BACK_SPACE;
        vm.select(new PanelRef(design.grid().lifts(), CRITICAL_BAY));
      }
      KeyEvent e = new KeyEvent(KeyEvent.KEY_PRESSED, "", "", code, false, false, false, false);
      // the baseline: the same snapshot with nothing changed (drawing the kept picture, reading it back)
      long i0 = System.nanoTime();
      view.canvas().snapshot(null, null);
      long i1 = System.nanoTime();
      long t0 = System.nanoTime();
      Event.fireEvent(view.canvas(), e);
      long t1 = System.nanoTime();
      view.canvas().snapshot(null, null);
      long t2 = System.nanoTime();
      if (k >= warm) {
        drawn[k - warm] = t1 - t0;
        framed[k - warm] = t2 - t0;
        idle[k - warm] = i1 - i0;
        if (!view.canvas().lastPaintPartial()) {
          fullRedraws++;
        }
      }
    }
    return new long[][] {drawn, framed, {fullRedraws}, idle};
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

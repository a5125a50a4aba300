package org.bracewalk.bench;

import java.time.LocalDate;
import java.time.ZoneId;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.LongSupplier;
import org.bracewalk.app.AppServices;
import org.bracewalk.app.ImportedSite;
import org.bracewalk.app.NewInspection;
import org.bracewalk.app.NewObservation;
import org.bracewalk.app.report.ReportService;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.DisplayUnits;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.Site;
import org.bracewalk.core.model.Structure;
import org.bracewalk.core.model.StructureKind;
import org.bracewalk.core.model.Support;

/**
 * Times the report end to end (read the records, analyse every plane, draw up the plan, render the
 * PDF) on the demo's after-impact inspection and on an invented structure of many large planes.
 * Runs on a fresh database it fills itself.
 */
public final class ReportBenchmark {
  /**
   * One measured case: the first run (cold: class loading and the JIT's start included) and the
   * median of the runs after it (warm), as wall-clock time and as this thread's CPU time (which a
   * busy shared machine inflates less).
   */
  public record Figure(String what, int planes, int panels, long firstMillis, long medianMillis,
      long firstCpuMillis, long medianCpuMillis, int bytes) {}

  private final AppServices services;
  private final ReportService reports;
  private final LongSupplier nanos;
  private final LongSupplier cpuNanos;

  /**
   * @param fresh services over an empty database
   * @param nanos a nanosecond wall-clock timer ({@code System::nanoTime} in the program)
   * @param cpuNanos this thread's CPU time in nanoseconds
   */
  public ReportBenchmark(AppServices fresh, ReportService reports, LongSupplier nanos,
      LongSupplier cpuNanos) {
    this.services = fresh;
    this.reports = reports;
    this.nanos = nanos;
    this.cpuNanos = cpuNanos;
  }

  /** The demo's after-impact report, {@code runs} times. */
  public Figure demo(int runs) {
    ImportedSite demo = services.demo().load();
    Inspection impact = demo.inspections().stream()
        .filter(i -> i.reason() == InspectionReason.AFTER_IMPACT).findFirst()
        .orElseThrow(() -> new IllegalStateException("the demo has no after-impact inspection"));
    int planes = services.sites().planes(impact.structureId()).size();
    int panels = services.sites().planes(impact.structureId()).stream()
        .mapToInt(p -> p.grid().panelCount()).sum();
    return time("demo after-impact report", impact.id(), planes, panels, runs);
  }

  /** An invented scaffold of {@code planes} planes of {@code size} x {@code size}, every panel recorded. */
  public Figure large(int planes, int size, int runs) {
    long inspectionId = services.store().inTransaction(() -> {
      Site site = services.sites().createSite(new Site(0, "Benchmark yard", "Bench client",
          "1 Test Road", "yard", ZoneId.of("UTC"), DisplayUnits.METRIC));
      Structure st = services.sites().createStructure(new Structure(0, site.id(),
          "Benchmark structure", StructureKind.SCAFFOLD, planes + " planes of " + size + " x " + size,
          "bench", 7));
      List<PlaneRecord> made = new ArrayList<>();
      for (int k = 1; k <= planes; k++) {
        PlaneDesign d = design(size);
        made.add(services.sites().createPlane(new PlaneRecord(0, st.id(), "plane " + k, d.grid()),
            "bench", LocalDate.of(2025, 1, 1), "", d));
      }
      Inspection i = services.inspections().start(st.id(), new NewInspection("B. Enchmark",
          "inspector", "B. Enchmark", "day", "", InspectionReason.ROUTINE, null, null));
      for (PlaneRecord p : made) {
        PlaneDesign d = services.sites().currentDesign(p.id()).design();
        for (int lift = 1; lift <= size; lift++) {
          for (int bay = 1; bay <= size; bay++) {
            PanelRef panel = PanelRef.of(lift, bay);
            PanelState state = p.name().equals("plane 1") && lift == size / 2 && d.braceAt(panel) != null
                ? PanelState.MISSING : PanelState.SOUND;
            services.inspections().recordObservation(i.id(),
                NewObservation.of(p.id(), panel, state, "B. Enchmark"));
          }
        }
      }
      services.inspections().finalise(i.id());
      return i.id();
    });
    return time(planes + " planes of " + size + " x " + size, inspectionId, planes,
        planes * size * size, runs);
  }

  /** Braces in every fifth bay of every lift, rising and falling by turns. */
  static PlaneDesign design(int size) {
    PlaneGrid grid = new PlaneGrid(size, size, java.util.Collections.nCopies(size, 2.4),
        java.util.Collections.nCopies(size, 2.0), Support.PINNED_BASE);
    Map<PanelRef, Brace> braces = new HashMap<>();
    for (int lift = 1; lift <= size; lift++) {
      for (int bay = 1; bay <= size; bay += 5) {
        braces.put(PanelRef.of(lift, bay),
            Brace.rigid((lift + bay) % 2 == 0 ? Diagonal.RISING : Diagonal.FALLING));
      }
    }
    return PlaneDesign.of(grid, braces);
  }

  private Figure time(String what, long inspectionId, int planes, int panels, int runs) {
    long[] ms = new long[Math.max(1, runs)];
    long[] cpu = new long[ms.length];
    int bytes = 0;
    for (int k = 0; k < ms.length; k++) {
      long t0 = nanos.getAsLong();
      long c0 = cpuNanos.getAsLong();
      byte[] pdf = reports.reportPdf(inspectionId);
      cpu[k] = (cpuNanos.getAsLong() - c0) / 1_000_000;
      ms[k] = (nanos.getAsLong() - t0) / 1_000_000;
      bytes = pdf.length;
    }
    return new Figure(what, planes, panels, ms[0], warmMedian(ms), cpu[0], warmMedian(cpu), bytes);
  }

  private static long warmMedian(long[] all) {
    long[] warm = all.length > 1 ? Arrays.copyOfRange(all, 1, all.length) : all.clone();
    Arrays.sort(warm);
    return warm[warm.length / 2];
  }
}

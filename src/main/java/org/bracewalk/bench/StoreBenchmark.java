package org.bracewalk.bench;

import java.nio.file.Path;
import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneId;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.function.LongSupplier;
import org.bracewalk.app.AppServices;
import org.bracewalk.app.AppServicesFactory;
import org.bracewalk.app.ImportedSite;
import org.bracewalk.app.NewInspection;
import org.bracewalk.app.NewObservation;
import org.bracewalk.app.sitefile.SiteFile;
import org.bracewalk.app.sitefile.SiteFile.DesignData;
import org.bracewalk.app.sitefile.SiteFile.InspectionData;
import org.bracewalk.app.sitefile.SiteFile.ObservationData;
import org.bracewalk.app.sitefile.SiteFile.PlaneData;
import org.bracewalk.app.sitefile.SiteFile.StructureData;
import org.bracewalk.app.sitefile.SiteFileWriter;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.DisplayUnits;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.InspectionStatus;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Site;
import org.bracewalk.core.model.StructureKind;
import org.bracewalk.core.model.Support;

/**
 * Measures the store: recording one observation including its commit (synced to disk), and
 * importing a site file of a given number of panels (with one finalised inspection that observes
 * every panel). A benchmark, not a test: the figures depend on the disk.
 */
public final class StoreBenchmark {
  private final AppServicesFactory factory;
  private final Clock clock;
  private final LongSupplier nanoTime;
  private final LongSupplier cpuNanos;

  /**
   * @param nanoTime wall-clock nanoseconds ({@code System::nanoTime})
   * @param cpuNanos the calling thread's CPU time in nanoseconds, SQLite's own work included (it
   *     runs in the calling thread): what a run would take on an idle machine, disk waits apart
   */
  public StoreBenchmark(
      AppServicesFactory factory, Clock clock, LongSupplier nanoTime, LongSupplier cpuNanos) {
    this.factory = Objects.requireNonNull(factory);
    this.clock = Objects.requireNonNull(clock);
    this.nanoTime = Objects.requireNonNull(nanoTime);
    this.cpuNanos = Objects.requireNonNull(cpuNanos);
  }

  /**
   * The figures.
   *
   * @param recordMillis each observation's record-and-commit time, in the order taken
   * @param recordCpuMillis each record's CPU time
   * @param importMillis each import's time
   * @param importCpuMillis each import's CPU time
   * @param panels panels in the imported site
   */
  public record Result(
      List<Double> recordMillis,
      List<Double> recordCpuMillis,
      List<Double> importMillis,
      List<Double> importCpuMillis,
      int panels) {
    public Result {
      recordMillis = List.copyOf(recordMillis);
      recordCpuMillis = List.copyOf(recordCpuMillis);
      importMillis = List.copyOf(importMillis);
      importCpuMillis = List.copyOf(importCpuMillis);
    }

    public double recordCpuMedian() {
      return median(recordCpuMillis);
    }

    public double importCpuMedian() {
      return median(importCpuMillis);
    }

    public double recordMedian() {
      return median(recordMillis);
    }

    public double recordPercentile95() {
      return percentile(recordMillis, 0.95);
    }

    public double importMedian() {
      return median(importMillis);
    }
  }

  static double median(List<Double> values) {
    return percentile(values, 0.5);
  }

  static double percentile(List<Double> values, double q) {
    if (values.isEmpty()) {
      return Double.NaN;
    }
    double[] v = values.stream().mapToDouble(Double::doubleValue).sorted().toArray();
    if (q == 0.5 && v.length % 2 == 0) {
      return (v[v.length / 2 - 1] + v[v.length / 2]) / 2;
    }
    return v[Math.min(v.length - 1, (int) Math.ceil(q * v.length) - 1 < 0 ? 0
        : (int) Math.ceil(q * v.length) - 1)];
  }

  /**
   * Runs the benchmark in {@code folder} (new database files are made there).
   *
   * @param records observations to record one by one
   * @param panels panels of the site to import (rounded to whole planes of 50 x 50)
   * @param imports how many times to import it, each into a new database
   */
  public Result run(Path folder, int records, int panels, int imports) {
    List<Double> recordTimes = new ArrayList<>();
    List<Double> recordCpu = new ArrayList<>();
    try (AppServices s = factory.open(folder.resolve("bench-record.db"))) {
      record(s, s.demo().load().structures().get(0).id(), records, recordTimes, recordCpu);
    }
    String site = new SiteFileWriter().write(bigSite(panels));
    int actualPanels = (int) Math.max(1, Math.round(panels / 2500.0)) * 2500;
    List<Double> importTimes = new ArrayList<>();
    List<Double> importCpu = new ArrayList<>();
    for (int run = 0; run < imports + 1; run++) {
      try (AppServices s = factory.open(folder.resolve("bench-import-" + run + ".db"))) {
        long c0 = cpuNanos.getAsLong();
        long t0 = nanoTime.getAsLong();
        s.files().importSite("bench-site.json", site);
        long t1 = nanoTime.getAsLong();
        long c1 = cpuNanos.getAsLong();
        if (run > 0) { // the first run warms up
          importTimes.add((t1 - t0) / 1e6);
          importCpu.add((c1 - c0) / 1e6);
        }
      }
    }
    return new Result(recordTimes, recordCpu, importTimes, importCpu, actualPanels);
  }

  /**
   * Records {@code records} observations one by one in a new open inspection on a team server's
   * database, each in its own transaction, as the walk-round does when it works on the server. The
   * first structure of the database is used; an empty database gets the demo site first. The
   * records stay (a server's records are append-only): run it on a database kept for the purpose.
   *
   * @return each record's time in ms (wall, then the calling thread's CPU: the server's own work
   *     is in the wall time only)
   */
  public List<List<Double>> runOnServer(String address, int records) {
    List<Double> recordTimes = new ArrayList<>();
    List<Double> recordCpu = new ArrayList<>();
    try (AppServices s = factory.openServer(address)) {
      long structure = s.sites().sites().isEmpty()
          ? s.demo().load().structures().get(0).id()
          : s.sites().structures(s.sites().sites().get(0).id()).get(0).id();
      record(s, structure, records, recordTimes, recordCpu);
    }
    return List.of(recordTimes, recordCpu);
  }

  private void record(AppServices s, long structure, int records, List<Double> times,
      List<Double> cpu) {
    long inspection = s.inspections().start(structure,
        NewInspection.of("Bench", "", InspectionReason.ROUTINE)).id();
    var planes = s.inspections().planesOf(inspection);
    for (int i = 0; i < records + 10; i++) {
      var plane = planes.get(i % planes.size());
      PanelRef p = PanelRef.of(1 + i % plane.grid().lifts(), 1 + i % plane.grid().bays());
      long c0 = cpuNanos.getAsLong();
      long t0 = nanoTime.getAsLong();
      s.inspections().recordObservation(inspection,
          NewObservation.of(plane.id(), p, PanelState.SOUND, "bench"));
      long t1 = nanoTime.getAsLong();
      long c1 = cpuNanos.getAsLong();
      if (i >= 10) { // the first few warm the code paths
        times.add((t1 - t0) / 1e6);
        cpu.add((c1 - c0) / 1e6);
      }
    }
  }

  /** A site of planes of 50 lifts x 50 bays, braced every fifth bay, with every panel observed. */
  SiteFile bigSite(int panels) {
    int planeCount = (int) Math.max(1, Math.round(panels / 2500.0));
    Instant t = clock.instant();
    List<PlaneData> planes = new ArrayList<>();
    List<ObservationData> observations = new ArrayList<>();
    for (int k = 1; k <= planeCount; k++) {
      PlaneGrid grid = new PlaneGrid(50, 50, Collections.nCopies(50, 2.4),
          Collections.nCopies(50, 2.0), Support.PINNED_BASE);
      Map<PanelRef, Brace> braces = new HashMap<>();
      for (int lift = 1; lift <= 50; lift++) {
        for (int bay = 1; bay <= 50; bay += 5) {
          braces.put(PanelRef.of(lift, bay), Brace.rigid(lift % 2 == 0 ? Diagonal.RISING
              : Diagonal.FALLING));
        }
      }
      String name = "elevation " + k;
      planes.add(new PlaneData(name, grid, List.of(new DesignData(1, "bench", LocalDate.of(2025,
          1, 1), "", t, PlaneDesign.of(grid, braces)))));
      for (int lift = 1; lift <= 50; lift++) {
        for (int bay = 1; bay <= 50; bay++) {
          observations.add(new ObservationData(name, PanelRef.of(lift, bay), PanelState.SOUND,
              null, null, null, null, "", t, "bench", null, "", List.of()));
        }
      }
    }
    InspectionData inspection = new InspectionData(1, t, t.plus(Duration.ofHours(8)),
        InspectionStatus.FINALISED, InspectionReason.ROUTINE, "bench", "", "", "", "", "", "",
        observations, List.of(), List.of());
    return new SiteFile(
        new Site(0, "benchmark site", "", "", "", ZoneId.of("UTC"), DisplayUnits.METRIC),
        List.of(new StructureData("big scaffold", StructureKind.SCAFFOLD, "", "", 7, planes,
            List.of(inspection))));
  }

}

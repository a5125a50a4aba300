package org.bracewalk.bench;

import java.nio.file.Path;
import java.time.Clock;
import java.time.LocalDate;
import java.time.ZoneId;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import java.util.UUID;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.function.Consumer;
import java.util.function.LongSupplier;
import org.bracewalk.app.AppServices;
import org.bracewalk.app.AppServicesFactory;
import org.bracewalk.app.NewInspection;
import org.bracewalk.app.NewObservation;
import org.bracewalk.app.SyncService;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.DisplayUnits;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.Site;
import org.bracewalk.core.model.Structure;
import org.bracewalk.core.model.StructureKind;
import org.bracewalk.core.model.Support;
import org.bracewalk.core.port.GlobalIdentities.Kind;

/**
 * Measures field files pushing to one team server at once: N field files, each synced from the
 * server first (so they share its sites, structures, planes and design revisions), each given
 * finalised inspections recorded through the services, then all pushed concurrently (one thread
 * per file, each running the sync use case over its own server connection). The push is timed;
 * recording is not. The server's records are then counted by global identity against what the
 * field files hold: every inspection and observation must be there exactly once, before and after
 * every file is pushed a second time.
 *
 * <p>The baseline of the same run is one more field file of the same size pushed alone, after the
 * concurrent push (so it runs with the code already warm: the ratio errs low, not high).
 *
 * <p>A benchmark, not a test: the figures depend on the machine and its load. The records stay on
 * the server (its records are append-only): run it on a database kept for benchmarks.
 */
public final class SyncBenchmark {
  /** The generated site's name; a later run on the same database reuses it. */
  static final String SITE_NAME = "bench-sync site";

  /** The generated plane: 20 lifts x 25 bays, 500 panels, braced every fifth bay. */
  static final int LIFTS = 20;

  static final int BAYS = 25;

  private final AppServicesFactory factory;
  private final Clock clock;
  private final LongSupplier nanoTime;

  /** @param nanoTime wall-clock nanoseconds ({@code System::nanoTime}) */
  public SyncBenchmark(AppServicesFactory factory, Clock clock, LongSupplier nanoTime) {
    this.factory = Objects.requireNonNull(factory);
    this.clock = Objects.requireNonNull(clock);
    this.nanoTime = Objects.requireNonNull(nanoTime);
  }

  /**
   * One push of several field files at once.
   *
   * @param wallMillis from the start signal until the last file's sync returned
   * @param fieldMillis each file's own sync time
   * @param summaries each file's sync summary
   */
  public record Push(double wallMillis, List<Double> fieldMillis,
      List<SyncService.Summary> summaries) {
    public Push {
      fieldMillis = List.copyOf(fieldMillis);
      summaries = List.copyOf(summaries);
    }

    public int pushedInspections() {
      return summaries.stream().mapToInt(SyncService.Summary::pushedInspections).sum();
    }

    public int pushedObservations() {
      return summaries.stream().mapToInt(SyncService.Summary::pushedObservations).sum();
    }

    public int skippedInspections() {
      return summaries.stream().mapToInt(SyncService.Summary::skippedInspections).sum();
    }

    public List<SyncService.Conflict> conflicts() {
      return summaries.stream().flatMap(s -> s.conflicts().stream()).toList();
    }
  }

  /**
   * The records of one group of field files, counted on the server and compared with the field
   * files by global identity.
   *
   * @param expectedInspections the field files' inspections (fields x inspections)
   * @param serverInspections the server's inspections made by the group's inspector
   * @param missingInspections field inspections whose identity the server lacks
   * @param extraInspections server inspections of the group whose identity no field file has, or
   *     that hold an identity twice: a record stored twice
   * @param expectedObservations the field files' observations of those inspections
   * @param serverObservations the server's observations of the group's inspections
   * @param missingObservations field observations whose identity the server lacks
   * @param extraObservations server observations of the group no field file has, or held twice
   */
  public record Tally(long expectedInspections, long serverInspections, long missingInspections,
      long extraInspections, long expectedObservations, long serverObservations,
      long missingObservations, long extraObservations) {
    /** Every record on the server exactly once. */
    public boolean exactlyOnce() {
      return missingInspections == 0 && extraInspections == 0 && missingObservations == 0
          && extraObservations == 0 && serverInspections == expectedInspections
          && serverObservations == expectedObservations;
    }
  }

  /**
   * The figures.
   *
   * @param tag the inspector name of this run's inspections (the baseline's ends " alone")
   * @param structure the server's structure inspected, in words
   * @param concurrent the timed concurrent push of the N field files
   * @param first the N files' records on the server after it
   * @param alone the baseline: one more field file pushed alone
   * @param aloneTally its records on the server
   * @param again every file (the baseline's too) pushed again, concurrently
   * @param second the N files' records on the server after that
   * @param aloneSecond the baseline file's records after that
   */
  public record Result(String tag, String structure, int fields, int inspections,
      int observations, Push concurrent, Tally first, Push alone, Tally aloneTally, Push again,
      Tally second, Tally aloneSecond) {
    /** Every record exactly once, after both pushes, and nothing pushed the second time. */
    public boolean exactlyOnce() {
      return first.exactlyOnce() && aloneTally.exactlyOnce() && second.exactlyOnce()
          && aloneSecond.exactlyOnce() && again.pushedInspections() == 0
          && concurrent.conflicts().isEmpty() && alone.conflicts().isEmpty()
          && again.conflicts().isEmpty();
    }
  }

  /** One field file of the run, open, with what it holds. */
  private record Field(AppServices services, Set<String> inspections, Set<String> observations) {}

  /**
   * Runs the benchmark against the server's database at {@code address}, making the field files
   * in {@code folder}.
   *
   * @param fields field files pushing at once
   * @param inspections finalised inspections recorded in each
   * @param observations observations in each inspection
   * @param progress told what stage the run has reached (the command prints it on standard error)
   */
  public Result run(String address, Path folder, int fields, int inspections, int observations,
      Consumer<String> progress) {
    long begun = nanoTime.getAsLong();
    String tag = "bench-sync " + UUID.randomUUID().toString().substring(0, 8);
    String aloneTag = tag + " alone";
    List<Field> opened = new ArrayList<>();
    try (AppServices server = factory.openServer(address)) {
      Structure structure = benchStructure(server);
      String structureUuid = server.store().identities().uuidOf(Kind.STRUCTURE, structure.id());
      String structureWords = "structure '" + structure.name() + "' of site '"
          + server.sites().site(structure.siteId()).name() + "'";
      List<Field> group = new ArrayList<>();
      Field baseline;
      int threads = Math.max(1, Math.min(fields + 1, Runtime.getRuntime().availableProcessors()));
      ExecutorService recorders = Executors.newFixedThreadPool(threads);
      try {
        List<Future<Field>> made = new ArrayList<>();
        for (int k = 0; k <= fields; k++) {
          Path file = folder.resolve("field-" + (k + 1) + ".db");
          String inspector = k < fields ? tag : aloneTag;
          AppServices f = factory.open(file);
          opened.add(new Field(f, Set.of(), Set.of()));
          // pulled from the server one at a time (not timed), then recorded in parallel
          new SyncService(clock).sync(f, server);
          made.add(recorders.submit(
              () -> record(f, structureUuid, inspector, inspections, observations)));
        }
        for (Future<Field> m : made) {
          group.add(get(m));
        }
      } finally {
        recorders.shutdownNow();
      }
      baseline = group.remove(group.size() - 1);
      progress.accept(String.format(Locale.ROOT, "%d field files made and recorded in %.0f s"
          + " (not measured); pushing", fields + 1, (nanoTime.getAsLong() - begun) / 1e9));

      Push concurrent = push(address, group);
      Tally first = tally(server, tag, group);
      progress.accept("pushed at once; counting on the server, then the baseline");
      Push alone = push(address, List.of(baseline));
      Tally aloneTally = tally(server, aloneTag, List.of(baseline));
      List<Field> all = new ArrayList<>(group);
      all.add(baseline);
      Push again = push(address, all);
      Tally second = tally(server, tag, group);
      Tally aloneSecond = tally(server, aloneTag, List.of(baseline));
      return new Result(tag, structureWords, fields, inspections, observations, concurrent,
          first, alone, aloneTally, again, second, aloneSecond);
    } finally {
      for (Field f : opened) {
        f.services().close();
      }
    }
  }

  /**
   * The structure the field files inspect: the generated one of an earlier run, else a new one
   * when the database is empty, else the first structure of the first site (as {@code bench-store
   * --server} does).
   */
  private Structure benchStructure(AppServices server) {
    List<Site> sites = server.sites().sites();
    Optional<Site> ours = sites.stream().filter(s -> s.name().equals(SITE_NAME)).findFirst();
    if (ours.isPresent()) {
      return server.sites().structures(ours.get().id()).get(0);
    }
    if (!sites.isEmpty()) {
      return server.sites().structures(sites.get(0).id()).get(0);
    }
    Site site = server.sites().createSite(new Site(0, SITE_NAME, "", "", "",
        ZoneId.of("UTC"), DisplayUnits.METRIC));
    Structure st = server.sites().createStructure(new Structure(0, site.id(), "bench scaffold",
        StructureKind.SCAFFOLD, "", "", Structure.DEFAULT_INTERVAL_DAYS));
    PlaneGrid grid = new PlaneGrid(LIFTS, BAYS, Collections.nCopies(BAYS, 2.5),
        Collections.nCopies(LIFTS, 2.0), Support.PINNED_BASE);
    Map<PanelRef, Brace> braces = new HashMap<>();
    for (int lift = 1; lift <= LIFTS; lift++) {
      for (int bay = 1; bay <= BAYS; bay += 5) {
        braces.put(PanelRef.of(lift, bay),
            Brace.rigid(lift % 2 == 0 ? Diagonal.RISING : Diagonal.FALLING));
      }
    }
    server.sites().createPlane(new PlaneRecord(0, st.id(), "front elevation", grid), "bench",
        LocalDate.of(2025, 1, 1), "", PlaneDesign.of(grid, braces));
    return st;
  }

  /**
   * Records {@code inspections} finalised inspections of {@code observations} observations each
   * in a field file, through the services; each inspection's observations in one transaction of
   * the file (recording is not what is measured). Panels are taken in turn over the inspection's
   * planes, lift then bay, again from the first when there are more observations than panels.
   */
  private Field record(AppServices f, String structureUuid, String inspector, int inspections,
      int observations) {
    long structure = f.store().identities().idOf(Kind.STRUCTURE, structureUuid).orElseThrow();
    List<Long> inspectionIds = new ArrayList<>();
    List<Long> observationIds = new ArrayList<>();
    for (int n = 0; n < inspections; n++) {
      long id = f.inspections().start(structure,
          NewInspection.of(inspector, "", InspectionReason.ROUTINE)).id();
      List<PlaneRecord> planes = f.inspections().planesOf(id);
      List<long[]> panels = new ArrayList<>();
      for (PlaneRecord p : planes) {
        for (int lift = 1; lift <= p.grid().lifts(); lift++) {
          for (int bay = 1; bay <= p.grid().bays(); bay++) {
            panels.add(new long[] {p.id(), lift, bay});
          }
        }
      }
      f.store().inTransaction(() -> {
        for (int k = 0; k < observations; k++) {
          long[] p = panels.get(k % panels.size());
          Observation o = f.inspections().recordObservation(id, NewObservation.of(p[0],
              PanelRef.of((int) p[1], (int) p[2]), PanelState.SOUND, inspector));
          observationIds.add(o.id());
        }
        return null;
      });
      f.inspections().finalise(id);
      inspectionIds.add(id);
    }
    var ids = f.store().identities();
    return new Field(f, new HashSet<>(ids.uuidsOf(Kind.INSPECTION, inspectionIds).values()),
        new HashSet<>(ids.uuidsOf(Kind.OBSERVATION, observationIds).values()));
  }

  /**
   * Pushes every field file at once, one thread each with its own server connection (opened
   * before the clock starts), each running the sync use case.
   */
  private Push push(String address, List<Field> fields) {
    List<AppServices> servers = new ArrayList<>();
    ExecutorService pool = Executors.newFixedThreadPool(fields.size());
    try {
      for (int k = 0; k < fields.size(); k++) {
        servers.add(factory.openServer(address));
      }
      CountDownLatch go = new CountDownLatch(1);
      long[] ends = new long[fields.size()];
      List<Future<SyncService.Summary>> running = new ArrayList<>();
      for (int k = 0; k < fields.size(); k++) {
        int i = k;
        running.add(pool.submit(() -> {
          go.await();
          try {
            return new SyncService(clock).sync(fields.get(i).services(), servers.get(i));
          } finally {
            ends[i] = nanoTime.getAsLong();
          }
        }));
      }
      long start = nanoTime.getAsLong();
      go.countDown();
      List<SyncService.Summary> summaries = new ArrayList<>();
      for (Future<SyncService.Summary> r : running) {
        summaries.add(get(r));
      }
      List<Double> each = new ArrayList<>();
      long last = start;
      for (long end : ends) {
        each.add((end - start) / 1e6);
        last = Math.max(last, end);
      }
      return new Push((last - start) / 1e6, each, summaries);
    } finally {
      pool.shutdownNow();
      servers.forEach(AppServices::close);
    }
  }

  /** The group's records as the server holds them, compared by global identity. */
  private static Tally tally(AppServices server, String inspector, List<Field> group) {
    Set<String> wantInspections = new HashSet<>();
    Set<String> wantObservations = new HashSet<>();
    group.forEach(f -> {
      wantInspections.addAll(f.inspections());
      wantObservations.addAll(f.observations());
    });
    List<Long> inspectionIds = server.inspections().allInspections().stream()
        .filter(i -> i.inspectorName().equals(inspector)).map(Inspection::id).toList();
    List<Long> observationIds = new ArrayList<>();
    for (long id : inspectionIds) {
      server.inspections().observations(id).forEach(o -> observationIds.add(o.id()));
    }
    var ids = server.store().identities();
    List<String> haveInspections =
        new ArrayList<>(ids.uuidsOf(Kind.INSPECTION, inspectionIds).values());
    List<String> haveObservations =
        new ArrayList<>(ids.uuidsOf(Kind.OBSERVATION, observationIds).values());
    return new Tally(wantInspections.size(), inspectionIds.size(),
        missing(wantInspections, haveInspections), extra(wantInspections, haveInspections),
        wantObservations.size(), observationIds.size(),
        missing(wantObservations, haveObservations), extra(wantObservations, haveObservations));
  }

  static long missing(Set<String> want, List<String> have) {
    Set<String> there = new HashSet<>(have);
    return want.stream().filter(u -> !there.contains(u)).count();
  }

  /** Records held that no field file has, plus every repeat of an identity. */
  static long extra(Set<String> want, List<String> have) {
    Set<String> seen = new HashSet<>();
    long extra = 0;
    for (String u : have) {
      if (!want.contains(u) || !seen.add(u)) {
        extra++;
      }
    }
    return extra;
  }

  private static <T> T get(Future<T> f) {
    try {
      return f.get();
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
      throw new IllegalStateException("interrupted", e);
    } catch (ExecutionException e) {
      if (e.getCause() instanceof RuntimeException r) {
        throw r;
      }
      throw new IllegalStateException(e.getCause());
    }
  }
}

package org.bracewalk.app;

import java.time.Clock;
import java.util.Objects;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.port.RecordStore;

/**
 * The application's services over one open store. Closing it closes the store.
 *
 * @param store the open store (for its location; use the services for everything else)
 * @param sites sites, structures, planes and designs
 * @param inspections inspections and observations
 * @param analysis every plane of an inspection against its design
 * @param history a plane across inspections
 * @param files site files and observation CSVs in and out
 * @param demo the demo site
 * @param repairs repair orders and their actions
 */
public record AppServices(
    RecordStore store,
    SiteService sites,
    InspectionService inspections,
    AnalysisService analysis,
    HistoryService history,
    ImportExportService files,
    DemoService demo,
    RepairService repairs)
    implements AutoCloseable {

  public AppServices {
    Objects.requireNonNull(store, "store");
  }

  /** Builds every service over {@code store}. */
  public static AppServices over(RecordStore store, Clock clock, PlaneAnalyzer analyzer) {
    SiteService sites = new SiteService(store, clock);
    InspectionService inspections = new InspectionService(store, clock);
    AnalysisService analysis = new AnalysisService(inspections, sites, analyzer);
    HistoryService history = new HistoryService(sites, inspections, analysis);
    ImportExportService files = new ImportExportService(store, clock);
    return new AppServices(store, sites, inspections, analysis, history, files,
        new DemoService(store, files), new RepairService(store, clock));
  }

  /** Where the record is kept (the database file's path), for the user to see. */
  public String location() {
    return store.location();
  }

  /**
   * The writer of output files for this database: it refuses the database file and its
   * companions as targets. Add the files a command reads with {@link OutputFiles#withInput}.
   */
  public OutputFiles outputs() {
    return OutputFiles.guarding(store.databaseFile());
  }

  @Override
  public void close() {
    store.close();
  }
}

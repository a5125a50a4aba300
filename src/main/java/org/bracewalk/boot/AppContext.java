package org.bracewalk.boot;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Duration;
import java.util.List;
import java.util.Map;
import org.bracewalk.app.AppServices;
import org.bracewalk.app.AppServicesFactory;
import org.bracewalk.app.report.ReportService;
import org.bracewalk.app.report.ReportServiceFactory;
import org.bracewalk.cli.CliContext;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.report.PdfDocumentStampReader;
import org.bracewalk.report.PdfRepairOrderRenderer;
import org.bracewalk.report.PdfReportRenderer;
import org.bracewalk.report.TemplateSource;
import org.bracewalk.store.Database;

/**
 * Builds the store and the services. The clock ticks in whole milliseconds, the precision the
 * store keeps, so a record read back equals the one written.
 */
public final class AppContext {
  private final Clock clock;
  private final PlaneAnalyzer analyzer;

  public AppContext(Clock clock, PlaneAnalyzer analyzer) {
    this.clock = Clock.tick(clock, Duration.ofMillis(1));
    this.analyzer = analyzer;
  }

  /** The program's context: the system clock in UTC and the standard engine. */
  public static AppContext standard() {
    return new AppContext(Clock.systemUTC(), PlaneAnalyzer.standard());
  }

  /** Opens the database file and the services over it. */
  public AppServices open(Path database) {
    return AppServices.over(Database.open(database), clock, analyzer);
  }

  /** Opens services over a file, and deletes a Bracewalk file to start again. */
  public AppServicesFactory factory() {
    return new AppServicesFactory() {
      @Override
      public AppServices open(Path database) {
        return AppContext.this.open(database);
      }

      @Override
      public boolean deleteDatabase(Path database) {
        return Database.delete(database);
      }
    };
  }

  public Clock clock() {
    return clock;
  }

  /** The engine every command uses. */
  public PlaneAnalyzer analyzer() {
    return analyzer;
  }

  /** The variable naming a folder of edited wording templates (default: the packed ones). */
  public static final String TEMPLATES_VARIABLE = "BRACEWALK_TEMPLATES";

  /** The variable naming the templates' language: {@code report.<lang>.properties} (default en). */
  public static final String LANGUAGE_VARIABLE = "BRACEWALK_LANG";

  /**
   * The report service over open services, with the PDF renderers reading their wording from
   * {@code $BRACEWALK_TEMPLATES} (a folder) or the packed {@code templates/}, in the language
   * {@code $BRACEWALK_LANG} (default {@code en}). The files of that folder are the factory's
   * {@link ReportServiceFactory#inputFiles}: no document is written over them.
   */
  public ReportServiceFactory reportFactory(Map<String, String> env) {
    String folder = env.get(TEMPLATES_VARIABLE);
    TemplateSource source = folder == null || folder.isBlank()
        ? TemplateSource.packed() : TemplateSource.folder(Path.of(folder));
    String lang = env.get(LANGUAGE_VARIABLE);
    String language = lang == null || lang.isBlank() ? "en" : lang.strip();
    PdfReportRenderer reports = new PdfReportRenderer(source, language);
    PdfRepairOrderRenderer orders = new PdfRepairOrderRenderer(source, language);
    PdfDocumentStampReader stamps = new PdfDocumentStampReader();
    List<Path> inputs = folder == null || folder.isBlank() ? List.of() : filesIn(Path.of(folder));
    return new ReportServiceFactory() {
      @Override
      public ReportService over(AppServices services) {
        return new ReportService(services, analyzer, reports, orders, stamps, clock);
      }

      @Override
      public List<Path> inputFiles() {
        return inputs;
      }
    };
  }

  /** The files directly in {@code folder} (none when it cannot be listed: the renderer says why). */
  private static List<Path> filesIn(Path folder) {
    try (var listing = Files.list(folder)) {
      return listing.filter(Files::isRegularFile).toList();
    } catch (IOException e) {
      return List.of();
    }
  }

  /** What the store commands need, with the environment given to the program. */
  public CliContext cliContext(Map<String, String> env) {
    return new CliContext(factory(), env, System.getProperty("os.name", ""),
        Path.of(System.getProperty("user.home", ".")), clock);
  }
}

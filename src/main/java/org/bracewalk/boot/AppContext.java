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
import org.bracewalk.core.port.DocumentSigner;
import org.bracewalk.core.port.RenderingException;
import org.bracewalk.report.PdfDocumentStampReader;
import org.bracewalk.report.Pkcs12Signer;
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

  /**
   * Opens a team server's database ({@code postgresql://HOST[:PORT]/DB}) and the services over
   * it; {@code env} gives the server's login ({@code PGUSER}, {@code PGPASSWORD}, {@code
   * PGSSLMODE}; the driver reads {@code ~/.pgpass} itself).
   */
  public AppServices openServer(String address, Map<String, String> env) {
    return AppServices.over(Database.open(address, env), clock, analyzer);
  }

  /** Opens services over a file, and deletes a Bracewalk file to start again. */
  public AppServicesFactory factory() {
    return factory(Map.of());
  }

  /**
   * As {@link #factory()}, opening team servers too, logging in with {@code env}'s {@code PGUSER}
   * and {@code PGPASSWORD}.
   */
  public AppServicesFactory factory(Map<String, String> env) {
    return new AppServicesFactory() {
      @Override
      public AppServices open(Path database) {
        return AppContext.this.open(database);
      }

      @Override
      public AppServices openServer(String address) {
        return AppContext.this.openServer(address, env);
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

  /** The variable naming the PKCS#12 file whose key signs reports and repair orders. */
  public static final String SIGN_FILE_VARIABLE = "BRACEWALK_SIGN_P12";

  /** The variable holding the password of {@code $BRACEWALK_SIGN_P12} (and of its key). */
  public static final String SIGN_PASSWORD_VARIABLE = "BRACEWALK_SIGN_PASSWORD";

  /**
   * The report service over open services, with the PDF renderers reading their wording from
   * {@code $BRACEWALK_TEMPLATES} (a folder) or the packed {@code templates/}, in the language
   * {@code $BRACEWALK_LANG} (default {@code en}). The files of that folder are the factory's
   * {@link ReportServiceFactory#inputFiles}: no document is written over them. Reports and repair
   * orders are signed with the key in {@code $BRACEWALK_SIGN_P12} when it is set (the file is read
   * at the first signature).
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
    DocumentSigner signer = signer(env);
    List<Path> inputs = new java.util.ArrayList<>(
        folder == null || folder.isBlank() ? List.of() : filesIn(Path.of(folder)));
    String key = env.get(SIGN_FILE_VARIABLE);
    if (key != null && !key.isBlank()) {
      try {
        inputs.add(Path.of(key.strip())); // the signing key is read too: never written over
      } catch (java.nio.file.InvalidPathException e) {
        // the signer refuses it, naming the variable
      }
    }
    return new ReportServiceFactory() {
      @Override
      public ReportService over(AppServices services) {
        return new ReportService(services, analyzer, reports, orders, stamps, signer, clock);
      }

      @Override
      public List<Path> inputFiles() {
        return List.copyOf(inputs);
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

  /**
   * The signer the environment configures: none when {@code $BRACEWALK_SIGN_P12} is unset or
   * empty. A file without a password, or a password without a file, is refused when a document
   * is made (not before: the other commands do not sign), naming the variable.
   */
  DocumentSigner signer(Map<String, String> env) {
    String file = env.get(SIGN_FILE_VARIABLE);
    String password = env.get(SIGN_PASSWORD_VARIABLE);
    boolean hasFile = file != null && !file.isBlank();
    boolean hasPassword = password != null && !password.isEmpty();
    if (!hasFile && !hasPassword) {
      return DocumentSigner.NONE;
    }
    Path path = null;
    if (hasFile) {
      try {
        path = Path.of(file.strip());
      } catch (java.nio.file.InvalidPathException e) {
        return refusing(SIGN_FILE_VARIABLE + " names no usable file: " + e.getMessage());
      }
    }
    if (!hasFile || !hasPassword) {
      return refusing(hasFile
          ? SIGN_FILE_VARIABLE + " is set but " + SIGN_PASSWORD_VARIABLE + " is not: set the"
              + " password of " + file.strip() + " there, or unset " + SIGN_FILE_VARIABLE
              + " to issue unsigned documents"
          : SIGN_PASSWORD_VARIABLE + " is set but " + SIGN_FILE_VARIABLE + " is not: set it to"
              + " the PKCS#12 file (.p12) to sign with");
    }
    return new Pkcs12Signer(path, password.toCharArray(), "$" + SIGN_FILE_VARIABLE,
        "$" + SIGN_PASSWORD_VARIABLE, clock);
  }

  /** A signer configured wrongly: every document it is asked to sign is refused with the message. */
  private static DocumentSigner refusing(String message) {
    return new DocumentSigner() {
      @Override
      public byte[] sign(byte[] pdf, String reason) {
        throw new RenderingException(message);
      }

      @Override
      public boolean signs() {
        return true;
      }
    };
  }

  /** What the store commands need, with the environment given to the program. */
  public CliContext cliContext(Map<String, String> env) {
    return new CliContext(factory(env), env, System.getProperty("os.name", ""),
        Path.of(System.getProperty("user.home", ".")), clock);
  }
}

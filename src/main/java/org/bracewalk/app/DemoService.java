package org.bracewalk.app;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.Objects;
import org.bracewalk.core.port.RecordStore;

/**
 * The invented demo site (Larkspur Depot: a facade scaffold and a racking run), shipped as a site
 * file in {@code demo-site/} and loaded through the ordinary importer.
 */
public final class DemoService {
  /** Where the demo site file is on the class path (packed from {@code demo-site/}). */
  public static final String RESOURCE = "/demo-site/larkspur-depot.site.json";

  private final RecordStore store;
  private final ImportExportService files;

  public DemoService(RecordStore store, ImportExportService files) {
    this.store = Objects.requireNonNull(store);
    this.files = Objects.requireNonNull(files);
  }

  /** The demo site file's text. */
  public static String siteFileText() {
    try (InputStream in = DemoService.class.getResourceAsStream(RESOURCE)) {
      if (in == null) {
        throw new IllegalStateException("the demo site " + RESOURCE + " is missing from the program");
      }
      return new String(in.readAllBytes(), StandardCharsets.UTF_8);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  /**
   * Loads the demo site into an empty database.
   *
   * @throws UserInputException when the database already holds sites (the demo's inspection ids
   *     are only the documented ones in a fresh database)
   */
  public ImportedSite load() {
    int existing = store.sites().all().size();
    if (existing > 0) {
      throw new UserInputException(
          store.location()
              + " already holds "
              + existing
              + (existing == 1 ? " site" : " sites")
              + "; load the demo into a new database file (--db demo.db)");
    }
    return files.importSite("demo-site/larkspur-depot.site.json", siteFileText());
  }
}

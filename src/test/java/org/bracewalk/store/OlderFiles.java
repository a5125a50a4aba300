package org.bracewalk.store;

import java.nio.file.Path;
import org.flywaydb.core.Flyway;

/**
 * Database files as an older Bracewalk left them: the packed migrations applied only up to a
 * version, by Flyway, with no application id written. Tests of a migration build their file here.
 */
public final class OlderFiles {
  private OlderFiles() {}

  /** Migrates {@code file} (created when new) up to {@code version} ("2", "6"..., or "latest"). */
  public static Path migratedTo(Path file, String version) {
    Flyway.configure(Database.class.getClassLoader())
        .dataSource(Database.dataSource(file))
        .locations("classpath:db/migration")
        .target(version)
        .load()
        .migrate();
    return file;
  }
}

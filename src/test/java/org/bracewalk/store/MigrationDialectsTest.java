package org.bracewalk.store;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * The two dialects' migrations are one history: {@code db-migrations/postgresql/} holds a script
 * of the same version and description for every SQLite script, and nothing else; and the SQLite
 * location packed as {@code db/migration} holds none of the PostgreSQL scripts (Flyway scans a
 * location's sub-folders too, so a packed {@code db/migration/postgresql/} would be applied to
 * every database file).
 */
class MigrationDialectsTest {
  private static List<String> scripts(Path folder) throws Exception {
    try (Stream<Path> listing = Files.list(folder)) {
      return listing.filter(Files::isRegularFile)
          .map(p -> p.getFileName().toString())
          .filter(n -> n.endsWith(".sql"))
          .sorted(java.util.Comparator.comparingInt(
              n -> Integer.parseInt(n.substring(1, n.indexOf("__")))))
          .toList();
    }
  }

  @Test
  void bothFoldersHoldTheSameVersionsAndDescriptions() throws Exception {
    assertThat(scripts(Path.of("db-migrations/postgresql")))
        .isEqualTo(scripts(Path.of("db-migrations")))
        .isEqualTo(Database.MIGRATION_SCRIPTS);
  }

  @Test
  void thePackedSqliteLocationHoldsNoPostgresqlScript() throws Exception {
    ClassLoader loader = MigrationDialectsTest.class.getClassLoader();
    assertThat(loader.getResource("db/migration/postgresql")).isNull();
    for (String script : Database.MIGRATION_SCRIPTS) {
      assertThat(loader.getResource("db/migration/" + script)).as(script).isNotNull();
      assertThat(loader.getResource("db/postgresql/" + script)).as(script).isNotNull();
    }
  }

  @Test
  void theSqliteScriptsArePackedByteForByte() throws Exception {
    // Flyway's checksum of a database file's history is of these bytes: they must not change
    ClassLoader loader = MigrationDialectsTest.class.getClassLoader();
    for (String script : Database.MIGRATION_SCRIPTS) {
      try (var in = loader.getResourceAsStream("db/migration/" + script)) {
        assertThat(in.readAllBytes()).as(script)
            .isEqualTo(Files.readAllBytes(Path.of("db-migrations", script)));
      }
    }
  }
}

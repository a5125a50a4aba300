package org.bracewalk.boot;

import java.nio.file.Path;
import java.time.Clock;
import java.time.Duration;
import java.util.Map;
import org.bracewalk.app.AppServices;
import org.bracewalk.app.AppServicesFactory;
import org.bracewalk.cli.CliContext;
import org.bracewalk.core.analysis.PlaneAnalyzer;
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

  public AppServicesFactory factory() {
    return this::open;
  }

  public Clock clock() {
    return clock;
  }

  /** The engine every command uses. */
  public PlaneAnalyzer analyzer() {
    return analyzer;
  }

  /** What the store commands need, with the environment given to the program. */
  public CliContext cliContext(Map<String, String> env) {
    return new CliContext(factory(), env, System.getProperty("os.name", ""),
        Path.of(System.getProperty("user.home", ".")), clock);
  }
}

package org.bracewalk.ui;

import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import org.bracewalk.app.AppServices;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.store.Database;

/** A fresh database file, optionally with the demo site, for view-model tests. */
public final class DemoDatabase {
  private DemoDatabase() {}

  /** A fixed clock: 2025-03-15 09:00 UTC, ten days after the demo's last inspection. */
  public static final Clock CLOCK = Clock.fixed(Instant.parse("2025-03-15T09:00:00Z"), ZoneOffset.UTC);

  public static AppServices empty(Path dir) {
    return AppServices.over(Database.open(dir.resolve("test.db")), CLOCK, PlaneAnalyzer.standard());
  }

  public static AppServices withDemo(Path dir) {
    AppServices s = empty(dir);
    s.demo().load();
    return s;
  }
}

package org.bracewalk.app;

import java.nio.file.Path;

/**
 * Opens the services over one database file. The composition root provides it, so front ends
 * choose the file without knowing how it is stored.
 */
@FunctionalInterface
public interface AppServicesFactory {
  /**
   * Opens (creating when new) the database file and returns the services over it.
   *
   * @throws org.bracewalk.core.port.StoreException naming the file when it cannot be opened
   */
  AppServices open(Path database);
}

package org.bracewalk.app;

import java.nio.file.Path;

/**
 * Opens the services over one database file. The composition root provides it, so front ends
 * choose the file without knowing how it is stored.
 */
public interface AppServicesFactory {
  /**
   * Opens (creating when new) the database file and returns the services over it. A file that is
   * not a Bracewalk database, or one in a folder that does not exist, is refused and left as it
   * was.
   *
   * @throws org.bracewalk.core.port.StoreException naming the file when it cannot be opened
   */
  AppServices open(Path database);

  /**
   * Opens the services over a team server's database, given as {@code
   * postgresql://HOST[:PORT]/DB} (credentials from {@code PGUSER}, {@code ~/.pgpass} or {@code
   * PGPASSWORD}, never from the address). A factory that opens files only refuses it.
   *
   * @throws org.bracewalk.core.port.StoreException naming the server when it cannot be opened
   */
  default AppServices openServer(String address) {
    throw new UserInputException("this program opens database files only, not the server "
        + address);
  }

  /**
   * Deletes a Bracewalk database file with its companion files, to start it again ({@code demo
   * --replace}); nothing when there is no file. Any other file is refused and left as it was.
   *
   * @return true when a database was deleted
   * @throws org.bracewalk.core.port.StoreException naming the file and saying what it is
   */
  boolean deleteDatabase(Path database);
}

package org.bracewalk.core.port;

import java.nio.file.Path;
import java.util.Optional;

/**
 * Everything Bracewalk keeps about sites, in one place (one database file). The repositories share
 * the store's connection; {@link #inTransaction} makes a group of calls all-or-nothing.
 */
public interface RecordStore extends AutoCloseable {

  SiteRepository sites();

  StructureRepository structures();

  PlaneRepository planes();

  DesignRepository designs();

  InspectionRepository inspections();

  ObservationRepository observations();

  RepairRepository repairs();

  IssuedReportRepository issuedReports();

  /** The global identities (UUIDs) of the records, the same in every copy of a record. */
  GlobalIdentities identities();

  /**
   * Runs {@code work} in one transaction: every change it makes through the repositories is
   * committed together when it returns, and none is kept when it throws (the exception is passed
   * on). A call inside another joins it.
   */
  <T> T inTransaction(Work<T> work);

  /** Where the records live, for messages (a file path). */
  String location();

  /**
   * The database file that holds the records, when they are in one: no output of the program
   * may be written over it or its companion files ({@code org.bracewalk.app.OutputFiles}).
   */
  default Optional<Path> databaseFile() {
    return Optional.empty();
  }

  /** Closes the store; further calls fail. */
  @Override
  void close();

  /** A unit of work run by {@link #inTransaction}. */
  @FunctionalInterface
  interface Work<T> {
    T run();
  }
}

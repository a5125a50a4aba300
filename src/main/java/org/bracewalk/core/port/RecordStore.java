package org.bracewalk.core.port;

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

  /**
   * Runs {@code work} in one transaction: every change it makes through the repositories is
   * committed together when it returns, and none is kept when it throws (the exception is passed
   * on). A call inside another joins it.
   */
  <T> T inTransaction(Work<T> work);

  /** Where the records live, for messages (a file path). */
  String location();

  /** Closes the store; further calls fail. */
  @Override
  void close();

  /** A unit of work run by {@link #inTransaction}. */
  @FunctionalInterface
  interface Work<T> {
    T run();
  }
}

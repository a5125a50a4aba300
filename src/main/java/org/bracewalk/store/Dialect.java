package org.bracewalk.store;

/**
 * What differs between the two stores' SQL, kept in one place: where the migrations are, how a
 * transaction begins, how the id of the row just inserted is asked. The repositories' SQL is
 * otherwise the same on both (standard SQL both engines run alike).
 */
enum Dialect {
  /** A database file (the field laptop's store): {@code db-migrations/}. */
  SQLITE("classpath:db/migration", "BEGIN IMMEDIATE", "SELECT last_insert_rowid()"),
  /** A team server: {@code db-migrations/postgresql/}, the same versions and rules. */
  POSTGRESQL("classpath:db/postgresql", "BEGIN", "SELECT lastval()");

  private final String migrations;
  private final String begin;
  private final String lastInsertId;

  Dialect(String migrations, String begin, String lastInsertId) {
    this.migrations = migrations;
    this.begin = begin;
    this.lastInsertId = lastInsertId;
  }

  /** The Flyway location of this dialect's migrations. */
  String migrations() {
    return migrations;
  }

  /**
   * The statement that begins a transaction: SQLite takes the write lock at once ({@code
   * IMMEDIATE}) so two writers queue instead of deadlocking; PostgreSQL locks rows as it goes.
   */
  String begin() {
    return begin;
  }

  /**
   * The query for the id the last insert on this connection was given: SQLite's rowid; on
   * PostgreSQL the last value an identity column's sequence gave in this session.
   */
  String lastInsertId() {
    return lastInsertId;
  }
}

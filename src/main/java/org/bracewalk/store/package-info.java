/**
 * SQLite repositories (xerial JDBC), Flyway migrations from {@code db-migrations/}, import and
 * export. Implements {@code core.port}.
 */
package org.bracewalk.store;

/**
 * Use cases: orchestrate the engine and the ports. No JavaFX, JDBC, PDF or command-line types.
 */
package org.bracewalk.app;

/**
 * The command line (picocli). Commands are thin: they call {@code app} services and write only to
 * picocli's writers.
 */
package org.bracewalk.cli;

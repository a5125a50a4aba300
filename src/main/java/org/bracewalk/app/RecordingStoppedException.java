package org.bracewalk.app;

import org.bracewalk.core.port.StoreException;

/**
 * Recording a file row by row stopped part-way (the database stayed busy, the inspection was
 * finalised meanwhile, ...). Unlike other errors, something was saved: the message says exactly
 * which rows are recorded (each committed and acknowledged before the next), that nothing after
 * them is, and that running the same command again records the rest and nothing twice.
 */
public final class RecordingStoppedException extends StoreException {
  private static final long serialVersionUID = 1L;

  private final int lastRecordedLine;

  RecordingStoppedException(String message, int lastRecordedLine, Throwable cause) {
    super(message, cause);
    this.lastRecordedLine = lastRecordedLine;
  }

  /** The line of the last row of the file that is recorded; 0 when none is. */
  public int lastRecordedLine() {
    return lastRecordedLine;
  }
}

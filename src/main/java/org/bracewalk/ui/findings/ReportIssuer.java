package org.bracewalk.ui.findings;

import java.nio.file.Path;
import java.util.function.Consumer;

/**
 * Issues an inspection's documents. Called off the UI thread; reports how far it has got. The
 * composition root provides it over the report service.
 */
public interface ReportIssuer {

  /** How far a document has got: a fraction from 0 to 1 and a few words. */
  record Progress(double fraction, String words) {}

  /**
   * Writes the inspection report (PDF) to {@code out} and records that it was issued; returns a
   * line for the status bar. Throws with a message naming what is missing when it cannot.
   */
  String issueReport(long inspectionId, Path out, Consumer<Progress> progress);

  /** Writes the repair order (PDF, and a CSV beside it) to {@code out}; returns a status line. */
  String issueRepairOrder(long inspectionId, Path out, Consumer<Progress> progress);
}

package org.bracewalk.core.port;

import java.io.IOException;
import java.io.OutputStream;
import org.bracewalk.core.port.report.ReportContent;

/** Turns an inspection report's content into a document (a PDF in Bracewalk). */
public interface ReportRenderer {

  /**
   * Writes the report to {@code out}; nothing is written when it fails.
   *
   * @throws RenderingException when the wording templates are missing or malformed, or the content
   *     cannot be shown; the message names the file and key or the field
   * @throws IOException when {@code out} fails
   */
  void renderReport(ReportContent report, OutputStream out) throws IOException;
}

package org.bracewalk.core.port;

import java.io.IOException;
import java.io.OutputStream;
import org.bracewalk.core.port.report.RepairOrderContent;

/** Turns a repair order into a document the crew can work down on site. */
public interface RepairOrderRenderer {

  /**
   * Writes the repair order to {@code out}; nothing is written when it fails.
   *
   * @throws RenderingException when the wording templates are missing or malformed
   * @throws IOException when {@code out} fails
   */
  void renderRepairOrder(RepairOrderContent order, OutputStream out) throws IOException;
}

package org.bracewalk.core.port;

import java.io.IOException;
import java.io.InputStream;
import java.util.Optional;
import org.bracewalk.core.port.report.DocumentStamp;

/** Reads back the stamp a Bracewalk document carries about itself. */
public interface DocumentStampReader {

  /**
   * The stamp of the document in {@code in}, or empty when it is not a document Bracewalk made
   * (not a PDF, or a PDF without a complete, well-formed stamp).
   *
   * @throws IOException when reading fails
   */
  Optional<DocumentStamp> readStamp(InputStream in) throws IOException;
}

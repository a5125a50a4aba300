package org.bracewalk.report;

import com.lowagie.text.pdf.PdfReader;
import java.io.IOException;
import java.io.InputStream;
import java.util.Map;
import java.util.Optional;
import org.bracewalk.core.port.DocumentStampReader;
import org.bracewalk.core.port.report.DocumentStamp;

/** Reads the stamp from a PDF's document information; anything unreadable is "not ours". */
public final class PdfDocumentStampReader implements DocumentStampReader {

  @Override
  public Optional<DocumentStamp> readStamp(InputStream in) throws IOException {
    byte[] bytes = in.readAllBytes();
    if (bytes.length < 5 || !new String(bytes, 0, 5, java.nio.charset.StandardCharsets.US_ASCII).equals("%PDF-")) {
      return Optional.empty();
    }
    Map<String, String> info;
    try {
      PdfReader reader = new PdfReader(bytes);
      try {
        info = reader.getInfo();
      } finally {
        reader.close();
      }
    } catch (IOException | RuntimeException e) {
      // a damaged or foreign PDF: not one of ours, whatever the cause
      return Optional.empty();
    }
    return StampCodec.decode(info);
  }
}

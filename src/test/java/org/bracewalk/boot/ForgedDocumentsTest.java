package org.bracewalk.boot;

import org.bracewalk.boot.Commands.Run;
import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.cos.COSArray;
import org.apache.pdfbox.cos.COSBase;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.cos.COSString;
import org.apache.pdfbox.pdfparser.PDFStreamParser;
import org.apache.pdfbox.pdfwriter.ContentStreamWriter;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentInformation;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.common.PDStream;
import org.apache.pdfbox.text.PDFTextStripper;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The attacks on verify-report, repeated as a user would run them: an issued report whose text is
 * edited, and one inspection's stamp pasted into another inspection's report. Both once exited 0
 * ("matches"); a document verifies only when its bytes are a registered issued copy, its stamp
 * names that copy, and the records are unchanged.
 */
class ForgedDocumentsTest {
  @TempDir Path dir;
  private Path db;
  private final AppContext context =
      new AppContext(Clock.fixed(Instant.parse("2025-03-06T09:00:00Z"), ZoneOffset.UTC),
          PlaneAnalyzer.standard());

  Run run(String... args) {
    return Commands.run(context, Map.of(), args);
  }

  @BeforeEach
  void demo() {
    db = dir.resolve("demo.db");
    assertThat(run("demo", "--db", db.toString()).code()).isZero();
  }

  private Path report(long inspection, String name) {
    Path pdf = dir.resolve(name);
    Run r = run("report", "--db", db.toString(), "--inspection", String.valueOf(inspection),
        "--out", pdf.toString());
    assertThat(r.code()).as(r.err()).isZero();
    return pdf;
  }

  static String text(byte[] pdf) throws IOException {
    try (PDDocument d = Loader.loadPDF(pdf)) {
      return new PDFTextStripper().getText(d).replaceAll("\\s+", " ");
    }
  }

  /**
   * Rewrites every text operand (Tj, TJ, ', ") of every page that contains {@code from}, as an
   * editor would, keeping the document information (the stamp) as it is. OpenPDF compresses
   * content streams, so the edit goes through PDFBox's content-stream parser and writer.
   */
  static byte[] replaceText(byte[] pdf, String from, String to) throws IOException {
    try (PDDocument d = Loader.loadPDF(pdf)) {
      int replaced = 0;
      for (PDPage page : d.getPages()) {
        PDFStreamParser parser = new PDFStreamParser(page);
        List<Object> tokens = new ArrayList<>(parser.parse());
        boolean changed = false;
        for (int i = 0; i < tokens.size(); i++) {
          if (tokens.get(i) instanceof COSString s && edited(s, from, to) != null) {
            tokens.set(i, edited(s, from, to));
            changed = true;
            replaced++;
          } else if (tokens.get(i) instanceof COSArray a) {
            for (int j = 0; j < a.size(); j++) {
              COSBase b = a.get(j);
              if (b instanceof COSString s && edited(s, from, to) != null) {
                a.set(j, edited(s, from, to));
                changed = true;
                replaced++;
              }
            }
          }
        }
        if (changed) {
          PDStream stream = new PDStream(d);
          try (OutputStream out = stream.createOutputStream(COSName.FLATE_DECODE)) {
            new ContentStreamWriter(out).writeTokens(tokens);
          }
          page.setContents(stream);
        }
      }
      assertThat(replaced).as("text operands holding '%s'", from).isPositive();
      ByteArrayOutputStream out = new ByteArrayOutputStream();
      d.save(out);
      return out.toByteArray();
    }
  }

  private static COSString edited(COSString s, String from, String to) {
    String text = new String(s.getBytes(), StandardCharsets.ISO_8859_1);
    return text.contains(from)
        ? new COSString(text.replace(from, to).getBytes(StandardCharsets.ISO_8859_1)) : null;
  }

  /** Copies the Bracewalk entries of one document's information into another's. */
  static byte[] pasteStamp(byte[] from, byte[] into) throws IOException {
    try (PDDocument source = Loader.loadPDF(from); PDDocument target = Loader.loadPDF(into)) {
      PDDocumentInformation a = source.getDocumentInformation();
      PDDocumentInformation b = target.getDocumentInformation();
      int copied = 0;
      for (String key : a.getMetadataKeys()) {
        if (key.startsWith("Bracewalk")) {
          b.setCustomMetadataValue(key, a.getCustomMetadataValue(key));
          copied++;
        }
      }
      assertThat(copied).as("stamp entries").isEqualTo(5);
      ByteArrayOutputStream out = new ByteArrayOutputStream();
      target.save(out);
      return out.toByteArray();
    }
  }

  @Test
  void anUnchangedIssuedReportMatches() throws Exception {
    Path pdf = report(2, "impact.pdf");
    Run v = run("verify-report", "--db", db.toString(), pdf.toString());
    assertThat(v.code()).as(v.out()).isZero();
    assertThat(v.out()).contains("matches: " + pdf + " is the inspection-report issued as"
        + " impact.pdf").contains("for inspection 2");
  }

  @Test
  void aReportWhoseVerdictIsEditedDoesNotVerify() throws Exception {
    Path pdf = report(2, "impact.pdf");
    byte[] issued = Files.readAllBytes(pdf);
    assertThat(text(issued)).contains("LOST RIGIDITY");
    byte[] edited = replaceText(issued, "LOST RIGIDITY", "All planes hold their shape");
    assertThat(text(edited)).doesNotContain("LOST RIGIDITY").contains("All planes hold their shape");
    Path forged = dir.resolve("impact-edited.pdf");
    Files.write(forged, edited);

    Run v = run("verify-report", "--db", db.toString(), forged.toString());
    assertThat(v.code()).as(v.out()).isEqualTo(1);
    assertThat(v.out()).contains("does not match: " + forged + " (inspection-report of inspection 2)")
        .contains("these bytes are not an issued copy (edited after issue, or never issued)")
        .contains("stamp names the inspection-report of inspection 2 issued as impact.pdf")
        .doesNotContain("matches:");
    // the issued copy itself still matches
    assertThat(run("verify-report", "--db", db.toString(), pdf.toString()).code()).isZero();
  }

  @Test
  void oneInspectionsStampPastedIntoAnothersReportDoesNotVerify() throws Exception {
    byte[] routine = Files.readAllBytes(report(1, "routine.pdf"));
    byte[] impact = Files.readAllBytes(report(2, "impact.pdf"));
    assertThat(text(impact)).contains("LOST RIGIDITY");
    Path forged = dir.resolve("impact-as-routine.pdf");
    Files.write(forged, pasteStamp(routine, impact));

    Run v = run("verify-report", "--db", db.toString(), forged.toString());
    assertThat(v.code()).as(v.out()).isEqualTo(1);
    assertThat(v.out()).contains("does not match: " + forged + " (inspection-report of inspection 1)")
        .contains("these bytes are not an issued copy (edited after issue, or never issued)")
        .contains("stamp names the inspection-report of inspection 1 issued as routine.pdf")
        .contains("but this file is not that copy");
  }

  @Test
  void aRepairOrderWithAnEditedLineDoesNotVerify() throws Exception {
    Path pdf = dir.resolve("order.pdf");
    Run r = run("repair-order", "--db", db.toString(), "--inspection", "2", "--out", pdf.toString());
    assertThat(r.code()).as(r.err()).isZero();
    assertThat(run("verify-report", "--db", db.toString(), pdf.toString()).code()).isZero();
    byte[] edited = replaceText(Files.readAllBytes(pdf), "frame 2", "frame 3");
    Path forged = dir.resolve("order-edited.pdf");
    Files.write(forged, edited);
    Run v = run("verify-report", "--db", db.toString(), forged.toString());
    assertThat(v.code()).as(v.out()).isEqualTo(1);
    assertThat(v.out()).contains("these bytes are not an issued copy");
  }
}

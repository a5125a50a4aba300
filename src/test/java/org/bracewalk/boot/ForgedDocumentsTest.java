package org.bracewalk.boot;

import org.bracewalk.boot.Commands.Run;
import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.contentstream.operator.Operator;
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
import org.apache.pdfbox.pdmodel.font.PDFont;
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
   * content streams, so the edit goes through PDFBox's content-stream parser and writer. The
   * documents' fonts are embedded subsets with Identity-H encoding, so an operand holds glyph
   * codes: it is read through the font's ToUnicode map and the new text written with the codes
   * the same font uses elsewhere in the document (as a forger with a PDF editor would).
   */
  static byte[] replaceText(byte[] pdf, String from, String to) throws IOException {
    try (PDDocument d = Loader.loadPDF(pdf)) {
      // the code of every character each font shows anywhere in the document
      Map<COSBase, Map<String, byte[]>> codes = new HashMap<>();
      List<List<Object>> pages = new ArrayList<>();
      List<Map<Integer, PDFont>> fontAt = new ArrayList<>();
      for (PDPage page : d.getPages()) {
        List<Object> tokens = new ArrayList<>(new PDFStreamParser(page).parse());
        Map<Integer, PDFont> fonts = new HashMap<>();
        PDFont font = null;
        for (int i = 0; i < tokens.size(); i++) {
          Object t = tokens.get(i);
          if (t instanceof Operator op && op.getName().equals("Tf") && i >= 2
              && tokens.get(i - 2) instanceof COSName name) {
            font = page.getResources().getFont(name);
          } else if (font != null && (t instanceof COSString || t instanceof COSArray)) {
            fonts.put(i, font);
            for (COSString str : strings(t)) {
              decode(font, str, codes.computeIfAbsent(font.getCOSObject(), k -> new HashMap<>()));
            }
          }
        }
        pages.add(tokens);
        fontAt.add(fonts);
      }
      int replaced = 0;
      int n = 0;
      for (PDPage page : d.getPages()) {
        List<Object> tokens = pages.get(n);
        Map<Integer, PDFont> fonts = fontAt.get(n++);
        boolean changed = false;
        for (Map.Entry<Integer, PDFont> e : fonts.entrySet()) {
          Object t = tokens.get(e.getKey());
          Map<String, byte[]> known = codes.get(e.getValue().getCOSObject());
          if (t instanceof COSString str) {
            COSString edited = edited(e.getValue(), str, from, to, known);
            if (edited != null) {
              tokens.set(e.getKey(), edited);
              changed = true;
              replaced++;
            }
          } else if (t instanceof COSArray a) {
            for (int j = 0; j < a.size(); j++) {
              if (a.get(j) instanceof COSString str) {
                COSString edited = edited(e.getValue(), str, from, to, known);
                if (edited != null) {
                  a.set(j, edited);
                  changed = true;
                  replaced++;
                }
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

  private static List<COSString> strings(Object token) {
    List<COSString> out = new ArrayList<>();
    if (token instanceof COSString s) {
      out.add(s);
    } else if (token instanceof COSArray a) {
      for (COSBase b : a) {
        if (b instanceof COSString s) {
          out.add(s);
        }
      }
    }
    return out;
  }

  /** The operand's text through the font's ToUnicode map; notes each character's code bytes. */
  private static String decode(PDFont font, COSString s, Map<String, byte[]> codes)
      throws IOException {
    StringBuilder text = new StringBuilder();
    byte[] bytes = s.getBytes();
    ByteArrayInputStream in = new ByteArrayInputStream(bytes);
    int at = 0;
    while (in.available() > 0) {
      int code = font.readCode(in);
      int next = bytes.length - in.available();
      String u = font.toUnicode(code);
      if (u != null) {
        text.append(u);
        codes.putIfAbsent(u, Arrays.copyOfRange(bytes, at, next));
      }
      at = next;
    }
    return text.toString();
  }

  private static COSString edited(PDFont font, COSString s, String from, String to,
      Map<String, byte[]> codes) throws IOException {
    String text = decode(font, s, new HashMap<>());
    if (!text.contains(from)) {
      return null;
    }
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    String changed = text.replace(from, to);
    for (int i = 0; i < changed.length(); ) {
      String c = new String(Character.toChars(changed.codePointAt(i)));
      byte[] code = codes.get(c);
      assertThat(code).as("a code for '%s' in font %s", c, font.getName()).isNotNull();
      out.write(code);
      i += c.length();
    }
    return new COSString(out.toByteArray());
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

package org.bracewalk.report;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.bracewalk.core.port.RenderingException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class TemplatesTest {
  @TempDir Path dir;

  static String packedText() throws IOException {
    try (InputStream in =
        TemplatesTest.class.getClassLoader().getResourceAsStream("templates/report.en.properties")) {
      return new String(in.readAllBytes(), StandardCharsets.UTF_8);
    }
  }

  private TemplateSource folderWith(String text) throws IOException {
    Files.writeString(dir.resolve("report.en.properties"), text, StandardCharsets.UTF_8);
    return TemplateSource.folder(dir);
  }

  private static String replaceLine(String text, String key, String newLine) {
    StringBuilder out = new StringBuilder();
    for (String line : text.split("\n", -1)) {
      out.append(line.startsWith(key + "=") ? newLine : line).append('\n');
    }
    return out.toString();
  }

  @Test
  void thePackedEnglishWordingHasEveryKeyTheDocumentsUse() {
    Templates t = Templates.load(TemplateSource.packed(), "en");
    for (String key : TemplateSpec.keys().keySet()) {
      assertThat(t.has(key)).as(key).isTrue();
    }
    assertThat(t.format("footer.page", "n", 2, "total", 7)).isEqualTo("page 2 of 7");
  }

  @Test
  void aMissingKeyIsNamedWithTheFile() throws IOException {
    TemplateSource src = folderWith(replaceLine(packedText(), "heading.findings", "# removed"));
    assertThatThrownBy(() -> Templates.load(src, "en"))
        .isInstanceOf(RenderingException.class)
        .hasMessageContaining(dir.resolve("report.en.properties").toString())
        .hasMessageContaining("key 'heading.findings' is missing");
  }

  @Test
  void aPlaceholderTheKeyDoesNotHaveIsRefused() throws IOException {
    TemplateSource src = folderWith(replaceLine(packedText(), "footer.page", "footer.page=page {n} of {totl}"));
    assertThatThrownBy(() -> Templates.load(src, "en"))
        .hasMessageContaining("key 'footer.page' uses placeholder {totl}, which it does not have (it has n, total)");
  }

  @Test
  void anUnclosedBraceIsRefusedNamingTheKey() throws IOException {
    TemplateSource src = folderWith(replaceLine(packedText(), "heading.plane", "heading.plane=Plane {plane"));
    assertThatThrownBy(() -> Templates.load(src, "en"))
        .hasMessageContaining("key 'heading.plane' has a '{' at character 7 with no closing '}'");
  }

  @Test
  void aCharacterTheFontCannotShowIsRefused() throws IOException {
    // U+4E2D (a CJK ideograph): DejaVu Sans has no CJK glyphs (its coverage table, dejavu-fonts.github.io)
    TemplateSource src = folderWith(replaceLine(packedText(), "damage.monitor", "damage.monitor=\u4e2d limit"));
    assertThatThrownBy(() -> Templates.load(src, "en"))
        .hasMessageContaining("key 'damage.monitor' uses character U+4E2D, which the report font (DejaVu Sans) cannot show");
  }

  @Test
  void polishRomanianGreekCyrillicAndTheLessOrEqualSignAreFine() throws IOException {
    String title = "Raport \u0141\u00f3d\u017a, \u0218tefan, \u0391\u03b8\u03ae\u03bd\u03b1,"
        + " \u041c\u043e\u0441\u043a\u0432\u0430 \u2264 1 m";
    Templates t = Templates.load(
        folderWith(replaceLine(packedText(), "doc.report.title", "doc.report.title=" + title)), "en");
    assertThat(t.text("doc.report.title")).isEqualTo(title);
  }

  @Test
  void accentedLettersOfWesternLanguagesAreFine() throws IOException {
    Templates t = Templates.load(
        folderWith(replaceLine(packedText(), "doc.report.title", "doc.report.title=Prüfbericht Aussteifung für Gerüste, été")),
        "en");
    assertThat(t.text("doc.report.title")).isEqualTo("Prüfbericht Aussteifung für Gerüste, été");
  }

  @Test
  void aFileThatIsNotUtf8IsRefusedWithItsLine() throws IOException {
    byte[] text = packedText().getBytes(StandardCharsets.UTF_8);
    byte[] bad = new byte[text.length + 12];
    byte[] head = "# a\n# b\nx=\u00e9".getBytes(StandardCharsets.ISO_8859_1);
    System.arraycopy(head, 0, bad, 0, head.length);
    bad[head.length] = '\n';
    System.arraycopy(text, 0, bad, head.length + 1, Math.min(text.length, bad.length - head.length - 1));
    Files.write(dir.resolve("report.en.properties"), bad);
    assertThatThrownBy(() -> Templates.load(TemplateSource.folder(dir), "en"))
        .hasMessageContaining("is not valid UTF-8 (line 3)");
  }

  @Test
  void aBadDatePatternIsNamed() throws IOException {
    TemplateSource src = folderWith(replaceLine(packedText(), "format.date", "format.date=d MMM yyyy #"));
    assertThatThrownBy(() -> Templates.load(src, "en"))
        .hasMessageContaining("key 'format.date' is not a date pattern");
  }

  @Test
  void aLanguageWithoutAFileIsNamed() {
    assertThatThrownBy(() -> Templates.load(TemplateSource.packed(), "xx"))
        .hasMessageContaining("templates/report.xx.properties (packed) is missing");
    assertThatThrownBy(() -> Templates.load(TemplateSource.packed(), "../etc"))
        .hasMessageContaining("is not a language tag");
  }

  @Test
  void placeholdersAndDoubledBracesParse() {
    assertThat(Templates.placeholders("a {x} {{literal}} {y2}")).isEqualTo(List.of("x", "y2"));
  }

  @Test
  void aFirmsEditedWordingIsWhatTheReportSaysAndABrokenOneWritesNothing() throws IOException {
    TemplateSource edited = folderWith(replaceLine(packedText(), "doc.report.title", "doc.report.title=Bracing survey of Hollin Vale Scaffolds Ltd"));
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    new PdfReportRenderer(edited, "en").renderReport(ReportFixtures.report(true), out);
    assertThat(PdfReportRendererTest.pageTexts(out.toByteArray()).get(0))
        .contains("Bracing survey of Hollin Vale Scaffolds Ltd");

    TemplateSource broken = folderWith(replaceLine(packedText(), "caution.lost", ""));
    ByteArrayOutputStream none = new ByteArrayOutputStream();
    assertThatThrownBy(() -> new PdfReportRenderer(broken, "en").renderReport(ReportFixtures.report(true), none))
        .hasMessageContaining("key 'caution.lost' is missing");
    assertThat(none.size()).isZero();
  }
}

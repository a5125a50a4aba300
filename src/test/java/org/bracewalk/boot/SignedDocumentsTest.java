package org.bracewalk.boot;

import org.bracewalk.boot.Commands.Run;
import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.cert.X509Certificate;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.interactive.digitalsignature.PDSignature;
import org.bouncycastle.cert.X509CertificateHolder;
import org.bouncycastle.cert.jcajce.JcaX509CertificateConverter;
import org.bouncycastle.cms.CMSProcessableByteArray;
import org.bouncycastle.cms.CMSSignedData;
import org.bouncycastle.cms.SignerInformation;
import org.bouncycastle.cms.jcajce.JcaSimpleSignerInfoVerifierBuilder;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * With a PKCS#12 certificate in the environment, reports and repair orders carry a PDF signature
 * a PDF reader checks: a signature dictionary ({@code adbe.pkcs7.detached}), a byte range covering
 * the whole file but the signature's own hole, and a CMS SignedData over those bytes (ISO 32000-1,
 * 12.8.1 and 12.8.3.3; RFC 5652). The signature is checked here with PDFBox and BouncyCastle, not
 * with the library that made it.
 */
class SignedDocumentsTest {
  private static final String PASSWORD = "k33p-it-s3cret";

  @TempDir Path dir;
  private Path db;
  private Path p12;
  private final AppContext context =
      new AppContext(Clock.fixed(Instant.parse("2025-03-06T09:00:00Z"), ZoneOffset.UTC),
          PlaneAnalyzer.standard());

  Run run(Map<String, String> env, String... args) {
    return Commands.run(context, env, args);
  }

  /** A key pair and self-signed certificate made with the JDK's keytool (its usual options). */
  @BeforeEach
  void setUp() throws Exception {
    db = dir.resolve("demo.db");
    assertThat(run(Map.of(), "demo", "--db", db.toString()).code()).isZero();
    p12 = dir.resolve("inspector.p12");
    Path keytool = Path.of(System.getProperty("java.home"), "bin", "keytool");
    Process p = new ProcessBuilder(keytool.toString(), "-genkeypair", "-alias", "inspector",
        "-keyalg", "RSA", "-keysize", "2048", "-sigalg", "SHA256withRSA",
        "-dname", "CN=Test Inspector, O=Bracewalk test", "-startdate", "2020/01/01 00:00:00",
        "-validity", "7300", "-storetype", "PKCS12", "-keystore", p12.toString(),
        "-storepass", PASSWORD, "-keypass", PASSWORD)
        .redirectErrorStream(true).start();
    String output = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
    assertThat(p.waitFor(60, TimeUnit.SECONDS)).isTrue();
    assertThat(p.exitValue()).as(output).isZero();
  }

  private Map<String, String> signing() {
    return Map.of("BRACEWALK_SIGN_P12", p12.toString(), "BRACEWALK_SIGN_PASSWORD", PASSWORD);
  }

  /** Checks the one signature of {@code file} as a PDF reader does; returns its signer's name. */
  static String checkSignature(byte[] file) throws Exception {
    try (PDDocument d = Loader.loadPDF(file)) {
      List<PDSignature> signatures = d.getSignatureDictionaries();
      assertThat(signatures).hasSize(1);
      PDSignature sig = signatures.get(0);
      assertThat(sig.getFilter()).isEqualTo("Adobe.PPKLite");
      assertThat(sig.getSubFilter()).isEqualTo("adbe.pkcs7.detached");
      int[] range = sig.getByteRange();
      assertThat(range).hasSize(4);
      // the byte range starts at 0, ends at the file's end, and leaves out only <contents>
      assertThat(range[0]).isZero();
      assertThat(range[2] + range[3]).isEqualTo(file.length);
      assertThat(file[range[1]]).isEqualTo((byte) '<');
      assertThat(file[range[2] - 1]).isEqualTo((byte) '>');
      String hole = new String(file, range[1] + 1, range[2] - range[1] - 2, StandardCharsets.US_ASCII);
      assertThat(hole).matches("[0-9A-Fa-f]+");

      byte[] signed = new byte[range[1] + range[3]];
      System.arraycopy(file, 0, signed, 0, range[1]);
      System.arraycopy(file, range[2], signed, range[1], range[3]);
      assertThat(sig.getSignedContent(file)).isEqualTo(signed);
      CMSSignedData cms = new CMSSignedData(new CMSProcessableByteArray(signed), sig.getContents(file));
      SignerInformation signer = cms.getSignerInfos().getSigners().iterator().next();
      @SuppressWarnings("unchecked")
      X509CertificateHolder holder = (X509CertificateHolder) cms.getCertificates()
          .getMatches(signer.getSID()).iterator().next();
      X509Certificate cert = new JcaX509CertificateConverter().getCertificate(holder);
      assertThat(signer.verify(new JcaSimpleSignerInfoVerifierBuilder().build(cert))).isTrue();
      assertThat(signer.getDigestAlgOID()).isEqualTo("2.16.840.1.101.3.4.2.1"); // SHA-256
      // one byte changed inside the signed range: the CMS no longer verifies
      byte[] tampered = signed.clone();
      tampered[range[1] / 2] ^= 1;
      CMSSignedData broken = new CMSSignedData(new CMSProcessableByteArray(tampered),
          sig.getContents(file));
      SignerInformation b = broken.getSignerInfos().getSigners().iterator().next();
      boolean stillValid;
      try {
        stillValid = b.verify(new JcaSimpleSignerInfoVerifierBuilder().build(cert));
      } catch (org.bouncycastle.cms.CMSException e) {
        stillValid = false;
      }
      assertThat(stillValid).isFalse();
      return cert.getSubjectX500Principal().getName();
    }
  }

  @Test
  void aSignedReportCarriesASignatureAReaderChecksAndStillVerifies() throws Exception {
    Path pdf = dir.resolve("impact.pdf");
    Run made = run(signing(), "report", "--db", db.toString(), "--inspection", "2", "--out",
        pdf.toString());
    assertThat(made.code()).as(made.err()).isZero();
    assertThat(made.out()).contains("digitally signed").doesNotContain(PASSWORD);
    byte[] bytes = Files.readAllBytes(pdf);
    assertThat(checkSignature(bytes)).contains("CN=Test Inspector");
    assertThat(ForgedDocumentsTest.text(bytes)).contains("LOST RIGIDITY");

    // the registered bytes are the signed ones: the file verifies, with or without the certificate
    Run v = run(Map.of(), "verify-report", "--db", db.toString(), pdf.toString());
    assertThat(v.code()).as(v.out()).isZero();
    assertThat(v.out()).contains("matches: " + pdf);

    // an edit after signing neither verifies against the register nor keeps a valid signature
    byte[] edited = ForgedDocumentsTest.replaceText(bytes, "LOST RIGIDITY", "All planes hold their shape");
    Path forged = dir.resolve("edited.pdf");
    Files.write(forged, edited);
    assertThat(run(Map.of(), "verify-report", "--db", db.toString(), forged.toString()).code())
        .isEqualTo(1);
  }

  /**
   * A second, independent reader: poppler's {@code pdfsig} (when installed, as for
   * {@code PageImagesTest}) checks the signature as a PDF viewer does.
   */
  @Test
  void popplerFindsTheSignatureValidOverTheWholeDocument() throws Exception {
    Path pdfsig = Path.of("/usr/bin/pdfsig");
    org.junit.jupiter.api.Assumptions.assumeTrue(Files.isExecutable(pdfsig),
        "poppler's pdfsig is not installed");
    Path pdf = dir.resolve("impact.pdf");
    Run made = run(signing(), "report", "--db", db.toString(), "--inspection", "2", "--out",
        pdf.toString());
    assertThat(made.code()).as(made.err()).isZero();
    Process p = new ProcessBuilder(pdfsig.toString(), pdf.toString()).redirectErrorStream(true).start();
    String output = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
    assertThat(p.waitFor(60, TimeUnit.SECONDS)).isTrue();
    assertThat(output).contains("Signer Certificate Common Name: Test Inspector")
        .contains("Signing Hash Algorithm: SHA-256")
        .contains("Total document signed")
        .contains("Signature is Valid");
  }

  @Test
  void aSignedRepairOrderToo() throws Exception {
    Path pdf = dir.resolve("order.pdf");
    Run made = run(signing(), "repair-order", "--db", db.toString(), "--inspection", "2", "--out",
        pdf.toString());
    assertThat(made.code()).as(made.err()).isZero();
    checkSignature(Files.readAllBytes(pdf));
    assertThat(run(Map.of(), "verify-report", "--db", db.toString(), pdf.toString()).code()).isZero();
  }

  @Test
  void withoutACertificateNothingIsSigned() throws Exception {
    Path pdf = dir.resolve("impact.pdf");
    Run made = run(Map.of(), "report", "--db", db.toString(), "--inspection", "2", "--out",
        pdf.toString());
    assertThat(made.code()).isZero();
    assertThat(made.out()).doesNotContain("signed");
    try (PDDocument d = Loader.loadPDF(Files.readAllBytes(pdf))) {
      assertThat(d.getSignatureDictionaries()).isEmpty();
    }
  }

  @Test
  void aCertificateThatCannotBeUsedIsBadInputNamingTheSettingAndNeverThePassword() throws Exception {
    Path pdf = dir.resolve("impact.pdf");
    Path missing = dir.resolve("nowhere.p12");
    Map<String, Map<String, String>> cases = Map.of(
        "missing file", Map.of("BRACEWALK_SIGN_P12", missing.toString(),
            "BRACEWALK_SIGN_PASSWORD", PASSWORD),
        "wrong password", Map.of("BRACEWALK_SIGN_P12", p12.toString(),
            "BRACEWALK_SIGN_PASSWORD", PASSWORD + "-wrong"),
        "no password", Map.of("BRACEWALK_SIGN_P12", p12.toString()),
        "no file", Map.of("BRACEWALK_SIGN_PASSWORD", PASSWORD));
    for (Map.Entry<String, Map<String, String>> c : cases.entrySet()) {
      Run r = run(c.getValue(), "report", "--db", db.toString(), "--inspection", "2", "--out",
          pdf.toString());
      assertThat(r.code()).as(c.getKey() + ": " + r.err()).isEqualTo(2);
      assertThat(r.err()).as(c.getKey()).contains("error: ")
          .doesNotContain(PASSWORD);
      assertThat(pdf).as(c.getKey()).doesNotExist();
    }
    Run noFile = run(cases.get("missing file"), "report", "--db", db.toString(), "--inspection",
        "2", "--out", pdf.toString());
    assertThat(noFile.err()).contains(missing.toString()).contains("$BRACEWALK_SIGN_P12");
    Run wrong = run(cases.get("wrong password"), "report", "--db", db.toString(), "--inspection",
        "2", "--out", pdf.toString());
    assertThat(wrong.err()).contains(p12.toString()).contains("$BRACEWALK_SIGN_PASSWORD");
    assertThat(run(cases.get("no password"), "report", "--db", db.toString(), "--inspection",
        "2", "--out", pdf.toString()).err()).contains("BRACEWALK_SIGN_PASSWORD is not");
    assertThat(run(cases.get("no file"), "report", "--db", db.toString(), "--inspection",
        "2", "--out", pdf.toString()).err()).contains("BRACEWALK_SIGN_P12 is not");
    // nothing was registered either
    Run v = run(Map.of(), "report", "--db", db.toString(), "--inspection", "2", "--out",
        pdf.toString());
    assertThat(v.out()).containsPattern("registered as issued \\(inspection-report 1,");
  }
}

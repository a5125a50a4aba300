package org.bracewalk.report;

import com.lowagie.text.DocumentException;
import com.lowagie.text.pdf.PdfDate;
import com.lowagie.text.pdf.PdfDictionary;
import com.lowagie.text.pdf.PdfName;
import com.lowagie.text.pdf.PdfPKCS7;
import com.lowagie.text.pdf.PdfReader;
import com.lowagie.text.pdf.PdfSignature;
import com.lowagie.text.pdf.PdfSignatureAppearance;
import com.lowagie.text.pdf.PdfStamper;
import com.lowagie.text.pdf.PdfString;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.security.GeneralSecurityException;
import java.security.KeyStore;
import java.security.MessageDigest;
import java.security.PrivateKey;
import java.security.cert.Certificate;
import java.security.cert.X509Certificate;
import java.time.Clock;
import java.util.Arrays;
import java.util.Calendar;
import java.util.Collections;
import java.util.GregorianCalendar;
import java.util.HashMap;
import java.util.Map;
import java.util.TimeZone;
import org.bracewalk.core.port.DocumentSigner;
import org.bracewalk.core.port.RenderingException;

/**
 * Signs PDFs with the private key and certificate chain of a PKCS#12 file: an invisible signature
 * field, {@code /Filter /Adobe.PPKLite /SubFilter /adbe.pkcs7.detached}, a CMS SignedData over
 * SHA-256 of the byte range (everything but the {@code /Contents} hole), as PDF readers check it
 * (ISO 32000-1, 12.8). Built with OpenPDF's {@code PdfStamper.createSignature} and
 * {@code PdfPKCS7} (which use BouncyCastle for the CMS). The key store is read on the first
 * signature; its errors name the setting and the file, never the password.
 */
public final class Pkcs12Signer implements DocumentSigner {
  /** Room for the CMS (certificate chain included) in the signature's hole, in bytes. */
  private static final int CONTENTS_BYTES = 16 * 1024;

  private final Path file;
  private final char[] password;
  private final String fileSetting;
  private final String passwordSetting;
  private final Clock clock;
  private Loaded loaded;

  private record Loaded(PrivateKey key, Certificate[] chain, String signer) {}

  /**
   * @param file the PKCS#12 file
   * @param password its password (and the key's)
   * @param fileSetting what names the file to the user (e.g. the environment variable), for messages
   * @param passwordSetting what names the password to the user, for messages
   */
  public Pkcs12Signer(Path file, char[] password, String fileSetting, String passwordSetting,
      Clock clock) {
    this.file = file;
    this.password = password.clone();
    this.fileSetting = fileSetting;
    this.passwordSetting = passwordSetting;
    this.clock = clock;
  }

  @Override
  public boolean signs() {
    return true;
  }

  private synchronized Loaded load() {
    if (loaded != null) {
      return loaded;
    }
    String where = "the signing certificate " + file + " (" + fileSetting + ")";
    KeyStore store;
    try (InputStream in = Files.newInputStream(file)) {
      store = KeyStore.getInstance("PKCS12");
      store.load(in, password);
    } catch (NoSuchFileException e) {
      throw new RenderingException(where + " does not exist; set " + fileSetting
          + " to a PKCS#12 file (.p12) or unset it to issue unsigned documents", e);
    } catch (IOException e) {
      throw new RenderingException("cannot read " + where + ": " + reason(e)
          + " (a wrong " + passwordSetting + " also shows so)", e);
    } catch (GeneralSecurityException e) {
      throw new RenderingException("cannot read " + where + ": " + reason(e), e);
    }
    try {
      for (String alias : Collections.list(store.aliases())) {
        if (!store.isKeyEntry(alias)) {
          continue;
        }
        if (!(store.getKey(alias, password) instanceof PrivateKey key)) {
          continue;
        }
        Certificate[] chain = store.getCertificateChain(alias);
        if (chain == null || chain.length == 0 || !(chain[0] instanceof X509Certificate cert)) {
          continue;
        }
        cert.checkValidity(java.util.Date.from(clock.instant()));
        String cn = PdfPKCS7.getSubjectFields(cert).getField("CN");
        loaded = new Loaded(key, chain, cn == null ? alias : cn);
        return loaded;
      }
    } catch (java.security.cert.CertificateExpiredException
        | java.security.cert.CertificateNotYetValidException e) {
      throw new RenderingException(where + " holds a certificate that is not valid now: "
          + reason(e), e);
    } catch (GeneralSecurityException e) {
      throw new RenderingException("cannot use the key in " + where + ": " + reason(e)
          + " (the key must have the same password, " + passwordSetting + ")", e);
    }
    throw new RenderingException(where + " holds no private key with an X.509 certificate");
  }

  private static String reason(Exception e) {
    return e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
  }

  @Override
  public byte[] sign(byte[] pdf, String reason) {
    Loaded key = load();
    try {
      PdfReader reader = new PdfReader(pdf);
      ByteArrayOutputStream out = new ByteArrayOutputStream(pdf.length + 2 * CONTENTS_BYTES + 4096);
      PdfStamper stamper = PdfStamper.createSignature(reader, out, '\0');
      PdfSignatureAppearance appearance = stamper.getSignatureAppearance();
      Calendar when = new GregorianCalendar(TimeZone.getTimeZone("UTC"));
      when.setTimeInMillis(clock.millis());
      appearance.setSignDate(when);
      appearance.setReason(reason);
      appearance.setCrypto(null, key.chain(), null, PdfSignatureAppearance.SELF_SIGNED);
      PdfSignature dictionary = new PdfSignature(PdfName.ADOBE_PPKLITE, PdfName.ADBE_PKCS7_DETACHED);
      dictionary.setReason(reason);
      dictionary.setName(key.signer());
      dictionary.setDate(new PdfDate(when));
      appearance.setCryptoDictionary(dictionary);
      Map<PdfName, Integer> hole = new HashMap<>();
      hole.put(PdfName.CONTENTS, CONTENTS_BYTES * 2 + 2);
      appearance.preClose(hole);

      MessageDigest sha256 = MessageDigest.getInstance("SHA-256");
      try (InputStream range = appearance.getRangeStream()) {
        byte[] buf = new byte[8192];
        for (int n; (n = range.read(buf)) > 0; ) {
          sha256.update(buf, 0, n);
        }
      }
      byte[] digest = sha256.digest();
      PdfPKCS7 cms = new PdfPKCS7(key.key(), key.chain(), null, "SHA256", null, false);
      byte[] attributes = cms.getAuthenticatedAttributeBytes(digest, when, null);
      cms.update(attributes, 0, attributes.length);
      byte[] encoded = cms.getEncodedPKCS7(digest, when, null, null);
      if (encoded.length > CONTENTS_BYTES) {
        throw new RenderingException("the signature made with " + file + " (" + fileSetting
            + ") is " + encoded.length + " bytes, more than the " + CONTENTS_BYTES
            + " bytes kept for it; use a certificate with a shorter chain");
      }
      PdfDictionary contents = new PdfDictionary();
      contents.put(PdfName.CONTENTS,
          new PdfString(Arrays.copyOf(encoded, CONTENTS_BYTES)).setHexWriting(true));
      appearance.close(contents);
      return out.toByteArray();
    } catch (IOException | DocumentException e) {
      throw new RenderingException("the document could not be signed: " + reason(e), e);
    } catch (GeneralSecurityException e) {
      throw new RenderingException("the document could not be signed with " + file + " ("
          + fileSetting + "): " + reason(e), e);
    }
  }
}

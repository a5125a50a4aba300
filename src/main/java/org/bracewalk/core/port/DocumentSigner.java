package org.bracewalk.core.port;

/**
 * Signs an issued document with a digital signature any PDF reader checks, when a signing
 * certificate is configured; otherwise {@link #NONE} hands the document back unchanged.
 */
public interface DocumentSigner {

  /** No certificate configured: documents are issued as rendered. */
  DocumentSigner NONE = new DocumentSigner() {
    @Override
    public byte[] sign(byte[] pdf, String reason) {
      return pdf;
    }

    @Override
    public boolean signs() {
      return false;
    }
  };

  /**
   * The document signed: the bytes returned are the final bytes to issue.
   *
   * @param reason the signature's reason, e.g. "inspection report of inspection 2"
   * @throws RenderingException when the certificate cannot be loaded or used; the message names
   *     the setting or file (never the password)
   */
  byte[] sign(byte[] pdf, String reason);

  /** True when documents are signed. */
  boolean signs();
}

package org.bracewalk.core.model;

import java.time.Instant;
import java.util.Objects;

/**
 * A document issued for an inspection, in the register of issued documents (append-only), so a
 * copy can be checked later.
 *
 * @param id stored id; 0 when new
 * @param inspectionId the inspection reported on
 * @param kind which document it is
 * @param fileName the file name as issued
 * @param fingerprint the SHA-256 of the file's exact bytes as written, 64 lower-case hex digits
 * @param recordsFingerprint the fingerprint of the inspection's records the document was made
 *     from (64 lower-case hex digits); {@code null} for a row registered before the register kept
 *     it, or brought in by a site-file import
 * @param origin how the row came into the register
 * @param issuedAt when it was issued (UTC)
 */
public record IssuedReport(long id, long inspectionId, Kind kind, String fileName,
    String fingerprint, String recordsFingerprint, Origin origin, Instant issuedAt) {

  /** The kinds of issued document, by the labels the register and the document stamp use. */
  public enum Kind {
    INSPECTION_REPORT("inspection-report"),
    REPAIR_ORDER("repair-order"),
    REPAIR_ORDER_CSV("repair-order-csv");

    private final String label;

    Kind(String label) {
      this.label = label;
    }

    public String label() {
      return label;
    }

    public static Kind fromLabel(String label) {
      for (Kind k : values()) {
        if (k.label.equals(label)) {
          return k;
        }
      }
      throw new IllegalArgumentException("unknown issued document kind '" + label
          + "': use inspection-report, repair-order or repair-order-csv");
    }
  }

  /** How a row came into the register. */
  public enum Origin {
    /** Issued by this program from this database, with the fingerprint of its records. */
    ISSUED("issued"),
    /** Brought in by a site-file import: another database issued it; it vouches for nothing here. */
    IMPORTED("imported"),
    /** Registered before the register kept kinds and record fingerprints (the file's bytes only). */
    BEFORE_REGISTER("before-register");

    private final String label;

    Origin(String label) {
      this.label = label;
    }

    public String label() {
      return label;
    }

    public static Origin fromLabel(String label) {
      for (Origin o : values()) {
        if (o.label.equals(label)) {
          return o;
        }
      }
      throw new IllegalArgumentException("unknown register origin '" + label
          + "': use issued, imported or before-register");
    }
  }

  public IssuedReport {
    Text.id(id, "issued report id");
    Text.ref(inspectionId, "inspection");
    Objects.requireNonNull(kind, "kind");
    fileName = Text.required(fileName, "report file name");
    Objects.requireNonNull(fingerprint, "fingerprint");
    if (!fingerprint.matches("[0-9a-f]{64}")) {
      throw new IllegalArgumentException(
          "fingerprint must be a SHA-256 in 64 lower-case hex digits, got '" + fingerprint + "'");
    }
    if (recordsFingerprint != null && !recordsFingerprint.matches("[0-9a-f]{64}")) {
      throw new IllegalArgumentException("records fingerprint must be a SHA-256 in 64 lower-case"
          + " hex digits, got '" + recordsFingerprint + "'");
    }
    Objects.requireNonNull(origin, "origin");
    if (origin == Origin.ISSUED && recordsFingerprint == null) {
      throw new IllegalArgumentException(
          "an issued document needs the fingerprint of the records it was made from");
    }
    Objects.requireNonNull(issuedAt, "issued at");
  }

  /**
   * A report as a site file carries it (name, SHA-256 of the bytes, time): registered as
   * {@link Origin#IMPORTED}, with no records fingerprint.
   */
  public IssuedReport(long id, long inspectionId, String fileName, String fingerprint,
      Instant issuedAt) {
    this(id, inspectionId, Kind.INSPECTION_REPORT, fileName, fingerprint, null, Origin.IMPORTED,
        issuedAt);
  }

  /** A document this program issues now, from records with the given fingerprint. */
  public static IssuedReport issued(long inspectionId, Kind kind, String fileName,
      String bytesSha256, String recordsFingerprint, Instant issuedAt) {
    return new IssuedReport(0, inspectionId, kind, fileName, bytesSha256, recordsFingerprint,
        Origin.ISSUED, issuedAt);
  }

  public IssuedReport withId(long newId) {
    return new IssuedReport(newId, inspectionId, kind, fileName, fingerprint, recordsFingerprint,
        origin, issuedAt);
  }
}

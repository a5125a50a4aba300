package org.bracewalk.core.model;

import java.time.Instant;
import java.util.Objects;

/**
 * A report file issued for an inspection, remembered so a copy can be checked later.
 *
 * @param id stored id; 0 when new
 * @param inspectionId the inspection reported on
 * @param fileName the file name as issued
 * @param fingerprint the SHA-256 of the file's bytes, 64 lower-case hex digits
 * @param issuedAt when it was issued (UTC)
 */
public record IssuedReport(long id, long inspectionId, String fileName, String fingerprint, Instant issuedAt) {

  public IssuedReport {
    Text.id(id, "issued report id");
    Text.ref(inspectionId, "inspection");
    fileName = Text.required(fileName, "report file name");
    Objects.requireNonNull(fingerprint, "fingerprint");
    if (!fingerprint.matches("[0-9a-f]{64}")) {
      throw new IllegalArgumentException(
          "fingerprint must be a SHA-256 in 64 lower-case hex digits, got '" + fingerprint + "'");
    }
    Objects.requireNonNull(issuedAt, "issued at");
  }

  public IssuedReport withId(long newId) {
    return new IssuedReport(newId, inspectionId, fileName, fingerprint, issuedAt);
  }
}

package org.bracewalk.core.port.report;

import java.util.List;
import java.util.Objects;

/**
 * The fingerprint of an inspection's records: a SHA-256 over the section digests in order, and
 * the section digests themselves (embedded in the report so a check can say which section
 * differs). {@code scheme} names the canonical form used (see DEVELOPERS.md).
 */
public record RecordFingerprint(String scheme, String sha256, List<SectionDigest> sections) {
  public RecordFingerprint {
    Objects.requireNonNull(scheme, "scheme");
    Objects.requireNonNull(sha256, "sha256");
    if (!sha256.matches("[0-9a-f]{64}")) {
      throw new IllegalArgumentException("not a lower-case SHA-256 in hex: '" + sha256 + "'");
    }
    sections = List.copyOf(sections);
  }
}

package org.bracewalk.core.port.report;

import java.util.Objects;

/** The SHA-256 of one section of an inspection's records (say one plane's observations). */
public record SectionDigest(String name, String sha256) {
  public SectionDigest {
    Objects.requireNonNull(name, "name");
    Objects.requireNonNull(sha256, "sha256");
    if (name.isBlank() || name.contains("\n") || name.contains("=")) {
      throw new IllegalArgumentException("a section name is one line without '=': '" + name + "'");
    }
    if (!sha256.matches("[0-9a-f]{64}")) {
      throw new IllegalArgumentException("not a lower-case SHA-256 in hex: '" + sha256 + "'");
    }
  }
}

package org.bracewalk.core.port.report;

import java.util.Objects;

/**
 * One photo attached to a finding: the image bytes (JPEG or PNG) and a caption (may be empty).
 * The array is not copied; treat it as read-only.
 */
public record FindingPhoto(byte[] data, String caption) {
  public FindingPhoto {
    Objects.requireNonNull(data, "data");
    caption = caption == null ? "" : caption;
  }
}

package org.bracewalk.core.model;

import java.time.Instant;
import java.util.Arrays;
import java.util.Objects;

/**
 * A photo attached to an observation, kept in the database so one file carries the whole record.
 * Like observations, photos are never changed or removed.
 *
 * @param id stored id; 0 when new
 * @param observationId the observation it shows
 * @param fileName the original file name (for export and display)
 * @param mediaType e.g. {@code image/jpeg}
 * @param data the bytes (copied in and out: the record stays immutable)
 * @param attachedAt when it was attached (UTC)
 */
public record Photo(
    long id, long observationId, String fileName, String mediaType, byte[] data, Instant attachedAt) {

  /** The largest photo accepted, in bytes (20 MB). */
  public static final int MAX_BYTES = 20 * 1024 * 1024;

  public Photo {
    Text.id(id, "photo id");
    Text.ref(observationId, "observation");
    fileName = Text.required(fileName, "photo file name");
    mediaType = Text.required(mediaType, "photo media type");
    Objects.requireNonNull(data, "photo data");
    if (data.length == 0 || data.length > MAX_BYTES) {
      throw new IllegalArgumentException(
          "photo " + fileName + " must hold 1 byte to 20 MB, has " + data.length);
    }
    data = data.clone();
    Objects.requireNonNull(attachedAt, "attached at");
  }

  @Override
  public byte[] data() {
    return data.clone();
  }

  public int size() {
    return data.length;
  }

  public Photo withId(long newId) {
    return new Photo(newId, observationId, fileName, mediaType, data, attachedAt);
  }

  @Override
  public boolean equals(Object o) {
    return o instanceof Photo p
        && id == p.id
        && observationId == p.observationId
        && fileName.equals(p.fileName)
        && mediaType.equals(p.mediaType)
        && Arrays.equals(data, p.data)
        && attachedAt.equals(p.attachedAt);
  }

  @Override
  public int hashCode() {
    return Objects.hash(id, observationId, fileName, mediaType, Arrays.hashCode(data), attachedAt);
  }

  @Override
  public String toString() {
    return "Photo[" + id + ", observation " + observationId + ", " + fileName + ", "
        + data.length + " bytes]";
  }
}
